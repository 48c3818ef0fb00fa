import type { Knex } from 'knex';

/** The next version name of a versioned settings table (`prefix-N`), taken under a table lock so two saves cannot share one. */
export async function nextVersion(trx: Knex.Transaction, table: string, prefix: string): Promise<string> {
  await trx.raw('lock table ?? in exclusive mode', [table]);
  const row = (await trx(table).count('* as count').first()) as { count: number | string };
  return `${prefix}-${Number(row.count) + 1}`;
}
