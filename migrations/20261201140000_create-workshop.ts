import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // Every stage move, append-only: who, when, from, to, why.
  await knex.schema.createTable('stage_moves', (t) => {
    t.bigIncrements('id').primary();
    t.integer('piano_id').notNullable().references('pianos.id').onDelete('CASCADE');
    t.text('action').notNullable();
    t.text('from_stage');
    t.text('to_stage').notNullable();
    t.text('why');
    t.integer('by_user_id').references('users.id');
    t.text('by_role').notNullable();
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['piano_id', 'at']);
  });
  await knex.raw(`
    create function stage_moves_append_only() returns trigger language plpgsql as $$
    begin
      raise exception 'stage_moves is append-only';
    end $$;
    create trigger stage_moves_no_change before update or delete on stage_moves
      for each row execute function stage_moves_append_only();
  `);

  // The shop's rate card, versioned like the grading rules.
  await knex.schema.createTable('rate_cards', (t) => {
    t.increments('id').primary();
    t.text('version').notNullable().unique();
    t.jsonb('card').notNullable();
    t.integer('created_by_id').references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('work_plans', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').notNullable().unique().references('pianos.id').onDelete('CASCADE');
    t.integer('assessment_id').references('assessments.id');
    t.text('rate_card_version').notNullable();
    t.text('currency').notNullable();
    t.integer('hourly_rate_minor').notNullable();
    t.integer('created_by_id').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.integer('approved_by_id').references('users.id');
    t.timestamp('approved_at', { useTz: true });
  });

  await knex.schema.createTable('work_items', (t) => {
    t.increments('id').primary();
    t.integer('plan_id').notNullable().references('work_plans.id').onDelete('CASCADE');
    t.integer('piano_id').notNullable().references('pianos.id').onDelete('CASCADE');
    t.text('task').notNullable();
    t.text('title').notNullable();
    t.decimal('estimated_hours', 6, 2).notNullable();
    t.integer('estimated_parts_minor').notNullable().defaultTo(0);
    t.integer('quantity').notNullable().defaultTo(1);
    t.specificType('because', 'text[]').notNullable().defaultTo('{}');
    t.integer('assigned_to_id').references('users.id');
    t.integer('priority').notNullable().defaultTo(2);
    t.date('due_on');
    t.text('status').notNullable().defaultTo('planned');
    t.timestamp('done_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['assigned_to_id', 'status']);
  });
  await knex.raw(`alter table work_items add constraint work_items_status_check check (status in ('planned', 'in_progress', 'done'))`);
  await knex.raw('alter table work_items add constraint work_items_priority_check check (priority between 1 and 3)');
  await knex.raw('alter table work_items add constraint work_items_estimate_check check (estimated_hours >= 0 and estimated_parts_minor >= 0 and quantity >= 1)');

  // Hours at the bench: a running timer has no end yet; a manual entry has minutes.
  await knex.schema.createTable('time_entries', (t) => {
    t.increments('id').primary();
    t.integer('work_item_id').notNullable().references('work_items.id').onDelete('CASCADE');
    t.integer('technician_id').notNullable().references('users.id');
    t.timestamp('started_at', { useTz: true }).notNullable();
    t.timestamp('ended_at', { useTz: true });
    t.integer('minutes');
    t.text('note');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('alter table time_entries add constraint time_entries_minutes_check check (minutes is null or minutes between 1 and 1440)');
  // One running timer per technician at a time.
  await knex.raw('create unique index time_entries_one_running on time_entries (technician_id) where ended_at is null and minutes is null');

  await knex.schema.createTable('part_uses', (t) => {
    t.increments('id').primary();
    t.integer('work_item_id').notNullable().references('work_items.id').onDelete('CASCADE');
    t.text('description').notNullable();
    t.integer('quantity').notNullable().defaultTo(1);
    t.integer('cost_minor').notNullable();
    t.integer('logged_by_id').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('alter table part_uses add constraint part_uses_check check (quantity >= 1 and cost_minor >= 0)');

  await knex.schema.createTable('work_notes', (t) => {
    t.increments('id').primary();
    t.integer('work_item_id').notNullable().references('work_items.id').onDelete('CASCADE');
    t.integer('author_id').notNullable().references('users.id');
    t.text('body').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.alterTable('photos', (t) => {
    t.integer('work_item_id').references('work_items.id').onDelete('SET NULL');
    t.text('phase');
  });
  await knex.raw(`alter table photos add constraint photos_phase_check check (phase is null or phase in ('before', 'after'))`);

  await knex.schema.createTable('climate_readings', (t) => {
    t.increments('id').primary();
    t.decimal('temp_c', 5, 2).notNullable();
    t.decimal('relative_humidity', 5, 2).notNullable();
    t.decimal('emc_pct', 5, 2).notNullable();
    t.integer('logged_by_id').notNullable().references('users.id');
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('climate_readings');
  await knex.raw('alter table photos drop constraint photos_phase_check');
  await knex.schema.alterTable('photos', (t) => t.dropColumns('work_item_id', 'phase'));
  for (const table of ['work_notes', 'part_uses', 'time_entries', 'work_items', 'work_plans', 'rate_cards', 'stage_moves']) await knex.schema.dropTable(table);
  await knex.raw('drop function stage_moves_append_only');
}
