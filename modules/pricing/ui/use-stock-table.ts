import { useQuery } from 'urql';

import type { StockQueryInput, StockRow } from '@/modules/pricing/core/stock-table';

import { PRICING_CONTEXT } from './use-pricing-mutation';

const ROW_FIELDS = 'pianoId stockNumber maker model serialNumber kind sizeCm stage daysInStock readiness provisional currency mixedCurrencies askingPriceMinor reconEstimateMinor labourMinor partsMinor reconActualMinor allowanceMinor costBasisMinor marginMinor';
export const STOCK_TABLE_QUERY = `query StockTable($query: StockTableQuery) { stockTable(query: $query) { total offset limit rows { ${ROW_FIELDS} } } }`;
export const FIRST_STOCK_VARIABLES = { query: { sort: 'stockNumber', descending: false, limit: 25, offset: 0 } };

export interface StockPage {
  total: number;
  offset: number;
  limit: number;
  rows: StockRow[];
}

/** One page of the manager's stock table, sorted and filtered on the server. */
export function useStockTable(query: StockQueryInput) {
  const [result] = useQuery<{ stockTable: StockPage }>({ query: STOCK_TABLE_QUERY, variables: { query }, context: PRICING_CONTEXT, requestPolicy: 'cache-and-network' });
  return { page: result.data?.stockTable ?? null, fetching: result.fetching, error: result.error };
}

export const STOCK_CHARTS_QUERY =
  'query StockCharts { stockCharts { byStage { key label value count } ageing { key label value count } margins { key label pianoId value currency } marginsTotal estimates { key label count currency estimatedMinor actualMinor } deposits { key label value count currency } } }';

export interface ChartBar {
  key: string;
  label: string;
  value: number;
  count: number;
  currency?: string | null;
}
export interface StockCharts {
  byStage: ChartBar[];
  ageing: ChartBar[];
  margins: (ChartBar & { pianoId: number })[];
  marginsTotal: number;
  estimates: { key: string; label: string; count: number; currency: string | null; estimatedMinor: number; actualMinor: number }[];
  deposits: ChartBar[];
}

export function useStockCharts() {
  const [result] = useQuery<{ stockCharts: StockCharts }>({ query: STOCK_CHARTS_QUERY, context: PRICING_CONTEXT, requestPolicy: 'cache-and-network' });
  return { charts: result.data?.stockCharts ?? null, error: result.error };
}

/** The address of the CSV of the rows the table shows: the same filter and sort, every page. */
export function stockCsvPath(query: StockQueryInput): string {
  const params = new URLSearchParams();
  for (const key of ['stages', 'kinds', 'readiness'] as const) {
    const list = query[key];
    if (list?.length) params.set(key, list.join(','));
  }
  if (query.search) params.set('search', query.search);
  if (query.sort) params.set('sort', query.sort);
  if (query.descending != null) params.set('descending', String(query.descending));
  const q = params.toString();
  return `/api/stock/export.csv${q ? `?${q}` : ''}`;
}
