import { GraphQLBoolean, GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLObjectType, GraphQLString } from 'graphql';

import { can } from '@/modules/accounts/core/roles';
import { notAllowed } from '@/server/errors';
import type { GraphDomain } from '@/server/graphql/domain';

import { Piano } from './piano-model';
import { createPiano, stageCounts } from './piano-service';
import { movePiano, stageHistory } from './stage-service';
import { GraphQLJSON } from '@/server/graphql/json-scalar';

const StageCount = new GraphQLObjectType({
  name: 'StageCount',
  fields: { stage: { type: new GraphQLNonNull(GraphQLString) }, count: { type: new GraphQLNonNull(GraphQLInt) } },
});

export const pianosGraph: GraphDomain = {
  readModels: [
    {
      model: Piano,
      fieldName: 'piano',
      listFieldName: 'pianos',
      filters: { single: ['idEq', 'stockNumberEq'], list: ['limit', 'offset', 'range', 'stageEq', 'makerLikeNoCase'] },
      orderBy: ['createdAt', 'stockNumber', 'stageChangedAt'],
      readPolicy: (_builder, ctx) => {
        if (!can(ctx.user.role, 'readPianos')) throw notAllowed('read pianos');
      },
    },
  ],
  queries: () => ({
    stageCounts: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(StageCount))),
      description: 'How many pianos stand in each stage, in stage order.',
      resolve: (_root, _args, ctx) => stageCounts(ctx.user),
    },
    stageHistory: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(GraphQLJSON))),
      description: 'Every stage move of a piano, oldest first: who, when, from, to, why.',
      args: { pianoId: { type: new GraphQLNonNull(GraphQLInt) } },
      resolve: (_root, args: { pianoId: number }, ctx) => stageHistory(ctx.user.role, args.pianoId),
    },
  }),
  mutations: (typeOf) => ({
    movePiano: {
      type: new GraphQLNonNull(typeOf(Piano)),
      description: 'One move through the stages (put on the floor, sell, deliver...), checked by role and stage.',
      args: { pianoId: { type: new GraphQLNonNull(GraphQLInt) }, action: { type: new GraphQLNonNull(GraphQLString) }, why: { type: GraphQLString } },
      resolve: async (_root, args: { pianoId: number; action: string; why?: string }, ctx) =>
        (await movePiano({ pianoId: args.pianoId, action: args.action as never, by: ctx.user.role, userId: ctx.user.id, why: args.why })).$toJson(),
    },
    createPiano: {
      type: new GraphQLNonNull(typeOf(Piano)),
      args: {
        maker: { type: new GraphQLNonNull(GraphQLString) },
        model: { type: GraphQLString },
        serialNumber: { type: GraphQLString },
        year: { type: GraphQLInt },
        yearIsEstimate: { type: GraphQLBoolean },
        kind: { type: new GraphQLNonNull(GraphQLString) },
        sizeCm: { type: GraphQLInt },
        finish: { type: GraphQLString },
      },
      resolve: async (_root, args, ctx) => (await createPiano(ctx.user, args)).$toJson(),
    },
  }),
};
