import {
  GraphQLBoolean,
  GraphQLEnumType,
  GraphQLFloat,
  GraphQLInputObjectType,
  GraphQLInt,
  GraphQLList,
  GraphQLObjectType,
  GraphQLString,
  type GraphQLFieldConfig,
  type GraphQLInputType,
  type GraphQLOutputType,
} from 'graphql';

import { can, type Ability } from '@/modules/accounts/core/roles';
import { OFFER_ANSWERS } from '@/modules/pricing/core/offer-input';
import { MAX_STOCK_PAGE, STOCK_SORTS, type StockQueryInput, type StockRow } from '@/modules/pricing/core/stock-table';
import { notAllowed } from '@/server/errors';
import type { GraphContext } from '@/server/graphql/context';
import type { GraphDomain } from '@/server/graphql/domain';
import { list, nn } from '@/server/graphql/types';

import {
  changeAskingPrice,
  MAX_ANSWERS_LISTED,
  MAX_PRICE_CHANGES_LISTED,
  offerAnswers,
  offerFor,
  priceHistory,
  readPricingRules,
  recordOfferAnswer,
  setPricingRules,
  suggestedPrice,
} from './pricing-service';
import { MARGIN_BARS, pianoStockRow, stockCharts, stockTable } from './stock-service';
import { Piano } from '@/modules/pianos/server/piano-model';

const inList = <T extends GraphQLInputType>(t: T) => new GraphQLList(nn(t));
type Field = GraphQLFieldConfig<unknown, GraphContext>;

/** A field that only some roles may read: refused by name for the others, whatever else the query asks. */
function guarded(ability: Ability, what: string, field: Field): Field {
  const resolve = field.resolve ?? ((parent: unknown) => (parent as Record<string, unknown>)[what]);
  return {
    ...field,
    resolve: (parent, args, ctx, info) => {
      if (!can(ctx.user.role, ability)) throw notAllowed(`see ${what}`);
      return resolve(parent, args, ctx, info);
    },
  };
}

const PriceBasis = new GraphQLEnumType({ name: 'PriceBasis', values: { retail: {}, wholesale: {} } });

const PriceLine = new GraphQLObjectType({
  name: 'PriceLine',
  description: 'One step of a worked figure: what it changes (negative when taken off) and where it leaves the figure, in minor units.',
  fields: {
    key: { type: nn(GraphQLString) },
    label: { type: nn(GraphQLString) },
    detail: { type: nn(GraphQLString) },
    amountMinor: { type: nn(GraphQLInt) },
    runningMinor: { type: nn(GraphQLInt) },
  },
});
const lines = { type: list(PriceLine), extensions: { maxRows: 12 } };

const AskingPriceSuggestion = new GraphQLObjectType({
  name: 'AskingPriceSuggestion',
  description: 'The suggested asking price with every step, or a wholesale figure said as such.',
  fields: {
    basis: { type: nn(PriceBasis) },
    currency: { type: nn(GraphQLString) },
    priceMinor: { type: nn(GraphQLInt) },
    provisional: { type: nn(GraphQLBoolean) },
    rulesVersion: { type: nn(GraphQLString) },
    lines,
    rounding: { type: nn(GraphQLString) },
    summary: { type: nn(GraphQLString) },
  },
});

const TradeInOfferType = new GraphQLObjectType({
  name: 'TradeInOffer',
  description: 'The trade-in offer worked back from the expected asking price, with its lines for the seller.',
  fields: {
    basis: { type: nn(PriceBasis) },
    currency: { type: nn(GraphQLString) },
    offerMinor: { type: nn(GraphQLInt) },
    expectedPriceMinor: { type: nn(GraphQLInt) },
    provisional: { type: nn(GraphQLBoolean) },
    rulesVersion: { type: nn(GraphQLString) },
    rateCardVersion: { type: nn(GraphQLString) },
    reconEstimateMinor: { type: nn(GraphQLInt) },
    reconSource: { type: nn(new GraphQLEnumType({ name: 'ReconSource', values: { plan: { description: 'the work plan’s items' }, condition: { description: 'the condition report’s work money' } } })) },
    assessmentVersion: { type: nn(GraphQLInt) },
    lines,
    rounding: { type: nn(GraphQLString) },
    summary: { type: nn(GraphQLString) },
    notes: { type: list(GraphQLString), extensions: { maxRows: 4 } },
  },
});

