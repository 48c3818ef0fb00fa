// The papers a buyer is handed: the dealer's letterhead and dates in the shop's words, the deposit on the
// signed copy, one acknowledgement per buyer and version, and the public check of a verification code.
import pdfParse from 'pdf-parse/lib/pdf-parse.js';

import { depositAmount } from '@/modules/deposits/core/deposit';
import { verificationCode } from '@/modules/disclosure/core/verification';
import { formatDayTime } from '@/modules/shop/core/dealer-time';
import { formatMoney } from '@/modules/shop/core/money';

import { startTestApi, type TestApi } from '../support/api';
import { buyers } from '../support/buyers';

let api: TestApi;
let b: ReturnType<typeof buyers>;
let base: string;
beforeAll(async () => {
  api = await startTestApi();
  base = await api.listen();
  b = buyers(api);
});
afterAll(() => api.close());

const pdfText = async (pdf: Buffer) => (await pdfParse(pdf)).text;
const CHICAGO = { locale: 'en-US', timeZone: 'America/Chicago' };
const PROFILE = { address: '14 Tamsin Yard\nOld Wharf, Brackley MB4 2QT', phone: '+1 555 0142', email: 'Sales@Larkspur.example', website: 'https://larkspur.example', ...CHICAGO, workshopIdleDays: 10 };
const SET_PROFILE = 'mutation($i: ShopProfileInput!) { setShopProfile(input: $i) { address email locale timeZone workshopIdleDays } }';

describe('the shop profile', () => {
  it('a manager sets it; floor staff may not; bad input changes nothing', async () => {
    const floor = await api.gql(await api.tokenFor('floor'), SET_PROFILE, { i: PROFILE });
    expect(floor.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    const badZone = await api.gql(await api.tokenFor('manager'), SET_PROFILE, { i: { ...PROFILE, timeZone: 'Mars/Olympus' } });
    expect(badZone.body.errors[0].message).toMatch(/^timeZone: /);
    const badDays = await api.gql(await api.tokenFor('manager'), SET_PROFILE, { i: { ...PROFILE, workshopIdleDays: 0 } });
    expect(badDays.body.errors[0].message).toMatch(/^workshopIdleDays: /);
    expect((await b.call('manager', '{ shopProfile { address timeZone } }')).shopProfile).toEqual({ address: '', timeZone: 'UTC' });

    const saved = (await b.call('manager', SET_PROFILE, { i: PROFILE })).setShopProfile;
    // The e-mail is kept in lower case, as every e-mail in Feltwire.
    expect(saved).toEqual({ address: PROFILE.address, email: 'sales@larkspur.example', ...CHICAGO, workshopIdleDays: 10 });
  });
});

describe('the signed copy and its e-mail', () => {
  it('names the dealer with address and contact, the piano, the price, the deposit terms, both signatures and the code, with dates in the shop’s zone', async () => {
    await b.call('manager', SET_PROFILE, { i: PROFILE });
    const { token, price } = await b.floorPiano();
    const page = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    expect(page.dealer).toMatchObject({ ...CHICAGO, contact: ['14 Tamsin Yard', 'Old Wharf, Brackley MB4 2QT', 'Telephone +1 555 0142', 'E-mail sales@larkspur.example', 'https://larkspur.example'] });
    const ack = (await api.http.post(`/api/public/disclosures/${token}/acknowledge`).send({ fullName: 'Odile Varga', email: 'odile@example.test', read: true, digest: page.digest })).body;
    const signed = (await b.call('floor', `mutation { countersign(acknowledgementId: ${ack.acknowledgementId}) }`)).countersign;
    await api.jobs.settle();
    const [mail] = b.mailTo('odile@example.test');
    const row = await api.knex('acknowledgements').where({ id: ack.acknowledgementId }).first();

    const text = await pdfText(mail.attachments[0].content);
    const flat = text.replace(/\s+/g, ' ');
    for (const line of [page.content.dealerName, '14 Tamsin Yard', 'Old Wharf, Brackley MB4 2QT', 'Telephone +1 555 0142', 'E-mail sales@larkspur.example', page.content.piano.stockNumber, page.content.piano.maker]) {
      expect(flat).toContain(line);
    }
    expect(flat).toContain(formatMoney(price, 'USD'));
    // The deposit the shop's rules ask (10 % of the price, at least 250.00) and its hold of 14 days.
    expect(flat).toContain(`A deposit of ${formatMoney(depositAmount(price, 'USD'), 'USD')} holds this piano for 14 days`);
    expect(flat).toContain('Odile Varga');
    expect(flat).toContain(signed.countersignedBy);
    expect(flat).toContain(verificationCode(page.digest));
    expect(flat).toContain(formatDayTime(String(row.acknowledged_at), CHICAGO));
    expect(flat).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    expect(flat).not.toContain(page.digest);

    expect(mail.text).toContain(`acknowledged on ${formatDayTime(String(row.acknowledged_at), CHICAGO)}`);
    expect(mail.text).toContain(`countersigned for the dealer on ${formatDayTime(String(row.countersigned_at), CHICAGO)}`);
    expect(mail.text).toContain(`http://feltwire.test/check/${verificationCode(page.digest)}`);
    expect(mail.text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    // The e-mail is plain text: an ampersand or apostrophe stays as typed.
    expect(mail.text).not.toMatch(/&amp;|&#x27;|&#39;/);
  });
});

describe('one acknowledgement per buyer and version', () => {
  it('the same buyer again gets the first one back, countersigned once; two at once make one', async () => {
    const { pianoId, token } = await b.floorPiano();
    const { digest } = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    const send = (email: string) => api.http.post(`/api/public/disclosures/${token}/acknowledge`).send({ fullName: 'Piet Adebayo', email, read: true, digest });
    const first = await send('piet@example.test');
    const again = await send('PIET@example.test');
    expect([first.status, again.status]).toEqual([201, 200]);
    expect(again.body).toMatchObject({ acknowledgementId: first.body.acknowledgementId, receiptToken: first.body.receiptToken, already: true });

    // Two presses at the same moment, over real HTTP: the database lets one in, both get it.
    const url = `${base}/api/public/disclosures/${token}/acknowledge`;
    const post = () => fetch(url, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ fullName: 'Rua Tenney', email: 'rua@example.test', read: true, digest }) }).then(async (r) => ({ status: r.status, body: await r.json() }));
    const [x, y] = await Promise.all([post(), post()]);
    expect([x.status, y.status].sort()).toEqual([200, 201]);
    expect(x.body.acknowledgementId).toBe(y.body.acknowledgementId);
    expect(await api.knex('acknowledgements').whereRaw('lower(buyer_email) = ?', ['rua@example.test']).count('* as n').first()).toEqual({ n: 1 });

    const list = (await b.call('floor', `{ acknowledgements(pianoId: ${pianoId}) }`)).acknowledgements as { buyerEmail: string }[];
    expect(list.map((a) => a.buyerEmail).sort()).toEqual(['piet@example.test', 'rua@example.test']);
    await b.call('floor', `mutation { countersign(acknowledgementId: ${first.body.acknowledgementId}) }`);
    const twice = await api.gql(await api.tokenFor('manager'), `mutation { countersign(acknowledgementId: ${again.body.acknowledgementId}) }`);
    expect(twice.body.errors[0].extensions.code).toBe('CONFLICT');
  });
});

