import type { Knex } from 'knex';

// A refund asked for but not yet made by the payment provider: the deposit shows it as refunding.
export async function up(knex: Knex): Promise<void> {
  await knex.raw('alter table deposits drop constraint deposits_status_check');
  await knex.raw(`alter table deposits add constraint deposits_status_check check (status in ('pending', 'holding', 'applied', 'released', 'expired', 'refunding', 'refunded', 'cancelled'))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('alter table deposits drop constraint deposits_status_check');
  await knex.raw(`alter table deposits add constraint deposits_status_check check (status in ('pending', 'holding', 'applied', 'released', 'expired', 'refunded', 'cancelled'))`);
}
