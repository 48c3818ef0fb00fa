import type { Knex } from 'knex';

// lpad cuts a number longer than its width: piano 10,000 and 10,001 would both be FW-1000.
// Four digits at least, every digit always: FW-0001 ... FW-9999, FW-10000 ...
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`create function next_stock_number() returns text language sql volatile as $$
    select 'FW-' || lpad(n::text, greatest(4, length(n::text)), '0') from nextval('piano_stock_seq') as n
  $$`);
  await knex.raw('alter table pianos alter column stock_number set default next_stock_number()');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`alter table pianos alter column stock_number set default ('FW-' || lpad(nextval('piano_stock_seq')::text, 4, '0'))`);
  await knex.raw('drop function next_stock_number()');
}
