import { GraphQLInt, GraphQLNonNull, GraphQLString } from 'graphql';

import { can } from '@/modules/accounts/core/roles';
import { notAllowed } from '@/server/errors';
import type { GraphDomain } from '@/server/graphql/domain';
import { list, nn } from '@/server/graphql/types';

import { Assessment } from './assessment-models';
import { assessmentHistory, correctAssessment, findSamePianos, gradeRulesInForce, intakeRecord, setGradeRules, submitIntake } from './assessment-service';
import { AssessmentVersionType, CorrectionInputType, GradeRulesInputType, GradeRulesType, IntakeInputType, IntakeRecordType, SamePianoType, SubmittedAssessmentType } from './assessment-types';

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
      type: nn(GradeRulesType),
      description: 'The grading rules in force (shop defaults until a manager changes them).',
      resolve: (_root, _args, ctx) => gradeRulesInForce(ctx.user),
    },
    assessmentHistory: {
      type: list(AssessmentVersionType),
      description: 'Every version of a piano’s assessment, oldest first.',
      args: pianoId,
      resolve: (_root, args: { pianoId: number }, ctx) => assessmentHistory(ctx.user, args.pianoId),
    },
    samePianos: {
      type: list(SamePianoType),
      description: 'Pianos already on record with this maker, model and serial number: the same piano taken in before.',
      args: { maker: { type: new GraphQLNonNull(GraphQLString) }, model: { type: GraphQLString }, serialNumber: { type: new GraphQLNonNull(GraphQLString) }, exceptPianoId: { type: GraphQLInt } },
      resolve: (_root, args: Record<string, unknown>, ctx) => findSamePianos(ctx.user, args),
    },
    intake: {
      type: IntakeRecordType,
      description: 'Where a piano came from; seller details for intake staff and managers only.',
      args: pianoId,
      resolve: (_root, args: { pianoId: number }, ctx) => intakeRecord(ctx.user, args.pianoId),
    },
  }),
  mutations: () => ({
    submitIntake: {
      type: nn(SubmittedAssessmentType),
      args: { input: { type: nn(IntakeInputType) } },
      resolve: (_root, args: { input: unknown }, ctx) => submitIntake(ctx.user, args.input),
    },
    correctAssessment: {
      type: nn(SubmittedAssessmentType),
      args: { input: { type: nn(CorrectionInputType) } },
      resolve: (_root, args: { input: unknown }, ctx) => correctAssessment(ctx.user, args.input),
    },
    setGradeRules: {
      type: nn(GradeRulesType),
      args: { rules: { type: nn(GradeRulesInputType) } },
      resolve: (_root, args: { rules: unknown }, ctx) => setGradeRules(ctx.user, args.rules),
    },
  }),
};
