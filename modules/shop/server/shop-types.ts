// The workshop's GraphQL types: plans and their items, the bench's page, an item with its time, parts
// and notes, and what the bench's commands send and answer.
import { GraphQLFloat, GraphQLInt, GraphQLString } from 'graphql';

import { QUEUE_SCOPES } from '@/modules/shop/core/work-views';
import { enumOf, float, input, int, list, nn, object, optInt, optStr, str } from '@/server/graphql/types';

import { WORK_STATUSES } from './shop-models';

const StatusType = enumOf('WorkStatus', WORK_STATUSES, 'Where a work item stands.');
export const QueueScopeType = enumOf('QueueScope', QUEUE_SCOPES, 'Which open items the bench lists.');

const CautionType = object('Caution', { kind: str, text: str }, 'A safety caution for a kind of work.');

const ITEM_FIELDS = {
  id: int,
  pianoId: int,
  task: str,
  title: str,
  status: nn(StatusType),
  doneReason: { type: GraphQLString, description: 'Marked done with no time logged: the reason given.' },
  priority: int,
  dueOn: optStr,
  assignedToId: optInt,
  assignedTo: { type: GraphQLString, description: 'By name.' },
  because: list(GraphQLString),
  quantity: int,
  estimatedHours: float,
  estimatedCostMinor: int,
  loggedMinutes: int,
  partsMinor: int,
  actualCostMinor: int,
  timerRunningFor: { type: list(GraphQLInt), description: 'Who has a timer running on the item right now.' },
  cautions: list(CautionType),
};
export const WorkItemViewType = object('WorkItemView', ITEM_FIELDS, 'A work item with its time and money so far.');

const COST = { estimatedHours: float, loggedHours: float, estimatedCostMinor: int, actualCostMinor: int, varianceMinor: int };
const CostLineType = object('CostLine', COST);
const TaskCostType = object('TaskCost', { task: str, ...COST });

export const WorkPlanType = object('WorkPlan', {
  planId: int,
  pianoId: int,
  currency: str,
  hourlyRateMinor: int,
  rateCardVersion: str,
  approvedAt: optStr,
  items: list(WorkItemViewType),
  totals: nn(CostLineType),
  byTask: list(TaskCostType),
});

const QueueItemType = object('QueueItem', { ...ITEM_FIELDS, stockNumber: str, piano: str });
const QueueCountsType = object('QueueCounts', Object.fromEntries(QUEUE_SCOPES.map((s) => [s, int])));
export const QueuePageType = object('QueuePage', {
  scope: nn(QueueScopeType),
  total: int,
  counts: nn(QueueCountsType),
  items: list(QueueItemType),
  running: { type: object('RunningTimer', { id: int, title: str, stockNumber: str }), description: 'The reader’s own running timer.' },
});

const CorrectionType = object('TimeCorrection', { by: str, byId: int, at: str, oldMinutes: int, newMinutes: int, why: str });
const ENTRY = { id: int, workItemId: int, technicianId: int, startedAt: str, endedAt: optStr, minutes: optInt, note: optStr };
export const TimeEntryType = object('TimeEntry', ENTRY);
const LoggedEntryType = object('LoggedTimeEntry', { ...ENTRY, corrections: { type: list(CorrectionType), description: 'Every correction of the entry, oldest first.' } });
export const PartUseType = object('PartUse', { id: int, workItemId: int, description: str, quantity: int, costMinor: int, loggedById: int, createdAt: str });
export const WorkNoteType = object('WorkNote', { id: int, workItemId: int, authorId: int, body: str, createdAt: str });

export const WorkItemDetailType = object('WorkItemDetail', { ...ITEM_FIELDS, currency: str, entries: list(LoggedEntryType), parts: list(PartUseType), notes: list(WorkNoteType) });

export const DecisionResultType = object('DecisionResult', { stage: str, planId: optInt });

// Inputs typed loosely where the domain's schema words the refusal better (whole numbers, dates, tasks).
const ITEM_INPUT = { title: GraphQLString, estimatedHours: GraphQLFloat, estimatedPartsMinor: GraphQLFloat, quantity: GraphQLFloat, assignedToId: GraphQLInt, priority: GraphQLFloat, dueOn: GraphQLString };
export const WorkItemInputType = input('WorkItemInput', { task: nn(GraphQLString), ...ITEM_INPUT, estimatedHours: nn(GraphQLFloat) });
export const WorkItemPatchType = input('WorkItemPatch', ITEM_INPUT);
export const TimeEntryInputType = input('TimeEntryInput', { workItemId: nn(GraphQLInt), minutes: nn(GraphQLFloat), note: GraphQLString });
export const PartUseInputType = input('PartUseInput', { workItemId: nn(GraphQLInt), description: nn(GraphQLString), quantity: GraphQLFloat, costMinor: nn(GraphQLFloat) });
export const TimeCorrectionInputType = input('TimeCorrectionInput', { timeEntryId: nn(GraphQLInt), minutes: nn(GraphQLFloat), why: nn(GraphQLString) });

