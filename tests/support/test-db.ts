import { randomBytes } from 'node:crypto';

import knexFactory, { type Knex } from 'knex';

import { bindModels, createKnex } from '@/server/db/knex';

// Each test file gets its own database, cloned from the migrated template that scripts/test.sh made.
function env(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run the tests with npm test`);
  return value;
}

export async function createTestDatabase(): Promise<{ knex: Knex; url: string; drop: () => Promise<void> }> {
  const base = env('TEST_PG_URL');
  const template = env('TEST_DB_TEMPLATE');
  const name = `fw_${env('TEST_RUN_ID')}_${randomBytes(4).toString('hex')}`;
  const admin = knexFactory({ client: 'pg', connection: `${base}/postgres`, pool: { min: 0, max: 1 } });
  await admin.raw(`create database ?? template ??`, [name, template]);
  const knex = createKnex(`${base}/${name}`, { min: 0, max: 5 });
  bindModels(knex);
  return {
    knex,
    url: `${base}/${name}`,
    drop: async () => {
      await knex.destroy();
      await admin.raw('drop database if exists ?? with (force)', [name]);
      await admin.destroy();
    },
  };
}
