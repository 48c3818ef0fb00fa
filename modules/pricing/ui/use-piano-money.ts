import { useQuery } from 'urql';

import type { OfferAnswer } from '@/modules/pricing/core/offer-input';
import type { PriceLine } from '@/modules/pricing/core/pricing';

import { PRICING_CONTEXT, usePricingMutation } from './use-pricing-mutation';

const LINE = 'lines { key label detail amountMinor runningMinor }';
export const OFFER_QUERY = `query PianoOffer($pianoId: Int!) { pianoMoney(pianoId: $pianoId) { pianoId offer { status offer { basis currency offerMinor expectedPriceMinor provisional rulesVersion reconEstimateMinor reconSource assessmentVersion ${LINE} rounding summary notes } } answers { id answer offerMinor counterMinor agreedMinor currency note recordedBy recordedAt } } }`;
export const PRICE_QUERY = `query PianoPrice($pianoId: Int!) { pianoMoney(pianoId: $pianoId) { pianoId askingPriceMinor priceCurrency suggestedPrice { basis currency priceMinor provisional rulesVersion ${LINE} rounding summary } priceHistory { id fromMinor toMinor currency suggestedMinor reason changedBy changedAt } costCurrency mixedCurrencies allowanceMinor reconEstimateMinor labourMinor partsMinor reconActualMinor costBasisMinor marginMinor } }`;

export interface OfferView {
  basis: 'retail' | 'wholesale';
  currency: string;
  offerMinor: number;
  expectedPriceMinor: number;
  provisional: boolean;
  rulesVersion: string;
  reconEstimateMinor: number;
  reconSource: 'plan' | 'condition';
  assessmentVersion: number;
  lines: PriceLine[];
  rounding: string;
  summary: string;
  notes: string[];
}
export interface AnswerView {
  id: number;
  answer: OfferAnswer;
  offerMinor: number;
  counterMinor: number | null;
  agreedMinor: number | null;
  currency: string;
  note: string | null;
  recordedBy: string;
  recordedAt: string;
}
export interface PriceChangeView {
  id: number;
  fromMinor: number | null;
  toMinor: number;
  currency: string;
  suggestedMinor: number | null;
  reason: string;
  changedBy: string | null;
  changedAt: string;
}
export interface PriceMoney {
  pianoId: number;
  askingPriceMinor: number | null;
  priceCurrency: string | null;
  suggestedPrice: { basis: 'retail' | 'wholesale'; currency: string; priceMinor: number; provisional: boolean; rulesVersion: string; lines: PriceLine[]; rounding: string; summary: string } | null;
  priceHistory: PriceChangeView[] | null;
  costCurrency: string | null;
  mixedCurrencies: boolean | null;
  allowanceMinor: number | null;
  reconEstimateMinor: number | null;
  labourMinor: number | null;
  partsMinor: number | null;
  reconActualMinor: number | null;
  costBasisMinor: number | null;
  marginMinor: number | null;
}

/** The trade-in offer of a piano and the seller's answers so far (intake staff and managers). */
export function usePianoOffer(pianoId: number, pause = false) {
  const [result] = useQuery<{ pianoMoney: { offer: { status: 'offer' | 'not_assessed' | 'consignment'; offer: OfferView | null } | null; answers: AnswerView[] | null } | null }>({
    query: OFFER_QUERY,
    variables: { pianoId },
    pause,
    context: PRICING_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  return { money: result.data?.pianoMoney ?? null, error: result.error };
}

/** The asking price, its suggestion and history, and the costs (managers). */
export function usePianoPrice(pianoId: number, pause = false) {
  const [result] = useQuery<{ pianoMoney: PriceMoney | null }>({ query: PRICE_QUERY, variables: { pianoId }, pause, context: PRICING_CONTEXT, requestPolicy: 'cache-and-network' });
  return { money: result.data?.pianoMoney ?? null, error: result.error };
}

export function useRecordAnswer() {
  return usePricingMutation<AnswerView, { i: { pianoId: number; answer: OfferAnswer; offeredMinor: number; counterMinor?: number | null; agreedMinor?: number | null; note?: string | null } }>(
    'mutation RecordOfferAnswer($i: OfferAnswerInput!) { recordOfferAnswer(input: $i) { id answer offerMinor counterMinor agreedMinor currency note recordedBy recordedAt } }',
    'recordOfferAnswer',
  );
}

export function useChangeAskingPrice() {
  return usePricingMutation<{ pianoId: number; askingPriceMinor: number; priceCurrency: string }, { i: { pianoId: number; askingPriceMinor: number; currency: string; reason: string } }>(
    'mutation ChangeAskingPrice($i: AskingPriceChangeInput!) { changeAskingPrice(input: $i) { pianoId askingPriceMinor priceCurrency change { id } } }',
    'changeAskingPrice',
  );
}
