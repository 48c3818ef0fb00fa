import { GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLString } from 'graphql';

import type { GraphDomain } from '@/server/graphql/domain';
import { GraphQLJSON } from '@/server/graphql/json-scalar';

import { listPhotos } from './photo-service';

export const photosGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    photos: {
      type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(GraphQLJSON))),
      description: 'A piano’s photos, or your own draft photos, each with a link valid for ten minutes.',
      args: { pianoId: { type: GraphQLInt }, draftKey: { type: GraphQLString } },
      resolve: (_root, args: { pianoId?: number; draftKey?: string }, ctx) => listPhotos(ctx.photos, ctx.user, args),
    },
  }),
};
