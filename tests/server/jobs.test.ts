import type { Knex } from 'knex';

import { enqueue } from '@/modules/jobs/server/queue';

import { startTestApi, type TestApi } from '../support/api';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

type Json = Record<string, any>;
const JOBS = '{ backgroundJobs { id task label about state stateText attempts maxAttempts lastError nextTryAt startedAt createdAt } }';
const jobCount = async () => Number((await api.knex('graphile_worker.jobs').count('* as n').first())!.n);
async function managerJobs(): Promise<Json[]> {
  const res = await api.gql(await api.tokenFor('manager'), JOBS);
  expect(res.body.errors).toBeUndefined();
  return res.body.data.backgroundJobs;
}
const mail = (subject: string, objectKey?: string) => ({
  to: 'queue@example.test',
  subject,
  text: 'A note from the queue test.',
  ...(objectKey ? { attachments: [{ filename: 'copy.pdf', contentType: 'application/pdf', objectKey }] } : {}),
});

describe('the job queue', () => {
  it('a job enqueued in a transaction that rolls back never exists; a committed one runs', async () => {
    const before = await jobCount();
    await expect(
      api.knex.transaction(async (trx: Knex.Transaction) => {
        await enqueue(trx, 'send-email', mail('Never sent'));
        expect(Number((await trx('graphile_worker.jobs').count('* as n').first())!.n)).toBe(before + 1);
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');
    expect(await jobCount()).toBe(before);

    const id = await api.knex.transaction((trx: Knex.Transaction) => enqueue(trx, 'send-email', mail('Sent once')));
    expect(id).toMatch(/^\d+$/);
    await api.jobs.settle();
    expect(api.mail.messages.filter((m) => m.subject === 'Sent once').map((m) => m.to)).toEqual([['queue@example.test']]);
    expect(api.mail.messages.filter((m) => m.subject === 'Never sent')).toEqual([]);
    expect(await jobCount()).toBe(before);
  });

  it('shows a manager the jobs that failed, in plain words, and runs one again on request', async () => {
    const key = `tests/missing-${Date.now()}.pdf`;
    const retrying = await api.knex.transaction((trx: Knex.Transaction) => enqueue(trx, 'send-email', mail('Signed copy', key)));
    const gaveUp = await api.knex.transaction((trx: Knex.Transaction) => enqueue(trx, 'send-email', mail('Last chance', key), { maxAttempts: 1 }));
    await api.jobs.settle();

    const listed = await managerJobs();
    const one = listed.find((j) => j.id === retrying)!;
    expect(one).toMatchObject({
      task: 'send-email',
      label: 'Send an e-mail',
      about: 'E-mail “Signed copy” to queue@example.test',
      state: 'retrying',
      stateText: 'Failed, trying again',
      attempts: 1,
      maxAttempts: 10,
      lastError: 'The attachment copy.pdf could not be read from storage: The specified key does not exist.',
      startedAt: null,
    });
    // graphile-worker's back-off after the first failure: e^1 seconds
    expect(Date.parse(one.nextTryAt) - Date.now()).toBeGreaterThan(1000);
    const done = listed.find((j) => j.id === gaveUp)!;
    expect(done).toMatchObject({ state: 'gave_up', attempts: 1, maxAttempts: 1, nextTryAt: null });

    // Running it again, still failing: one more try was used.
    expect((await api.gql(await api.tokenFor('manager'), `mutation { retryBackgroundJob(id: "${gaveUp}") }`)).body.data).toEqual({ retryBackgroundJob: true });
    await api.jobs.settle();
    expect((await managerJobs()).find((j) => j.id === gaveUp)).toMatchObject({ state: 'gave_up', attempts: 2, maxAttempts: 2 });

    // Once the file is there, running both again sends both, and the list is clear of them.
    await api.photos.put(key, Buffer.from('%PDF-1.4 test'), 'application/pdf');
    for (const id of [retrying, gaveUp]) await api.gql(await api.tokenFor('manager'), `mutation { retryBackgroundJob(id: "${id}") }`);
    await api.jobs.settle();
    const sent = api.mail.messages.filter((m) => m.to.includes('queue@example.test') && ['Signed copy', 'Last chance'].includes(m.subject));
    expect(sent.map((m) => [m.subject, m.attachments[0].content.toString()]).sort()).toEqual([
      ['Last chance', '%PDF-1.4 test'],
      ['Signed copy', '%PDF-1.4 test'],
    ]);
    expect((await managerJobs()).filter((j) => [retrying, gaveUp].includes(j.id))).toEqual([]);
    const gone = await api.gql(await api.tokenFor('manager'), `mutation { retryBackgroundJob(id: "${retrying}") }`);
    expect(gone.body.errors[0]).toMatchObject({ message: 'This job is no longer waiting: it has finished or was removed.', extensions: { code: 'NOT_FOUND' } });
  });

  it('keeps the list and the retry to managers', async () => {
    for (const role of ['floor', 'technician', 'intake'] as const) {
      const list = await api.gql(await api.tokenFor(role), JOBS);
      expect(list.body.errors[0]).toMatchObject({ message: 'Not allowed: your role cannot see background work.', extensions: { code: 'NOT_ALLOWED' } });
      const retry = await api.gql(await api.tokenFor(role), 'mutation { retryBackgroundJob(id: "1") }');
      expect(retry.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    }
    const bad = await api.gql(await api.tokenFor('manager'), 'mutation { retryBackgroundJob(id: "abc") }');
    expect(bad.body.errors[0].extensions.code).toBe('NOT_FOUND');
  });
});
