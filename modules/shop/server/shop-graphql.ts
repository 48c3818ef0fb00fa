import { GraphQLBoolean, GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLString } from 'graphql';

import { can } from '@/modules/accounts/core/roles';
import { submitRemeasurement } from '@/modules/assessment/server/assessment-service';
import { RemeasureInputType, SubmittedAssessmentType } from '@/modules/assessment/server/assessment-types';
import { Piano } from '@/modules/pianos/server/piano-model';
import { notAllowed } from '@/server/errors';
import type { GraphDomain } from '@/server/graphql/domain';
import { GraphQLJSON } from '@/server/graphql/json-scalar';
import { nn } from '@/server/graphql/types';

import { WorkItem } from './shop-models';
import {
  DecisionResultType,
  PartUseInputType,
  PartUseType,
  QueuePageType,
  TimeCorrectionInputType,
  TimeEntryInputType,
  TimeEntryType,
  WorkItemDetailType,
  WorkItemInputType,
  WorkItemPatchType,
  WorkNoteType,
  WorkPlanType,
} from './shop-types';
import {
  addNote,
  addPart,
  addWorkItem,
  approvePlan,
  correctTimeEntry,
  decide,
  finishWorkshop,
  itemDetail,
  logClimate,
  logTime,
  overruns,
  planView,
  rateCardFor,
  recentClimate,
  removeWorkItem,
  setRateCard,
  setWorkItemDone,
  startTimer,
  stopTimer,
  updateWorkItem,
  workQueue,
} from './shop-service';

const int = { type: new GraphQLNonNull(GraphQLInt) };
const json = { type: new GraphQLNonNull(GraphQLJSON) };
const jsonList = new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(GraphQLJSON)));
const toJson = (m: { $toJson?: () => unknown }) => (m.$toJson ? m.$toJson() : m);

