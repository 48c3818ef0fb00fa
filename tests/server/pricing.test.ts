import { gradeAssessment } from '@/modules/assessment/core/grade';
import { defaultRules } from '@/modules/assessment/core/grade-rules';
import { pricingPiano, tradeInOffer } from '@/modules/pricing/core/pricing';
import { demoPricingRules } from '@/modules/pricing/core/pricing-rules';
import { conditionReport } from '@/modules/shop/core/condition-report';
import { demoRateCard } from '@/modules/shop/core/rate-card';

import { startTestApi, type TestApi } from '../support/api';
import { buildIntake, buildMeasurements } from '../support/builders';
import { tableStates } from '../support/db-state';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

type Json = Record<string, any>;
type Role = 'intake' | 'technician' | 'floor' | 'manager';
async function gql(role: Role, query: string, variables?: Json): Promise<{ data?: Json; errors?: Json[] }> {
  return (await api.gql(await api.tokenFor(role), query, variables)).body;
}
async function call(role: Role, query: string, variables?: Json): Promise<Json> {
  const body = await gql(role, query, variables);
  if (body.errors) throw Object.assign(new Error(body.errors[0].message), { extensions: body.errors[0].extensions });
  return body.data!;
}

const OFFER = `query($id: Int!) { pianoMoney(pianoId: $id) { offer { status offer { basis currency offerMinor expectedPriceMinor provisional reconEstimateMinor reconSource rulesVersion lines { key label detail amountMinor runningMinor } notes rounding } } } }`;
const ANSWER = `mutation($i: OfferAnswerInput!) { recordOfferAnswer(input: $i) { id answer offerMinor counterMinor agreedMinor currency recordedBy recordedAt } }`;
const PRICE = `mutation($i: AskingPriceChangeInput!) { changeAskingPrice(input: $i) { pianoId askingPriceMinor priceCurrency change { fromMinor toMinor currency reason changedBy suggestedMinor } } }`;
const COSTS = `query($id: Int!) { pianoMoney(pianoId: $id) { allowanceMinor costBasisMinor marginMinor reconActualMinor priceHistory { fromMinor toMinor reason changedBy } } }`;

async function submit(over: Json = {}) {
  return (await call('intake', 'mutation($input: IntakeInput!) { submitIntake(input: $input) { pianoId stockNumber } }', { input: buildIntake(over) })).submitIntake as { pianoId: number; stockNumber: string };
}