const OfferStatus = new GraphQLEnumType({
  name: 'OfferStatus',
  values: { offer: { description: 'an offer is worked out' }, not_assessed: { description: 'no assessment yet' }, consignment: { description: 'taken on consignment: the dealer does not buy it' } },
});

const TradeInOfferResult = new GraphQLObjectType({
  name: 'TradeInOfferResult',
  fields: { status: { type: nn(OfferStatus) }, offer: { type: TradeInOfferType } },
});

const OfferAnswerKind = new GraphQLEnumType({ name: 'OfferAnswerKind', values: Object.fromEntries(OFFER_ANSWERS.map((a) => [a, {}])) });

const TradeInAnswerType = new GraphQLObjectType({
  name: 'TradeInAnswer',
  description: 'What the seller said to an offer: who recorded it, when, and the amounts.',
  fields: {
    id: { type: nn(GraphQLInt) },
    answer: { type: nn(OfferAnswerKind) },
    offerMinor: { type: nn(GraphQLInt) },
    counterMinor: { type: GraphQLInt },
    agreedMinor: { type: GraphQLInt },
    currency: { type: nn(GraphQLString) },
    basis: { type: nn(PriceBasis) },
    provisional: { type: nn(GraphQLBoolean) },
    pricingRulesVersion: { type: nn(GraphQLString) },
    note: { type: GraphQLString },
    recordedBy: { type: nn(GraphQLString) },
    recordedAt: { type: nn(GraphQLString), description: 'ISO 8601.' },
  },
});

const PriceChangeType = new GraphQLObjectType({
  name: 'PriceChange',
  description: 'One change of a piano’s asking price: who, when, from what, to what, and why.',
  fields: {
    id: { type: nn(GraphQLInt) },
    pianoId: { type: nn(GraphQLInt) },
    fromMinor: { type: GraphQLInt },
    toMinor: { type: nn(GraphQLInt) },
    currency: { type: nn(GraphQLString) },
    suggestedMinor: { type: GraphQLInt, description: 'The suggested price in force when it changed, in the same currency.' },
    pricingRulesVersion: { type: GraphQLString },
    reason: { type: nn(GraphQLString) },
    changedBy: { type: GraphQLString },
    changedAt: { type: nn(GraphQLString), description: 'ISO 8601.' },
  },
});

// One piano's money, each field loaded once per request and checked by role on its own.
interface MoneyParent {
  pianoId: number;
  askingPriceMinor: number | null;
  priceCurrency: string | null;
  row?: Promise<StockRow | null>;
}
const rowOf = (p: MoneyParent, ctx: GraphContext) => (p.row ??= pianoStockRow(ctx.pricing, p.pianoId));
const costField = (what: string, pick: (r: StockRow) => unknown, type: GraphQLOutputType = GraphQLInt): Field =>
  guarded('readCostsAndMargins', what, { type, resolve: async (p, _a, ctx) => {
    const r = await rowOf(p as MoneyParent, ctx);
    return r ? pick(r) : null;
  } });

