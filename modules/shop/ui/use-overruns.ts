import { useQuery } from 'urql';

import type { Stage } from '@/modules/pianos/core/piano';

import { SHOP_CONTEXT } from './use-shop-mutation';

export interface Overrun {
  pianoId: number;
  stockNumber: string;
  stage: Stage;
  overrunMinor: number;
  itemsOver: string[];
  estimatedCostMinor: number;
  actualCostMinor: number;
  varianceMinor: number;
  currency: string;
}

export const OVERRUNS_QUERY = 'query WorkshopOverruns { workshopOverruns }';

/** Pianos whose workshop items cost more than their estimates, worst first. */
export function useOverruns() {
  const [result] = useQuery<{ workshopOverruns: Overrun[] }>({ query: OVERRUNS_QUERY, context: SHOP_CONTEXT, requestPolicy: 'cache-and-network' });
  return { overruns: result.data?.workshopOverruns ?? null, error: result.error };
}
