// What the server answers about a workshop item, and the screens read: one shape for both sides.
export interface WorkItemView {
  id: number;
  pianoId: number;
  task: string;
  title: string;
  status: 'planned' | 'in_progress' | 'done';
  /** marked done with no time logged: the reason given */
  doneReason: string | null;
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
  /** Who has a timer running on the item right now. */
  timerRunningFor: number[];
  cautions: { kind: string; text: string }[];
}

/** An item on the bench, with the piano it belongs to. */
export interface QueueItem extends WorkItemView {
  stockNumber: string;
  piano: string;
}

/** Which open items the bench lists: the technician's own, those nobody has taken, or every one (managers). */
export const QUEUE_SCOPES = ['mine', 'unassigned', 'all'] as const;
export type QueueScope = (typeof QUEUE_SCOPES)[number];
/** Items the bench shows at a time. */
export const QUEUE_PAGE = 30;

/** One page of the bench: its items, how many each scope holds, and the timer the reader has running. */
export interface QueuePage {
  scope: QueueScope;
  total: number;
  counts: Record<QueueScope, number>;
  items: QueueItem[];
  running: { id: number; title: string; stockNumber: string } | null;
}
