import { GraphQLInputObjectType, GraphQLInt, GraphQLList, GraphQLNonNull, GraphQLObjectType, GraphQLString, type GraphQLFieldConfigMap } from 'graphql';

import type { GraphDomain } from '@/server/graphql/domain';

import { idleInWorkshop, MAX_IDLE_LISTED, readShopProfile, setShopProfile } from './shop-profile-service';

const text = { type: new GraphQLNonNull(GraphQLString) };
const PROFILE_FIELDS = {
  address: { ...text, description: 'Postal address, one line or several.' },
  phone: text,
  email: text,
  website: text,
  locale: { ...text, description: 'The language tag dates are written in (en-GB, en-US, de-DE...).' },
  timeZone: { ...text, description: 'The IANA time zone of the shop (Europe/London, America/Chicago...).' },
  workshopIdleDays: { type: new GraphQLNonNull(GraphQLInt), description: 'A piano in the workshop longer than this with no work items is flagged.' },
};

const ShopProfileType = new GraphQLObjectType({ name: 'ShopProfile', description: 'The dealer on the papers, where its dates are written, and the workshop’s idle rule.', fields: PROFILE_FIELDS as GraphQLFieldConfigMap<unknown, unknown> });
const ShopProfileInput = new GraphQLInputObjectType({ name: 'ShopProfileInput', fields: PROFILE_FIELDS });

const IdlePianoType = new GraphQLObjectType({
  name: 'IdlePiano',
  fields: {
    pianoId: { type: new GraphQLNonNull(GraphQLInt) },
    stockNumber: text,
    maker: text,
    model: { type: GraphQLString },
    inWorkshopSince: text,
    days: { type: new GraphQLNonNull(GraphQLInt) },
  },
});
const IdleInWorkshopType = new GraphQLObjectType({
  name: 'IdleInWorkshop',
  fields: {
    idleDays: { type: new GraphQLNonNull(GraphQLInt), description: 'The shop’s rule: days in the workshop with no work items before a piano is flagged.' },
    pianos: { type: new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(IdlePianoType))), extensions: { maxRows: MAX_IDLE_LISTED } },
  },
});

export const shopProfileGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    shopProfile: { type: new GraphQLNonNull(ShopProfileType), resolve: (_r, _a, ctx) => readShopProfile(ctx.user) },
    idleInWorkshop: {
      type: new GraphQLNonNull(IdleInWorkshopType),
      description: 'Pianos in the workshop past the shop’s idle days with no work items, longest first (managers).',
      resolve: (_r, _a, ctx) => idleInWorkshop(ctx.user, ctx.deposits.clock.now()),
    },
  }),
  mutations: () => ({
    setShopProfile: {
      type: new GraphQLNonNull(ShopProfileType),
      args: { input: { type: new GraphQLNonNull(ShopProfileInput) } },
      resolve: (_r, a: { input: unknown }, ctx) => setShopProfile(ctx.user, { ...(a.input as object) }),
    },
  }),
};
