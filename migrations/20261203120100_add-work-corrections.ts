import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // Marked done with no time logged: the reason, shown to staff.
  await knex.schema.alterTable('work_items', (t) => t.text('done_reason'));

  // A time entry corrected to 0 minutes stands for one logged by mistake; its history says why.
  await knex.raw('alter table time_entries drop constraint time_entries_minutes_check');
  await knex.raw('alter table time_entries add constraint time_entries_minutes_check check (minutes is null or minutes between 0 and 1440)');

  // Every correction of a time entry: who, when, the old and new minutes, and why. Append-only.
  await knex.schema.createTable('time_entry_corrections', (t) => {
    t.increments('id').primary();
    t.integer('time_entry_id').notNullable().references('time_entries.id').onDelete('CASCADE');
    t.integer('corrected_by_id').notNullable().references('users.id');
    t.timestamp('corrected_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.integer('old_minutes').notNullable();
    t.integer('new_minutes').notNullable();
    t.text('why').notNullable();
    t.index(['time_entry_id']);
  });
  await knex.raw('alter table time_entry_corrections add constraint time_entry_corrections_minutes_check check (old_minutes between 0 and 1440 and new_minutes between 0 and 1440)');
  await knex.raw(`
    create function time_entry_corrections_append_only() returns trigger language plpgsql as $$
    begin
      raise exception 'time_entry_corrections is append-only';
    end $$;
    create trigger time_entry_corrections_no_change before update on time_entry_corrections
      for each row execute function time_entry_corrections_append_only();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('time_entry_corrections');
  await knex.raw('drop function time_entry_corrections_append_only');
  await knex.raw('delete from time_entries where minutes = 0');
  await knex.raw('alter table time_entries drop constraint time_entries_minutes_check');
  await knex.raw('alter table time_entries add constraint time_entries_minutes_check check (minutes is null or minutes between 1 and 1440)');
  await knex.schema.alterTable('work_items', (t) => t.dropColumn('done_reason'));
}
