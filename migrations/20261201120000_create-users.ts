import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.text('email').notNullable().unique();
    t.text('name').notNullable();
    t.text('role').notNullable();
    t.text('password_hash').notNullable();
    t.boolean('active').notNullable().defaultTo(true);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(`alter table users add constraint users_role_check check (role in ('intake', 'technician', 'floor', 'manager'))`);
  await knex.raw(`alter table users add constraint users_email_lower_check check (email = lower(email))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('users');
}
