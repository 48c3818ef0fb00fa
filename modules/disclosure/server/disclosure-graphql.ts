import { GraphQLInt, GraphQLNonNull } from 'graphql';

import { Piano } from '@/modules/pianos/server/piano-model';
import type { GraphDomain } from '@/server/graphql/domain';
import { list, nn } from '@/server/graphql/types';

import { acknowledgementsFor, countersign, disclosureVersions, publishDisclosure, setAskingPrice, setShopTexts, shopTexts } from './disclosure-service';
import { AcknowledgementType, AskingPriceInputType, CountersignedType, DisclosureVersionsType, PublishedType, ShopTextsInputType, ShopTextsType } from './disclosure-types';

const pianoId = { pianoId: { type: new GraphQLNonNull(GraphQLInt) } };

export const disclosureGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    disclosures: { type: nn(DisclosureVersionsType), description: 'The public link and every published version of a piano’s disclosure.', args: pianoId, resolve: (_r, a: { pianoId: number }, ctx) => disclosureVersions(ctx.user, a.pianoId) },
    acknowledgements: { type: list(AcknowledgementType), args: pianoId, resolve: (_r, a: { pianoId: number }, ctx) => acknowledgementsFor(ctx.user, a.pianoId) },
    shopTexts: { type: nn(ShopTextsType), resolve: () => shopTexts() },
  }),
  mutations: (typeOf) => ({
    publishDisclosure: { type: nn(PublishedType), args: pianoId, resolve: (_r, a: { pianoId: number }, ctx) => publishDisclosure(ctx.disclosure, ctx.user, a.pianoId) },
    countersign: { type: nn(CountersignedType), args: { acknowledgementId: { type: new GraphQLNonNull(GraphQLInt) } }, resolve: (_r, a: { acknowledgementId: number }, ctx) => countersign(ctx.disclosure, ctx.user, a.acknowledgementId) },
    setAskingPrice: { type: nn(typeOf(Piano)), args: { input: { type: nn(AskingPriceInputType) } }, resolve: async (_r, a: { input: unknown }, ctx) => (await setAskingPrice(ctx.user, a.input, ctx.pricing)).$toJson() },
    setShopTexts: { type: nn(ShopTextsType), args: { texts: { type: nn(ShopTextsInputType) } }, resolve: (_r, a: { texts: unknown }, ctx) => setShopTexts(ctx.user, a.texts) },
  }),
};
