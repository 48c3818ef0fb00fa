import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('pianos', (t) => {
    t.integer('year_from');
    t.integer('year_to');
    t.text('case_condition');
    t.text('case_notes');
  });
  await knex.raw(`alter table pianos add constraint pianos_case_condition_check check (case_condition is null or case_condition in ('excellent', 'good', 'worn', 'damaged'))`);
  await knex.raw('alter table pianos add constraint pianos_year_range_check check (year_from is null or year_to is null or year_from <= year_to)');

  // Where a piano came from. The seller's details are personal data: intake staff and managers only.
  await knex.schema.createTable('intakes', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').notNullable().unique().references('pianos.id').onDelete('CASCADE');
    t.text('seller_name').notNullable();
    t.text('seller_phone');
    t.text('seller_email');
    t.text('seller_address');
    t.text('acquisition').notNullable();
    t.date('received_on').notNullable();
    t.text('inspected_at').notNullable();
    t.text('notes');
    t.integer('created_by_id').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(`alter table intakes add constraint intakes_acquisition_check check (acquisition in ('trade_in', 'purchase', 'consignment'))`);
  await knex.raw(`alter table intakes add constraint intakes_inspected_at_check check (inspected_at in ('customer_home', 'showroom', 'workshop'))`);

  // Shop grading rules, versioned: a change is a new row; the newest is in force.
  await knex.schema.createTable('grade_rule_sets', (t) => {
    t.increments('id').primary();
    t.text('version').notNullable().unique();
    t.jsonb('rules').notNullable();
    t.integer('created_by_id').references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // Each submitted inspection; a correction is a new version of the same piano's assessment.
  await knex.schema.createTable('assessments', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').notNullable().references('pianos.id').onDelete('CASCADE');
    t.integer('version').notNullable();
    t.text('kind').notNullable().defaultTo('intake');
    t.jsonb('measurements').notNullable();
    t.jsonb('grade').notNullable();
    t.integer('score').notNullable();
    t.text('band').notNullable();
    t.boolean('refer_to_technician').notNullable();
    t.boolean('not_recommended_for_retail').notNullable();
    t.text('rules_version').notNullable();
    t.text('change_note');
    t.integer('submitted_by_id').notNullable().references('users.id');
    t.timestamp('submitted_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['piano_id', 'version']);
  });
  await knex.raw(`alter table assessments add constraint assessments_kind_check check (kind in ('intake', 'post_workshop'))`);
  await knex.raw(`alter table assessments add constraint assessments_band_check check (band in ('excellent', 'good', 'fair', 'poor'))`);
  await knex.raw('alter table assessments add constraint assessments_score_check check (score between 0 and 100)');

  // Photos live in S3; a row here records one. Uploaded during a draft, a photo has a draft key and no piano yet.
  await knex.schema.createTable('photos', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').references('pianos.id').onDelete('CASCADE');
    t.text('draft_key');
    t.text('area').notNullable();
    t.text('caption');
    t.text('object_key').notNullable().unique();
    t.text('content_type').notNullable();
    t.integer('bytes').notNullable();
    t.integer('uploaded_by_id').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['piano_id']);
    t.index(['draft_key']);
  });
  await knex.raw(`alter table photos add constraint photos_area_check check (area in ('keys', 'hammers', 'strings', 'soundboard', 'tuning', 'play', 'case', 'general'))`);
  await knex.raw(`alter table photos add constraint photos_owner_check check (piano_id is not null or draft_key is not null)`);
  await knex.raw(`alter table photos add constraint photos_type_check check (content_type in ('image/jpeg', 'image/png', 'image/webp'))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('photos');
  await knex.schema.dropTable('assessments');
  await knex.schema.dropTable('grade_rule_sets');
  await knex.schema.dropTable('intakes');
  await knex.raw('alter table pianos drop constraint pianos_case_condition_check, drop constraint pianos_year_range_check');
  await knex.schema.alterTable('pianos', (t) => {
    t.dropColumns('year_from', 'year_to', 'case_condition', 'case_notes');
  });
}
