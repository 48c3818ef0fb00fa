import { useCallback } from 'react';
import { useClient, useQuery } from 'urql';

import type { MutationData } from '@/modules/accounts/ui/use-guarded-mutation';
import type { AddPartMutation, AddWorkNoteMutation, CorrectTimeEntryMutation, LogTimeMutation, SetWorkItemDoneMutation, StartTimerMutation, StopTimerMutation, WorkItemDetailQuery, WorkItemDetailQueryVariables } from '@/modules/api/ui/graphql-types';

import { SHOP_CONTEXT, useShopMutation } from './use-shop-mutation';

export const WORK_ITEM_QUERY = /* GraphQL */ `
  query WorkItemDetail($itemId: Int!) {
    workItemDetail(itemId: $itemId) {
      id pianoId task title status doneReason priority dueOn assignedToId assignedTo because quantity estimatedHours estimatedCostMinor loggedMinutes partsMinor actualCostMinor timerRunningFor cautions { kind text }
      currency
      entries { id workItemId technicianId startedAt endedAt minutes note corrections { by byId at oldMinutes newMinutes why } }
      parts { id workItemId description quantity costMinor loggedById createdAt }
      notes { id workItemId authorId body createdAt }
    }
  }
`;

export type WorkItemDetail = WorkItemDetailQuery['workItemDetail'];
export type TimeEntryView = Pick<WorkItemDetail['entries'][number], 'id' | 'technicianId' | 'startedAt' | 'endedAt' | 'minutes' | 'note'> & Partial<Pick<WorkItemDetail['entries'][number], 'corrections'>>;
export type TimeCorrectionView = WorkItemDetail['entries'][number]['corrections'][number];
export type PartView = WorkItemDetail['parts'][number];
export type NoteView = WorkItemDetail['notes'][number];

export function useWorkItem(itemId: number | null) {
  const [result] = useQuery<WorkItemDetailQuery, WorkItemDetailQueryVariables>({
    query: WORK_ITEM_QUERY,
    variables: { itemId: itemId ?? 0 },
    pause: itemId == null,
    context: SHOP_CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  const client = useClient();
  // A promise, so a command can say "done" only once the page shows the new state.
  const refresh = useCallback(async () => {
    if (itemId == null) return;
    await client.query(WORK_ITEM_QUERY, { itemId }, { ...SHOP_CONTEXT, requestPolicy: 'network-only' }).toPromise();
  }, [client, itemId]);
  return { item: result.data?.workItemDetail ?? null, fetching: result.fetching, error: result.error, refresh };
}

/** A timer entry still running: started, neither stopped nor given minutes. */
export const isRunning = (e: TimeEntryView) => !e.endedAt && e.minutes == null;

/** Minutes an entry counts for, a running one up to `now`. */
export function entryMinutes(e: TimeEntryView, now: number): number {
  if (e.minutes != null) return e.minutes;
  const end = e.endedAt ? Date.parse(e.endedAt) : now;
  return Math.max(0, Math.round((end - Date.parse(e.startedAt)) / 60000));
}

export function useBenchCommands() {
  const start = useShopMutation<MutationData<StartTimerMutation>, { itemId: number }>(
    /* GraphQL */ `
      mutation StartTimer($itemId: Int!) {
        startTimer(itemId: $itemId) { id technicianId startedAt endedAt minutes note }
      }
    `,
    'startTimer',
  );
  const stop = useShopMutation<MutationData<StopTimerMutation>, { itemId: number }>(
    /* GraphQL */ `
      mutation StopTimer($itemId: Int!) {
        stopTimer(itemId: $itemId) { id technicianId startedAt endedAt minutes note }
      }
    `,
    'stopTimer',
  );
  const logTime = useShopMutation<MutationData<LogTimeMutation>, { e: { workItemId: number; minutes: number; note: string | null } }>(
    /* GraphQL */ `
      mutation LogTime($e: TimeEntryInput!) {
        logTime(entry: $e) { id technicianId startedAt endedAt minutes note }
      }
    `,
    'logTime',
  );
  const addPart = useShopMutation<MutationData<AddPartMutation>, { p: { workItemId: number; description: string; quantity: number; costMinor: number } }>(
    /* GraphQL */ `
      mutation AddPart($p: PartUseInput!) {
        addPart(part: $p) { id description quantity costMinor }
      }
    `,
    'addPart',
  );
  const addNote = useShopMutation<MutationData<AddWorkNoteMutation>, { itemId: number; body: string }>(
    /* GraphQL */ `
      mutation AddWorkNote($itemId: Int!, $body: String!) {
        addWorkNote(itemId: $itemId, body: $body) { id authorId body createdAt }
      }
    `,
    'addWorkNote',
  );
  const setDone = useShopMutation<MutationData<SetWorkItemDoneMutation>, { itemId: number; done: boolean; reason?: string | null }>(
    /* GraphQL */ `
      mutation SetWorkItemDone($itemId: Int!, $done: Boolean!, $reason: String) {
        setWorkItemDone(itemId: $itemId, done: $done, reason: $reason) { id status }
      }
    `,
    'setWorkItemDone',
  );
  const correctTime = useShopMutation<MutationData<CorrectTimeEntryMutation>, { c: { timeEntryId: number; minutes: number; why: string } }>(
    /* GraphQL */ `
      mutation CorrectTimeEntry($c: TimeCorrectionInput!) {
        correctTimeEntry(correction: $c) { id technicianId startedAt endedAt minutes note }
      }
    `,
    'correctTimeEntry',
  );
  return { start, stop, logTime, addPart, addNote, setDone, correctTime };
}
