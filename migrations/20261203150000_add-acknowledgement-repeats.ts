import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // A buyer who acknowledged one version twice, before one acknowledgement per buyer was enforced: the
  // later row points at the first, which stands for both. Kept, never deleted: they are the buyer's records.
  await knex.schema.alterTable('acknowledgements', (t) => {
    t.integer('repeats_id').references('acknowledgements.id');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('acknowledgements', (t) => t.dropColumn('repeats_id'));
}
