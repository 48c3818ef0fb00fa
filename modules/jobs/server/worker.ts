import { Logger, run, type Runner, type Task, type TaskList } from 'graphile-worker';
import type { Knex } from 'knex';

import { JOB_TASKS, type JobPayloads, type JobTask } from '@/modules/jobs/core/job-kinds';

import { bringForward, JobFailure, queuePool, quietLogger } from './queue';

export interface JobRun {
  id: string;
  /** This try's number, from 1. */
  attempt: number;
}

export type JobHandlers = { [T in JobTask]: (payload: JobPayloads[T], run: JobRun) => Promise<void> };

export interface JobWorker {
  /** Finishes the jobs in hand and stops taking new ones. */
  stop: () => Promise<void>;
  /** Runs every job due by `upTo` now (a test that moved its clock on), then waits for the queue to settle. */
  runDue: (upTo: Date) => Promise<void>;
  /** Waits until no job is due or running; jobs waiting for a later try do not count. */
  settle: (timeoutMs?: number) => Promise<void>;
}

export interface WorkerOptions {
  knex: Knex;
  handlers: JobHandlers;
  concurrency?: number;
  /** Log each job's start, end and failure (the server); tests keep quiet. */
  verbose?: boolean;
}

// One line a job event, without the stack: the manager's screen has the detail.
const serverLogger = new Logger(() => (level, message) => {
  const line = `[feltwire] jobs: ${message.split('\n')[0].replace(/:$/, '')}`;
  if (level === 'error' || level === 'warning') console.error(line);
  else if (level === 'info') console.log(line);
});

/** Runs the job queue inside this process, on a small pool of its own so jobs never starve requests. */
export async function startJobWorker(opts: WorkerOptions): Promise<JobWorker> {
  const concurrency = opts.concurrency ?? 2;
  // One connection per running job, one for LISTEN, one spare.
  const pool = queuePool(opts.knex, concurrency + 2);
  const taskList: TaskList = {};
  for (const task of JOB_TASKS) {
    const handler = opts.handlers[task] as (payload: unknown, run: JobRun) => Promise<void>;
    const wrapped: Task = async (payload, helpers) => {
      try {
        await handler(payload, { id: String(helpers.job.id), attempt: helpers.job.attempts });
      } catch (err) {
        if (err instanceof JobFailure) throw err;
        throw new JobFailure(`Feltwire stopped on a problem of its own: ${(err as Error)?.message ?? String(err)}`);
      }
    };
    taskList[task] = wrapped;
  }
  const runner: Runner = await run({
    pgPool: pool,
    taskList,
    concurrency,
    noHandleSignals: true,
    pollInterval: 1000,
    parsedCronItems: [],
    logger: opts.verbose ? serverLogger : quietLogger,
  });

  async function pending(): Promise<number> {
    const { rows } = await pool.query('select count(*)::int as n from graphile_worker.jobs where locked_at is not null or (run_at <= now() and attempts < max_attempts)');
    return rows[0].n;
  }
  async function settle(timeoutMs = 15_000): Promise<void> {
    const until = Date.now() + timeoutMs;
    while ((await pending()) > 0) {
      if (Date.now() > until) throw new Error('background jobs did not finish in time');
      await new Promise((r) => setTimeout(r, 25));
    }
  }
  return {
    stop: async () => {
      await runner.stop();
      // Every connection back before the pool closes (the LISTEN one is handed back last).
      await runner.promise.catch(() => undefined);
      await pool.end();
    },
    runDue: async (upTo) => {
      const { rows } = await pool.query('select id from graphile_worker.jobs where locked_at is null and attempts < max_attempts and run_at <= $1', [upTo.toISOString()]);
      await bringForward(opts.knex, rows.map((r) => String(r.id)));
      await settle();
    },
    settle,
  };
}
