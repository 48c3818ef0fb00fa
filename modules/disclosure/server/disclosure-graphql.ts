import { GraphQLInt, GraphQLList, GraphQLNonNull } from 'graphql';

import { Piano } from '@/modules/pianos/server/piano-model';
import type { GraphDomain } from '@/server/graphql/domain';
import { GraphQLJSON } from '@/server/graphql/json-scalar';

import { acknowledgementsFor, countersign, disclosureVersions, publishDisclosure, setAskingPrice, setShopTexts, shopTexts } from './disclosure-service';

const pianoId = { pianoId: { type: new GraphQLNonNull(GraphQLInt) } };
const json = new GraphQLNonNull(GraphQLJSON);

export const disclosureGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    disclosures: { type: json, description: 'The public link and every published version of a piano’s disclosure.', args: pianoId, resolve: (_r, a: { pianoId: number }, ctx) => disclosureVersions(ctx.user, a.pianoId) },
    acknowledgements: { type: new GraphQLNonNull(new GraphQLList(json)), args: pianoId, resolve: (_r, a: { pianoId: number }, ctx) => acknowledgementsFor(ctx.user, a.pianoId) },
    shopTexts: { type: json, resolve: () => shopTexts() },
  }),
  mutations: (typeOf) => ({
    publishDisclosure: { type: json, args: pianoId, resolve: (_r, a: { pianoId: number }, ctx) => publishDisclosure(ctx.disclosure, ctx.user, a.pianoId) },
    countersign: { type: json, args: { acknowledgementId: { type: new GraphQLNonNull(GraphQLInt) } }, resolve: (_r, a: { acknowledgementId: number }, ctx) => countersign(ctx.disclosure, ctx.user, a.acknowledgementId) },
    setAskingPrice: { type: new GraphQLNonNull(typeOf(Piano)), args: { input: { type: json } }, resolve: async (_r, a: { input: unknown }, ctx) => (await setAskingPrice(ctx.user, a.input, ctx.pricing)).$toJson() },
    setShopTexts: { type: json, args: { texts: { type: json } }, resolve: (_r, a: { texts: unknown }, ctx) => setShopTexts(ctx.user, a.texts) },
  }),
};
