// The deposits' GraphQL types: what the deposit desk reads and sends, typed field by field.
import { GraphQLBoolean, GraphQLFloat, GraphQLInt, GraphQLString, type GraphQLEnumType } from 'graphql';

import { SellerInputType } from '@/modules/assessment/server/assessment-types';
import { PIANO_KINDS } from '@/modules/pianos/core/piano';

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

// Typed loosely where the domain's schema words the refusal better (whole minor units, the kind).
const TradeInPianoInputType = input('TradeInPianoInput', {
  maker: nn(GraphQLString),
  model: GraphQLString,
  serialNumber: GraphQLString,
  year: GraphQLFloat,
  yearIsEstimate: GraphQLBoolean,
  kind: { type: nn(GraphQLString), description: PIANO_KINDS.join(' or ') },
  sizeCm: GraphQLFloat,
  finish: GraphQLString,
});
const TradeInInputType = input('TradeInInput', { piano: nn(TradeInPianoInputType), allowanceMinor: { type: nn(GraphQLFloat), description: 'What the dealer allows for it, in minor units of the sale’s currency.' } });
export const SaleInputType = input(
  'SaleInput',
  {
    buyer: nn(SellerInputType),
    agreedPriceMinor: { type: nn(GraphQLFloat), description: 'In minor units of the piano’s currency.' },
    salesTaxPct: { type: GraphQLFloat, description: 'Left out: the shop’s rate.' },
    tradeIn: TradeInInputType,
  },
  'What is recorded at the sale: the buyer, the agreed price, the tax rate and the buyer’s own piano taken in trade.',
);

const SaleBuyerType = object('SaleBuyer', { name: str, email: optStr, phone: optStr, address: optStr }, 'The buyer: personal data, for roles that may read it.');
const TradeInPianoType = object('TradeInPiano', { pianoId: int, stockNumber: str });
export const SaleRecordType = object(
  'SaleRecord',
  {
    id: int,
    currency: nn(CurrencyType),
    agreedPriceMinor: int,
    salesTaxPct: float,
    taxMinor: int,
    totalMinor: int,
    depositMinor: int,
    tradeInAllowanceMinor: int,
    balanceMinor: int,
    owedToBuyerMinor: { type: nn(GraphQLInt), description: 'Paid back to the buyer when the deposit and allowance exceed the total.' },
    tradeIn: TradeInPianoType,
    buyer: SaleBuyerType,
    balancePaidAt: optStr,
    balancePaidHow: { type: enumOf('BalancePaidHow', ['in_shop', 'online'], 'Where the balance was paid.') },
  },
  'The recorded sale’s lines in minor units; the buyer only for roles that may read buyer details.',
);

/** The sale's answer; `stage` is the pianos' own generated stage enum. */
export const saleType = (stage: GraphQLEnumType) => object('Sale', { stage: nn(stage), balance: BalanceType, sale: SaleRecordType });
