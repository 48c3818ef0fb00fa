import type { Knex } from 'knex';

import { can } from '@/modules/accounts/core/roles';
import { User } from '@/modules/accounts/server/user-model';
import type { Actor } from '@/modules/accounts/server/user-service';
import { Intake } from '@/modules/assessment/server/assessment-models';
import { latestGradedAssessment } from '@/modules/assessment/server/assessment-service';
import { Piano } from '@/modules/pianos/server/piano-model';
import { offerAnswerInput, priceChangeInput, type OfferAnswer } from '@/modules/pricing/core/offer-input';
import { askingPrice, pricingPiano, tradeInOffer, type AskingPrice, type TradeInOffer } from '@/modules/pricing/core/pricing';
import { demoPricingRules, pricingRulesInput, withPricingVersion, type PricingRules } from '@/modules/pricing/core/pricing-rules';
import { conditionReport } from '@/modules/shop/core/condition-report';
import { formatMoney, type Currency } from '@/modules/shop/core/money';
import { WorkItem, WorkPlan } from '@/modules/shop/server/shop-models';
import { currentRateCard } from '@/modules/shop/server/shop-service';
import type { Clock } from '@/server/clock';
import { nextVersion } from '@/server/db/versions';
import { AppError, notAllowed, notFound } from '@/server/errors';

import { PriceChange, PricingRuleSet, TradeInAnswer } from './pricing-models';

export interface PricingDeps {
  clock: Clock;
}

export async function currentPricingRules(trx?: Knex.Transaction): Promise<PricingRules> {
  const latest = await PricingRuleSet.query(trx).orderBy('id', 'desc').first();
  return latest ? { ...latest.rules, version: latest.version } : demoPricingRules;
}

export async function readPricingRules(actor: Actor): Promise<PricingRules> {
  if (!can(actor.role, 'setPricingRules')) throw notAllowed('see the pricing rules');
  return currentPricingRules();
}

export async function setPricingRules(actor: Actor, raw: unknown): Promise<PricingRules> {
  if (!can(actor.role, 'setPricingRules')) throw notAllowed('change the pricing rules');
  const input = pricingRulesInput.parse(raw);
  return PricingRuleSet.transaction(async (trx) => {
    const rules = withPricingVersion(input, await nextVersion(trx, PricingRuleSet.tableName, 'pricing'));
    await PricingRuleSet.query(trx).insert({ version: rules.version, rules, createdById: actor.id });
    return rules;
  });
}

/** Why a piano has no offer: not inspected yet, or taken on consignment (the dealer does not buy it). */
export type OfferStatus = 'offer' | 'not_assessed' | 'consignment';

export interface PianoOffer {
  pianoId: number;
  status: OfferStatus;
  offer: (TradeInOffer & { reconEstimateMinor: number; reconSource: 'plan' | 'condition'; assessmentId: number; assessmentVersion: number; rateCardVersion: string }) | null;
  /** the suggested asking price the offer is worked back from */
  asking: AskingPrice | null;
}

/** The reconditioning estimate: the work plan's items once there is a plan, else the condition report's work money. */
async function reconEstimate(trx: Knex.Transaction | undefined, pianoId: number, conditionMinor: number): Promise<{ minor: number; source: 'plan' | 'condition'; currency: string | null }> {
  const plan = await WorkPlan.query(trx).findOne({ piano_id: pianoId });
  if (!plan) return { minor: conditionMinor, source: 'condition', currency: null };
  const row = (await WorkItem.query(trx)
    .where('plan_id', plan.id)
    .select(WorkItem.knex().raw('coalesce(sum(round(estimated_hours * ?) + estimated_parts_minor), 0)::int as minor', [plan.hourlyRateMinor]))
    .first()) as unknown as { minor: number };
  return { minor: row.minor, source: 'plan', currency: plan.currency };
}

function sameCurrency(what: string, a: string, rules: PricingRules) {
  if (a !== rules.currency) throw new AppError('CONFLICT', `The ${what} is in ${a} and the pricing rules in ${rules.currency}: set both in one currency to price pianos.`);
}

