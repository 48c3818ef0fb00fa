import { describeJob, jobState, type JobFacts } from '@/modules/jobs/core/job-kinds';

const now = new Date('2026-12-03T12:00:00.000Z');
const at = (minutesAgo: number) => new Date(now.getTime() - minutesAgo * 60_000).toISOString();
const job = (over: Partial<JobFacts>): JobFacts => ({ attempts: 0, maxAttempts: 10, lastError: null, runAt: at(0), lockedAt: null, ...over });

describe('jobState', () => {
  // thresholds: shop defaults (stuck after 10 minutes running, late after 5 minutes waiting)
  it.each([
    ['a fresh job waiting its turn', job({}), null],
    ['a job due in the future', job({ runAt: at(-60) }), null],
    ['a job running for a minute', job({ lockedAt: at(1), attempts: 1 }), null],
    ['a job running for 11 minutes', job({ lockedAt: at(11), attempts: 1 }), 'stuck'],
    ['a job that failed once and waits for its next try', job({ attempts: 1, lastError: 'x', runAt: at(-1) }), 'retrying'],
    ['a job that used every try', job({ attempts: 10, lastError: 'x' }), 'gave_up'],
    ['a job 6 minutes past its time, not taken', job({ runAt: at(6) }), 'late'],
    ['a job 4 minutes past its time', job({ runAt: at(4) }), null],
  ])('%s: %p', (_name, facts, state) => expect(jobState(facts, now)).toBe(state));
});

describe('describeJob', () => {
  it.each([
    ['refund-deposit', { depositId: 12, notice: 'lost_race' }, 'Refund deposit #12'],
    ['expire-hold', { depositId: 7 }, 'End the hold of deposit #7'],
    ['send-email', { to: 'a@b.test', subject: 'Receipt', text: '' }, 'E-mail “Receipt” to a@b.test'],
    ['something-else', {}, 'something-else'],
  ])('%s', (task, payload, text) => expect(describeJob(task, payload)).toBe(text));
});
