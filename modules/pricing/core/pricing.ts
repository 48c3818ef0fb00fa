import { READINESS_WORDS, type Readiness } from '@/modules/assessment/core/grade';
import type { PianoKind } from '@/modules/pianos/core/piano';
import { formatMoney, roundMinor, type Currency } from '@/modules/shop/core/money';

import type { AgeBand, PricingRules, SizeBand, WorkShareBand } from './pricing-rules';

/** The facts of a piano that pricing reads; its age is worked out by the caller from the day it prices on. */
export interface PricingPiano {
  kind: PianoKind;
  sizeCm: number | null;
  ageYears: number | null;
  ageIsEstimate: boolean;
}

/** What pricing reads of the condition: `conditionReport(grade, card)` gives all three. */
export interface PricingCondition {
  readiness: Readiness;
  provisional: boolean;
  /** the work the findings call for, on the rate card, in minor units of the rules' currency */
  workMinor: number;
}

/** One step of a worked figure: what it changes (`amountMinor`, negative when taken off) and where it leaves it. */
export interface PriceLine {
  key: 'base' | 'age' | 'condition' | 'work' | 'ending' | 'wholesale' | 'asking' | 'recon' | 'margin' | 'holding' | 'floor' | 'offerStep';
  label: string;
  detail: string;
  amountMinor: number;
  runningMinor: number;
}

export type PriceBasis = 'retail' | 'wholesale';

export interface AskingPrice {
  basis: PriceBasis;
  currency: Currency;
  priceMinor: number;
  provisional: boolean;
  rulesVersion: string;
  lines: PriceLine[];
  /** how the figures were rounded, in words */
  rounding: string;
  /** what the figure is, in words: a retail price, or a wholesale figure said as such */
  summary: string;
}

export interface TradeInOffer {
  basis: PriceBasis;
  currency: Currency;
  offerMinor: number;
  /** the asking price (or wholesale figure) the offer is worked back from */
  expectedPriceMinor: number;
  provisional: boolean;
  rulesVersion: string;
  lines: PriceLine[];
  rounding: string;
  summary: string;
  /** what intake staff may say to the seller about how firm the figure is */
  notes: string[];
}

/** The piano's age on a day: from its year, or the middle of its estimated range. */
export function pricingPiano(p: { kind: PianoKind; sizeCm: number | null; year: number | null; yearIsEstimate: boolean }, onYear: number): PricingPiano {
  return { kind: p.kind, sizeCm: p.sizeCm, ageYears: p.year == null ? null : Math.max(0, onYear - p.year), ageIsEstimate: p.yearIsEstimate };
}

const money = (minor: number, currency: Currency) => formatMoney(minor, currency);
const pct = (f: number) => `${Number((f * 100).toFixed(1))} %`;
const KIND_WORDS: Record<PianoKind, string> = { upright: 'Upright', grand: 'Grand' };

function sizeBandOf(bands: SizeBand[], sizeCm: number | null): { band: SizeBand; words: string } {
  if (sizeCm == null) return { band: bands[0], words: 'size not measured: priced in the smallest band' };
  const n = bands.findIndex((b) => b.upToCm == null || sizeCm <= b.upToCm);
  const band = bands[n];
  const from = n > 0 ? bands[n - 1].upToCm : null;
  const range = band.upToCm == null ? `over ${from} cm` : from == null ? `up to ${band.upToCm} cm` : `${from + 1}-${band.upToCm} cm`;
  return { band, words: `${sizeCm} cm, in the band ${range}` };
}

function ageBandOf(bands: AgeBand[], age: number): { band: AgeBand; range: string } {
  const n = bands.findIndex((b) => b.upToYears == null || age <= b.upToYears);
  const band = bands[n];
  const from = n > 0 ? bands[n - 1].upToYears : null;
  const range = band.upToYears == null ? `over ${from} years` : from == null ? `up to ${band.upToYears} years` : `${from + 1}-${band.upToYears} years`;
  return { band, range };
}

function workBandOf(bands: WorkShareBand[], sharePct: number): WorkShareBand {
  return bands.find((b) => b.upToPct == null || sharePct <= b.upToPct) ?? bands[bands.length - 1];
}