/** Works out the offer and the suggested asking price of a piano from its newest assessment, today's rules and rate card. */
async function priceFacts(pianoId: number, now: Date, trx?: Knex.Transaction): Promise<PianoOffer> {
  const piano = await Piano.query(trx).findById(pianoId);
  if (!piano) throw notFound(`piano ${pianoId}`);
  const latest = await latestGradedAssessment(pianoId, trx);
  if (!latest) return { pianoId, status: 'not_assessed', offer: null, asking: null };
  const [rules, card, intake] = [await currentPricingRules(trx), await currentRateCard(trx), await Intake.query(trx).findOne({ piano_id: pianoId })];
  sameCurrency('rate card', card.currency, rules);
  const report = conditionReport(latest.grade, card);
  const recon = await reconEstimate(trx, pianoId, report.workMinor);
  if (recon.currency) sameCurrency('work plan', recon.currency, rules);
  const facts = pricingPiano(piano, now.getUTCFullYear());
  const asking = askingPrice(facts, report, rules);
  if (intake?.acquisition === 'consignment') return { pianoId, status: 'consignment', offer: null, asking };
  const offer = tradeInOffer(facts, report, recon.minor, rules);
  return {
    pianoId,
    status: 'offer',
    asking,
    offer: { ...offer, reconEstimateMinor: recon.minor, reconSource: recon.source, assessmentId: latest.id, assessmentVersion: latest.version, rateCardVersion: card.version },
  };
}

export async function offerFor(deps: PricingDeps, actor: Actor, pianoId: number): Promise<PianoOffer> {
  if (!can(actor.role, 'readOffers')) throw notAllowed('see trade-in offers');
  return priceFacts(pianoId, deps.clock.now());
}

export async function suggestedPrice(deps: PricingDeps, actor: Actor, pianoId: number): Promise<AskingPrice | null> {
  if (!can(actor.role, 'setPrices')) throw notAllowed('see suggested asking prices');
  return (await priceFacts(pianoId, deps.clock.now())).asking;
}

export interface AnswerView {
  id: number;
  answer: OfferAnswer;
  offerMinor: number;
  counterMinor: number | null;
  agreedMinor: number | null;
  currency: string;
  basis: string;
  provisional: boolean;
  pricingRulesVersion: string;
  note: string | null;
  recordedBy: string;
  recordedAt: string;
}

const answerView = (a: TradeInAnswer & { recordedByName?: string }): AnswerView => ({
  id: a.id,
  answer: a.answer,
  offerMinor: a.offerMinor,
  counterMinor: a.counterMinor,
  agreedMinor: a.answer === 'agreed' ? a.allowanceMinor : null,
  currency: a.currency,
  basis: a.basis,
  provisional: a.provisional,
  pricingRulesVersion: a.pricingRulesVersion,
  note: a.note,
  recordedBy: a.recordedByName ?? 'Unknown',
  recordedAt: new Date(a.recordedAt).toISOString(),
});

export const MAX_ANSWERS_LISTED = 50;

/** The seller's answers to offers on a piano, oldest first (the newest 50). */
export async function offerAnswers(actor: Actor, pianoId: number): Promise<AnswerView[]> {
  if (!can(actor.role, 'readOffers')) throw notAllowed('see trade-in offers');
  const rows = (await TradeInAnswer.query()
    .where('trade_in_answers.piano_id', pianoId)
    .leftJoin('users', 'users.id', 'trade_in_answers.recorded_by_id')
    .select('trade_in_answers.*', 'users.name as recorded_by_name')
    .orderBy([{ column: 'trade_in_answers.recorded_at', order: 'desc' }, { column: 'trade_in_answers.id', order: 'desc' }])
    .limit(MAX_ANSWERS_LISTED)) as (TradeInAnswer & { recordedByName: string })[];
  return rows.reverse().map(answerView);
}

/**
 * Records what the seller said to the offer on screen. The offer is worked out again inside the
 * transaction and must be the one the screen showed, so nobody records an answer to an old figure.
 */
export async function recordOfferAnswer(deps: PricingDeps, actor: Actor, raw: unknown): Promise<AnswerView> {
  if (!can(actor.role, 'answerOffers')) throw notAllowed('record a seller’s answer to an offer');
  const input = offerAnswerInput.parse(raw);
  return Piano.transaction(async (trx) => {
    const piano = await Piano.query(trx).findById(input.pianoId).forUpdate();
    if (!piano) throw notFound(`piano ${input.pianoId}`);
    const facts = await priceFacts(piano.id, deps.clock.now(), trx);
    if (facts.status === 'not_assessed') throw new AppError('CONFLICT', `${piano.stockNumber} has no assessment yet, so there is no offer to answer.`);
    if (facts.status === 'consignment') throw new AppError('CONFLICT', `${piano.stockNumber} was taken on consignment: the dealer does not buy it, so there is no offer to answer.`);
    const offer = facts.offer!;
    if (offer.offerMinor !== input.offeredMinor) {
      throw new AppError('CONFLICT', `The offer is now ${formatMoney(offer.offerMinor, offer.currency)}, not ${formatMoney(input.offeredMinor, offer.currency)}: the assessment, the work plan or the rules changed. Show the seller the new offer first.`, 'offeredMinor');
    }
    const allowance = input.answer === 'accepted' ? offer.offerMinor : input.answer === 'agreed' ? input.agreedMinor! : null;
    const row = await TradeInAnswer.query(trx).insertAndFetch({
      pianoId: piano.id,
      assessmentId: offer.assessmentId,
      pricingRulesVersion: offer.rulesVersion,
      rateCardVersion: offer.rateCardVersion,
      currency: offer.currency,
      basis: offer.basis,
      provisional: offer.provisional,
      offerMinor: offer.offerMinor,
      lines: offer.lines,
      answer: input.answer,
      counterMinor: input.answer === 'countered' ? input.counterMinor! : null,
      allowanceMinor: allowance,
      note: input.note ?? null,
      recordedById: actor.id,
      recordedAt: deps.clock.now().toISOString(),
    });
    const user = await User.query(trx).findById(actor.id);
    return answerView(Object.assign(row, { recordedByName: user?.name }));
  });
}

