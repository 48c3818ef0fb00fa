import { useCallback } from 'react';
import { useQuery } from 'urql';

import type { MutationData } from '@/modules/accounts/ui/use-guarded-mutation';
import { withFragments } from '@/modules/api/ui/document';
import type { AddWorkItemMutation, DecidePianoMutation, SubmitRemeasurementMutation, UpdateWorkItemMutation, WorkPlanQuery, WorkPlanQueryVariables } from '@/modules/api/ui/graphql-types';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { GRADE_PARTS } from '@/modules/assessment/ui/grade-fragment';
import type { Decision } from '@/modules/shop/core/work-input';

import { SHOP_CONTEXT, useShopMutation } from './use-shop-mutation';

export const WORK_PLAN_QUERY = /* GraphQL */ `
  query WorkPlan($pianoId: Int!) {
    workPlan(pianoId: $pianoId) {
      planId pianoId currency hourlyRateMinor rateCardVersion approvedAt
      items { id pianoId task title status doneReason priority dueOn assignedToId assignedTo because quantity estimatedHours estimatedCostMinor loggedMinutes partsMinor actualCostMinor timerRunningFor cautions { kind text } }
      totals { estimatedHours loggedHours estimatedCostMinor actualCostMinor varianceMinor }
      byTask { task estimatedHours loggedHours estimatedCostMinor actualCostMinor varianceMinor }
    }
  }
`;

export type WorkPlanView = NonNullable<WorkPlanQuery['workPlan']>;
export type CostLine = WorkPlanView['totals'];

export function useWorkPlan(pianoId: number | null) {
  const [result, reexecute] = useQuery<WorkPlanQuery, WorkPlanQueryVariables>({
    query: WORK_PLAN_QUERY,
    variables: { pianoId: pianoId ?? 0 },
    pause: pianoId == null,
    context: SHOP_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { plan: result.data?.workPlan ?? null, loaded: result.data !== undefined, fetching: result.fetching, error: result.error, refresh };
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
  const decide = useShopMutation<MutationData<DecidePianoMutation>, { pianoId: number; decision: Decision; why: string | null }>(
    /* GraphQL */ `
      mutation DecidePiano($pianoId: Int!, $decision: String!, $why: String) {
        decidePiano(pianoId: $pianoId, decision: $decision, why: $why) { stage planId }
      }
    `,
    'decidePiano',
  );
  const addItem = useShopMutation<MutationData<AddWorkItemMutation>, { pianoId: number; item: ItemInput }>(
    /* GraphQL */ `
      mutation AddWorkItem($pianoId: Int!, $item: WorkItemInput!) {
        addWorkItem(pianoId: $pianoId, item: $item) { id status }
      }
    `,
    'addWorkItem',
  );
  const updateItem = useShopMutation<MutationData<UpdateWorkItemMutation>, { itemId: number; p: ItemPatch }>(
    /* GraphQL */ `
      mutation UpdateWorkItem($itemId: Int!, $p: WorkItemPatch!) {
        updateWorkItem(itemId: $itemId, patch: $p) { id status }
      }
    `,
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
  const remeasure = useShopMutation<MutationData<SubmitRemeasurementMutation>, { i: { pianoId: number; measurements: Partial<Measurements>; changeNote: string | null } }>(
    withFragments(
      /* GraphQL */ `
        mutation SubmitRemeasurement($i: RemeasureInput!) {
          submitRemeasurement(input: $i) { version grade { ...GradeParts } }
        }
      `,
      GRADE_PARTS,
    ),
    'submitRemeasurement',
  );
  return { decide, addItem, updateItem, removeItem, approve, finish, remeasure };
}
