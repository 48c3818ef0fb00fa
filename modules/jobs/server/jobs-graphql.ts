import { GraphQLBoolean, GraphQLEnumType, GraphQLID, GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLObjectType, GraphQLString } from 'graphql';

import { JOB_STATE_TEXT } from '@/modules/jobs/core/job-kinds';
import type { GraphDomain } from '@/server/graphql/domain';

import { retryBackgroundJob, troubledJobs } from './jobs-service';

const str = { type: new GraphQLNonNull(GraphQLString) };
const int = { type: new GraphQLNonNull(GraphQLInt) };

const BackgroundJobState = new GraphQLEnumType({
  name: 'BackgroundJobState',
  values: Object.fromEntries(Object.entries(JOB_STATE_TEXT).map(([value, description]) => [value, { value, description }])),
});

const BackgroundJob = new GraphQLObjectType({
  name: 'BackgroundJob',
  description: 'A job of the background queue that needs a manager’s eye.',
  fields: {
    id: { type: new GraphQLNonNull(GraphQLID) },
    task: { ...str, description: 'The queue’s name for the kind of work.' },
    label: { ...str, description: 'The kind of work, in plain words.' },
    about: { ...str, description: 'What this job is for.' },
    state: { type: new GraphQLNonNull(BackgroundJobState) },
    stateText: str,
    attempts: int,
    maxAttempts: int,
    lastError: { type: GraphQLString, description: 'Why the last try failed.' },
    nextTryAt: { type: GraphQLString, description: 'When the queue tries again on its own; null when it gave up or is running.' },
    startedAt: { type: GraphQLString, description: 'When the running try began.' },
    createdAt: str,
  },
});

export const jobsGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    backgroundJobs: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(BackgroundJob))),
      description: 'Jobs that failed at least once, gave up, or are stuck (managers only).',
      resolve: (_r, _a, ctx) => troubledJobs(ctx.user),
    },
  }),
  mutations: () => ({
    retryBackgroundJob: {
      type: new GraphQLNonNull(GraphQLBoolean),
      description: 'Runs a job again now (managers only).',
      args: { id: { type: new GraphQLNonNull(GraphQLID) } },
      resolve: (_r, a: { id: string }, ctx) => retryBackgroundJob(ctx.user, a.id),
    },
  }),
};
