import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // One sale per piano: the buyer (personal data, like a seller's), its totals in minor units, and the buyer's own piano taken in trade.
  await knex.schema.createTable('sales', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').notNullable().unique().references('pianos.id').onDelete('CASCADE');
    t.text('buyer_name').notNullable();
    t.text('buyer_phone');
    t.text('buyer_email');
    t.text('buyer_address');
    t.text('currency').notNullable();
    t.bigInteger('agreed_price_minor').notNullable();
    t.double('sales_tax_pct').notNullable();
    t.bigInteger('tax_minor').notNullable();
    t.bigInteger('total_minor').notNullable();
    t.integer('deposit_id').references('deposits.id');
    t.bigInteger('deposit_minor').notNullable().defaultTo(0);
    t.integer('trade_in_piano_id').unique().references('pianos.id');
    t.bigInteger('trade_in_allowance_minor').notNullable().defaultTo(0);
    t.bigInteger('balance_minor').notNullable();
    t.bigInteger('owed_to_buyer_minor').notNullable().defaultTo(0);
    t.integer('recorded_by_id').notNullable().references('users.id');
    t.timestamp('recorded_at', { useTz: true }).notNullable();
  });
  await knex.raw(`alter table sales add constraint sales_amounts_check check (
    agreed_price_minor > 0 and tax_minor >= 0 and deposit_minor >= 0 and trade_in_allowance_minor >= 0 and balance_minor >= 0 and owed_to_buyer_minor >= 0
    and total_minor = agreed_price_minor + tax_minor
    and balance_minor - owed_to_buyer_minor = total_minor - deposit_minor - trade_in_allowance_minor
    and (trade_in_piano_id is not null or trade_in_allowance_minor = 0))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sales');
}
