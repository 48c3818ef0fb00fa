// The public catalogue: exactly the pianos on the floor nobody holds, filtered on the server, and only
// what their published disclosures say.
import { CATALOGUE_PAGE } from '@/modules/catalogue/core/catalogue';

import { startTestApi, type TestApi } from '../support/api';
import { buyers } from '../support/buyers';

let api: TestApi;
let b: ReturnType<typeof buyers>;
beforeAll(async () => {
  api = await startTestApi();
  await api.listen();
  b = buyers(api);
});
afterAll(() => api.close());

type Entry = { token: string; stockNumber: string; kind: string; size: string; askingPrice: { minor: number; currency: string } | null };
const list = async (query = '') => {
  const res = await api.http.get(`/api/public/pianos${query}`);
  expect(res.status).toBe(200);
  return res.body as { pianos: Entry[]; total: number; offset: number; pageSize: number };
};
const stockOf = (page: { pianos: Entry[] }) => page.pianos.map((p) => p.stockNumber).sort();

/** What the database says should be listed: on the floor, a published disclosure, no deposit holding it. */
async function expectedStock(): Promise<string[]> {
  const rows = await api
    .knex('pianos')
    .where('stage', 'on_floor')
    .whereExists(api.knex('disclosures').whereRaw('disclosures.piano_id = pianos.id'))
    .whereNotExists(api.knex('deposits').whereRaw('deposits.piano_id = pianos.id').where('status', 'holding'))
    .select('stock_number');
  return rows.map((r) => r.stock_number).sort();
}

describe('the catalogue', () => {
  it('lists exactly the demo pianos on the floor, with their published words and live price', async () => {
    const page = await list();
    // The demo's pianos on the floor (seeds/demo.ts); FW-0011 is held and FW-0012 sold.
    expect(stockOf(page)).toEqual(['FW-0008', 'FW-0009', 'FW-0010', 'FW-0013']);
    expect(stockOf(page)).toEqual(await expectedStock());
    expect(page).toMatchObject({ total: 4, offset: 0, pageSize: CATALOGUE_PAGE });
    const grand = page.pianos.find((p) => p.stockNumber === 'FW-0009')!;
    const piano = await api.knex('pianos').where({ stock_number: 'FW-0009' }).first();
    const link = await api.knex('disclosure_links').where({ piano_id: piano.id }).first();
    expect(grand).toMatchObject({ token: link.token, maker: 'Thornquist & Hale', model: 'Concert Parlour', kind: 'grand', size: 'grand, 188 cm long', year: '1983', askingPrice: { minor: piano.asking_price_minor, currency: 'USD' } });
    // Condition in the disclosure's own marks, one per area it publishes.
    const published = (await api.knex('disclosures').where({ piano_id: piano.id }).orderBy('version', 'desc').first()).content;
    expect((grand as unknown as { areas: { label: string; mark: string }[] }).areas).toEqual(published.areas.map((a: { label: string; mark: string }) => expect.objectContaining({ label: a.label, mark: a.mark })));
  });

  it('filters by kind, size and price with real values', async () => {
    expect(stockOf(await list('?kind=grand'))).toEqual(['FW-0009']);
    expect(stockOf(await list('?kind=upright'))).toEqual(['FW-0008', 'FW-0010', 'FW-0013']);
    // Sizes as published: FW-0010 91 cm, FW-0013 114 cm, FW-0008 125 cm, FW-0009 188 cm.
    expect(stockOf(await list('?minSizeCm=100&maxSizeCm=119'))).toEqual(['FW-0013']);
    expect(stockOf(await list('?kind=upright&minSizeCm=114'))).toEqual(['FW-0008', 'FW-0013']);
    expect(stockOf(await list('?maxSizeCm=91'))).toEqual(['FW-0010']);
    const prices: Record<string, number> = Object.fromEntries((await api.knex('pianos').whereIn('stock_number', ['FW-0008', 'FW-0009', 'FW-0010', 'FW-0013']).select('stock_number', 'asking_price_minor')).map((r) => [r.stock_number, r.asking_price_minor as number]));
    const cheapest = Math.min(...Object.values(prices));
    const dearest = Math.max(...Object.values(prices));
    expect(stockOf(await list(`?maxPriceMinor=${cheapest}`))).toEqual(Object.keys(prices).filter((k) => prices[k] === cheapest));
    expect(stockOf(await list(`?minPriceMinor=${dearest}`))).toEqual(['FW-0009']);
    expect(stockOf(await list(`?minPriceMinor=${cheapest + 1}&maxPriceMinor=${dearest - 1}`))).toEqual(Object.keys(prices).filter((k) => prices[k] > cheapest && prices[k] < dearest).sort());
    expect(await list('?kind=grand&maxSizeCm=150')).toMatchObject({ pianos: [], total: 0 });
  });

  it.each([
    ['a kind that is not one', '?kind=harpsichord', /kind must be upright or grand/],
    ['a size in words', '?minSizeCm=tall', /minSizeCm must be a whole number/],
    ['a negative price', '?maxPriceMinor=-5', /maxPriceMinor must be a whole number/],
    ['a price past the integer range', '?maxPriceMinor=99999999999', /maxPriceMinor must be a whole number|at most 2147483647/],
    ['a size given twice', '?minSizeCm=100&minSizeCm=120', /minSizeCm must be given once/],
    ['a range upside down', '?minPriceMinor=500000&maxPriceMinor=100', /minPriceMinor must not be above maxPriceMinor/],
    ['a filter it does not know', '?colour=red', /colour/],
    ['a filter as an object', '?kind[$ne]=grand', /kind/],
  ])('answers %s with 400 and a message', async (_what, query, message) => {
    const res = await api.http.get(`/api/public/pianos${query}`);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(message);
  });

  it('pages on the server', async () => {
    const second = await list(`?offset=${CATALOGUE_PAGE}`);
    expect(second).toMatchObject({ pianos: [], total: 4, offset: CATALOGUE_PAGE });
    const all = (await list()).pianos.map((p) => p.stockNumber);
    const skipped = await list('?offset=2');
    expect(skipped.pianos.map((p) => p.stockNumber)).toEqual(all.slice(2));
    expect(skipped.total).toBe(4);
  });

  it('drops a piano the moment a deposit holds it, and one the moment it is sold', async () => {
    const before = stockOf(await list());
    const held = await b.floorPiano();
    const heldStock = (await api.knex('pianos').where({ id: held.pianoId }).first()).stock_number;
    expect(before).toContain(heldStock);
    const receipt = await b.acknowledged(held.token, 'Imke Solberg-Tan', 'imke@example.test');
    const co = await b.checkout(held.token, receipt);
    // Still listed while the buyer is on the payment page: only a paid deposit holds it.
    expect(stockOf(await list())).toContain(heldStock);
    expect((await b.pay(co.sessionId)).status).toBe(303);
    await api.stripeFake.idle();
    expect(await b.stageOf(held.pianoId)).toBe('held');
    expect(stockOf(await list())).toEqual(before.filter((s) => s !== heldStock));

    const sold = await b.floorPiano();
    const soldStock = (await api.knex('pianos').where({ id: sold.pianoId }).first()).stock_number;
    await b.call('floor', `mutation { movePiano(pianoId: ${sold.pianoId}, action: "sell") { stage } }`);
    expect(stockOf(await list())).toEqual(before.filter((s) => s !== heldStock && s !== soldStock));
    expect(stockOf(await list())).toEqual(await expectedStock());
    expect((await list()).total).toBe(2);
  });
});
