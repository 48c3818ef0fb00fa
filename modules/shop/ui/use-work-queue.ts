import { useCallback } from 'react';
import { useQuery } from 'urql';

import { SHOP_CONTEXT } from './use-shop-mutation';

/** One workshop item as the server describes it (the bench, the item page and the plan share it). */
export interface WorkItemView {
  id: number;
  pianoId: number;
  task: string;
  title: string;
  status: 'planned' | 'in_progress' | 'done';
  priority: number;
  dueOn: string | null;
  assignedToId: number | null;
  assignedTo: string | null;
  because: string[];
  quantity: number;
  estimatedHours: number;
  estimatedCostMinor: number;
  loggedMinutes: number;
  partsMinor: number;
  actualCostMinor: number;
  timerRunningFor: number[];
  cautions: { kind: string; text: string }[];
}

export interface QueueItem extends WorkItemView {
  stockNumber: string;
  piano: string;
}

export const WORK_QUEUE_QUERY = 'query WorkQueue { workQueue }';

/** Open items on pianos in the workshop, by priority then due date: a technician's own and the unassigned; every item for a manager. */
export function useWorkQueue() {
  const [result, reexecute] = useQuery<{ workQueue: QueueItem[] }>({ query: WORK_QUEUE_QUERY, context: SHOP_CONTEXT, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { items: result.data?.workQueue ?? null, fetching: result.fetching, error: result.error, refresh };
}
