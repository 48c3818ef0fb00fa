import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // The buyer's checkout for the balance, paid online from their disclosure link.
  await knex.schema.alterTable('sales', (t) => {
    t.text('balance_checkout_session_id').unique();
    t.text('balance_payment_intent_id');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sales', (t) => {
    t.dropColumn('balance_payment_intent_id');
    t.dropColumn('balance_checkout_session_id');
  });
}
