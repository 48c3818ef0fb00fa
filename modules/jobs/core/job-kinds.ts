// The kinds of background work, what each carries, and how a manager reads one that went wrong.

export type RefundNotice = 'lost_race' | 'released' | 'on_request';

/** An e-mail ready to send; large attachments wait in object storage and travel as their key. */
export interface QueuedMail {
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string; contentType: string; objectKey: string }[];
}

export interface JobPayloads {
  'refund-deposit': { depositId: number; notice: RefundNotice };
  'send-email': QueuedMail;
  'expire-hold': { depositId: number };
}

export type JobTask = keyof JobPayloads;

export const JOB_KINDS: Record<JobTask, { label: string; maxAttempts: number }> = {
  // With the queue's back-off (e^n seconds after the n-th failure, at most e^10) 12 tries span about 16 hours, 10 about 3.5.
  'refund-deposit': { label: 'Refund a deposit', maxAttempts: 12 },
  'send-email': { label: 'Send an e-mail', maxAttempts: 10 },
  'expire-hold': { label: 'End a hold that ran out', maxAttempts: 10 },
};

export const JOB_TASKS = Object.keys(JOB_KINDS) as JobTask[];

export const isJobTask = (task: string): task is JobTask => task in JOB_KINDS;

/** What the job is about, in a line a manager can act on. */
export function describeJob(task: string, payload: unknown): string {
  const p = (payload ?? {}) as Record<string, unknown>;
  switch (task) {
    case 'refund-deposit':
      return `Refund deposit #${p.depositId}`;
    case 'expire-hold':
      return `End the hold of deposit #${p.depositId}`;
    case 'send-email':
      return `E-mail “${p.subject}” to ${p.to}`;
    default:
      return task;
  }
}

export type JobState = 'retrying' | 'gave_up' | 'stuck' | 'late';

export interface JobFacts {
  attempts: number;
  maxAttempts: number;
  lastError: string | null;
  runAt: string;
  lockedAt: string | null;
}

// A task takes seconds; one taken this long ago and still held is stuck (shop default).
export const STUCK_AFTER_MS = 10 * 60_000;
// A job this far past its time and not taken means no worker is running (shop default).
export const LATE_AFTER_MS = 5 * 60_000;

/** Why a job needs a manager's eye, or null when it is fine. */
export function jobState(job: JobFacts, now: Date): JobState | null {
  const t = now.getTime();
  if (job.lockedAt) return t - Date.parse(job.lockedAt) > STUCK_AFTER_MS ? 'stuck' : null;
  if (job.attempts >= job.maxAttempts) return 'gave_up';
  if (job.attempts > 0 && job.lastError) return 'retrying';
  if (t - Date.parse(job.runAt) > LATE_AFTER_MS) return 'late';
  return null;
}

/** A job as a manager reads it, on the server and on the screen. */
export interface BackgroundJobView {
  id: string;
  task: string;
  label: string;
  about: string;
  state: JobState;
  stateText: string;
  attempts: number;
  maxAttempts: number;
  lastError: string | null;
  /** When the queue tries it next; null when it gave up or is running. */
  nextTryAt: string | null;
  startedAt: string | null;
  createdAt: string;
}

export const JOB_STATE_TEXT: Record<JobState, string> = {
  retrying: 'Failed, trying again',
  gave_up: 'Out of tries',
  stuck: 'Stalled while running',
  late: 'Waiting past its time',
};