export interface PriceChangeView {
  id: number;
  pianoId: number;
  fromMinor: number | null;
  toMinor: number;
  currency: string;
  suggestedMinor: number | null;
  pricingRulesVersion: string | null;
  reason: string;
  changedBy: string | null;
  changedAt: string;
}

type NamedChange = PriceChange & { changedByName: string | null };
const namedChanges = (trx?: Knex.Transaction) => PriceChange.query(trx).leftJoin('users', 'users.id', 'price_changes.changed_by_id').select('price_changes.*', 'users.name as changed_by_name');

const changeView = (c: PriceChange & { changedByName?: string | null }): PriceChangeView => ({
  id: c.id,
  pianoId: c.pianoId,
  fromMinor: c.fromMinor,
  toMinor: c.toMinor,
  currency: c.currency,
  suggestedMinor: c.suggestedMinor,
  pricingRulesVersion: c.pricingRulesVersion,
  reason: c.reason,
  changedBy: c.changedByName ?? null,
  changedAt: new Date(c.changedAt).toISOString(),
});

/**
 * The one path that sets a piano's asking price: the piano row and its history change in one
 * transaction, with who, when, from what, to what, why, and the suggestion in force then.
 * Setting the price it already has changes nothing.
 */
export async function changeAskingPrice(deps: PricingDeps, actor: Actor, raw: unknown): Promise<{ piano: Piano; change: PriceChangeView }> {
  if (!can(actor.role, 'setPrices')) throw notAllowed('set prices');
  const input = priceChangeInput.parse(raw);
  return Piano.transaction(async (trx) => {
    const piano = await Piano.query(trx).findById(input.pianoId).forUpdate();
    if (!piano) throw notFound(`piano ${input.pianoId}`);
    if (piano.askingPriceMinor === input.askingPriceMinor && piano.priceCurrency === input.currency) {
      const last = await namedChanges(trx).where('price_changes.piano_id', piano.id).orderBy('price_changes.id', 'desc').first();
      if (last) return { piano, change: changeView(last as NamedChange) };
    }
    let suggestion: AskingPrice | null = null;
    try {
      suggestion = (await priceFacts(piano.id, deps.clock.now(), trx)).asking;
    } catch (err) {
      // A price may be set by hand when no suggestion can be made (rules in another currency).
      if (!(err instanceof AppError)) throw err;
    }
    const fromMinor = piano.askingPriceMinor;
    const updated = await piano.$query(trx).patchAndFetch({ askingPriceMinor: input.askingPriceMinor, priceCurrency: input.currency });
    const inserted = await PriceChange.query(trx).insertAndFetch({
      pianoId: piano.id,
      fromMinor,
      toMinor: input.askingPriceMinor,
      currency: input.currency,
      suggestedMinor: suggestion && suggestion.currency === (input.currency as Currency) ? suggestion.priceMinor : null,
      pricingRulesVersion: suggestion?.rulesVersion ?? null,
      reason: input.reason,
      changedById: actor.id,
      changedAt: deps.clock.now().toISOString(),
    });
    const user = await User.query(trx).findById(actor.id);
    return { piano: updated, change: changeView(Object.assign(inserted, { changedByName: user?.name ?? null })) };
  });
}

export const MAX_PRICE_CHANGES_LISTED = 50;

/** A piano's price changes, newest first (the newest 50). */
export async function priceHistory(actor: Actor, pianoId: number): Promise<PriceChangeView[]> {
  if (!can(actor.role, 'setPrices')) throw notAllowed('see price history');
  const rows = await namedChanges()
    .where('price_changes.piano_id', pianoId)
    .orderBy([{ column: 'price_changes.changed_at', order: 'desc' }, { column: 'price_changes.id', order: 'desc' }])
    .limit(MAX_PRICE_CHANGES_LISTED);
  return (rows as NamedChange[]).map(changeView);
}