/** To the nearest step (half a step goes up), less the ending; never below zero. */
export function applyPriceEnding(valueMinor: number, ending: PricingRules['priceEnding']): number {
  const stepped = roundMinor(valueMinor / ending.stepMinor) * ending.stepMinor;
  return Math.max(0, stepped - ending.lessMinor);
}

/** Down to a whole step, so an offer never rounds up. */
export function roundOfferDown(valueMinor: number, stepMinor: number): number {
  return Math.max(0, Math.floor(valueMinor / stepMinor) * stepMinor);
}

export function roundingWords(rules: PricingRules): string {
  const c = rules.currency;
  const ending = rules.priceEnding.lessMinor ? `, less ${money(rules.priceEnding.lessMinor, c)}` : '';
  return `Each step rounds to a whole minor unit of ${c}, half away from zero; asking prices go to the nearest ${money(rules.priceEnding.stepMinor, c)}${ending}; offers go down to a whole ${money(rules.offerStepMinor, c)}.`;
}

function assertCurrency(rules: PricingRules, currency?: Currency) {
  if (currency && currency !== rules.currency) throw new Error(`the work money is in ${currency} and the pricing rules in ${rules.currency}`);
}

/** The value before the condition: the base for the kind and size, then the age factor. */
function valueBeforeCondition(piano: PricingPiano, rules: PricingRules, lines: PriceLine[]): number {
  const { band, words } = sizeBandOf(rules.baseRetail[piano.kind], piano.sizeCm);
  lines.push({ key: 'base', label: 'Base retail value', detail: `${KIND_WORDS[piano.kind]}, ${words}`, amountMinor: band.baseMinor, runningMinor: band.baseMinor });
  let factor: number;
  let detail: string;
  if (piano.ageYears == null) {
    factor = rules.unknownAgeFactor;
    detail = `Year not known: ${pct(factor)} kept`;
  } else {
    const { band: age, range } = ageBandOf(rules.ageBands, piano.ageYears);
    factor = age.factor;
    detail = `${piano.ageIsEstimate ? 'About ' : ''}${piano.ageYears} years old (${range}): ${pct(factor)} kept`;
  }
  const after = roundMinor(band.baseMinor * factor);
  lines.push({ key: 'age', label: 'Age', detail, amountMinor: after - band.baseMinor, runningMinor: after });
  return after;
}

/**
 * The suggested asking price with every step shown: the base for kind and size, the age factor, the
 * condition factor from the readiness verdict and from the work money as a share of the value, then
 * the price ending. A piano for wholesale gets a wholesale buyer's figure instead, said as such.
 */
export function askingPrice(piano: PricingPiano, condition: PricingCondition & { currency?: Currency }, rules: PricingRules): AskingPrice {
  assertCurrency(rules, condition.currency);
  const c = rules.currency;
  const lines: PriceLine[] = [];
  const value = valueBeforeCondition(piano, rules, lines);
  const common = { currency: c, provisional: condition.provisional, rulesVersion: rules.version, rounding: roundingWords(rules) };
  if (condition.readiness === 'wholesale') {
    const figure = roundMinor(value * rules.wholesale.factor);
    lines.push({ key: 'wholesale', label: 'Wholesale', detail: `For wholesale, not recommended for retail: ${pct(rules.wholesale.factor)} of the value`, amountMinor: figure - value, runningMinor: figure });
    const priceMinor = roundOfferDown(figure, rules.offerStepMinor);
    lines.push({ key: 'offerStep', label: 'Rounded', detail: `Down to a whole ${money(rules.offerStepMinor, c)}`, amountMinor: priceMinor - figure, runningMinor: priceMinor });
    return { ...common, basis: 'wholesale', priceMinor, lines, summary: `A wholesale figure, not a retail price: what a wholesale buyer would likely pay for it as it stands.` };
  }
  const readinessFactor = rules.conditionFactors[condition.readiness];
  const afterReadiness = roundMinor(value * readinessFactor);
  lines.push({ key: 'condition', label: 'Condition', detail: `${READINESS_WORDS[condition.readiness]}${condition.provisional ? ' (provisional)' : ''}: ${pct(readinessFactor)} kept`, amountMinor: afterReadiness - value, runningMinor: afterReadiness });
  const sharePct = value > 0 ? (condition.workMinor / value) * 100 : condition.workMinor > 0 ? Infinity : 0;
  const workBand = workBandOf(rules.workShareBands, sharePct);
  const afterWork = roundMinor(afterReadiness * workBand.factor);
  const shareWords = Number.isFinite(sharePct) ? `${Number(sharePct.toFixed(1))} % of the value` : 'more than the value';
  lines.push({ key: 'work', label: 'Work it needs', detail: `${money(condition.workMinor, c)} of work, ${shareWords}: ${pct(workBand.factor)} kept`, amountMinor: afterWork - afterReadiness, runningMinor: afterWork });
  const priceMinor = applyPriceEnding(afterWork, rules.priceEnding);
  const less = rules.priceEnding.lessMinor ? `, less ${money(rules.priceEnding.lessMinor, c)}` : '';
  lines.push({ key: 'ending', label: 'Price ending', detail: `To the nearest ${money(rules.priceEnding.stepMinor, c)}${less}`, amountMinor: priceMinor - afterWork, runningMinor: priceMinor });
  return { ...common, basis: 'retail', priceMinor, lines, summary: 'A retail asking price for the piano once the work is done.' };
}

