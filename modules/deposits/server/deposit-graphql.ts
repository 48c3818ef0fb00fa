import { GraphQLBoolean, GraphQLInt, GraphQLNonNull, GraphQLString } from 'graphql';

import { stageType } from '@/modules/pianos/server/piano-graphql';
import type { GraphDomain } from '@/server/graphql/domain';
import { nn } from '@/server/graphql/types';

import { depositRules, depositsFor, markBalancePaid, recordSale, refundDeposit, releaseHold, setDepositRules } from './deposit-service';
import { DepositRulesInputType, DepositRulesType, DepositType, PianoDepositsType, SaleInputType, SaleRecordType, saleType } from './deposit-types';

const int = { type: new GraphQLNonNull(GraphQLInt) };
const asJson = (d: { $toJson: () => unknown }) => d.$toJson();

export const depositsGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    deposits: { type: nn(PianoDepositsType), description: 'A piano’s deposits, the balance due at sale, and the rules.', args: { pianoId: int }, resolve: (_r, a: { pianoId: number }, ctx) => depositsFor(ctx.user, a.pianoId) },
    depositRules: { type: nn(DepositRulesType), resolve: () => depositRules() },
  }),
  mutations: (typeOf) => ({
    releaseHold: {
      type: nn(DepositType),
      args: { depositId: int, refund: { type: new GraphQLNonNull(GraphQLBoolean) }, why: { type: GraphQLString } },
      resolve: async (_r, a: { depositId: number; refund: boolean; why?: string }, ctx) => asJson(await releaseHold(ctx.deposits, ctx.user, a.depositId, a.refund, a.why)),
    },
    refundDeposit: { type: nn(DepositType), args: { depositId: int }, resolve: async (_r, a: { depositId: number }, ctx) => asJson(await refundDeposit(ctx.deposits, ctx.user, a.depositId)) },
    recordSale: {
      type: nn(saleType(stageType(typeOf))),
      args: { pianoId: int, sale: { type: SaleInputType } },
      resolve: (_r, a: { pianoId: number; sale?: unknown }, ctx) => recordSale(ctx.deposits, ctx.user, a.pianoId, a.sale),
    },
    markBalancePaid: { type: nn(SaleRecordType), description: 'Staff took the balance in the shop.', args: { saleId: int }, resolve: (_r, a: { saleId: number }, ctx) => markBalancePaid(ctx.deposits, ctx.user, a.saleId) },
    setDepositRules: { type: nn(DepositRulesType), args: { rules: { type: nn(DepositRulesInputType) } }, resolve: (_r, a: { rules: unknown }, ctx) => setDepositRules(ctx.user, a.rules) },
  }),
};
