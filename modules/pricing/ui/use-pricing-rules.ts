import { useQuery } from 'urql';

import type { PricingRules } from '@/modules/pricing/core/pricing-rules';

import { PRICING_CONTEXT, usePricingMutation } from './use-pricing-mutation';

const FIELDS = 'currency baseRetail { upright { upToCm baseMinor } grand { upToCm baseMinor } } ageBands { upToYears factor } unknownAgeFactor conditionFactors { floor work_first unjudged } workShareBands { upToPct factor } targetMargin holdingCostPerDayMinor daysToSell { upright grand } priceEnding { stepMinor lessMinor } offerStepMinor wholesale { factor daysToSell }';
export const PRICING_RULES_QUERY = `query PricingRules { pricingRules { version ${FIELDS} } }`;

export function usePricingRules() {
  const [result] = useQuery<{ pricingRules: PricingRules }>({ query: PRICING_RULES_QUERY, context: PRICING_CONTEXT, requestPolicy: 'cache-and-network' });
  return { rules: result.data?.pricingRules ?? null, error: result.error };
}

export function useSavePricingRules() {
  return usePricingMutation<PricingRules, { r: Omit<PricingRules, 'version'> }>(`mutation SetPricingRules($r: PricingRulesInput!) { setPricingRules(rules: $r) { version ${FIELDS} } }`, 'setPricingRules');
}
