import { Logger, runMigrations } from 'graphile-worker';
import type { Knex } from 'knex';
import pg, { type PoolConfig } from 'pg';

import { JOB_KINDS, type JobPayloads, type JobTask } from '@/modules/jobs/core/job-kinds';

// Durable background work in PostgreSQL (graphile-worker): written in the transaction of the change
// it follows, so it exists exactly when that change committed.

/** A job's failure told in plain words; the manager's screen shows its message as it is. */
export class JobFailure extends Error {}

export interface EnqueueOptions {
  /** One job per key: enqueueing again replaces a job not yet started. */
  jobKey?: string;
  runAt?: Date | string;
  maxAttempts?: number;
  /** Jobs of one named queue run one at a time, in the order they were added. */
  queueName?: string;
}

// E-mails go out one at a time, in the order they were written (a receipt before the release notice).
function defaultQueue(task: JobTask): string | null {
  return task === 'send-email' ? 'mail' : null;
}

/** Adds a job inside `trx`; a rollback takes the job with it. */
export async function enqueue<T extends JobTask>(trx: Knex.Transaction, task: T, payload: JobPayloads[T], opts: EnqueueOptions = {}): Promise<string> {
  const runAt = opts.runAt == null ? null : new Date(opts.runAt).toISOString();
  const { rows } = await trx.raw(
    'select id from graphile_worker.add_job(identifier => ?, payload => ?::json, queue_name => ?::text, run_at => ?::timestamptz, max_attempts => ?::int, job_key => ?::text)',
    [task, JSON.stringify(payload), opts.queueName ?? defaultQueue(task), runAt, opts.maxAttempts ?? JOB_KINDS[task].maxAttempts, opts.jobKey ?? null],
  );
  return String(rows[0].id);
}

/** Takes a keyed job off the queue; one already running is kept from running again. */
export async function removeJob(trx: Knex.Transaction, jobKey: string): Promise<void> {
  await trx.raw('select graphile_worker.remove_job(?)', [jobKey]);
}

/** Moves waiting jobs to now and wakes the worker; running ones are left alone. Returns the ids moved. */
export async function bringForward(db: Knex, ids: string[]): Promise<string[]> {
  if (!ids.length) return [];
  const { rows } = await db.raw('select id from graphile_worker.reschedule_jobs(?::bigint[], run_at => now())', [ids]);
  await wakeWorkers(db, rows.length);
  return rows.map((r: { id: string | number }) => String(r.id));
}

/** Runs one job now, with one more try when it used them all; false when it is running or gone. */
export async function retryNow(db: Knex, id: string): Promise<boolean> {
  const job = await db('graphile_worker.jobs').where({ id }).first('attempts', 'max_attempts');
  if (!job) return false;
  const { rows } = await db.raw('select id from graphile_worker.reschedule_jobs(?::bigint[], run_at => now(), max_attempts => ?::int)', [[id], Math.max(job.max_attempts, job.attempts + 1)]);
  await wakeWorkers(db, rows.length);
  return rows.length > 0;
}

// The worker listens on this channel; add_job sends it, a reschedule does not.
async function wakeWorkers(db: Knex, count: number): Promise<void> {
  if (count) await db.raw(`select pg_notify('jobs:insert', ?)`, [JSON.stringify({ count })]);
}

export const quietLogger = new Logger(() => () => undefined);

/** A small pool of the queue's own on the database knex connects to; a lost connection is logged, not thrown. */
export function queuePool(knex: Knex, max: number): pg.Pool {
  const settings = (knex.client as { connectionSettings?: unknown }).connectionSettings;
  if (!settings || typeof settings !== 'object') throw new Error('the job queue needs the database connection settings of knex');
  const pool = new pg.Pool({ ...(settings as PoolConfig), max });
  // A connection cut while the pool closes is the close itself, not news.
  const lost = (err: Error) => {
    if (!pool.ending) console.error('[feltwire] job queue connection lost:', err.message);
  };
  pool.on('error', lost);
  pool.on('connect', (client) => client.on('error', lost));
  return pool;
}

/** Installs or upgrades the queue's own schema (graphile_worker); safe to run every boot. */
export async function installJobQueue(knex: Knex): Promise<void> {
  const pgPool = queuePool(knex, 1);
  try {
    await runMigrations({ pgPool, logger: quietLogger });
  } finally {
    await pgPool.end();
  }
}
