import { READINESS } from '@/modules/assessment/core/grade';
import { STOCK_SORTS } from '@/modules/pricing/core/stock-table';
import { STOCK_TABLE_QUERY } from '@/modules/pricing/ui/use-stock-table';

import { startTestApi, type TestApi } from '../support/api';
import { buildIntake } from '../support/builders';

let api: TestApi;
type Json = Record<string, any>;
async function call(query: string, variables?: Json, role: 'manager' | 'intake' = 'manager'): Promise<Json> {
  const body = (await api.gql(await api.tokenFor(role), query, variables)).body;
  if (body.errors) throw new Error(body.errors[0].message);
  return body.data;
}
const table = async (query: Json) => (await call(STOCK_TABLE_QUERY, { query })).stockTable as { total: number; rows: Json[] };

let traded: { pianoId: number; offerMinor: number };
beforeAll(async () => {
  api = await startTestApi();
  // One trade-in of our own: accepted at the offer, then priced.
  const { pianoId } = (await call('mutation($input: IntakeInput!) { submitIntake(input: $input) { pianoId stockNumber } }', { input: buildIntake({ piano: { maker: 'Quorrel', model: 'Salon 121', serialNumber: 'QS-55123', kind: 'upright', sizeCm: 121, yearFrom: 1990, yearTo: 1994 } }) }, 'intake')).submitIntake;
  const offer = (await call('query($id: Int!) { pianoMoney(pianoId: $id) { offer { offer { offerMinor } } } }', { id: pianoId }, 'intake')).pianoMoney.offer.offer;
  await call('mutation($i: OfferAnswerInput!) { recordOfferAnswer(input: $i) { id } }', { i: { pianoId, answer: 'accepted', offeredMinor: offer.offerMinor } }, 'intake');
  await call('mutation($i: AskingPriceChangeInput!) { changeAskingPrice(input: $i) { pianoId } }', { i: { pianoId, askingPriceMinor: 289500, currency: 'USD', reason: 'First price' } });
  traded = { pianoId, offerMinor: offer.offerMinor };
});
afterAll(() => api.close());

