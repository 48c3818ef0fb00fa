import type { Knex } from 'knex';

// Data: the warranty template once ended with advice to the dealer; buyers read the warranty, so a saved
// copy loses that sentence (the manager's editing screen says it now). Any other wording stays as typed.
const ADVICE = ' This text is a template for the dealer to adapt to local law.';

export async function up(knex: Knex): Promise<void> {
  const row = await knex('shop_settings').where({ key: 'warranty' }).first('value');
  if (typeof row?.value === 'string' && row.value.endsWith(ADVICE)) {
    await knex('shop_settings').where({ key: 'warranty' }).update({ value: JSON.stringify(row.value.slice(0, -ADVICE.length)) });
  }
}

export async function down(): Promise<void> {
  // The advice stays off the buyer's warranty.
}
