import type { Knex } from 'knex';

export type TableStates = Record<string, { rows: number; md5: string }>;

/** Every table of the public schema: its row count and an md5 of its rows, each as text, in order. */
export async function tableStates(knex: Knex): Promise<TableStates> {
  const tables = (await knex('pg_tables').where('schemaname', 'public').orderBy('tablename').pluck('tablename')) as string[];
  const states: TableStates = {};
  for (const table of tables) {
    const row = await knex.raw(`select count(*)::int as rows, md5(coalesce(string_agg(t::text, E'\\n' order by t::text), '')) as md5 from ?? t`, [table]);
    states[table] = row.rows[0];
  }
  return states;
}
