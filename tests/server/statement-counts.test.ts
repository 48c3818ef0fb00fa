import { hashPassword } from '@/modules/accounts/server/user-service';
import { seedBench } from '@/bench/seed';
import { publicDisclosurePath, screenDocuments, STOCK_EXPORT_PATH, type Targets } from '@/bench/screens';

import { startTestApi, type TestApi } from '../support/api';

// Statements per request do not depend on the machine, so a test may hold them: each main screen's
// query must cost the same number of statements however much stock the dealer has.
let api: TestApi;
let statements = 0;
let targets: Targets;
beforeAll(async () => {
  api = await startTestApi();
  api.knex.on('query', () => {
    statements += 1;
  });
  const inWorkshop = await api.knex('pianos').where({ stage: 'in_workshop' }).orderBy('id').first('id');
  const onFloor = await api.knex('disclosure_links').join('pianos', 'pianos.id', 'disclosure_links.piano_id').where('pianos.stage', 'on_floor').orderBy('pianos.id').first('token');
  targets = { pianoId: inWorkshop.id, disclosureToken: onFloor.token };
});
afterAll(() => api.close());

async function countEach(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const doc of screenDocuments(targets)) {
    const token = await api.tokenFor(doc.role);
    const before = statements;
    const res = await api.gql(token, doc.query, doc.variables);
    expect(res.body.errors).toBeUndefined();
    out[doc.name] = statements - before;
  }
  const before = statements;
  const res = await api.http.get(publicDisclosurePath(targets.disclosureToken));
  expect(res.status).toBe(200);
  out['public disclosure'] = statements - before;
  const beforeCsv = statements;
  const csv = await api.http.get(STOCK_EXPORT_PATH).set('authorization', `Bearer ${await api.tokenFor('manager')}`);
  expect(csv.status).toBe(200);
  out['stock table CSV'] = statements - beforeCsv;
  return out;
}

it('every main screen runs as many statements at 30 pianos of history as at 3', async () => {
  const passwordHash = await hashPassword('not-used-to-sign-in');
  await seedBench(api.knex, { pianos: 3, seed: 1, passwordHash });
  const small = await countEach();
  await seedBench(api.knex, { pianos: 27, seed: 2, passwordHash });
  const plans = Number((await api.knex('work_plans').count('* as n').first())?.n);
  const items = Number((await api.knex('work_items').count('* as n').first())?.n);
  // The data did grow: more plans and items than the demo alone holds.
  expect(plans).toBeGreaterThan(20);
  expect(items).toBeGreaterThan(60);
  const large = await countEach();
  expect(large).toEqual(small);
  // Each screen stays within a handful of statements, the token's user lookup included.
  for (const [name, count] of Object.entries(large)) expect([name, count <= 8]).toEqual([name, true]);
  // The stock table is one statement a page (and the CSV one for every row), whatever the sort: the token's lookup and that one.
  for (const name of ['stock table', 'stock table by margin, on hand', 'stock table, a search', 'stock table CSV']) expect([name, large[name]]).toEqual([name, 2]);
});
