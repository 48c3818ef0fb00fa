import type { Knex } from 'knex';

// The condition is no longer a score in bands: a grade is read from its measurements. Old grade
// documents keep their score inside the JSON as they were stored; the columns go.
export async function up(knex: Knex): Promise<void> {
  await knex.raw('alter table assessments drop constraint assessments_band_check, drop constraint assessments_score_check');
  await knex.schema.alterTable('assessments', (t) => {
    t.dropColumns('score', 'band');
    // A re-measurement names the fields measured again; null on rows from before this column.
    t.specificType('remeasured_fields', 'text[]');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('assessments', (t) => {
    t.dropColumn('remeasured_fields');
    t.integer('score');
    t.text('band');
  });
}
