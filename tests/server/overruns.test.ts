import { hashPassword } from '@/modules/accounts/server/user-service';
import { WorkPlan } from '@/modules/shop/server/shop-models';
import { overruns, planView } from '@/modules/shop/server/shop-service';
import { seedBench } from '@/bench/seed';

import { startTestApi, type TestApi } from '../support/api';

let api: TestApi;
let manager: { id: number; role: 'manager' };
beforeAll(async () => {
  api = await startTestApi();
  await seedBench(api.knex, { pianos: 60, seed: 7, passwordHash: await hashPassword('not-used-to-sign-in') });
  manager = { id: (await api.knex('users').where({ email: 'manager@feltwire.test' }).first()).id, role: 'manager' };
  // A timer running right now counts toward the cost so far.
  const open = await api.knex('work_items').join('pianos', 'pianos.id', 'work_items.piano_id').where('pianos.stage', 'in_workshop').whereNot('status', 'done').first('work_items.id', 'work_items.estimated_hours');
  const tech = await api.knex('users').where({ email: 'tech2@feltwire.test' }).first();
  await api.knex('time_entries').where({ technician_id: tech.id }).whereNull('ended_at').whereNull('minutes').update({ minutes: 5 });
  await api.knex('time_entries').insert({ work_item_id: open.id, technician_id: tech.id, started_at: new Date(Date.now() - (open.estimated_hours * 60 + 90) * 60_000).toISOString() });
});
afterAll(() => api.close());

// The list as it was figured before it became one statement: every approved plan's view, item by item.
async function referenceOverruns() {
  const out = [];
  for (const plan of await WorkPlan.query().whereNotNull('approved_at')) {
    const view = (await planView(manager, plan.pianoId))!;
    const over = view.items.filter((i) => i.actualCostMinor > i.estimatedCostMinor);
    if (!over.length) continue;
    const piano = await api.knex('pianos').where({ id: plan.pianoId }).first();
    out.push({
      pianoId: plan.pianoId,
      stockNumber: piano.stock_number,
      stage: piano.stage,
      overrunMinor: over.reduce((s, i) => s + i.actualCostMinor - i.estimatedCostMinor, 0),
      itemsOver: over.map((i) => i.title),
      estimatedHours: Math.round(view.totals.estimatedHours * 100) / 100,
      loggedHours: view.totals.loggedHours,
      estimatedCostMinor: view.totals.estimatedCostMinor,
      actualCostMinor: view.totals.actualCostMinor,
      varianceMinor: view.totals.varianceMinor,
      currency: plan.currency,
    });
  }
  return out.sort((a, b) => b.overrunMinor - a.overrunMinor || a.pianoId - b.pianoId);
}

it('gives the same pianos, amounts and items as adding up each plan item by item, worst first', async () => {
  const expected = await referenceOverruns();
  expect(expected.length).toBeGreaterThan(15);
  const got = await overruns(manager, { limit: 200 });
  expect(got.total).toBe(expected.length);
  expect(got.overruns).toEqual(expected);
});

it('pages through the same list, and says how many there are on every page', async () => {
  const all = (await overruns(manager, { limit: 200 })).overruns;
  const pages = [];
  for (let offset = 0; offset < all.length; offset += 7) {
    const page = await overruns(manager, { limit: 7, offset });
    expect(page.total).toBe(all.length);
    pages.push(...page.overruns);
  }
  expect(pages).toEqual(all);
  const past = await overruns(manager, { limit: 7, offset: all.length + 10 });
  expect(past).toEqual({ total: all.length, overruns: [] });
});

it.each<[{ limit?: number; offset?: number }, string]>([
  [{ limit: 0 }, 'limit'],
  [{ limit: 201 }, 'limit'],
  [{ offset: -1 }, 'offset'],
])('refuses the page %j with a message naming %s', async (page, field) => {
  const res = await api.gql(await api.tokenFor('manager'), 'query($limit: Int, $offset: Int) { workshopOverruns(limit: $limit, offset: $offset) }', page);
  expect(res.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field });
});

it('is for managers only', async () => {
  for (const role of ['technician', 'floor', 'intake'] as const) {
    const res = await api.gql(await api.tokenFor(role), '{ workshopOverruns }');
    expect(res.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
  }
});
