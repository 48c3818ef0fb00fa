import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // When and how the balance was paid: in the shop (marked by staff) or online.
  await knex.schema.alterTable('sales', (t) => {
    t.timestamp('balance_paid_at', { useTz: true });
    t.text('balance_paid_how');
    t.integer('balance_paid_by_id').references('users.id');
  });
  await knex.raw(`alter table sales add constraint sales_balance_paid_check check (
    (balance_paid_at is null) = (balance_paid_how is null) and (balance_paid_how is null or balance_paid_how in ('in_shop', 'online')))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sales', (t) => {
    t.dropColumn('balance_paid_by_id');
    t.dropColumn('balance_paid_how');
    t.dropColumn('balance_paid_at');
  });
}
