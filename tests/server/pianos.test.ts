import { DEMO_PIANOS } from '@/seeds/demo';
import { DEFAULT_PAGE_SIZE, MAX_PAGE_SIZE } from '@/server/graphql/limits';

import { startTestApi, type TestApi } from '../support/api';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

describe('the piano list', () => {
  it('lists the seeded pianos in stock-number order to every staff role', async () => {
    for (const role of ['intake', 'technician', 'floor', 'manager'] as const) {
      const res = await api.gql(await api.tokenFor(role), '{ pianos(orderBy: stockNumber) { stockNumber maker kind stage } }');
      expect(res.body.errors).toBeUndefined();
      expect(res.body.data.pianos).toHaveLength(DEMO_PIANOS.length);
      expect(res.body.data.pianos[0]).toEqual({ stockNumber: 'FW-0001', maker: DEMO_PIANOS[0].maker, kind: DEMO_PIANOS[0].kind, stage: DEMO_PIANOS[0].stage });
    }
  });

  it('takes the page size and offset as plain Int variables', async () => {
    const token = await api.tokenFor('floor');
    const res = await api.gql(token, 'query($n: Int, $o: Int) { pianos(limit: $n, offset: $o, orderBy: stockNumber) { stockNumber } }', { n: 2, o: 3 });
    expect(res.body.data.pianos).toEqual([{ stockNumber: 'FW-0004' }, { stockNumber: 'FW-0005' }]);
  });

  it('counts pianos per stage, every stage listed', async () => {
    const res = await api.gql(await api.tokenFor('manager'), '{ stageCounts { stage count } }');
    const counts = Object.fromEntries(res.body.data.stageCounts.map((c: { stage: string; count: number }) => [c.stage, c.count]));
    expect(counts).toEqual({
      received: 2, assessed: 2, in_workshop: 2, ready: 1, on_floor: 4, held: 1, sold: 1, delivered: 0, wholesaled: 0, returned_to_owner: 0,
    });
  });

  it('filters by stage', async () => {
    const res = await api.gql(await api.tokenFor('floor'), '{ pianos(stageEq: on_floor) { stage } }');
    const expected = DEMO_PIANOS.filter((p) => p.stage === 'on_floor').length;
    expect(res.body.data.pianos).toHaveLength(expected);
    expect(new Set(res.body.data.pianos.map((p: { stage: string }) => p.stage))).toEqual(new Set(['on_floor']));
  });

  it('answers a default page when no limit is given, and refuses a page over the maximum', async () => {
    const rows = Array.from({ length: DEFAULT_PAGE_SIZE + 5 }, (_, i) => ({ maker: `Bulk ${i}`, kind: 'upright' }));
    await api.knex('pianos').insert(rows);
    const token = await api.tokenFor('manager');
    const all = await api.gql(token, '{ pianos { id } }');
    expect(all.body.data.pianos).toHaveLength(DEFAULT_PAGE_SIZE);
    const big = await api.gql(token, `{ pianos(limit: ${MAX_PAGE_SIZE + 1}) { id } }`);
    expect(big.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'limit' });
    const wide = await api.gql(token, `{ pianos(range: [0, ${MAX_PAGE_SIZE}]) { id } }`);
    expect(wide.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'range' });
    const page = await api.gql(token, '{ pianos(limit: 60) { id } }');
    expect(page.body.data.pianos).toHaveLength(60);
  });
});

describe('createPiano', () => {
  const CREATE = 'mutation($maker: String!, $kind: String!, $sizeCm: Int, $year: Int) { createPiano(maker: $maker, kind: $kind, sizeCm: $sizeCm, year: $year, yearIsEstimate: true) { id stockNumber stage year yearIsEstimate createdBy { id name } } }';

  it('creates a received piano with the next stock number for intake staff', async () => {
    const before = await api.knex('pianos').max('id as max').first();
    const res = await api.gql(await api.tokenFor('intake'), CREATE, { maker: 'Test Maker', kind: 'grand', sizeCm: 183, year: 1961 });
    expect(res.body.errors).toBeUndefined();
    const piano = res.body.data.createPiano;
    expect(piano).toMatchObject({ stage: 'received', year: 1961, yearIsEstimate: true, createdBy: { name: 'Ines Okafor-Lind' } });
    expect(piano.stockNumber).toMatch(/^FW-\d{4}$/);
    expect(piano.id).toBeGreaterThan(before!.max);
  });

  it.each([
    [{ maker: 'X', kind: 'organ' }, 'kind'],
    [{ maker: '', kind: 'upright' }, 'maker'],
    [{ maker: 'X', kind: 'upright', sizeCm: 20 }, 'sizeCm'],
    [{ maker: 'X', kind: 'upright', year: 1500 }, 'year'],
  ])('refuses %j naming %s and stores nothing', async (vars, field) => {
    const count = await api.knex('pianos').count('* as n').first();
    const res = await api.gql(await api.tokenFor('intake'), CREATE, vars);
    expect(res.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field });
    expect(await api.knex('pianos').count('* as n').first()).toEqual(count);
  });

  it.each(['technician', 'floor'] as const)('refuses %s', async (role) => {
    const res = await api.gql(await api.tokenFor(role), CREATE, { maker: 'X', kind: 'upright' });
    expect(res.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
  });

  it('refuses a wrongly typed argument before it reaches the service', async () => {
    const res = await api.gql(await api.tokenFor('intake'), 'mutation { createPiano(maker: "X", kind: "upright", sizeCm: "tall") { id } }');
    expect(res.body.data).toBeUndefined();
    expect(res.body.errors[0].message).toMatch(/Int cannot represent/);
  });
});
