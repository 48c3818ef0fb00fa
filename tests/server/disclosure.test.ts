// The library's own entry file runs a self-test when loaded directly; its parser module does not.
import pdfParse from 'pdf-parse/lib/pdf-parse.js';

import { verificationCode } from '@/modules/disclosure/core/verification';
import { sha256Hex } from '@/modules/disclosure/server/digest';

import { postGql, startTestApi, type TestApi } from '../support/api';
import { buildIntake, buildMeasurements } from '../support/builders';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

type Json = Record<string, any>;
async function call(role: 'intake' | 'technician' | 'floor' | 'manager', query: string, variables?: Json): Promise<Json> {
  const res = await api.gql(await api.tokenFor(role), query, variables);
  if (res.body.errors) throw Object.assign(new Error(res.body.errors[0].message), { extensions: res.body.errors[0].extensions });
  return res.body.data;
}
const pdfText = async (pdf: Buffer) => (await pdfParse(pdf)).text;

describe('sha256Hex', () => {
  // FIPS 180-4 (NIST example): SHA-256("abc")
  it('matches the published example', () => {
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});

describe('a published disclosure', () => {
  let pianoId: number;
  let token: string;
  let stockNumber: string;
  beforeAll(async () => {
    const out = (await call('intake', 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake() })).submitIntake;
    pianoId = out.pianoId;
    stockNumber = out.stockNumber;
    await call('manager', 'mutation($i: AskingPriceInput!) { setAskingPrice(input: $i) { askingPriceMinor } }', { i: { pianoId, askingPriceMinor: 349500, currency: 'USD' } });
    const pub = (await call('manager', `mutation { publishDisclosure(pianoId: ${pianoId}) }`)).publishDisclosure;
    token = pub.token;
    expect(pub).toMatchObject({ version: 1, unchanged: false, url: `http://feltwire.test/d/${token}` });
    expect(pub.digest).toMatch(/^[0-9a-f]{64}$/);
  });

  it('has a link token of at least 128 random bits', () => {
    // 32 base64url characters carry 192 bits
    expect(token).toMatch(/^[A-Za-z0-9_-]{32}$/);
  });

  it('reads publicly with the piano, the price, the findings and the verification code of its content', async () => {
    const res = await api.http.get(`/api/public/disclosures/${token}`);
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(1);
    expect(res.body.content.piano.stockNumber).toBe(stockNumber);
    expect(res.body.content.askingPrice).toEqual({ minor: 349500, currency: 'USD' });
    const areas = res.body.content.areas.map((a: Json) => a.area);
    expect(areas).toEqual(expect.arrayContaining(['soundboard', 'hammers', 'keys', 'tuning', 'play', 'case']));
    const html = await api.http.get(`/api/public/disclosures/${token}/html`);
    // The printable page carries the short code, never the digest itself.
    expect(res.body.verificationCode).toBe(verificationCode(res.body.digest));
    expect(html.text).toContain(res.body.verificationCode);
    expect(html.text).not.toContain(res.body.digest);
    expect(html.text).toContain('USD 3,495.00');
  });

  it('holds nothing internal', async () => {
    const res = await api.http.get(`/api/public/disclosures/${token}`);
    const text = JSON.stringify(res.body);
    // seller identity and intake notes
    for (const secret of ['Rosalind', 'Vantongeren', '555 0100', 'rosalind@example.test', 'Quince Row', 'before the holidays']) expect(text).not.toContain(secret);
    // cost basis, trade-in allowance, margin, internal flags and staff identities
    for (const field of ['acquisition', 'trade_in', 'allowance', 'costBasis', 'margin', 'estimatedCostMinor', 'hourlyRateMinor', 'partsMinor', 'referToTechnician', 'notRecommendedForRetail', 'score', 'rulesVersion', 'createdById', 'submittedBy', 'sellerName', 'notes', 'Ines Okafor-Lind']) {
      expect(text).not.toContain(field);
    }
  });

  it('answers 404 and nothing more for an unknown or malformed token', async () => {
    for (const bad of ['A'.repeat(32), 'short', `${token}x`, "' or 1=1 --"]) {
      const res = await api.http.get(`/api/public/disclosures/${encodeURIComponent(bad)}`);
      expect(res.status).toBe(404);
      expect(res.body).toEqual({ error: 'Not found.' });
    }
  });

  it('a changed finding publishes a new version and digest; the old version reads the same', async () => {
    const v1 = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    const again = (await call('manager', `mutation { publishDisclosure(pianoId: ${pianoId}) }`)).publishDisclosure;
    expect(again).toMatchObject({ version: 1, unchanged: true });

    await call('intake', 'mutation($input: CorrectionInput!) { correctAssessment(input: $input) }', { input: { pianoId, measurements: buildMeasurements({ hammerGrooveDepthMm: 0.8 }), changeNote: 'Hammers were reshaped' } });
    const v2pub = (await call('floor', `mutation { publishDisclosure(pianoId: ${pianoId}) }`)).publishDisclosure;
    expect(v2pub.version).toBe(2);
    expect(v2pub.digest).not.toBe(v1.digest);

    const newest = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    expect(newest).toMatchObject({ version: 2, newestVersion: 2, isNewest: true, digest: v2pub.digest });
    expect(newest.changedAt > v1.publishedAt).toBe(true);
    const old = (await api.http.get(`/api/public/disclosures/${token}?version=1`)).body;
    expect(old.content).toEqual(v1.content);
    expect(old).toMatchObject({ version: 1, digest: v1.digest, isNewest: false, newestVersion: 2 });
    await expect(api.knex('disclosures').where({ piano_id: pianoId, version: 1 }).update({ digest: 'x' })).rejects.toThrow(/cannot change/);
  });

  it('refuses publishing by a technician and pricing by intake staff', async () => {
    const tech = await api.gql(await api.tokenFor('technician'), `mutation { publishDisclosure(pianoId: ${pianoId}) }`);
    expect(tech.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    const price = await api.gql(await api.tokenFor('intake'), 'mutation($i: AskingPriceInput!) { setAskingPrice(input: $i) { id } }', { i: { pianoId, askingPriceMinor: 1, currency: 'USD' } });
    expect(price.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
  });

  it('a buyer acknowledges, floor staff countersign, and the signed PDF arrives by e-mail', async () => {
    const current = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    const stale = await api.http.post(`/api/public/disclosures/${token}/acknowledge`).send({ fullName: 'Ada Brightwell', email: 'ada@example.test', read: true, digest: '0'.repeat(64) });
    expect(stale.status).toBe(409);
    const unread = await api.http.post(`/api/public/disclosures/${token}/acknowledge`).send({ fullName: 'Ada Brightwell', email: 'ada@example.test', read: false, digest: current.digest });
    expect(unread.status).toBe(400);
    expect(unread.body.error).toMatch(/^read: /);
    expect(await api.knex('acknowledgements').count('* as n').first()).toEqual({ n: 0 });

    const ack = await api.http.post(`/api/public/disclosures/${token}/acknowledge`).send({ fullName: 'Ada Brightwell', email: 'Ada@Example.test', read: true, digest: current.digest });
    expect(ack.status).toBe(201);
    expect(ack.body).toMatchObject({ version: current.version, digest: current.digest });

    const signed = (await call('floor', `mutation { countersign(acknowledgementId: ${ack.body.acknowledgementId}) }`)).countersign;
    expect(signed.countersignedBy).toBe('Fern Adeyemi-Holt');
    const again = await api.gql(await api.tokenFor('floor'), `mutation { countersign(acknowledgementId: ${ack.body.acknowledgementId}) }`);
    expect(again.body.errors[0].extensions.code).toBe('CONFLICT');

    // The e-mail is a job, queued with the signature.
    await api.jobs.settle();
    expect(api.mail.messages).toHaveLength(1);
    const mail = api.mail.messages[0];
    expect(mail.to).toEqual(['ada@example.test']);
    expect(mail.subject).toContain(stockNumber);
    expect(mail.text).toContain(verificationCode(current.digest));
    expect(mail.text).not.toContain(current.digest);
    // Dates as the dealer writes them, never an ISO timestamp.
    expect(mail.text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0].contentType).toBe('application/pdf');
    const text = await pdfText(mail.attachments[0].content);
    expect(text).toContain(stockNumber);
    expect(text).toContain(verificationCode(current.digest));
    expect(text.replace(/\s+/g, '')).not.toContain(current.digest);
    expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}T/);
    expect(text).toContain('Ada Brightwell');
    expect(text).toContain('Fern Adeyemi-Holt');
    expect(text).toContain(`version ${current.version}`);

    const download = await api.http.get(`/api/public/receipts/${ack.body.receiptToken}.pdf`).buffer(true);
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    expect(Buffer.compare(download.body, mail.attachments[0].content)).toBe(0);
    const staff = await api.http.get(`/api/acknowledgements/${ack.body.acknowledgementId}/signed.pdf`).set('Authorization', `Bearer ${await api.tokenFor('manager')}`).buffer(true);
    expect(staff.status).toBe(200);
    const list = (await call('floor', `{ acknowledgements(pianoId: ${pianoId}) }`)).acknowledgements;
    expect(list[0]).toMatchObject({ buyerName: 'Ada Brightwell', buyerEmail: 'ada@example.test', countersignedBy: 'Fern Adeyemi-Holt', hasPdf: true });
  });

  it('two staff countersigning one acknowledgement at once: one signs, the other is refused, one PDF, one e-mail', async () => {
    const base = await api.listen();
    const current = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    const ack = await api.http.post(`/api/public/disclosures/${token}/acknowledge`).send({ fullName: 'Bram Oyelaran', email: 'bram@example.test', read: true, digest: current.digest });
    const q = `mutation { countersign(acknowledgementId: ${ack.body.acknowledgementId}) }`;
    const [a, b] = await Promise.all([postGql(base, await api.tokenFor('floor'), q), postGql(base, await api.tokenFor('manager'), q)]);
    const won = [a, b].filter((r) => !r.errors);
    expect(won).toHaveLength(1);
    const lost = [a, b].find((r) => r.errors)!;
    expect(lost.errors![0]).toMatchObject({ message: 'This acknowledgement is already countersigned.', extensions: { code: 'CONFLICT' } });
    const row = await api.knex('acknowledgements').where({ id: ack.body.acknowledgementId }).first();
    expect(row.countersigned_by_id).toBe((await api.knex('users').where({ name: won[0].data.countersign.countersignedBy }).first()).id);
    const pdfs = (await api.objectKeys()).filter((k) => k.startsWith(`disclosures/${pianoId}/signed-${ack.body.acknowledgementId}-`));
    expect(pdfs).toEqual([row.pdf_key]);
    // Every job done, one e-mail went out: one e-mail job was queued.
    await api.jobs.settle();
    expect(api.mail.messages.filter((m) => m.to.includes('bram@example.test'))).toHaveLength(1);
  });

  it('prints a floor tag with the stock number, the price and the link', async () => {
    const res = await api.http.get(`/api/pianos/${pianoId}/floor-tag.pdf`).set('Authorization', `Bearer ${await api.tokenFor('floor')}`).buffer(true);
    expect(res.status).toBe(200);
    const text = await pdfText(res.body);
    expect(text).toContain(stockNumber);
    expect(text).toContain('USD 3,495.00');
    expect(text.replace(/\s+/g, '')).toContain(`http://feltwire.test/d/${token}`);
    const anon = await api.http.get(`/api/pianos/${pianoId}/floor-tag.pdf`);
    expect(anon.status).toBe(401);
  });
});

