import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.raw('create sequence piano_stock_seq start 1');
  await knex.schema.createTable('pianos', (t) => {
    t.increments('id').primary();
    t.text('stock_number').notNullable().unique()
      .defaultTo(knex.raw(`'FW-' || lpad(nextval('piano_stock_seq')::text, 4, '0')`));
    t.text('maker').notNullable();
    t.text('model');
    t.text('serial_number');
    t.integer('year');
    t.boolean('year_is_estimate').notNullable().defaultTo(false);
    t.text('kind').notNullable();
    t.integer('size_cm');
    t.text('finish');
    t.text('stage').notNullable().defaultTo('received');
    t.integer('created_by_id').references('users.id').onDelete('SET NULL');
    t.timestamp('stage_changed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['stage']);
  });
  await knex.raw(`alter table pianos add constraint pianos_kind_check check (kind in ('upright', 'grand'))`);
  await knex.raw(`alter table pianos add constraint pianos_stage_check check (stage in (
    'received', 'assessed', 'in_workshop', 'ready', 'on_floor', 'held', 'sold', 'delivered', 'wholesaled', 'returned_to_owner'))`);
  await knex.raw('alter table pianos add constraint pianos_year_check check (year is null or year between 1700 and 2100)');
  await knex.raw('alter table pianos add constraint pianos_size_check check (size_cm is null or size_cm between 50 and 400)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('pianos');
  await knex.raw('drop sequence piano_stock_seq');
}
