import { useCallback } from 'react';
import { useQuery } from 'urql';

import { SHOP_CONTEXT, useShopMutation } from './use-shop-mutation';

export interface ClimateReadingView {
  id: number;
  tempC: number;
  relativeHumidity: number;
  emcPct: number;
  at: string;
  warning: string | null;
}

export const CLIMATE_QUERY = 'query ClimateReadings { climateReadings }';

/** The workshop's recent readings, newest first, with the wood's moisture content and any warning. */
export function useClimateReadings() {
  const [result, reexecute] = useQuery<{ climateReadings: ClimateReadingView[] }>({ query: CLIMATE_QUERY, context: SHOP_CONTEXT, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { readings: result.data?.climateReadings ?? null, error: result.error, refresh };
}

export function useLogClimate() {
  return useShopMutation<ClimateReadingView, { r: { tempC: number; relativeHumidity: number } }>('mutation LogClimate($r: JSON!) { logClimate(reading: $r) }', 'logClimate');
}