describe('what cannot be published', () => {
  const publish = async (pianoId: number) => api.gql(await api.tokenFor('manager'), `mutation { publishDisclosure(pianoId: ${pianoId}) }`);
  const intake = async (measurements: Json) => (await call('intake', 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake({ measurements }) })).submitIntake;

  it('refuses a provisional grade with a conflict that says why, and publishes nothing', async () => {
    const out = await intake({ keySidePlayMm: 1.2, hammerGrooveDepthMm: 0.8, overallImpression: 4 });
    expect(out.grade.provisional).toBe(true);
    const res = await publish(out.pianoId);
    expect(res.body.errors[0].extensions.code).toBe('CONFLICT');
    expect(res.body.errors[0].message).toBe(
      `${out.stockNumber} cannot be published yet. The grade is provisional: 3 of 6 areas are inspected and the shop asks for 5. Correct the assessment with the missing areas first.`,
    );
    expect(await api.knex('disclosures').where({ piano_id: out.pianoId }).count('* as n').first()).toEqual({ n: 0 });
    expect(await api.knex('disclosure_links').where({ piano_id: out.pianoId }).count('* as n').first()).toEqual({ n: 0 });
  });

  it('refuses a grade without the play test, and takes it once the play test is in', async () => {
    const noPlay = buildMeasurements({ bassEvenness: null, middleEvenness: null, trebleEvenness: null, dynamicRange: null, overallImpression: null });
    const out = await intake(noPlay);
    expect(out.grade).toMatchObject({ provisional: false, playTested: false });
    const res = await publish(out.pianoId);
    expect(res.body.errors[0]).toMatchObject({ extensions: { code: 'CONFLICT' } });
    expect(res.body.errors[0].message).toContain('The play test is missing, and a disclosure needs it');
    await call('intake', 'mutation($input: CorrectionInput!) { correctAssessment(input: $input) }', { input: { pianoId: out.pianoId, measurements: buildMeasurements(), changeNote: 'Play test done in the showroom' } });
    expect((await publish(out.pianoId)).body.data.publishDisclosure.version).toBe(1);
  });
});

