import knexFactory, { type Knex } from 'knex';
import path from 'node:path';
import { Model } from 'objection';
import pg from 'pg';

import { installJobQueue } from '@/modules/jobs/server/queue';

// Timestamps leave the database as ISO 8601 strings and dates as YYYY-MM-DD, never as JS Dates.
pg.types.setTypeParser(1184, (v) => new Date(v).toISOString()); // timestamptz
pg.types.setTypeParser(1114, (v) => new Date(`${v}Z`).toISOString()); // timestamp
pg.types.setTypeParser(1082, (v) => v); // date
pg.types.setTypeParser(20, (v) => Number(v)); // bigint counts
pg.types.setTypeParser(1700, (v) => Number(v)); // numeric: hours, humidity (well within a double's precision)

export const MIGRATIONS_DIR = path.resolve(__dirname, '../../migrations');

export function createKnex(databaseUrl: string, pool = { min: 0, max: 10 }): Knex {
  return knexFactory({
    client: 'pg',
    connection: databaseUrl,
    pool,
    // Every query in a transaction uses it, so a full pool only queues requests: fail one after 10 s rather than 60.
    acquireConnectionTimeout: 10_000,
    migrations: { directory: MIGRATIONS_DIR, loadExtensions: ['.ts'], tableName: 'knex_migrations' },
  });
}

export function bindModels(knex: Knex): void {
  Model.knex(knex);
}

/** The job queue's own schema first (migrations may enqueue), then ours. */
export async function migrateLatest(knex: Knex): Promise<string[]> {
  await installJobQueue(knex);
  const [, applied] = await knex.migrate.latest();
  return applied as string[];
}
