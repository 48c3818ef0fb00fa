import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('deposits', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').notNullable().references('pianos.id').onDelete('CASCADE');
    t.integer('disclosure_id').notNullable().references('disclosures.id');
    t.integer('acknowledgement_id').notNullable().references('acknowledgements.id');
    t.text('disclosure_digest').notNullable();
    t.text('buyer_name').notNullable();
    t.text('buyer_email').notNullable();
    t.integer('amount_minor').notNullable();
    t.text('currency').notNullable();
    t.text('checkout_session_id').notNullable().unique();
    t.text('payment_intent_id');
    t.text('status').notNullable().defaultTo('pending');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('paid_at', { useTz: true });
    t.timestamp('hold_expires_at', { useTz: true });
    t.timestamp('closed_at', { useTz: true });
    t.text('refund_id');
    t.integer('refunded_minor').notNullable().defaultTo(0);
    t.text('close_reason');
  });
  await knex.raw(`alter table deposits add constraint deposits_status_check check (status in ('pending', 'holding', 'applied', 'released', 'expired', 'refunded', 'cancelled'))`);
  // One hold per piano, enforced by the database: two paid deposits cannot both hold it.
  await knex.raw(`create unique index deposits_one_hold_per_piano on deposits (piano_id) where status = 'holding'`);

  // Each payment event is acted on once, however often it is delivered.
  await knex.schema.createTable('payment_events', (t) => {
    t.text('event_id').primary();
    t.text('type').notNullable();
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('payment_events');
  await knex.schema.dropTable('deposits');
}
