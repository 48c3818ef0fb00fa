import { GraphQLBoolean, GraphQLInt, GraphQLNonNull, GraphQLString } from 'graphql';

import type { GraphDomain } from '@/server/graphql/domain';
import { GraphQLJSON } from '@/server/graphql/json-scalar';

import { depositRules, depositsFor, recordSale, refundDeposit, releaseHold, setDepositRules } from './deposit-service';

const int = { type: new GraphQLNonNull(GraphQLInt) };
const json = new GraphQLNonNull(GraphQLJSON);
const asJson = (d: { $toJson: () => unknown }) => d.$toJson();

export const depositsGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    deposits: { type: json, description: 'A piano’s deposits, the balance due at sale, and the rules.', args: { pianoId: int }, resolve: (_r, a: { pianoId: number }, ctx) => depositsFor(ctx.user, a.pianoId) },
    depositRules: { type: json, resolve: () => depositRules() },
  }),
  mutations: () => ({
    releaseHold: {
      type: json,
      args: { depositId: int, refund: { type: new GraphQLNonNull(GraphQLBoolean) }, why: { type: GraphQLString } },
      resolve: async (_r, a: { depositId: number; refund: boolean; why?: string }, ctx) => asJson(await releaseHold(ctx.deposits, ctx.user, a.depositId, a.refund, a.why)),
    },
    refundDeposit: { type: json, args: { depositId: int }, resolve: async (_r, a: { depositId: number }, ctx) => asJson(await refundDeposit(ctx.deposits, ctx.user, a.depositId)) },
    recordSale: { type: json, args: { pianoId: int }, resolve: (_r, a: { pianoId: number }, ctx) => recordSale(ctx.deposits, ctx.user, a.pianoId) },
    setDepositRules: { type: json, args: { rules: { type: json } }, resolve: (_r, a: { rules: unknown }, ctx) => setDepositRules(ctx.user, a.rules) },
  }),
};
