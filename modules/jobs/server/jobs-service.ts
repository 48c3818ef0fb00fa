import { Model } from 'objection';

import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { describeJob, isJobTask, JOB_KINDS, JOB_STATE_TEXT, jobState, LATE_AFTER_MS, STUCK_AFTER_MS, type BackgroundJobView } from '@/modules/jobs/core/job-kinds';
import { AppError, notAllowed, notFound } from '@/server/errors';

import { retryNow } from './queue';

interface JobRow {
  id: string | number;
  task_identifier: string;
  attempts: number;
  max_attempts: number;
  last_error: string | null;
  run_at: string;
  locked_at: string | null;
  created_at: string;
  payload: unknown;
  db_now: string;
}

const db = () => Model.knex();

/** The jobs a manager should look at: failed at least once, gave up, stuck while running, or left waiting. */
export async function troubledJobs(actor: Actor): Promise<BackgroundJobView[]> {
  if (!can(actor.role, 'tendBackgroundWork')) throw notAllowed('see background work');
  // The public view has no payload; it is read beside it to say what each job is about.
  const rows = (await db()
    .select('j.id', 'j.task_identifier', 'j.attempts', 'j.max_attempts', 'j.last_error', 'j.run_at', 'j.locked_at', 'j.created_at', 'p.payload', db().raw('now() as db_now'))
    .from('graphile_worker.jobs as j')
    .join('graphile_worker._private_jobs as p', 'p.id', 'j.id')
    .where((q) =>
      q
        .where('j.attempts', '>', 0)
        .orWhere('j.locked_at', '<', db().raw(`now() - interval '${STUCK_AFTER_MS} milliseconds'`))
        .orWhere('j.run_at', '<', db().raw(`now() - interval '${LATE_AFTER_MS} milliseconds'`)),
    )
    .orderBy('j.updated_at', 'desc')
    .limit(200)) as JobRow[];
  const out: BackgroundJobView[] = [];
  for (const r of rows) {
    const facts = { attempts: r.attempts, maxAttempts: r.max_attempts, lastError: r.last_error, runAt: r.run_at, lockedAt: r.locked_at };
    const state = jobState(facts, new Date(r.db_now));
    if (!state) continue;
    out.push({
      id: String(r.id),
      task: r.task_identifier,
      label: isJobTask(r.task_identifier) ? JOB_KINDS[r.task_identifier].label : r.task_identifier,
      about: describeJob(r.task_identifier, r.payload),
      state,
      stateText: JOB_STATE_TEXT[state],
      attempts: r.attempts,
      maxAttempts: r.max_attempts,
      lastError: r.last_error,
      nextTryAt: state === 'retrying' || state === 'late' ? r.run_at : null,
      startedAt: r.locked_at,
      createdAt: r.created_at,
    });
  }
  return out;
}

/** A manager runs a job again now; one that used all its tries gets one more. */
export async function retryBackgroundJob(actor: Actor, id: string): Promise<boolean> {
  if (!can(actor.role, 'tendBackgroundWork')) throw notAllowed('run background work again');
  if (!/^\d{1,18}$/.test(id)) throw notFound(`background job ${id}`);
  if (await retryNow(db(), id)) return true;
  const job = await db()('graphile_worker.jobs').where({ id }).first('locked_at');
  if (!job) throw new AppError('NOT_FOUND', 'This job is no longer waiting: it has finished or was removed.');
  throw new AppError('CONFLICT', 'This job is running right now; look again in a minute.');
}
