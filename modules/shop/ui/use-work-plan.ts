import { useCallback } from 'react';
import { useQuery } from 'urql';

import type { Grade } from '@/modules/assessment/core/grade';
import type { Measurements } from '@/modules/assessment/core/measurements';
import type { Decision } from '@/modules/shop/core/work-input';

import { SHOP_CONTEXT, useShopMutation } from './use-shop-mutation';
import type { WorkItemView } from './use-work-queue';

export interface CostLine {
  estimatedHours: number;
  loggedHours: number;
  estimatedCostMinor: number;
  actualCostMinor: number;
  varianceMinor: number;
}

export interface WorkPlanView {
  planId: number;
  pianoId: number;
  currency: string;
  hourlyRateMinor: number;
  rateCardVersion: string;
  approvedAt: string | null;
  items: WorkItemView[];
  totals: CostLine;
  byTask: (CostLine & { task: string })[];
}

export const WORK_PLAN_QUERY = 'query WorkPlan($pianoId: Int!) { workPlan(pianoId: $pianoId) }';

export function useWorkPlan(pianoId: number | null) {
  const [result, reexecute] = useQuery<{ workPlan: WorkPlanView | null }>({
    query: WORK_PLAN_QUERY,
    variables: { pianoId: pianoId ?? 0 },
    pause: pianoId == null,
    context: SHOP_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { plan: result.data?.workPlan ?? null, loaded: result.data !== undefined, fetching: result.fetching, error: result.error, refresh };
}

export interface AssessmentVersionView {
  version: number;
  kind: 'intake' | 'correction' | 'post_workshop' | string;
  measurements: Measurements;
  grade: Grade;
  changeNote: string | null;
  submittedBy: string;
  submittedAt: string;
}

export const ASSESSMENT_HISTORY_QUERY = 'query AssessmentHistory($pianoId: Int!) { assessmentHistory(pianoId: $pianoId) }';

/** Every assessment of a piano, oldest first; the last is the one in force. */
export function useAssessmentHistory(pianoId: number | null) {
  const [result, reexecute] = useQuery<{ assessmentHistory: AssessmentVersionView[] }>({
    query: ASSESSMENT_HISTORY_QUERY,
    variables: { pianoId: pianoId ?? 0 },
    pause: pianoId == null,
    context: SHOP_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  const list = result.data?.assessmentHistory ?? null;
  return { history: list, latest: list?.length ? list[list.length - 1] : null, error: result.error, refresh };
}

export interface ItemInput {
  task: string;
  title?: string;
  estimatedHours: number;
  estimatedPartsMinor: number;
  quantity: number;
  assignedToId: number | null;
  priority: number;
  dueOn: string | null;
}

export type ItemPatch = Partial<Omit<ItemInput, 'task'>>;

export function usePlanCommands() {
  const decide = useShopMutation<{ stage: string; planId: number | null }, { pianoId: number; decision: Decision; why: string | null }>(
    'mutation DecidePiano($pianoId: Int!, $decision: String!, $why: String) { decidePiano(pianoId: $pianoId, decision: $decision, why: $why) }',
    'decidePiano',
  );
  const addItem = useShopMutation<WorkItemView, { pianoId: number; item: ItemInput }>(
    'mutation AddWorkItem($pianoId: Int!, $item: JSON!) { addWorkItem(pianoId: $pianoId, item: $item) }',
    'addWorkItem',
  );
  const updateItem = useShopMutation<WorkItemView, { itemId: number; p: ItemPatch }>(
    'mutation UpdateWorkItem($itemId: Int!, $p: JSON!) { updateWorkItem(itemId: $itemId, patch: $p) }',
    'updateWorkItem',
  );
  const removeItem = useShopMutation<boolean, { itemId: number }>('mutation RemoveWorkItem($itemId: Int!) { removeWorkItem(itemId: $itemId) }', 'removeWorkItem');
  const approve = useShopMutation<{ id: number; stage: string }, { pianoId: number; why: string | null }>(
    'mutation ApprovePlan($pianoId: Int!, $why: String) { approvePlan(pianoId: $pianoId, why: $why) { id stage } }',
    'approvePlan',
  );
  const finish = useShopMutation<{ id: number; stage: string }, { pianoId: number }>(
    'mutation FinishWorkshop($pianoId: Int!) { finishWorkshop(pianoId: $pianoId) { id stage } }',
    'finishWorkshop',
  );
  const remeasure = useShopMutation<{ version: number; grade: Grade }, { i: { pianoId: number; measurements: Partial<Measurements>; changeNote: string | null } }>(
    'mutation SubmitRemeasurement($i: JSON!) { submitRemeasurement(input: $i) }',
    'submitRemeasurement',
  );
  return { decide, addItem, updateItem, removeItem, approve, finish, remeasure };
}
