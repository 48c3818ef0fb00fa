import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('pianos', (t) => {
    t.integer('asking_price_minor');
    t.text('price_currency');
  });
  await knex.raw('alter table pianos add constraint pianos_price_check check (asking_price_minor is null or (asking_price_minor >= 0 and price_currency is not null))');

  // Texts the manager edits (dealer name, warranty template).
  await knex.schema.createTable('shop_settings', (t) => {
    t.text('key').primary();
    t.jsonb('value').notNullable();
    t.integer('updated_by_id').references('users.id');
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // One public link per piano; it always shows the newest published version.
  await knex.schema.createTable('disclosure_links', (t) => {
    t.integer('piano_id').primary().references('pianos.id').onDelete('CASCADE');
    t.text('token').notNullable().unique();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // A published version never changes: content as JSON and HTML, and the digest of the content.
  await knex.schema.createTable('disclosures', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').notNullable().references('pianos.id').onDelete('CASCADE');
    t.integer('version').notNullable();
    t.jsonb('content').notNullable();
    t.text('html').notNullable();
    t.text('digest').notNullable();
    t.integer('published_by_id').notNullable().references('users.id');
    t.timestamp('published_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['piano_id', 'version']);
  });
  await knex.raw(`
    create function disclosures_frozen() returns trigger language plpgsql as $$
    begin
      raise exception 'a published disclosure version cannot change';
    end $$;
    create trigger disclosures_no_change before update on disclosures
      for each row execute function disclosures_frozen();
  `);

  await knex.schema.createTable('acknowledgements', (t) => {
    t.increments('id').primary();
    t.integer('disclosure_id').notNullable().references('disclosures.id');
    t.text('buyer_name').notNullable();
    t.text('buyer_email').notNullable();
    t.text('digest').notNullable();
    t.timestamp('acknowledged_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('receipt_token').notNullable().unique();
    t.integer('countersigned_by_id').references('users.id');
    t.timestamp('countersigned_at', { useTz: true });
    t.text('pdf_key');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('acknowledgements');
  await knex.schema.dropTable('disclosures');
  await knex.raw('drop function disclosures_frozen');
  await knex.schema.dropTable('disclosure_links');
  await knex.schema.dropTable('shop_settings');
  await knex.raw('alter table pianos drop constraint pianos_price_check');
  await knex.schema.alterTable('pianos', (t) => t.dropColumns('asking_price_minor', 'price_currency'));
}
