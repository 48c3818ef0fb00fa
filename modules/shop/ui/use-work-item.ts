import { useCallback } from 'react';
import { useClient, useQuery } from 'urql';

import { SHOP_CONTEXT, useShopMutation } from './use-shop-mutation';
import type { WorkItemView } from './use-work-queue';

export interface TimeCorrectionView {
  by: string;
  byId: number;
  at: string;
  oldMinutes: number;
  newMinutes: number;
  why: string;
}

export interface TimeEntryView {
  id: number;
  technicianId: number;
  startedAt: string;
  endedAt: string | null;
  minutes: number | null;
  note: string | null;
  /** every correction of the entry, oldest first */
  corrections?: TimeCorrectionView[];
}

export interface PartView {
  id: number;
  description: string;
  quantity: number;
  costMinor: number;
}

export interface NoteView {
  id: number;
  authorId: number;
  body: string;
  createdAt: string;
}

export interface WorkItemDetail extends WorkItemView {
  currency: string;
  entries: TimeEntryView[];
  parts: PartView[];
  notes: NoteView[];
}

export const WORK_ITEM_QUERY = 'query WorkItemDetail($itemId: Int!) { workItemDetail(itemId: $itemId) }';

export function useWorkItem(itemId: number | null) {
  const [result] = useQuery<{ workItemDetail: WorkItemDetail }>({
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
  const start = useShopMutation<TimeEntryView, { itemId: number }>('mutation StartTimer($itemId: Int!) { startTimer(itemId: $itemId) }', 'startTimer');
  const stop = useShopMutation<TimeEntryView, { itemId: number }>('mutation StopTimer($itemId: Int!) { stopTimer(itemId: $itemId) }', 'stopTimer');
  const logTime = useShopMutation<TimeEntryView, { e: { workItemId: number; minutes: number; note: string | null } }>(
    'mutation LogTime($e: JSON!) { logTime(entry: $e) }',
    'logTime',
  );
  const addPart = useShopMutation<PartView, { p: { workItemId: number; description: string; quantity: number; costMinor: number } }>(
    'mutation AddPart($p: JSON!) { addPart(part: $p) }',
    'addPart',
  );
  const addNote = useShopMutation<NoteView, { itemId: number; body: string }>('mutation AddWorkNote($itemId: Int!, $body: String!) { addWorkNote(itemId: $itemId, body: $body) }', 'addWorkNote');
  const setDone = useShopMutation<WorkItemView, { itemId: number; done: boolean; reason?: string | null }>(
    'mutation SetWorkItemDone($itemId: Int!, $done: Boolean!, $reason: String) { setWorkItemDone(itemId: $itemId, done: $done, reason: $reason) }',
    'setWorkItemDone',
  );
  const correctTime = useShopMutation<TimeEntryView, { c: { timeEntryId: number; minutes: number; why: string } }>(
    'mutation CorrectTimeEntry($c: JSON!) { correctTimeEntry(correction: $c) }',
    'correctTimeEntry',
  );
  return { start, stop, logTime, addPart, addNote, setDone, correctTime };
}
