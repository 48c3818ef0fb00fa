import { useCallback } from 'react';
import { useQuery } from 'urql';

import type { RateCard } from '@/modules/shop/core/rate-card';

import { SHOP_CONTEXT, useShopMutation } from './use-shop-mutation';

export const RATE_CARD_QUERY = 'query RateCard { rateCard }';

export function useRateCard(pause = false) {
  const [result, reexecute] = useQuery<{ rateCard: RateCard }>({ query: RATE_CARD_QUERY, pause, context: SHOP_CONTEXT, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { card: result.data?.rateCard ?? null, error: result.error, refresh };
}

export function useSaveRateCard() {
  return useShopMutation<RateCard, { c: Omit<RateCard, 'version'> }>('mutation SetRateCard($c: JSON!) { setRateCard(card: $c) }', 'setRateCard');
}