export const shopGraph: GraphDomain = {
  readModels: [
    {
      model: WorkItem,
      fieldName: 'workItem',
      listFieldName: 'workItems',
      filters: { single: ['idEq'], list: ['limit', 'offset', 'pianoIdEq', 'statusEq'] },
      readPolicy: (_builder, ctx) => {
        if (!can(ctx.user.role, 'workAtBench')) throw notAllowed('read workshop items');
      },
    },
  ],
  queries: () => ({
    rateCard: { type: json.type, resolve: (_r, _a, ctx) => rateCardFor(ctx.user) },
    workQueue: {
      type: nn(QueuePageType),
      description: 'A page of open items on pianos in the workshop, by priority and due date: yours, the unassigned ones, or (managers) all.',
      args: { scope: { type: GraphQLString }, limit: { type: GraphQLInt }, offset: { type: GraphQLInt } },
      resolve: (_r, a: { scope?: string | null; limit?: number | null; offset?: number | null }, ctx) => workQueue(ctx.user, a),
    },
    workItemDetail: { type: nn(WorkItemDetailType), args: { itemId: int }, resolve: (_r, a: { itemId: number }, ctx) => itemDetail(ctx.user, a.itemId) },
    workPlan: { type: WorkPlanType, args: { pianoId: int }, resolve: (_r, a: { pianoId: number }, ctx) => planView(ctx.user, a.pianoId) },
    workshopOverruns: {
      type: json.type,
      description: 'Pianos whose items cost more than their estimates, worst first, a page at a time: { total, overruns }.',
      args: { limit: { type: GraphQLInt }, offset: { type: GraphQLInt } },
      resolve: (_r, a: { limit?: number | null; offset?: number | null }, ctx) => overruns(ctx.user, a),
    },
    climateReadings: { type: jsonList, resolve: (_r, _a, ctx) => recentClimate(ctx.user) },
  }),
  mutations: (typeOf) => ({
    decidePiano: {
      type: nn(DecisionResultType),
      args: { pianoId: int, decision: { type: new GraphQLNonNull(GraphQLString) }, why: { type: GraphQLString } },
      resolve: (_r, a: { pianoId: number; decision: string; why?: string }, ctx) => decide(ctx.user, a),
    },
    addWorkItem: { type: nn(typeOf(WorkItem)), args: { pianoId: int, item: { type: nn(WorkItemInputType) } }, resolve: async (_r, a: { pianoId: number; item: unknown }, ctx) => toJson(await addWorkItem(ctx.user, a.pianoId, a.item)) },
    updateWorkItem: { type: nn(typeOf(WorkItem)), args: { itemId: int, patch: { type: nn(WorkItemPatchType) } }, resolve: async (_r, a: { itemId: number; patch: unknown }, ctx) => toJson(await updateWorkItem(ctx.user, a.itemId, a.patch)) },
    removeWorkItem: { type: new GraphQLNonNull(GraphQLBoolean), args: { itemId: int }, resolve: (_r, a: { itemId: number }, ctx) => removeWorkItem(ctx.user, a.itemId) },
    approvePlan: { type: new GraphQLNonNull(typeOf(Piano)), args: { pianoId: int, why: { type: GraphQLString } }, resolve: async (_r, a: { pianoId: number; why?: string }, ctx) => toJson(await approvePlan(ctx.user, a.pianoId, a.why)) },
    startTimer: { type: nn(TimeEntryType), args: { itemId: int }, resolve: async (_r, a: { itemId: number }, ctx) => toJson(await startTimer(ctx.user, a.itemId)) },
    stopTimer: { type: nn(TimeEntryType), args: { itemId: int }, resolve: async (_r, a: { itemId: number }, ctx) => toJson(await stopTimer(ctx.user, a.itemId)) },
    logTime: { type: nn(TimeEntryType), args: { entry: { type: nn(TimeEntryInputType) } }, resolve: async (_r, a: { entry: unknown }, ctx) => toJson(await logTime(ctx.user, a.entry)) },
    addPart: { type: nn(PartUseType), args: { part: { type: nn(PartUseInputType) } }, resolve: async (_r, a: { part: unknown }, ctx) => toJson(await addPart(ctx.user, a.part)) },
    addWorkNote: { type: nn(WorkNoteType), args: { itemId: int, body: { type: new GraphQLNonNull(GraphQLString) } }, resolve: async (_r, a: { itemId: number; body: string }, ctx) => toJson(await addNote(ctx.user, a.itemId, a.body)) },
    setWorkItemDone: {
      type: nn(typeOf(WorkItem)),
      args: { itemId: int, done: { type: new GraphQLNonNull(GraphQLBoolean) }, reason: { type: GraphQLString } },
      resolve: async (_r, a: { itemId: number; done: boolean; reason?: string | null }, ctx) => toJson(await setWorkItemDone(ctx.user, a)),
    },
    correctTimeEntry: { type: nn(TimeEntryType), args: { correction: { type: nn(TimeCorrectionInputType) } }, resolve: async (_r, a: { correction: unknown }, ctx) => toJson(await correctTimeEntry(ctx.user, a.correction)) },
    submitRemeasurement: { type: nn(SubmittedAssessmentType), args: { input: { type: nn(RemeasureInputType) } }, resolve: (_r, a: { input: unknown }, ctx) => submitRemeasurement(ctx.user, a.input) },
    finishWorkshop: { type: new GraphQLNonNull(typeOf(Piano)), args: { pianoId: int }, resolve: async (_r, a: { pianoId: number }, ctx) => toJson(await finishWorkshop(ctx.user, a.pianoId)) },
    logClimate: { type: json.type, args: { reading: json }, resolve: (_r, a: { reading: unknown }, ctx) => logClimate(ctx.user, a.reading) },
    setRateCard: { type: json.type, args: { card: json }, resolve: (_r, a: { card: unknown }, ctx) => setRateCard(ctx.user, a.card) },
  }),
};
