import { hashPassword } from '@/modules/accounts/server/user-service';
import { seedBench } from '@/bench/seed';
import { QUEUE_PAGE } from '@/modules/shop/core/work-views';
import { WORK_QUEUE_QUERY } from '@/modules/shop/ui/use-work-queue';

import { startTestApi, type TestApi } from '../support/api';

type Json = Record<string, any>;
let api: TestApi;
let techId: number;
beforeAll(async () => {
  api = await startTestApi();
  // Enough workshop stock that the queue runs over more than one page.
  await seedBench(api.knex, { pianos: 400, seed: 3, passwordHash: await hashPassword('not-used-to-sign-in') });
  techId = (await api.knex('users').where({ email: 'tech@feltwire.test' }).first()).id;
});
afterAll(() => api.close());

async function queue(role: 'technician' | 'manager', variables: Json = {}): Promise<{ status: number; body: Json; bytes: number }> {
  const res = await api.gql(await api.tokenFor(role), WORK_QUEUE_QUERY, variables);
  return { status: res.status, body: res.body, bytes: Buffer.byteLength(res.text) };
}

function openItems() {
  return api.knex('work_items').join('pianos', 'pianos.id', 'work_items.piano_id').where('pianos.stage', 'in_workshop').whereNot('work_items.status', 'done');
}

it('counts what each list holds, as the database has it', async () => {
  const { body } = await queue('manager');
  const all = Number((await openItems().count('* as n').first())?.n);
  const unassigned = Number((await openItems().whereNull('work_items.assigned_to_id').count('* as n').first())?.n);
  expect(all).toBeGreaterThan(QUEUE_PAGE);
  expect(body.data.workQueue).toMatchObject({ scope: 'all', total: all, counts: { all, unassigned } });
  const tech = (await queue('technician')).body.data.workQueue;
  const mine = Number((await openItems().where('work_items.assigned_to_id', techId).count('* as n').first())?.n);
  expect(tech).toMatchObject({ scope: 'mine', total: mine, counts: { mine, unassigned } });
});

it('pages through every item of a list exactly once, most urgent first, each page well under 50 KB', async () => {
  const seen: Json[] = [];
  let total = Infinity;
  for (let offset = 0; offset < total; offset += QUEUE_PAGE) {
    const { body, bytes } = await queue('technician', { scope: 'unassigned', offset });
    const page = body.data.workQueue;
    total = page.total;
    expect(page.items.length).toBeLessThanOrEqual(QUEUE_PAGE);
    expect(bytes).toBeLessThan(50 * 1024);
    seen.push(...page.items);
  }
  const expected = await openItems().whereNull('work_items.assigned_to_id').orderBy([{ column: 'priority' }, { column: 'due_on', nulls: 'last' }, { column: 'work_items.id' }]).select('work_items.id');
  expect(seen.map((i) => i.id)).toEqual(expected.map((r: Json) => r.id));
  expect(seen.every((i) => i.assignedToId === null && typeof i.stockNumber === 'string')).toBe(true);
});

it('tells a technician where their running timer is, on whatever page', async () => {
  const item = await openItems().where('work_items.assigned_to_id', techId).orderBy('work_items.id', 'desc').first('work_items.id', 'work_items.title', 'pianos.stock_number');
  await api.knex('time_entries').where({ technician_id: techId }).whereNull('ended_at').whereNull('minutes').update({ minutes: 5 });
  await api.knex('time_entries').insert({ work_item_id: item.id, technician_id: techId, started_at: new Date(Date.now() - 600_000).toISOString() });
  const page = (await queue('technician', { scope: 'unassigned' })).body.data.workQueue;
  expect(page.running).toEqual({ id: item.id, title: item.title, stockNumber: item.stock_number });
});

it.each<[string, Json, string]>([
  ['a scope that does not exist', { scope: 'everything' }, 'BAD_INPUT'],
  ['a page too large', { limit: 500 }, 'BAD_INPUT'],
  ['a negative offset', { offset: -3 }, 'BAD_INPUT'],
  ['every item, asked by a technician', { scope: 'all' }, 'NOT_ALLOWED'],
])('refuses %s with a message', async (_what, variables, code) => {
  const { status, body } = await queue('technician', variables);
  expect(status).toBe(200);
  expect(body.errors[0].extensions.code).toBe(code);
  expect(body.errors[0].message.length).toBeGreaterThan(10);
});
