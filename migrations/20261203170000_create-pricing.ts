import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // The manager's pricing rules, versioned like the grading rules and the rate card.
  await knex.schema.createTable('pricing_rule_sets', (t) => {
    t.increments('id').primary();
    t.text('version').notNullable().unique();
    t.jsonb('rules').notNullable();
    t.integer('created_by_id').references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // What the seller said to an offer, with the offer as it was shown (its lines and the rules it came from).
  await knex.schema.createTable('trade_in_answers', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').notNullable().references('pianos.id').onDelete('CASCADE');
    t.integer('assessment_id').notNullable().references('assessments.id');
    t.text('pricing_rules_version').notNullable();
    t.text('rate_card_version').notNullable();
    t.text('currency').notNullable();
    t.text('basis').notNullable();
    t.boolean('provisional').notNullable();
    t.integer('offer_minor').notNullable();
    t.jsonb('lines').notNullable();
    t.text('answer').notNullable();
    t.integer('counter_minor');
    // The trade-in allowance this answer settles on: the offer accepted, or the figure agreed after a counter.
    t.integer('allowance_minor');
    t.text('note');
    t.integer('recorded_by_id').notNullable().references('users.id');
    t.timestamp('recorded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['piano_id', 'recorded_at']);
  });
  await knex.raw(`alter table trade_in_answers add constraint trade_in_answers_answer_check check (answer in ('accepted', 'countered', 'agreed', 'declined'))`);
  await knex.raw(`alter table trade_in_answers add constraint trade_in_answers_basis_check check (basis in ('retail', 'wholesale'))`);
  await knex.raw(`alter table trade_in_answers add constraint trade_in_answers_amounts_check check (
    offer_minor >= 0 and (counter_minor is null or counter_minor >= 0) and (allowance_minor is null or allowance_minor >= 0)
    and ((answer = 'countered') = (counter_minor is not null))
    and ((answer in ('accepted', 'agreed')) = (allowance_minor is not null)))`);

  // Every change of a piano's asking price: who, when, from what to what, and why.
  await knex.schema.createTable('price_changes', (t) => {
    t.increments('id').primary();
    t.integer('piano_id').notNullable().references('pianos.id').onDelete('CASCADE');
    t.integer('from_minor');
    t.integer('to_minor').notNullable();
    t.text('currency').notNullable();
    t.integer('suggested_minor');
    t.text('pricing_rules_version');
    t.text('reason').notNullable();
    t.integer('changed_by_id').references('users.id');
    t.timestamp('changed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['piano_id', 'changed_at']);
  });
  await knex.raw('alter table price_changes add constraint price_changes_amounts_check check (to_minor >= 0 and (from_minor is null or from_minor >= 0))');

  await knex.raw(`
    create function pricing_records_append_only() returns trigger language plpgsql as $$
    begin
      raise exception '% is append-only', tg_table_name;
    end $$;
    create trigger trade_in_answers_no_change before update on trade_in_answers
      for each row execute function pricing_records_append_only();
    create trigger price_changes_no_change before update on price_changes
      for each row execute function pricing_records_append_only();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('price_changes');
  await knex.schema.dropTable('trade_in_answers');
  await knex.raw('drop function pricing_records_append_only');
  await knex.schema.dropTable('pricing_rule_sets');
}