describe('the check of a verification code', () => {
  it('finds the published version from the code however it is typed, and serves that version’s page', async () => {
    const { token } = await b.floorPiano();
    const pub = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    const code = verificationCode(pub.digest);
    for (const typed of [code, code.toLowerCase().replace(/-/g, ' '), code.replace(/-/g, '')]) {
      const res = await api.http.get(`/api/public/check/${encodeURIComponent(typed)}`);
      expect(res.status).toBe(200);
      expect(res.body.code).toBe(code);
      expect(res.body.versions).toHaveLength(1);
      expect(res.body.versions[0]).toMatchObject({ stockNumber: pub.content.piano.stockNumber, version: pub.version, newestVersion: pub.newestVersion, dealerName: pub.content.dealerName });
    }
    const { id } = (await api.http.get(`/api/public/check/${code}`)).body.versions[0];
    const html = await api.http.get(`/api/public/check/${code}/html?id=${id}`);
    expect(html.status).toBe(200);
    expect(html.text).toContain(code);
    expect(html.text).toContain(pub.content.piano.stockNumber);
    // Another version's id with this code is not served.
    expect((await api.http.get(`/api/public/check/${code}/html?id=${id + 1000}`)).status).toBe(404);

    // A code of the right shape that no version has: found nothing, not an error.
    const other = code.startsWith('0000') ? 'ZZZZ-ZZZZ-ZZZZ' : '0000-0000-0000';
    expect((await api.http.get(`/api/public/check/${other}`)).body).toEqual({ code: other, versions: [] });
    const bad = await api.http.get('/api/public/check/7K3Q-M9TD');
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatch(/^code: /);
  });
});

describe('pianos idle in the workshop', () => {
  it('flags a piano in the workshop past the shop’s idle days with no work items, and only that', async () => {
    const idle = await api.knex('pianos').whereNotExists(api.knex('work_items').select(1).whereRaw('work_items.piano_id = pianos.id')).orderBy('id').first();
    const now = api.clock.now().getTime();
    await api.knex('pianos').where({ id: idle.id }).update({ stage: 'in_workshop', stage_changed_at: new Date(now - 12 * 86_400_000).toISOString() });
    const q = '{ idleInWorkshop { idleDays pianos { pianoId stockNumber days } } }';
    const found = (await b.call('manager', q)).idleInWorkshop;
    expect(found.idleDays).toBe(10);
    expect(found.pianos).toContainEqual({ pianoId: idle.id, stockNumber: idle.stock_number, days: 12 });
    // Every piano listed is in the workshop, past 10 days, with no work item.
    for (const p of found.pianos as { pianoId: number; days: number }[]) {
      expect(p.days).toBeGreaterThanOrEqual(10);
      expect(await api.knex('work_items').where({ piano_id: p.pianoId }).first()).toBeUndefined();
    }
    await b.call('manager', SET_PROFILE, { i: { ...PROFILE, workshopIdleDays: 13 } });
    expect((await b.call('manager', q)).idleInWorkshop.pianos.map((p: { pianoId: number }) => p.pianoId)).not.toContain(idle.id);
    const floor = await api.gql(await api.tokenFor('floor'), q);
    expect(floor.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
  });
});
