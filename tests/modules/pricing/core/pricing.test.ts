import { applyPriceEnding, askingPrice, pricingPiano, roundingWords, roundOfferDown, tradeInOffer, type PricingCondition, type PricingPiano } from '@/modules/pricing/core/pricing';
import { pricingRulesInput, type PricingRules } from '@/modules/pricing/core/pricing-rules';
import { formatMoney } from '@/modules/shop/core/money';

// Fixed rules, apart from the shop's demo values, so these figures never move with them.
const USD_RULES: PricingRules = {
  version: 'test-1',
  currency: 'USD',
  baseRetail: {
    upright: [
      { upToCm: 110, baseMinor: 240000 },
      { upToCm: 125, baseMinor: 380000 },
      { upToCm: null, baseMinor: 520000 },
    ],
    grand: [
      { upToCm: 160, baseMinor: 850000 },
      { upToCm: null, baseMinor: 1450000 },
    ],
  },
  ageBands: [
    { upToYears: 10, factor: 1 },
    { upToYears: 25, factor: 0.85 },
    { upToYears: 50, factor: 0.7 },
    { upToYears: 80, factor: 0.55 },
    { upToYears: null, factor: 0.45 },
  ],
  unknownAgeFactor: 0.55,
  conditionFactors: { floor: 1, work_first: 0.95, unjudged: 0.85 },
  workShareBands: [
    { upToPct: 10, factor: 1 },
    { upToPct: 25, factor: 0.95 },
    { upToPct: 50, factor: 0.9 },
    { upToPct: null, factor: 0.8 },
  ],
  targetMargin: 0.35,
  holdingCostPerDayMinor: 250,
  daysToSell: { upright: 60, grand: 90 },
  priceEnding: { stepMinor: 10000, lessMinor: 500 },
  offerStepMinor: 2500,
  wholesale: { factor: 0.3, daysToSell: 21 },
};

const JPY_RULES: PricingRules = {
  ...USD_RULES,
  version: 'test-jpy',
  currency: 'JPY',
  holdingCostPerDayMinor: 300,
  priceEnding: { stepMinor: 1000, lessMinor: 0 },
  offerStepMinor: 1000,
};

const piano = (kind: PricingPiano['kind'], sizeCm: number | null, ageYears: number | null): PricingPiano => ({ kind, sizeCm, ageYears, ageIsEstimate: false });
const cond = (readiness: PricingCondition['readiness'], workMinor = 0, provisional = false): PricingCondition => ({ readiness, workMinor, provisional });

describe('askingPrice', () => {
  it.each([
    ['an upright ready for the floor', piano('upright', 118, 30), cond('floor'), USD_RULES, 'retail', 269500, [380000, 266000, 266000, 266000, 269500]],
    ['an upright that needs work first', piano('upright', 118, 30), cond('work_first', 64000), USD_RULES, 'retail', 239500, [380000, 266000, 252700, 240065, 239500]],
    ['a grand of unknown year with more work than it is worth', piano('grand', 150, null), cond('work_first', 900000), USD_RULES, 'retail', 359500, [850000, 467500, 444125, 355300, 359500]],
    ['a provisional upright not judged yet', piano('upright', 100, 5), cond('unjudged', 0, true), USD_RULES, 'retail', 199500, [240000, 240000, 204000, 204000, 199500]],
    ['an upright with no size measured (smallest band)', piano('upright', null, 12), cond('floor'), USD_RULES, 'retail', 199500, [240000, 204000, 204000, 204000, 199500]],
    ['a piano for wholesale', piano('upright', 130, 90), cond('wholesale', 250000), USD_RULES, 'wholesale', 70000, [520000, 234000, 70200, 70000]],
    ['an upright in yen (0 decimals)', piano('upright', 118, 30), cond('floor'), JPY_RULES, 'retail', 266000, [380000, 266000, 266000, 266000, 266000]],
  ])('%s', (_name, p, c, rules, basis, priceMinor, running) => {
    const a = askingPrice(p, c, rules);
    expect(a.basis).toBe(basis);
    expect(a.priceMinor).toBe(priceMinor);
    expect(a.currency).toBe(rules.currency);
    expect(a.lines.map((l) => l.runningMinor)).toEqual(running);
    // Every line's change adds up to the figure it leaves.
    expect(a.lines.reduce((s, l) => s + l.amountMinor, 0)).toBe(priceMinor);
  });

  it('says what each step did, in words', () => {
    const a = askingPrice(piano('upright', 118, 30), cond('work_first', 64000), USD_RULES);
    expect(a.lines.map((l) => [l.label, l.detail])).toEqual([
      ['Base retail value', 'Upright, 118 cm, in the band 111-125 cm'],
      ['Age', '30 years old (26-50 years): 70 % kept'],
      ['Condition', 'Needs work first: 95 % kept'],
      ['Work it needs', 'USD 640.00 of work, 24.1 % of the value: 95 % kept'],
      ['Price ending', 'To the nearest USD 100.00, less USD 5.00'],
    ]);
    expect(a.summary).toMatch(/retail asking price/);
  });

  it('names a wholesale figure as such', () => {
    const a = askingPrice(piano('upright', 130, 90), cond('wholesale'), USD_RULES);
    expect(a.summary).toBe('A wholesale figure, not a retail price: what a wholesale buyer would likely pay for it as it stands.');
    expect(a.lines.find((l) => l.key === 'wholesale')?.detail).toBe('For wholesale, not recommended for retail: 30 % of the value');
  });

  it('refuses work money in another currency than the rules', () => {
    expect(() => askingPrice(piano('upright', 118, 30), { ...cond('floor'), currency: 'EUR' }, USD_RULES)).toThrow('the work money is in EUR and the pricing rules in USD');
  });

  it('rounds each step to a whole minor unit, half away from zero', () => {
    const rules: PricingRules = { ...JPY_RULES, baseRetail: { ...JPY_RULES.baseRetail, upright: [{ upToCm: null, baseMinor: 100001 }] }, ageBands: [{ upToYears: null, factor: 0.85 }] };
    // 100001 x 0.85 = 85000.85
    expect(askingPrice(piano('upright', 118, 3), cond('floor'), rules).lines[1].runningMinor).toBe(85001);
    const half: PricingRules = { ...rules, baseRetail: { ...rules.baseRetail, upright: [{ upToCm: null, baseMinor: 10001 }] }, ageBands: [{ upToYears: null, factor: 0.5 }] };
    // 10001 x 0.5 = 5000.5
    expect(askingPrice(piano('upright', 118, 3), cond('floor'), half).lines[1].runningMinor).toBe(5001);
  });
});

