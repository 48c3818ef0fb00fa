import { getNamedType, GraphQLBoolean, GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLObjectType, GraphQLString, type GraphQLEnumType } from 'graphql';

import { can } from '@/modules/accounts/core/roles';
import { notAllowed } from '@/server/errors';
import { perSchema, type GraphDomain, type TypeOf } from '@/server/graphql/domain';

import { Piano } from './piano-model';
import { createPiano, stageCounts } from './piano-service';
import { movePiano, stageHistory } from './stage-service';

const str = { type: new GraphQLNonNull(GraphQLString) };

/** The generated enum of a piano's stage, for every hand-written answer that names one. */
export const stageType = (typeOf: TypeOf) => getNamedType(typeOf(Piano).getFields().stage.type) as GraphQLEnumType;

const pianoTypes = perSchema((typeOf) => {
  const stage = stageType(typeOf);
  return {
    count: new GraphQLObjectType({
      name: 'StageCount',
      fields: { stage: { type: new GraphQLNonNull(stage) }, count: { type: new GraphQLNonNull(GraphQLInt) } },
    }),
    move: new GraphQLObjectType({
      name: 'StageMove',
      description: 'One move of a piano through its stages.',
      fields: {
        action: str,
        fromStage: { type: stage, description: 'Null for the arrival.' },
        toStage: { type: new GraphQLNonNull(stage) },
        why: { type: GraphQLString },
        by: { ...str, description: 'Who made it, by name; Feltwire for a move it made itself.' },
        byRole: { ...str, description: 'The role, or system.' },
        at: str,
      },
    }),
  };
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
  queries: (typeOf) => ({
    stageCounts: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(pianoTypes(typeOf).count))),
      description: 'How many pianos stand in each stage, in stage order.',
      resolve: (_root, _args, ctx) => stageCounts(ctx.user),
    },
    stageHistory: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(pianoTypes(typeOf).move))),
      description: 'Every stage move of a piano, oldest first: who, when, from, to, why.',
      args: { pianoId: { type: new GraphQLNonNull(GraphQLInt) } },
      resolve: (_root, args: { pianoId: number }, ctx) => stageHistory(ctx.user, args.pianoId),
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