/**
 * The trade-in offer, worked back from the expected asking price: less the reconditioning estimate, the
 * target margin on that price and the holding cost while it waits to sell; never below zero, and down to
 * the offer step. A piano for wholesale is offered from its wholesale figure, with no work counted.
 */
export function tradeInOffer(piano: PricingPiano, condition: PricingCondition & { currency?: Currency }, reconEstimateMinor: number, rules: PricingRules): TradeInOffer {
  const asking = askingPrice(piano, condition, rules);
  const c = rules.currency;
  const wholesale = asking.basis === 'wholesale';
  const expected = asking.priceMinor;
  const lines: PriceLine[] = [
    { key: 'asking', label: wholesale ? 'Wholesale figure' : 'Expected asking price', detail: wholesale ? 'What a wholesale buyer would likely pay' : 'The suggested asking price once the work is done', amountMinor: expected, runningMinor: expected },
  ];
  let running = expected;
  const take = (key: PriceLine['key'], label: string, detail: string, amount: number) => {
    running -= amount;
    lines.push({ key, label, detail, amountMinor: -amount, runningMinor: running });
  };
  if (!wholesale) take('recon', 'Reconditioning estimate', 'The work the piano needs before it can be sold', Math.max(0, reconEstimateMinor));
  take('margin', 'Target margin', `${pct(rules.targetMargin)} of the ${wholesale ? 'wholesale figure' : 'asking price'}`, roundMinor(expected * rules.targetMargin));
  const days = wholesale ? rules.wholesale.daysToSell : rules.daysToSell[piano.kind];
  take('holding', 'Holding cost', `${money(rules.holdingCostPerDayMinor, c)} a day for ${days} days until it sells`, rules.holdingCostPerDayMinor * days);
  if (running < 0) {
    lines.push({ key: 'floor', label: 'Never below zero', detail: 'The costs are more than the piano would fetch: nothing is offered', amountMinor: -running, runningMinor: 0 });
    running = 0;
  }
  const offerMinor = roundOfferDown(running, rules.offerStepMinor);
  if (offerMinor !== running) lines.push({ key: 'offerStep', label: 'Rounded', detail: `Down to a whole ${money(rules.offerStepMinor, c)}`, amountMinor: offerMinor - running, runningMinor: offerMinor });
  const notes: string[] = [];
  if (condition.provisional) notes.push('Provisional: the inspection did not cover enough areas, so the offer may change once the rest is inspected.');
  if (wholesale) notes.push('Not recommended for retail: this is a wholesale offer, for a piano the dealer will sell on as it stands.');
  if (offerMinor === 0) notes.push('The piano would not cover its costs: there is no offer to make for it.');
  return {
    basis: asking.basis,
    currency: c,
    offerMinor,
    expectedPriceMinor: expected,
    provisional: condition.provisional,
    rulesVersion: rules.version,
    lines,
    rounding: asking.rounding,
    summary: wholesale ? 'A wholesale offer' : 'A trade-in offer',
    notes,
  };
}
