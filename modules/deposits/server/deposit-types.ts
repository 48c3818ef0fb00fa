// The deposits' GraphQL types: what the deposit desk reads and sends, typed field by field.
import { GraphQLFloat, type GraphQLEnumType } from 'graphql';

import { DEPOSIT_STATUSES } from '@/modules/deposits/core/deposit';
import { CurrencyType, enumOf, float, input, int, list, nn, object, optStr, str } from '@/server/graphql/types';

export const DepositStatusType = enumOf('DepositStatus', DEPOSIT_STATUSES, 'Where a deposit stands.');

export const DepositType = object('Deposit', {
  id: int,
  pianoId: int,
  status: nn(DepositStatusType),
  amountMinor: int,
  currency: str,
  buyerName: str,
  buyerEmail: str,
  createdAt: str,
  paidAt: optStr,
  holdExpiresAt: optStr,
  closedAt: optStr,
  refundedMinor: int,
  refundId: optStr,
  closeReason: optStr,
});

export const BalanceType = object('Balance', { priceMinor: int, taxMinor: int, totalMinor: int, depositMinor: int, balanceMinor: int, currency: nn(CurrencyType), salesTaxPct: float }, 'What is due at the sale: price and sales tax less the deposit.');

const RULES = { percent: float, minimumMajor: float, holdDays: int, salesTaxPct: float };
export const DepositRulesType = object('DepositRules', RULES, 'The shop’s deposit terms.');
// Typed loosely where the domain's schema words the refusal better (whole days).
export const DepositRulesInputType = input('DepositRulesInput', { percent: nn(GraphQLFloat), minimumMajor: nn(GraphQLFloat), holdDays: nn(GraphQLFloat), salesTaxPct: nn(GraphQLFloat) });

export const PianoDepositsType = object('PianoDeposits', { deposits: list(DepositType), balance: BalanceType, rules: nn(DepositRulesType) });

/** The sale's answer; `stage` is the pianos' own generated stage enum. */
export const saleType = (stage: GraphQLEnumType) => object('Sale', { stage: nn(stage), balance: BalanceType });
