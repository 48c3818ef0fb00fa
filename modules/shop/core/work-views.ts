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
