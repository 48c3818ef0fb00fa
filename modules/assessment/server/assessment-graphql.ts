import { GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLString } from 'graphql';

import { can } from '@/modules/accounts/core/roles';
import { notAllowed } from '@/server/errors';
import type { GraphDomain } from '@/server/graphql/domain';
import { GraphQLJSON } from '@/server/graphql/json-scalar';

import { Assessment } from './assessment-models';
import { assessmentHistory, correctAssessment, currentRules, findSamePianos, intakeRecord, setGradeRules, submitIntake } from './assessment-service';

const pianoId = { pianoId: { type: new GraphQLNonNull(GraphQLInt) } };

export const assessmentGraph: GraphDomain = {
  readModels: [
    {
      model: Assessment,
      fieldName: 'assessment',
      listFieldName: 'assessments',
      filters: { single: ['idEq'], list: ['limit', 'offset', 'pianoIdEq'] },
      readPolicy: (_builder, ctx) => {
        if (!can(ctx.user.role, 'readPianos')) throw notAllowed('read assessments');
      },
    },
  ],
  queries: () => ({
    gradeRules: {
      type: new GraphQLNonNull(GraphQLJSON),
      description: 'The grading rules in force (shop defaults until a manager changes them).',
      resolve: () => currentRules(),
    },
    assessmentHistory: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(GraphQLJSON))),
      description: 'Every version of a piano’s assessment, oldest first, each with what it changed.',
      args: pianoId,
      resolve: (_root, args: { pianoId: number }, ctx) => assessmentHistory(ctx.user, args.pianoId),
    },
    samePianos: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(GraphQLJSON))),
      description: 'Pianos already on record with this maker, model and serial number: the same piano taken in before.',
      args: { maker: { type: new GraphQLNonNull(GraphQLString) }, model: { type: GraphQLString }, serialNumber: { type: new GraphQLNonNull(GraphQLString) }, exceptPianoId: { type: GraphQLInt } },
      resolve: (_root, args: Record<string, unknown>, ctx) => findSamePianos(ctx.user, args),
    },
    intake: {
      type: GraphQLJSON,
      description: 'Where a piano came from; seller details for intake staff and managers only.',
      args: pianoId,
      resolve: (_root, args: { pianoId: number }, ctx) => intakeRecord(ctx.user, args.pianoId),
    },
  }),
  mutations: () => ({
    submitIntake: {
      type: new GraphQLNonNull(GraphQLJSON),
      args: { input: { type: new GraphQLNonNull(GraphQLJSON) } },
      resolve: (_root, args: { input: unknown }, ctx) => submitIntake(ctx.user, args.input),
    },
    correctAssessment: {
      type: new GraphQLNonNull(GraphQLJSON),
      args: { input: { type: new GraphQLNonNull(GraphQLJSON) } },
      resolve: (_root, args: { input: unknown }, ctx) => correctAssessment(ctx.user, args.input),
    },
    setGradeRules: {
      type: new GraphQLNonNull(GraphQLJSON),
      args: { rules: { type: new GraphQLNonNull(GraphQLJSON) } },
      resolve: (_root, args: { rules: unknown }, ctx) => setGradeRules(ctx.user, args.rules),
    },
  }),
};

