import { z } from '@/modules/input/core/zod';

import { READINESS, READINESS_WORDS, type Readiness } from '@/modules/assessment/core/grade';
import { lineText } from '@/modules/input/core/text';
import { PIANO_KINDS, STAGES, STAGE_LABELS, type PianoKind, type Stage } from '@/modules/pianos/core/piano';
import { CURRENCY_DIGITS, type Currency } from '@/modules/shop/core/money';

/** The columns the stock table sorts by; the server orders the whole filtered stock by one of them. */
export const STOCK_SORTS = [
  'stockNumber',
  'makerModel',
  'kindSize',
  'stage',
  'daysInStock',
  'readiness',
  'reconEstimate',
  'reconActual',
  'costBasis',
  'askingPrice',
  'margin',
] as const;
export type StockSort = (typeof STOCK_SORTS)[number];
export const STOCK_SORT_LABELS: Record<StockSort, string> = {
  stockNumber: 'Stock number',
  makerModel: 'Maker and model',
  kindSize: 'Kind and size',
  stage: 'Stage',
  daysInStock: 'Days in stock',
  readiness: 'Readiness',
  reconEstimate: 'Work estimate',
  reconActual: 'Work so far',
  costBasis: 'Cost basis',
  askingPrice: 'Asking price',
  margin: 'Expected margin',
};
/** Sorts that need each piano's money summed first; the others order the pianos and sum one page. */
export const MONEY_SORTS: readonly StockSort[] = ['reconEstimate', 'reconActual', 'costBasis', 'margin'];

/** A piano with no assessment yet is "not assessed": a filter value apart from the four verdicts. */
export const READINESS_FILTERS = [...READINESS, 'none'] as const;
export type ReadinessFilter = (typeof READINESS_FILTERS)[number];
export const READINESS_FILTER_WORDS: Record<ReadinessFilter, string> = { ...READINESS_WORDS, none: 'Not assessed' };

export const STOCK_PAGE = 25;
export const MAX_STOCK_PAGE = 100;
/** The most rows one CSV export holds; the filter narrows a larger stock. */
export const MAX_EXPORT_ROWS = 20_000;

export const stockQueryInput = z
  .object({
    stages: z.array(z.enum(STAGES, { message: `must be one of ${STAGES.join(', ')}` })).max(STAGES.length).nullish(),
    kinds: z.array(z.enum(PIANO_KINDS, { message: 'must be upright or grand' })).max(PIANO_KINDS.length).nullish(),
    readiness: z.array(z.enum(READINESS_FILTERS, { message: `must be one of ${READINESS_FILTERS.join(', ')}` })).max(READINESS_FILTERS.length).nullish(),
    search: lineText().trim().max(80, 'must be at most 80 characters').nullish(),
    sort: z.enum(STOCK_SORTS, { message: `must be one of ${STOCK_SORTS.join(', ')}` }).default('stockNumber'),
    descending: z.boolean().default(false),
    limit: z.number().int().min(1, `must be from 1 to ${MAX_STOCK_PAGE}`).max(MAX_STOCK_PAGE, `must be from 1 to ${MAX_STOCK_PAGE}`).default(STOCK_PAGE),
    offset: z.number().int().min(0, 'must be 0 or more').max(1_000_000).default(0),
  })
  .strict();
export type StockQueryInput = z.input<typeof stockQueryInput>;
export type StockQuery = z.output<typeof stockQueryInput>;

/** One piano as the stock table shows it: money in minor units of `currency`, null where there is none yet. */
export interface StockRow {
  pianoId: number;
  stockNumber: string;
  maker: string;
  model: string | null;
  serialNumber: string | null;
  kind: PianoKind;
  sizeCm: number | null;
  stage: Stage;
  daysInStock: number;
  readiness: Readiness | null;
  provisional: boolean;
  currency: Currency | null;
  /** true when the piano's money is in more than one currency: no sum is made of it */
  mixedCurrencies: boolean;
  reconEstimateMinor: number | null;
  labourMinor: number;
  partsMinor: number;
  reconActualMinor: number;
  allowanceMinor: number | null;
  costBasisMinor: number | null;
  askingPriceMinor: number | null;
  marginMinor: number | null;
}

/** The ageing buckets of the stock on hand, by days since it was taken in. */
export const AGEING_BUCKETS = [
  { key: 'd0_30', label: '0-30 days', upTo: 30 },
  { key: 'd31_60', label: '31-60 days', upTo: 60 },
  { key: 'd61_90', label: '61-90 days', upTo: 90 },
  { key: 'd91', label: 'Over 90 days', upTo: null },
] as const;

export function ageingBucket(days: number): (typeof AGEING_BUCKETS)[number]['key'] {
  return AGEING_BUCKETS.find((b) => b.upTo == null || days <= b.upTo)!.key;
}

/** Stages a piano has left the stock in: it counts as sold or gone, not on hand. */
export const GONE_STAGES: readonly Stage[] = ['sold', 'delivered', 'wholesaled', 'returned_to_owner'];

// A cell a spreadsheet would read as a formula is written as text; a plain number (a negative margin) stays one.
const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^-?\d+(\.\d+)?$/;
function csvCell(value: string | number | null): string {
  if (value == null) return '';
  const text = typeof value === 'number' ? String(value) : FORMULA_START.test(value) && !PLAIN_NUMBER.test(value) ? `'${value}` : value;
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Minor units as a plain decimal in the currency's own digits (ISO 4217), for a spreadsheet. */
export function csvMoney(minor: number | null, currency: Currency | null): string {
  if (minor == null || currency == null) return '';
  const digits = CURRENCY_DIGITS[currency];
  const sign = minor < 0 ? '-' : '';
  const abs = Math.abs(minor);
  if (!digits) return `${sign}${abs}`;
  const unit = 10 ** digits;
  return `${sign}${Math.floor(abs / unit)}.${String(abs % unit).padStart(digits, '0')}`;
}

export const CSV_COLUMNS = [
  'Stock number',
  'Maker',
  'Model',
  'Serial number',
  'Kind',
  'Size (cm)',
  'Stage',
  'Days in stock',
  'Readiness',
  'Provisional',
  'Currency',
  'Work estimate',
  'Work so far',
  'Trade-in allowance',
  'Cost basis',
  'Asking price',
  'Expected margin',
] as const;

/** The rows as CSV (RFC 4180: comma-separated, CRLF line ends, quotes doubled), money in major units. */
export function stockCsv(rows: readonly StockRow[]): string {
  const lines = [CSV_COLUMNS.map(csvCell).join(',')];
  for (const r of rows) {
    const m = (minor: number | null) => csvMoney(minor, r.currency);
    lines.push(
      [
        r.stockNumber,
        r.maker,
        r.model,
        r.serialNumber,
        r.kind,
        r.sizeCm,
        STAGE_LABELS[r.stage],
        r.daysInStock,
        r.readiness ? READINESS_WORDS[r.readiness] : READINESS_FILTER_WORDS.none,
        r.provisional ? 'yes' : 'no',
        r.currency,
        m(r.reconEstimateMinor),
        m(r.reconActualMinor),
        m(r.allowanceMinor),
        m(r.costBasisMinor),
        m(r.askingPriceMinor),
        m(r.marginMinor),
      ]
        .map(csvCell)
        .join(','),
    );
  }
  return `${lines.join('\r\n')}\r\n`;
}