describe('the trade-in offer after an inspection', () => {
  let pianoId: number;
  let offer: Json;
  beforeAll(async () => {
    ({ pianoId } = await submit());
    offer = (await call('intake', OFFER, { id: pianoId })).pianoMoney.offer;
  });

  it('is the offer the pricing core works out from the grade, the rate card and the demo rules', () => {
    const grade = gradeAssessment(buildMeasurements(), defaultRules);
    const report = conditionReport(grade, demoRateCard);
    // The built piano: an upright of 118 cm from about 1981, priced in the test clock's year.
    const expected = tradeInOffer(pricingPiano({ kind: 'upright', sizeCm: 118, year: 1981, yearIsEstimate: true }, api.clock.now().getUTCFullYear()), report, report.workMinor, demoPricingRules);
    expect(offer.status).toBe('offer');
    expect(offer.offer).toMatchObject({ basis: 'retail', currency: 'USD', offerMinor: expected.offerMinor, expectedPriceMinor: expected.expectedPriceMinor, reconSource: 'condition', reconEstimateMinor: report.workMinor, rulesVersion: 'demo-1' });
    expect(offer.offer.lines).toEqual(expected.lines);
    expect(offer.offer.offerMinor).toBeGreaterThan(0);
    expect(offer.offer.lines.map((l: Json) => l.label)).toEqual(['Expected asking price', 'Reconditioning estimate', 'Target margin', 'Holding cost', 'Rounded'].slice(0, offer.offer.lines.length));
  });

  it('refuses an answer to another figure than the offer, and changes nothing', async () => {
    const before = await tableStates(api.knex);
    const body = await gql('intake', ANSWER, { i: { pianoId, answer: 'accepted', offeredMinor: offer.offer.offerMinor + 2500 } });
    expect(body.errors?.[0].extensions.code).toBe('CONFLICT');
    expect(body.errors?.[0].message).toMatch(/^The offer is now USD [\d,]+\.00, not USD [\d,]+\.00/);
    expect(await tableStates(api.knex)).toEqual(before);
  });

  it('records a counter-offer, then the figure agreed, with who and when', async () => {
    const counter = (await call('intake', ANSWER, { i: { pianoId, answer: 'countered', offeredMinor: offer.offer.offerMinor, counterMinor: offer.offer.offerMinor + 30000, note: 'Seller hoped for more' } })).recordOfferAnswer;
    expect(counter).toMatchObject({ answer: 'countered', offerMinor: offer.offer.offerMinor, counterMinor: offer.offer.offerMinor + 30000, agreedMinor: null, currency: 'USD', recordedBy: 'Ines Okafor-Lind' });
    // Recorded on the services' clock, a moment ago.
    expect(Math.abs(Date.parse(counter.recordedAt) - api.clock.now().getTime())).toBeLessThan(60_000);
    const agreed = (await call('manager', ANSWER, { i: { pianoId, answer: 'agreed', offeredMinor: offer.offer.offerMinor, agreedMinor: offer.offer.offerMinor + 15000 } })).recordOfferAnswer;
    expect(agreed).toMatchObject({ answer: 'agreed', agreedMinor: offer.offer.offerMinor + 15000, recordedBy: 'Mara Quillfeather' });
    const answers = (await call('intake', 'query($id: Int!) { pianoMoney(pianoId: $id) { answers { answer counterMinor agreedMinor } } }', { id: pianoId })).pianoMoney.answers;
    expect(answers).toEqual([
      { answer: 'countered', counterMinor: offer.offer.offerMinor + 30000, agreedMinor: null },
      { answer: 'agreed', counterMinor: null, agreedMinor: offer.offer.offerMinor + 15000 },
    ]);
    // The manager sees the allowance agreed, and the cost basis it starts.
    const costs = (await call('manager', COSTS, { id: pianoId })).pianoMoney;
    expect(costs).toMatchObject({ allowanceMinor: offer.offer.offerMinor + 15000, costBasisMinor: offer.offer.offerMinor + 15000, reconActualMinor: 0, marginMinor: null });
  });

  it.each([
    ['a counter without its figure', { answer: 'countered' }, 'counterMinor: is the figure the seller asked for: required with a counter-offer'],
    ['an agreed figure with an acceptance', { answer: 'accepted', agreedMinor: 100 }, 'agreedMinor: only goes with the answer agreed'],
    ['a negative counter', { answer: 'countered', counterMinor: -1 }, 'counterMinor: must be 0 or more'],
  ])('refuses %s', async (_n, over, message) => {
    const body = await gql('intake', ANSWER, { i: { pianoId, offeredMinor: offer.offer.offerMinor, ...over } });
    expect(body.errors?.[0]).toMatchObject({ message, extensions: { code: 'BAD_INPUT' } });
  });

  it('says a provisional offer is provisional', async () => {
    const few = buildMeasurements();
    const only = Object.fromEntries(Object.entries(few).filter(([k]) => ['keySidePlayMm', 'keyTouchesNeighbour', 'keyLevelDeviationMm'].includes(k)));
    const { pianoId: id } = await submit({ measurements: only });
    const o = (await call('intake', OFFER, { id })).pianoMoney.offer.offer;
    expect(o.provisional).toBe(true);
    expect(o.notes[0]).toMatch(/^Provisional: /);
  });

  it('gives a piano on consignment no offer, and one not yet assessed none either', async () => {
    const { pianoId: id } = await submit({ acquisition: 'consignment' });
    expect((await call('intake', OFFER, { id })).pianoMoney.offer).toEqual({ status: 'consignment', offer: null });
    const logged = (await call('intake', 'mutation { createPiano(maker: "Tessaly", kind: "upright") { id } }')).createPiano.id;
    expect((await call('intake', OFFER, { id: logged })).pianoMoney.offer).toEqual({ status: 'not_assessed', offer: null });
  });

  it('offers a wholesale figure for the demo piano not recommended for retail, said as such', async () => {
    const id = (await api.knex('pianos').where('stock_number', 'FW-0011').first('id')).id;
    const o = (await call('manager', OFFER, { id })).pianoMoney.offer.offer;
    expect(o.basis).toBe('wholesale');
    expect(o.lines[0].label).toBe('Wholesale figure');
    expect(o.notes).toContain('Not recommended for retail: this is a wholesale offer, for a piano the dealer will sell on as it stands.');
  });
});