describe('the stock table', () => {
  it('shows a traded-in piano with its allowance as the cost basis and its margin', async () => {
    const { rows, total } = await table({ search: 'QS-55123' });
    expect(total).toBe(1);
    expect(rows[0]).toMatchObject({
      pianoId: traded.pianoId,
      maker: 'Quorrel',
      model: 'Salon 121',
      kind: 'upright',
      sizeCm: 121,
      stage: 'assessed',
      daysInStock: 0,
      currency: 'USD',
      mixedCurrencies: false,
      reconEstimateMinor: null,
      reconActualMinor: 0,
      allowanceMinor: traded.offerMinor,
      costBasisMinor: traded.offerMinor,
      askingPriceMinor: 289500,
      marginMinor: 289500 - traded.offerMinor,
    });
    expect(READINESS).toContain(rows[0].readiness);
  });

  it('counts a piano in the workshop at its plan’s estimate and what its items cost so far', async () => {
    const id = (await api.knex('pianos').where('stock_number', 'FW-0005').first('id')).id;
    const plan = (await call('query($p: Int!) { workPlan(pianoId: $p) }', { p: id })).workPlan;
    const row = (await table({ search: 'FW-0005' })).rows[0];
    expect(row.reconEstimateMinor).toBe(plan.totals.estimatedCostMinor);
    expect(row.reconActualMinor).toBe(plan.totals.actualCostMinor);
    expect(row.labourMinor + row.partsMinor).toBe(plan.totals.actualCostMinor);
    expect(row.reconActualMinor).toBeGreaterThan(0);
  });

  it('sorts by every column both ways, nulls last', async () => {
    const all = await table({ limit: 100 });
    expect(all.total).toBe(Number((await api.knex('pianos').count('* as n').first())!.n));
    const key: Record<string, (r: Json) => number | string | null> = {
      stockNumber: (r) => r.stockNumber,
      daysInStock: (r) => r.daysInStock,
      askingPrice: (r) => r.askingPriceMinor,
      reconActual: (r) => r.reconActualMinor,
      reconEstimate: (r) => r.reconEstimateMinor,
      costBasis: (r) => r.costBasisMinor,
      margin: (r) => r.marginMinor,
    };
    for (const sort of STOCK_SORTS) {
      for (const descending of [false, true]) {
        const { rows, total } = await table({ sort, descending, limit: 100 });
        expect([sort, total, rows.length]).toEqual([sort, all.total, all.total]);
        const pick = key[sort];
        if (!pick) continue;
        const values = rows.map(pick);
        const present = values.filter((v) => v != null);
        // Nulls come after every value.
        expect([sort, values.slice(0, present.length)]).toEqual([sort, present]);
        const sorted = [...present].sort((a, b) => (a! < b! ? -1 : a! > b! ? 1 : 0));
        expect([sort, descending, present]).toEqual([sort, descending, descending ? sorted.reverse() : sorted]);
      }
    }
  });

  it('filters by stage, kind and readiness, and searches maker, model, stock number and serial', async () => {
    const onFloor = await table({ stages: ['on_floor'], limit: 100 });
    const floorCount = Number((await api.knex('pianos').where('stage', 'on_floor').count('* as n').first())!.n);
    expect(onFloor.total).toBe(floorCount);
    expect(onFloor.rows.every((r) => r.stage === 'on_floor')).toBe(true);
    const grands = await table({ kinds: ['grand'], limit: 100 });
    expect(grands.total).toBe(Number((await api.knex('pianos').where('kind', 'grand').count('* as n').first())!.n));
    const wholesale = await table({ readiness: ['wholesale'], limit: 100 });
    expect(wholesale.rows.map((r) => r.stockNumber)).toContain('FW-0011');
    expect(wholesale.rows.every((r) => r.readiness === 'wholesale')).toBe(true);
    for (const search of ['quorrel', 'SALON 121', 'qs-55123']) expect([search, (await table({ search })).rows.map((r) => r.pianoId)]).toEqual([search, [traded.pianoId]]);
    // A percent sign is a character, not a wildcard.
    expect((await table({ search: '%' })).total).toBe(0);
  });

  it('pages on the server, and counts a page past the end', async () => {
    const first = await table({ limit: 5, offset: 0 });
    const second = await table({ limit: 5, offset: 5 });
    expect(first.rows).toHaveLength(5);
    expect(second.rows[0].stockNumber > first.rows[4].stockNumber).toBe(true);
    const past = await table({ limit: 5, offset: 5000 });
    expect(past).toMatchObject({ total: first.total, rows: [] });
  });

  it('exports the filtered rows as CSV in the table’s order', async () => {
    const shown = await table({ stages: ['on_floor', 'ready'], sort: 'askingPrice', descending: true, limit: 100 });
    const res = await api.http.get('/api/stock/export.csv?stages=on_floor,ready&sort=askingPrice&descending=true').set('authorization', `Bearer ${await api.tokenFor('manager')}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="stock-\d{4}-\d{2}-\d{2}\.csv"$/);
    const lines = res.text.trimEnd().split('\r\n');
    expect(lines[0]).toBe('Stock number,Maker,Model,Serial number,Kind,Size (cm),Stage,Days in stock,Readiness,Provisional,Currency,Work estimate,Work so far,Trade-in allowance,Cost basis,Asking price,Expected margin');
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual(shown.rows.map((r) => r.stockNumber));
    const firstPrice = shown.rows[0].askingPriceMinor as number;
    expect(lines[1].split(',')[15]).toBe(`${Math.floor(firstPrice / 100)}.${String(firstPrice % 100).padStart(2, '0')}`);
  });
});

describe('the stock charts', () => {
  it('count the stock by stage and by age, list the thinnest margins first, and sum estimates, actuals and deposits', async () => {
    const c = (await call('{ stockCharts { byStage { key value } ageing { key label value } margins { pianoId value currency } marginsTotal estimates { label count estimatedMinor actualMinor } deposits { label value count currency } } }')).stockCharts;
    const pianos = Number((await api.knex('pianos').count('* as n').first())!.n);
    expect(c.byStage.reduce((s: number, b: Json) => s + b.value, 0)).toBe(pianos);
    const onHand = Number((await api.knex('pianos').whereNotIn('stage', ['sold', 'delivered', 'wholesaled', 'returned_to_owner']).count('* as n').first())!.n);
    expect(c.ageing.map((b: Json) => b.label)).toEqual(['0-30 days', '31-60 days', '61-90 days', 'Over 90 days']);
    expect(c.ageing.reduce((s: number, b: Json) => s + b.value, 0)).toBe(onHand);
    const margins = c.margins.map((m: Json) => m.value);
    expect(margins).toEqual([...margins].sort((a, b) => a - b));
    expect(c.margins.map((m: Json) => m.pianoId)).toContain(traded.pianoId);
    const done = await api.knex('work_items').where('status', 'done').count('* as n').first();
    expect(c.estimates.reduce((s: number, e: Json) => s + e.count, 0)).toBe(Number(done!.n));
    const held = await api.knex('deposits').whereIn('status', ['holding', 'refunding']).select(api.knex.raw('coalesce(sum(amount_minor - refunded_minor), 0)::int as held')).first();
    expect(c.deposits.reduce((s: number, d: Json) => s + d.value, 0)).toBe(held.held);
  });
});
