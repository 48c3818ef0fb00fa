import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // A play-test recording in S3. Made during an intake not yet submitted, it has a draft key and no piano;
  // on submit it joins the piano and the assessment the intake wrote.
  await knex.schema.createTable('tone_recordings', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').references('pianos.id').onDelete('CASCADE');
    t.integer('assessment_id').references('assessments.id').onDelete('SET NULL');
    t.text('draft_key');
    t.text('source').notNullable();
    t.text('object_key').notNullable().unique();
    t.integer('bytes').notNullable();
    t.integer('sample_rate').notNullable();
    t.integer('channels').notNullable();
    t.double('duration_s').notNullable();
    t.integer('recorded_by_id').notNullable().references('users.id');
    t.timestamp('recorded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['piano_id']);
    t.index(['assessment_id']);
    t.index(['draft_key']);
  });
  await knex.raw(`alter table tone_recordings add constraint tone_recordings_owner_check check (piano_id is not null or draft_key is not null)`);
  await knex.raw(`alter table tone_recordings add constraint tone_recordings_source_check check (source in ('recorded', 'uploaded'))`);
  await knex.raw('alter table tone_recordings add constraint tone_recordings_duration_check check (duration_s > 0 and duration_s <= 300)');

  // Each note measured in a recording, in the order played.
  await knex.schema.createTable('tone_notes', (t) => {
    t.increments('id').primary();
    t.integer('recording_id').notNullable().references('tone_recordings.id').onDelete('CASCADE');
    t.integer('position').notNullable();
    t.double('start_s').notNullable();
    t.double('frequency_hz').notNullable();
    t.integer('key').notNullable();
    t.double('cents').notNullable();
    t.double('level_db').notNullable();
    t.unique(['recording_id', 'position']);
  });
  await knex.raw('alter table tone_notes add constraint tone_notes_key_check check (key between 1 and 88)');
  await knex.raw('alter table tone_notes add constraint tone_notes_cents_check check (cents between -50.5 and 50.5)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('tone_notes');
  await knex.schema.dropTable('tone_recordings');
}
