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

export const OVERRUNS_QUERY = 'query WorkshopOverruns($limit: Int, $offset: Int) { workshopOverruns(limit: $limit, offset: $offset) }';
export const OVERRUNS_PAGE = 50;

/** Pianos whose workshop items cost more than their estimates, worst first, a page at a time. */
export function useOverruns(offset = 0) {
  const [result] = useQuery<{ workshopOverruns: { total: number; overruns: Overrun[] } }>({
    query: OVERRUNS_QUERY,
    variables: { limit: OVERRUNS_PAGE, offset },
    context: SHOP_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  const page = result.data?.workshopOverruns;
  return { overruns: page?.overruns ?? null, total: page?.total ?? 0, fetching: result.fetching, error: result.error };
}