describe('money fields by role', () => {
  let pianoId: number;
  beforeAll(async () => {
    pianoId = (await api.knex('pianos').where('stock_number', 'FW-0003').first('id')).id;
  });

  // Each money field asked alone, so each refusal is seen by its own name.
  const FIELDS: [string, string, string][] = [
    ['offer', 'offer { status }', 'Not allowed: your role cannot see the trade-in offer.'],
    ['answers', 'answers { id }', 'Not allowed: your role cannot see the seller’s answers to offers.'],
    ['allowanceMinor', 'allowanceMinor', 'Not allowed: your role cannot see the trade-in allowance.'],
    ['costBasisMinor', 'costBasisMinor', 'Not allowed: your role cannot see the cost basis.'],
    ['marginMinor', 'marginMinor', 'Not allowed: your role cannot see the margin.'],
    ['suggestedPrice', 'suggestedPrice { priceMinor }', 'Not allowed: your role cannot see the suggested asking price.'],
    ['priceHistory', 'priceHistory { toMinor }', 'Not allowed: your role cannot see the price history.'],
  ];
  it.each((['technician', 'floor'] as const).flatMap((role) => FIELDS.map(([field, selection, message]) => [role, field, selection, message] as const)))(
    'a %s asking for %s is refused by name',
    async (role, field, selection, message) => {
      const body = await gql(role, `query($id: Int!) { pianoMoney(pianoId: $id) { pianoId ${selection} } }`, { id: pianoId });
      expect(body.errors).toEqual([expect.objectContaining({ message, path: ['pianoMoney', field], extensions: expect.objectContaining({ code: 'NOT_ALLOWED' }) })]);
      expect(body.data?.pianoMoney).toEqual(expect.objectContaining({ pianoId }));
      expect(body.data?.pianoMoney[field] ?? null).toBeNull();
    },
  );

  it.each([
    ['intake', 'costBasisMinor', false],
    ['intake', 'marginMinor', false],
    ['intake', 'allowanceMinor', false],
    ['intake', 'offer { status }', true],
    ['manager', 'costBasisMinor', true],
  ] as const)('%s reading %s: allowed %s', async (role, selection, allowed) => {
    const body = await gql(role, `query($id: Int!) { pianoMoney(pianoId: $id) { ${selection} } }`, { id: pianoId });
    expect(body.errors?.[0]?.extensions?.code ?? 'OK').toBe(allowed ? 'OK' : 'NOT_ALLOWED');
  });

  it.each(['technician', 'floor', 'intake'] as const)('refuses the stock table, its charts, its CSV and the pricing rules to %s', async (role) => {
    for (const [name, query] of [
      ['stockTable', '{ stockTable { total rows { costBasisMinor marginMinor allowanceMinor } } }'],
      ['stockCharts', '{ stockCharts { margins { value } } }'],
      ['pricingRules', '{ pricingRules { targetMargin } }'],
    ]) {
      const body = await gql(role, query);
      expect([name, body.errors?.[0]?.extensions?.code]).toEqual([name, 'NOT_ALLOWED']);
      expect(body.data ?? null).toBeNull();
    }
    const csv = await api.http.get('/api/stock/export.csv').set('authorization', `Bearer ${await api.tokenFor(role)}`);
    expect(csv.status).toBe(403);
    expect(csv.text).not.toContain('FW-0003');
  });
});

