import type { Knex } from 'knex';

// A colleague as every staff role may see them: the name only. Generated reads follow relations with no
// policy of their own, so "who logged it" and "who assessed it" lead here, never to the accounts.
export async function up(knex: Knex): Promise<void> {
  await knex.raw('create view staff_members as select id, name from users');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop view if exists staff_members');
}
