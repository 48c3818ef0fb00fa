// The catalogue shows only what the published disclosures publish: each private field is named here
// and looked for in the whole answer.
import { startTestApi, type TestApi } from '../support/api';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

describe('the catalogue keeps private things private', () => {
  it('carries no seller, trade-in, cost, margin, offer, serial number, note or staff detail', async () => {
    // An internal note on a listed piano's work, as a technician would leave one.
    const item = await api.knex('work_items').join('pianos', 'pianos.id', 'work_items.piano_id').where('pianos.stock_number', 'FW-0009').first('work_items.id');
    const tech = await api.knex('users').where({ role: 'technician' }).first('id');
    await api.knex('work_notes').insert({ work_item_id: item.id, author_id: tech.id, body: 'Hairline in the rim under the lid: watch it in dry weather.' });
    const res = await api.http.get('/api/public/pianos');
    expect(res.status).toBe(200);
    const text = JSON.stringify(res.body);
    const listed = await api.knex('pianos').whereIn('stock_number', res.body.pianos.map((p: { stockNumber: string }) => p.stockNumber));
    expect(listed).toHaveLength(4);
    const ids = listed.map((p) => p.id);

    const intakes = await api.knex('intakes').whereIn('piano_id', ids);
    expect(intakes).toHaveLength(4);
    const answers = await api.knex('trade_in_answers').whereIn('piano_id', ids);
    expect(answers.length).toBeGreaterThan(0);
    const staff = await api.knex('users').select('name', 'email');
    const privateText: [string, string][] = [
      ...intakes.flatMap((i) => [['seller name', i.seller_name], ['seller e-mail', i.seller_email], ['seller phone', i.seller_phone], ['seller address', i.seller_address]] as [string, string][]),
      ...listed.map((p) => ['serial number', p.serial_number] as [string, string]),
      ...staff.flatMap((u) => [['staff name', u.name], ['staff e-mail', u.email]] as [string, string][]),
      ...(await api.knex('work_notes').join('work_items', 'work_items.id', 'work_notes.work_item_id').whereIn('work_items.piano_id', ids).select('work_notes.body')).map((w) => ['work note', w.body] as [string, string]),
      ...(await api.knex('time_entries').join('work_items', 'work_items.id', 'time_entries.work_item_id').whereIn('work_items.piano_id', ids).whereNotNull('time_entries.note').select('time_entries.note')).map((t) => ['time entry note', t.note] as [string, string]),
      ...(await api.knex('price_changes').whereIn('piano_id', ids).select('reason')).map((c) => ['price change reason', c.reason] as [string, string]),
      ...answers.filter((a) => a.note).map((a) => ['offer note', a.note] as [string, string]),
      ...(await api.knex('stage_moves').whereIn('piano_id', ids).whereNotNull('why').select('why')).map((m) => ['stage move reason', m.why] as [string, string]),
    ];
    expect(privateText.length).toBeGreaterThan(20);
    for (const [what, value] of privateText) {
      expect(value).toBeTruthy();
      expect({ what, found: text.includes(value) }).toEqual({ what, found: false });
    }

    // Money only a manager or intake sees: offers, allowances (the cost basis) and margins, as numbers anywhere in the answer.
    const numbers = new Set<number>();
    JSON.stringify(res.body, (_k, v) => (typeof v === 'number' && numbers.add(v), v));
    const byPiano = new Map(listed.map((p) => [p.id, p.asking_price_minor as number]));
    const privateMoney: [string, number][] = answers.flatMap((a) => {
      // With nothing paid for the piano the margin is its price, which is public.
      const basis = a.allowance_minor ?? a.offer_minor;
      return [['offer', a.offer_minor], ['counter-offer', a.counter_minor], ['trade-in allowance', a.allowance_minor], ...(basis > 0 ? [['margin', byPiano.get(a.piano_id)! - basis]] : [])].filter(([, v]) => v != null && v !== 0) as [string, number][];
    });
    expect(privateMoney.length).toBeGreaterThan(3);
    for (const [what, value] of privateMoney) expect({ what, found: numbers.has(value) }).toEqual({ what, found: false });

    // And no field by any private name.
    const keys = new Set<string>();
    JSON.stringify(res.body, (k, v) => (keys.add(k), v));
    for (const name of ['serialNumber', 'seller', 'sellerName', 'sellerEmail', 'sellerPhone', 'sellerAddress', 'offerMinor', 'allowanceMinor', 'costMinor', 'marginMinor', 'note', 'notes', 'createdBy', 'publishedById', 'id', 'pianoId', 'email']) {
      expect({ name, present: keys.has(name) }).toEqual({ name, present: false });
    }
  });
});
