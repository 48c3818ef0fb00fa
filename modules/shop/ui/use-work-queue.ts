import { useCallback } from 'react';
import { useQuery } from 'urql';

import type { QueueItem } from '@/modules/shop/core/work-views';

import { SHOP_CONTEXT } from './use-shop-mutation';

export type { QueueItem, WorkItemView } from '@/modules/shop/core/work-views';

export const WORK_QUEUE_QUERY = 'query WorkQueue { workQueue }';

/** Open items on pianos in the workshop, by priority then due date: a technician's own and the unassigned; every item for a manager. */
export function useWorkQueue() {
  const [result, reexecute] = useQuery<{ workQueue: QueueItem[] }>({ query: WORK_QUEUE_QUERY, context: SHOP_CONTEXT, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { items: result.data?.workQueue ?? null, fetching: result.fetching, error: result.error, refresh };
}