const PianoMoney = new GraphQLObjectType<MoneyParent, GraphContext>({
  name: 'PianoMoney',
  description: 'One piano’s money. Offers reach intake staff and managers; allowance, cost basis and margin reach managers only; each field is refused by name to any other role.',
  fields: {
    pianoId: { type: nn(GraphQLInt) },
    askingPriceMinor: { type: GraphQLInt },
    priceCurrency: { type: GraphQLString },
    offer: guarded('readOffers', 'the trade-in offer', { type: TradeInOfferResult, resolve: (p, _a, ctx) => offerFor(ctx.pricing, ctx.user, (p as MoneyParent).pianoId) }),
    answers: guarded('readOffers', 'the seller’s answers to offers', { type: new GraphQLList(nn(TradeInAnswerType)), extensions: { maxRows: MAX_ANSWERS_LISTED }, resolve: (p, _a, ctx) => offerAnswers(ctx.user, (p as MoneyParent).pianoId) }),
    suggestedPrice: guarded('setPrices', 'the suggested asking price', { type: AskingPriceSuggestion, resolve: (p, _a, ctx) => suggestedPrice(ctx.pricing, ctx.user, (p as MoneyParent).pianoId) }),
    priceHistory: guarded('setPrices', 'the price history', { type: new GraphQLList(nn(PriceChangeType)), extensions: { maxRows: MAX_PRICE_CHANGES_LISTED }, resolve: (p, _a, ctx) => priceHistory(ctx.user, (p as MoneyParent).pianoId) }),
    costCurrency: costField('the cost currency', (r) => r.currency, GraphQLString),
    mixedCurrencies: costField('the cost currencies', (r) => r.mixedCurrencies, GraphQLBoolean),
    allowanceMinor: costField('the trade-in allowance', (r) => r.allowanceMinor),
    reconEstimateMinor: costField('the reconditioning estimate', (r) => r.reconEstimateMinor),
    labourMinor: costField('the workshop labour', (r) => r.labourMinor),
    partsMinor: costField('the parts', (r) => r.partsMinor),
    reconActualMinor: costField('the reconditioning actual', (r) => r.reconActualMinor),
    costBasisMinor: costField('the cost basis', (r) => r.costBasisMinor),
    marginMinor: costField('the margin', (r) => r.marginMinor),
  },
});

const money = (what: string, key: keyof StockRow): Field => guarded('readCostsAndMargins', what, { type: GraphQLInt, resolve: (r) => (r as StockRow)[key] });

const StockRowType = new GraphQLObjectType({
  name: 'StockRow',
  description: 'One piano in the manager’s stock table; money in minor units of `currency`, null where there is none yet.',
  fields: {
    pianoId: { type: nn(GraphQLInt) },
    stockNumber: { type: nn(GraphQLString) },
    maker: { type: nn(GraphQLString) },
    model: { type: GraphQLString },
    serialNumber: { type: GraphQLString },
    kind: { type: nn(GraphQLString) },
    sizeCm: { type: GraphQLInt },
    stage: { type: nn(GraphQLString) },
    daysInStock: { type: nn(GraphQLInt) },
    readiness: { type: GraphQLString, description: 'The newest assessment’s verdict; null when not assessed.' },
    provisional: { type: nn(GraphQLBoolean) },
    currency: { type: GraphQLString },
    mixedCurrencies: { type: nn(GraphQLBoolean) },
    askingPriceMinor: { type: GraphQLInt },
    reconEstimateMinor: money('the reconditioning estimate', 'reconEstimateMinor'),
    labourMinor: money('the workshop labour', 'labourMinor'),
    partsMinor: money('the parts', 'partsMinor'),
    reconActualMinor: money('the reconditioning actual', 'reconActualMinor'),
    allowanceMinor: money('the trade-in allowance', 'allowanceMinor'),
    costBasisMinor: money('the cost basis', 'costBasisMinor'),
    marginMinor: money('the margin', 'marginMinor'),
  },
});

const StockTablePage = new GraphQLObjectType({
  name: 'StockTablePage',
  fields: {
    total: { type: nn(GraphQLInt) },
    offset: { type: nn(GraphQLInt), resolve: (p: { query: { offset: number; limit: number } }) => p.query.offset },
    limit: { type: nn(GraphQLInt), resolve: (p: { query: { offset: number; limit: number } }) => p.query.limit },
    rows: { type: list(StockRowType), extensions: { maxRows: MAX_STOCK_PAGE } },
  },
});

const StockSortEnum = new GraphQLEnumType({ name: 'StockSort', values: Object.fromEntries(STOCK_SORTS.map((s) => [s, {}])) });