describe('asking prices and their history', () => {
  let pianoId: number;
  beforeAll(async () => {
    ({ pianoId } = await submit());
  });

  it('keeps every change with who, when, from, to and why, and the disclosure takes the current price', async () => {
    const first = (await call('manager', PRICE, { i: { pianoId, askingPriceMinor: 329500, currency: 'USD', reason: 'First price after the inspection' } })).changeAskingPrice;
    expect(first).toMatchObject({ askingPriceMinor: 329500, priceCurrency: 'USD', change: { fromMinor: null, toMinor: 329500, reason: 'First price after the inspection', changedBy: 'Mara Quillfeather' } });
    expect(first.change.suggestedMinor).toBeGreaterThan(0);
    await api.advance(60_000);
    await call('manager', PRICE, { i: { pianoId, askingPriceMinor: 309500, currency: 'USD', reason: 'Sixty days on the floor' } });
    // The disclosure desk's field takes the same path.
    await call('manager', 'mutation($i: AskingPriceInput!) { setAskingPrice(input: $i) { askingPriceMinor } }', { i: { pianoId, askingPriceMinor: 299500, currency: 'USD', reason: 'Matched at the desk' } });
    // The same price again changes nothing.
    await call('manager', PRICE, { i: { pianoId, askingPriceMinor: 299500, currency: 'USD', reason: 'Again' } });
    const history = (await call('manager', COSTS, { id: pianoId })).pianoMoney.priceHistory;
    expect(history).toEqual([
      { fromMinor: 309500, toMinor: 299500, reason: 'Matched at the desk', changedBy: 'Mara Quillfeather' },
      { fromMinor: 329500, toMinor: 309500, reason: 'Sixty days on the floor', changedBy: 'Mara Quillfeather' },
      { fromMinor: null, toMinor: 329500, reason: 'First price after the inspection', changedBy: 'Mara Quillfeather' },
    ]);
    const piano = await api.knex('pianos').where({ id: pianoId }).first('asking_price_minor');
    expect(piano.asking_price_minor).toBe(299500);
    const pub = (await call('manager', `mutation { publishDisclosure(pianoId: ${pianoId}) }`)).publishDisclosure;
    const res = await api.http.get(`/api/public/disclosures/${pub.token}`);
    expect(res.body.content.askingPrice).toEqual({ minor: 299500, currency: 'USD' });
  });

  it.each([
    ['no reason', { reason: '  ' }, 'reason: says why, in at least 3 characters'],
    ['an unknown currency', { currency: 'XTS' }, 'currency: must be one of USD, CAD, EUR, GBP, JPY'],
    ['a negative price', { askingPriceMinor: -1 }, 'askingPriceMinor: must be 0 or more'],
  ])('refuses a price with %s and changes nothing', async (_n, over, message) => {
    const before = await tableStates(api.knex);
    const body = await gql('manager', PRICE, { i: { pianoId, askingPriceMinor: 1000, currency: 'USD', reason: 'A reason', ...over } });
    expect(body.errors?.[0]).toMatchObject({ message, extensions: { code: 'BAD_INPUT' } });
    expect(await tableStates(api.knex)).toEqual(before);
  });

  it('lets only managers set prices', async () => {
    for (const role of ['intake', 'technician', 'floor'] as const) {
      const body = await gql(role, PRICE, { i: { pianoId, askingPriceMinor: 1000, currency: 'USD', reason: 'Try' } });
      expect([role, body.errors?.[0]?.extensions.code]).toEqual([role, 'NOT_ALLOWED']);
    }
  });
});

describe('pricing rules', () => {
  const RULES = `{ pricingRules { version currency targetMargin holdingCostPerDayMinor baseRetail { upright { upToCm baseMinor } grand { upToCm baseMinor } } ageBands { upToYears factor } unknownAgeFactor conditionFactors { floor work_first unjudged } workShareBands { upToPct factor } daysToSell { upright grand } priceEnding { stepMinor lessMinor } offerStepMinor wholesale { factor daysToSell } } }`;
  const SET = 'mutation($r: PricingRulesInput!) { setPricingRules(rules: $r) { version targetMargin } }';

  it('start at the shop defaults and take a manager’s edit as a new version the offer then uses', async () => {
    const rules = (await call('manager', RULES)).pricingRules;
    expect(rules.version).toBe('demo-1');
    const { version: _v, ...input } = rules;
    const saved = (await call('manager', SET, { r: { ...input, targetMargin: 0.5 } })).setPricingRules;
    expect(saved).toEqual({ version: 'pricing-1', targetMargin: 0.5 });
    const { pianoId } = await submit();
    const offer = (await call('intake', OFFER, { id: pianoId })).pianoMoney.offer.offer;
    expect(offer.rulesVersion).toBe('pricing-1');
    expect(offer.lines.find((l: Json) => l.key === 'margin').detail).toBe('50 % of the asking price');
    // Rules in another currency than the rate card make no offer, and say why.
    await call('manager', SET, { r: { ...input, currency: 'EUR' } });
    const body = await gql('intake', OFFER, { id: pianoId });
    expect(body.errors?.[0]).toMatchObject({ message: 'The rate card is in USD and the pricing rules in EUR: set both in one currency to price pianos.', path: ['pianoMoney', 'offer'] });
    await call('manager', SET, { r: input });
  });

  it('refuses bands out of order, and changes nothing', async () => {
    const { version: _v, ...input } = (await call('manager', RULES)).pricingRules;
    const before = await tableStates(api.knex);
    const body = await gql('manager', SET, { r: { ...input, ageBands: [{ upToYears: 30, factor: 1 }, { upToYears: 10, factor: 0.5 }, { upToYears: null, factor: 0.4 }] } });
    expect(body.errors?.[0]).toMatchObject({ message: 'ageBands.1.upToYears: must be above the band before', extensions: { code: 'BAD_INPUT' } });
    expect(await tableStates(api.knex)).toEqual(before);
  });
});
