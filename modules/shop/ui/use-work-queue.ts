import { useCallback } from 'react';
import { useQuery } from 'urql';

import { QUEUE_PAGE, type QueuePage, type QueueScope } from '@/modules/shop/core/work-views';

import { SHOP_CONTEXT } from './use-shop-mutation';

export type { QueueItem, QueuePage, QueueScope, WorkItemView } from '@/modules/shop/core/work-views';

export const WORK_QUEUE_QUERY = 'query WorkQueue($scope: String, $limit: Int, $offset: Int) { workQueue(scope: $scope, limit: $limit, offset: $offset) }';

/** What the bench asks on first opening: the server picks the scope (a technician's own, a manager's all). */
export const FIRST_QUEUE_VARIABLES = { scope: null, limit: QUEUE_PAGE, offset: 0 };

/** A page of open items on pianos in the workshop, by priority then due date, in the scope asked (or the reader's usual one). */
export function useWorkQueue(scope: QueueScope | null, offset: number) {
  const [result, reexecute] = useQuery<{ workQueue: QueuePage }>({
    query: WORK_QUEUE_QUERY,
    variables: { ...FIRST_QUEUE_VARIABLES, scope, offset },
    context: SHOP_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { page: result.data?.workQueue ?? null, fetching: result.fetching, error: result.error, refresh };
}
