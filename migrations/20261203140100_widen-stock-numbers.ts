import type { Knex } from 'knex';

// lpad(n, 4) cuts a longer number to four digits: the 10,000th piano got FW-1000 again and was
// refused as a duplicate. Four digits at least, as many as the number needs.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create function next_stock_number() returns text language sql volatile as $$
      select 'FW-' || lpad(n::text, greatest(4, length(n::text)), '0') from nextval('piano_stock_seq') as n
    $$;
    alter table pianos alter column stock_number set default next_stock_number();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`
    alter table pianos alter column stock_number set default 'FW-' || lpad(nextval('piano_stock_seq')::text, 4, '0');
    drop function next_stock_number();
  `);
}