const StockTableQuery = new GraphQLInputObjectType({
  name: 'StockTableQuery',
  description: 'Filters (stages, kinds, readiness verdicts or "none"; a search in stock number, maker, model and serial), one sort, and the page.',
  fields: {
    stages: { type: inList(GraphQLString) },
    kinds: { type: inList(GraphQLString) },
    readiness: { type: inList(GraphQLString) },
    search: { type: GraphQLString },
    sort: { type: StockSortEnum },
    descending: { type: GraphQLBoolean },
    limit: { type: GraphQLInt },
    offset: { type: GraphQLInt },
  },
});

const ChartBar = new GraphQLObjectType({
  name: 'ChartBar',
  fields: { key: { type: nn(GraphQLString) }, label: { type: nn(GraphQLString) }, value: { type: nn(GraphQLInt) }, count: { type: nn(GraphQLInt) }, currency: { type: GraphQLString } },
});
const MarginBar = new GraphQLObjectType({
  name: 'MarginBar',
  fields: { key: { type: nn(GraphQLString) }, label: { type: nn(GraphQLString) }, pianoId: { type: nn(GraphQLInt) }, value: { type: nn(GraphQLInt) }, currency: { type: GraphQLString } },
});
const EstimateBar = new GraphQLObjectType({
  name: 'EstimateBar',
  fields: {
    key: { type: nn(GraphQLString) },
    label: { type: nn(GraphQLString) },
    count: { type: nn(GraphQLInt), description: 'Finished items of this task.' },
    currency: { type: GraphQLString },
    estimatedMinor: { type: nn(GraphQLInt) },
    actualMinor: { type: nn(GraphQLInt) },
  },
});
const StockChartsType = new GraphQLObjectType({
  name: 'StockCharts',
  fields: {
    byStage: { type: list(ChartBar), extensions: { maxRows: 10 } },
    ageing: { type: list(ChartBar), extensions: { maxRows: 4 } },
    margins: { type: list(MarginBar), extensions: { maxRows: MARGIN_BARS } },
    marginsTotal: { type: nn(GraphQLInt), description: 'Pianos on hand with a margin; the chart shows the thinnest.' },
    estimates: { type: list(EstimateBar), extensions: { maxRows: 20 } },
    deposits: { type: list(ChartBar), extensions: { maxRows: 6 } },
  },
});

// ---- pricing rules, out and in: the same shape ----

const ruleTypes = (suffix: '' | 'Input') => {
  const Obj = (suffix ? GraphQLInputObjectType : GraphQLObjectType) as unknown as new (c: { name: string; fields: Record<string, { type: never }> }) => never;
  const make = (name: string, fields: Record<string, unknown>) => new Obj({ name: `${name}${suffix}`, fields: fields as Record<string, { type: never }> });
  const int = { type: nn(GraphQLInt) };
  const float = { type: nn(GraphQLFloat) };
  const SizeBand = make('PricingSizeBand', { upToCm: { type: GraphQLInt }, baseMinor: int });
  const bandsOf = (t: never) => ({ type: nn(new GraphQLList(nn(t))) });
  const AgeBand = make('PricingAgeBand', { upToYears: { type: GraphQLInt }, factor: float });
  const WorkBand = make('PricingWorkShareBand', { upToPct: { type: GraphQLFloat }, factor: float });
  return make('PricingRules', {
    ...(suffix ? {} : { version: { type: nn(GraphQLString) } }),
    currency: { type: nn(GraphQLString) },
    baseRetail: { type: nn(make('PricingBaseRetail', { upright: bandsOf(SizeBand), grand: bandsOf(SizeBand) })) },
    ageBands: bandsOf(AgeBand),
    unknownAgeFactor: float,
    conditionFactors: { type: nn(make('PricingConditionFactors', { floor: float, work_first: float, unjudged: float })) },
    workShareBands: bandsOf(WorkBand),
    targetMargin: float,
    holdingCostPerDayMinor: int,
    daysToSell: { type: nn(make('PricingDaysToSell', { upright: int, grand: int })) },
    priceEnding: { type: nn(make('PricingPriceEnding', { stepMinor: int, lessMinor: int })) },
    offerStepMinor: int,
    wholesale: { type: nn(make('PricingWholesale', { factor: float, daysToSell: int })) },
  });
};
const PricingRulesType = ruleTypes('') as unknown as GraphQLObjectType;
const PricingRulesInput = ruleTypes('Input') as unknown as GraphQLInputObjectType;

