import { GraphQLBoolean, GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLObjectType, GraphQLString } from 'graphql';

import { can } from '@/modules/accounts/core/roles';
import { notAllowed } from '@/server/errors';
import type { GraphDomain } from '@/server/graphql/domain';

import { Piano } from './piano-model';
import { createPiano, stageCounts } from './piano-service';

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
  }),
  mutations: (typeOf) => ({
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