describe('tradeInOffer', () => {
  it.each([
    // 269500 - 0 - 94325 (35 %) - 15000 (60 days x 250) = 160175, down to 2500s
    ['ready for the floor', piano('upright', 118, 30), cond('floor'), 0, USD_RULES, 'retail', 160000, [269500, 269500, 175175, 160175, 160000]],
    // 239500 - 64000 - 83825 - 15000 = 76675
    ['needs work first', piano('upright', 118, 30), cond('work_first', 64000), 64000, USD_RULES, 'retail', 75000, [239500, 175500, 91675, 76675, 75000]],
    // a plan's estimate above the condition report's work money is what is taken off
    ['with a larger workshop estimate', piano('upright', 118, 30), cond('work_first', 64000), 100000, USD_RULES, 'retail', 40000, [239500, 139500, 55675, 40675, 40000]],
    // 359500 - 900000 - 125825 - 22500 < 0: the zero floor
    ['costs above the price: zero', piano('grand', 150, null), cond('work_first', 900000), 900000, USD_RULES, 'retail', 0, [359500, -540500, -666325, -688825, 0]],
    // wholesale: 70000 - 24500 - 5250 (21 days) = 40250, no reconditioning counted
    ['for wholesale', piano('upright', 130, 90), cond('wholesale', 250000), 250000, USD_RULES, 'wholesale', 40000, [70000, 45500, 40250, 40000]],
    // yen: 266000 - 93100 - 18000 = 154900, down to 1000s
    ['in yen (0 decimals)', piano('upright', 118, 30), cond('floor'), 0, JPY_RULES, 'retail', 154000, [266000, 266000, 172900, 154900, 154000]],
  ])('%s', (_name, p, c, recon, rules, basis, offerMinor, running) => {
    const o = tradeInOffer(p, c, recon, rules);
    expect(o.basis).toBe(basis);
    expect(o.offerMinor).toBe(offerMinor);
    expect(o.lines.map((l) => l.runningMinor)).toEqual(running);
    expect(o.lines.reduce((s, l) => s + l.amountMinor, 0)).toBe(offerMinor);
    expect(o.offerMinor).toBeGreaterThanOrEqual(0);
  });

  it('shows its lines so the offer can be explained', () => {
    const o = tradeInOffer(piano('upright', 118, 30), cond('work_first', 64000), 64000, USD_RULES);
    expect(o.lines.map((l) => [l.label, l.detail, l.amountMinor])).toEqual([
      ['Expected asking price', 'The suggested asking price once the work is done', 239500],
      ['Reconditioning estimate', 'The work the piano needs before it can be sold', -64000],
      ['Target margin', '35 % of the asking price', -83825],
      ['Holding cost', 'USD 2.50 a day for 60 days until it sells', -15000],
      ['Rounded', 'Down to a whole USD 25.00', -1675],
    ]);
    expect(o.notes).toEqual([]);
    expect(o.summary).toBe('A trade-in offer');
  });

  it('says a wholesale offer is one, and a provisional one is provisional', () => {
    const w = tradeInOffer(piano('upright', 130, 90), cond('wholesale', 0, true), 0, USD_RULES);
    expect(w.summary).toBe('A wholesale offer');
    expect(w.provisional).toBe(true);
    expect(w.notes).toEqual([
      'Provisional: the inspection did not cover enough areas, so the offer may change once the rest is inspected.',
      'Not recommended for retail: this is a wholesale offer, for a piano the dealer will sell on as it stands.',
    ]);
    expect(w.lines.some((l) => l.key === 'recon')).toBe(false);
  });

  it('says so when there is nothing to offer', () => {
    const o = tradeInOffer(piano('grand', 150, null), cond('work_first', 900000), 900000, USD_RULES);
    expect(o.lines.find((l) => l.key === 'floor')).toEqual({ key: 'floor', label: 'Never below zero', detail: 'The costs are more than the piano would fetch: nothing is offered', amountMinor: 688825, runningMinor: 0 });
    expect(o.notes).toContain('The piano would not cover its costs: there is no offer to make for it.');
  });
});

