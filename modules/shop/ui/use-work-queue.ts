import { useCallback } from 'react';
import { useQuery } from 'urql';

import type { WorkQueueQuery, WorkQueueQueryVariables } from '@/modules/api/ui/graphql-types';
import { QUEUE_PAGE, type QueueScope } from '@/modules/shop/core/work-views';

import { SHOP_CONTEXT } from './use-shop-mutation';

export type { QueueScope } from '@/modules/shop/core/work-views';

export const WORK_QUEUE_QUERY = /* GraphQL */ `
  query WorkQueue($scope: String, $limit: Int, $offset: Int) {
    workQueue(scope: $scope, limit: $limit, offset: $offset) {
      scope total counts { mine unassigned all }
      items { id pianoId task title status doneReason priority dueOn assignedToId assignedTo because quantity estimatedHours estimatedCostMinor loggedMinutes partsMinor actualCostMinor timerRunningFor cautions { kind text } stockNumber piano }
      running { id title stockNumber }
    }
  }
`;

export type QueuePage = WorkQueueQuery['workQueue'];
export type QueueItem = QueuePage['items'][number];
/** A work item as the bench and the plan show it. */
export type WorkItemView = Omit<QueueItem, 'stockNumber' | 'piano'>;

/** What the bench asks on first opening: the server picks the scope (a technician's own, a manager's all). */
export const FIRST_QUEUE_VARIABLES = { scope: null, limit: QUEUE_PAGE, offset: 0 };

/** A page of open items on pianos in the workshop, by priority then due date, in the scope asked (or the reader's usual one). */
export function useWorkQueue(scope: QueueScope | null, offset: number) {
  const [result, reexecute] = useQuery<WorkQueueQuery, WorkQueueQueryVariables>({
    query: WORK_QUEUE_QUERY,
    variables: { ...FIRST_QUEUE_VARIABLES, scope, offset },
    context: SHOP_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { page: result.data?.workQueue ?? null, fetching: result.fetching, error: result.error, refresh };
}