const OfferAnswerInput = new GraphQLInputObjectType({
  name: 'OfferAnswerInput',
  description: 'The seller’s answer to the offer on screen: `offeredMinor` is the figure shown; a counter carries the seller’s figure, an agreement the settled one.',
  fields: {
    pianoId: { type: nn(GraphQLInt) },
    answer: { type: nn(OfferAnswerKind) },
    offeredMinor: { type: nn(GraphQLInt) },
    counterMinor: { type: GraphQLInt },
    agreedMinor: { type: GraphQLInt },
    note: { type: GraphQLString },
  },
});

const AskingPriceChangeInput = new GraphQLInputObjectType({
  name: 'AskingPriceChangeInput',
  fields: { pianoId: { type: nn(GraphQLInt) }, askingPriceMinor: { type: nn(GraphQLInt) }, currency: { type: nn(GraphQLString) }, reason: { type: nn(GraphQLString) } },
});

const AskingPriceChange = new GraphQLObjectType({
  name: 'AskingPriceChangeResult',
  fields: { pianoId: { type: nn(GraphQLInt) }, askingPriceMinor: { type: GraphQLInt }, priceCurrency: { type: GraphQLString }, change: { type: nn(PriceChangeType) } },
});

export const pricingGraph: GraphDomain = {
  readModels: [],
  queries: () => ({
    pianoMoney: {
      type: PianoMoney,
      description: 'One piano’s asking price, offer, price history and costs; each money field checks the reader’s role on its own.',
      args: { pianoId: { type: nn(GraphQLInt) } },
      resolve: async (_r, a: { pianoId: number }, ctx) => {
        if (!can(ctx.user.role, 'readPianos')) throw notAllowed('read pianos');
        const piano = await Piano.query().findById(a.pianoId).select('id', 'asking_price_minor', 'price_currency');
        return piano ? { pianoId: piano.id, askingPriceMinor: piano.askingPriceMinor, priceCurrency: piano.priceCurrency } : null;
      },
    },
    stockTable: {
      type: nn(StockTablePage),
      description: 'The manager’s stock table: every piano with its costs and margin, filtered, sorted and paged on the server.',
      args: { query: { type: StockTableQuery } },
      resolve: (_r, a: { query?: StockQueryInput | null }, ctx) => stockTable(ctx.pricing, ctx.user, a.query),
    },
    stockCharts: {
      type: nn(StockChartsType),
      description: 'Stock by stage, ageing of the stock on hand, the thinnest margins, workshop estimates against actuals by task, and cash held in deposits.',
      resolve: (_r, _a, ctx) => stockCharts(ctx.pricing, ctx.user),
    },
    pricingRules: { type: nn(PricingRulesType), description: 'The pricing rules in force (shop defaults until a manager changes them).', resolve: (_r, _a, ctx) => readPricingRules(ctx.user) },
  }),
  mutations: () => ({
    recordOfferAnswer: {
      type: nn(TradeInAnswerType),
      args: { input: { type: nn(OfferAnswerInput) } },
      resolve: (_r, a: { input: unknown }, ctx) => recordOfferAnswer(ctx.pricing, ctx.user, { ...(a.input as object) }),
    },
    changeAskingPrice: {
      type: nn(AskingPriceChange),
      description: 'Sets a piano’s asking price; every change is kept with who, when and why.',
      args: { input: { type: nn(AskingPriceChangeInput) } },
      resolve: async (_r, a: { input: unknown }, ctx) => {
        const { piano, change } = await changeAskingPrice(ctx.pricing, ctx.user, { ...(a.input as object) });
        return { pianoId: piano.id, askingPriceMinor: piano.askingPriceMinor, priceCurrency: piano.priceCurrency, change };
      },
    },
    setPricingRules: {
      type: nn(PricingRulesType),
      args: { rules: { type: nn(PricingRulesInput) } },
      resolve: (_r, a: { rules: unknown }, ctx) => setPricingRules(ctx.user, JSON.parse(JSON.stringify(a.rules))),
    },
  }),
};