describe('rounding and money', () => {
  it.each([
    [265000, 269500],
    [264999, 259500],
    [4999, 0],
    [0, 0],
  ])('price ending of %i is %i', (value, price) => expect(applyPriceEnding(value, USD_RULES.priceEnding)).toBe(price));

  it.each([
    [160175, 2500, 160000],
    [2499, 2500, 0],
    [-10, 2500, 0],
    [154999, 1000, 154000],
  ])('an offer of %i down to %i is %i', (value, step, out) => expect(roundOfferDown(value, step)).toBe(out));

  it('states the rounding in the currency', () => {
    expect(roundingWords(USD_RULES)).toBe('Each step rounds to a whole minor unit of USD, half away from zero; asking prices go to the nearest USD 100.00, less USD 5.00; offers go down to a whole USD 25.00.');
    expect(roundingWords(JPY_RULES)).toBe('Each step rounds to a whole minor unit of JPY, half away from zero; asking prices go to the nearest JPY 1,000; offers go down to a whole JPY 1,000.');
  });

  it.each([
    // ISO 4217 minor units (see TRADE.md): USD has 2 decimals
    [269500, 'USD', 'USD 2,695.00'],
    // ISO 4217 minor units (see TRADE.md): EUR has 2 decimals
    [5, 'EUR', 'EUR 0.05'],
    // ISO 4217 minor units (see TRADE.md): JPY has 0 decimals
    [154000, 'JPY', 'JPY 154,000'],
  ] as const)('formats %i %s as %s', (minor, currency, text) => expect(formatMoney(minor, currency)).toBe(text));
});

describe('pricingPiano and the rules input', () => {
  it('ages a piano from its year on the day priced, never below zero', () => {
    expect(pricingPiano({ kind: 'upright', sizeCm: 118, year: 1996, yearIsEstimate: true }, 2026)).toEqual({ kind: 'upright', sizeCm: 118, ageYears: 30, ageIsEstimate: true });
    expect(pricingPiano({ kind: 'grand', sizeCm: null, year: 2027, yearIsEstimate: false }, 2026).ageYears).toBe(0);
    expect(pricingPiano({ kind: 'grand', sizeCm: null, year: null, yearIsEstimate: false }, 2026).ageYears).toBeNull();
  });

  it('accepts the fixed rules and refuses bands out of order or closed at the end', () => {
    const { version: _v, ...input } = USD_RULES;
    expect(pricingRulesInput.safeParse(input).success).toBe(true);
    const messages = (raw: unknown) => (pricingRulesInput.safeParse(raw).error?.issues ?? []).map((i) => `${i.path.join('.')}: ${i.message}`);
    expect(messages({ ...input, ageBands: [{ upToYears: 20, factor: 1 }, { upToYears: 10, factor: 0.9 }, { upToYears: null, factor: 0.5 }] })).toEqual(['ageBands.1.upToYears: must be above the band before']);
    expect(messages({ ...input, workShareBands: [{ upToPct: 10, factor: 1 }] })).toEqual(['workShareBands.0.upToPct: the last band has no upper limit (null)']);
    expect(messages({ ...input, priceEnding: { stepMinor: 500, lessMinor: 500 } })).toEqual(['priceEnding.lessMinor: the amount taken off must be less than the step']);
    expect(messages({ ...input, targetMargin: 1.5 })).toEqual(['targetMargin: must be at most 0.9']);
  });
});