describe('the demo’s disclosures', () => {
  const contentOf = async (stockNumber: string) => {
    const piano = await api.knex('pianos').where({ stock_number: stockNumber }).first();
    return (await api.knex('disclosures').where({ piano_id: piano.id }).orderBy('version', 'desc').first()).content;
  };

  it('a piano whose hammers were worked on and not measured again shows them as found before the work', async () => {
    const c = await contentOf('FW-0010');
    const hammers = c.areas.find((a: Json) => a.area === 'hammers');
    expect(hammers).toMatchObject({ foundBeforeWork: true, measuredAfter: [], mark: 'unseen', condition: 'Not measured after the work', notMeasuredAgain: ['hammer wear', 'hammer felt'] });
    // voicing, asked for by the play test, is work on the hammers too
    expect(hammers.workDone).toEqual(['Reshape and voice hammers', 'Voicing']);
    const keys = c.areas.find((a: Json) => a.area === 'keys');
    expect(keys.measuredAfter.map((f: Json) => f.mark)).toEqual(['fine', 'fine']);
  });

  it('a piano sold as it stands says what was not done', async () => {
    const c = await contentOf('FW-0011');
    expect(c.soldAsItStands).toBe(true);
    expect(c.notDone).toEqual(expect.arrayContaining(['Regulation', 'Voicing', 'Reshape and voice hammers']));
    const history = (await call('manager', `{ stageHistory(pianoId: ${(await api.knex('pianos').where({ stock_number: 'FW-0011' }).first()).id}) }`)).stageHistory;
    expect(history.find((h: Json) => h.action === 'sell_as_is').why).toMatch(/project piano/);
  });
});

