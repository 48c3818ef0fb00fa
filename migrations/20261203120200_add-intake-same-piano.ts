import type { Knex } from 'knex';

// The same piano taken in again: the earlier record intake staff knowingly matched it with.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('intakes', (t) => t.integer('same_piano_as_id').references('pianos.id').onDelete('SET NULL'));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('intakes', (t) => t.dropColumn('same_piano_as_id'));
}
