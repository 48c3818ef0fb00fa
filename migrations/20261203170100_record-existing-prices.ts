import type { Knex } from 'knex';

// Asking prices set before price history was kept get one first entry, so every price has a history row.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    insert into price_changes (piano_id, from_minor, to_minor, currency, reason, changed_by_id, changed_at)
    select id, null, asking_price_minor, price_currency, 'On record before price history was kept', null, updated_at
    from pianos where asking_price_minor is not null and price_currency is not null`);
}

export async function down(knex: Knex): Promise<void> {
  await knex('price_changes').where('reason', 'On record before price history was kept').whereNull('changed_by_id').del();
}