describe('a version published in the first format', () => {
  it('stays readable as published, and its signed copy prints its own words', async () => {
    const out = (await call('intake', 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake() })).submitIntake;
    const pub = (await call('manager', `mutation { publishDisclosure(pianoId: ${out.pianoId}) }`)).publishDisclosure;
    const link = await api.knex('disclosure_links').where({ piano_id: out.pianoId }).first();
    // Content as format 1 stored it: a condition word per area, severities, no format field.
    const v1 = {
      dealerName: 'Larkspur Lane Pianos',
      piano: { stockNumber: out.stockNumber, maker: 'Almsbury', model: 'Parlour 118', serialNumber: null, year: '1981', kind: 'upright', size: 'upright, 118 cm tall', finish: null },
      askingPrice: null,
      assessedOn: '2026-11-20',
      assessedAfterWorkshop: false,
      pitch: null,
      areas: [{ area: 'hammers', label: 'Hammers', condition: 'Needs attention', severity: 'needs_work', findings: [{ severity: 'needs_work', text: 'Hammer string grooves are 2.2 mm deep.' }], workDone: [], photoIds: [] }],
      photos: [],
      warranty: 'One year.',
      notices: [],
    };
    const digest = sha256Hex(JSON.stringify(v1));
    const [row] = await api.knex('disclosures').insert({ piano_id: out.pianoId, version: pub.version + 1, content: JSON.stringify(v1), html: '<p>as published</p>', digest, published_by_id: 1 }).returning('id');
    const read = (await api.http.get(`/api/public/disclosures/${link.token}`)).body;
    expect(read.content).toEqual(v1);
    expect((await api.http.get(`/api/public/disclosures/${link.token}/html`)).text).toBe('<p>as published</p>');
    const ack = await api.http.post(`/api/public/disclosures/${link.token}/acknowledge`).send({ fullName: 'Tam Oldfield', email: 'tam@example.test', read: true, digest });
    expect(ack.status).toBe(201);
    await call('floor', `mutation { countersign(acknowledgementId: ${ack.body.acknowledgementId}) }`);
    // The signed copy goes out by a job.
    await api.jobs.settle();
    const mail = api.mail.messages.find((m) => m.to.includes('tam@example.test'))!;
    const text = await pdfText(mail.attachments[0].content);
    expect(text).toContain('Hammers: Needs attention');
    expect(text).toContain('Hammer string grooves are 2.2 mm deep.');
    expect(row.id).toBeGreaterThan(0);
  });
});
