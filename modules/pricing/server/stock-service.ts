import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { READINESS, type Readiness } from '@/modules/assessment/core/grade';
import { WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import { STAGES, STAGE_LABELS, type Stage } from '@/modules/pianos/core/piano';
import { Piano } from '@/modules/pianos/server/piano-model';
import { AGEING_BUCKETS, GONE_STAGES, MAX_EXPORT_ROWS, MONEY_SORTS, stockQueryInput, type StockQuery, type StockQueryInput, type StockRow, type StockSort } from '@/modules/pricing/core/stock-table';
import type { Currency } from '@/modules/shop/core/money';
import { notAllowed } from '@/server/errors';

import type { PricingDeps } from './pricing-service';

// Values checked against their enums before they get here, written as PostgreSQL array literals.
const pgArray = (values: readonly string[]) => `{${values.join(',')}}`;
const likePattern = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

const READINESS_ORDER = pgArray(READINESS);
const STAGE_ORDER = pgArray(STAGES);

// Every column a sort can name, as an SQL expression over the row (`f` the piano, `m` its money).
const SORT_SQL: Record<StockSort, string[]> = {
  stockNumber: ['f.stock_number'],
  makerModel: ['lower(f.maker)', "lower(coalesce(f.model, ''))"],
  kindSize: ['f.kind', 'f.size_cm'],
  stage: [`array_position('${STAGE_ORDER}'::text[], f.stage)`],
  daysInStock: ['f.days_in_stock'],
  readiness: [`array_position('${READINESS_ORDER}'::text[], f.readiness)`],
  askingPrice: ['f.asking_price_minor'],
  reconEstimate: ['m.recon_estimate_minor'],
  reconActual: ['m.recon_actual_minor'],
  costBasis: ['m.cost_basis_minor'],
  margin: ['m.margin_minor'],
};

function orderBy(sort: StockSort, descending: boolean): string {
  const dir = descending ? 'desc' : 'asc';
  return [...SORT_SQL[sort].map((k) => `${k} ${dir} nulls last`), `f.id ${dir}`].join(', ');
}

// The pianos the filter keeps, with their newest verdict and days in stock (to the day they left, once gone).
const FILTERED = `
  filtered as (
    select p.id, p.stock_number, p.maker, p.model, p.serial_number, p.kind, p.size_cm, p.stage,
      p.asking_price_minor, p.price_currency, a.readiness, coalesce(a.provisional, false) as provisional,
      greatest(0, floor(extract(epoch from (coalesce(
        case when p.stage = any(:gone::text[]) then (select min(sm.at) from stage_moves sm where sm.piano_id = p.id and sm.to_stage = any(:gone::text[])) end,
        :now::timestamptz) - p.created_at)) / 86400))::int as days_in_stock
    from pianos p
    left join lateral (
      select coalesce(grade->>'readiness', 'unjudged') as readiness, (grade->>'provisional')::boolean as provisional
      from assessments where piano_id = p.id order by version desc limit 1
    ) a on true
    where (:id::int is null or p.id = :id::int)
      and (:stages::text[] is null or p.stage = any(:stages::text[]))
      and (:kinds::text[] is null or p.kind = any(:kinds::text[]))
      and (:readiness::text[] is null or coalesce(a.readiness, 'none') = any(:readiness::text[]))
      and (:search::text is null or p.stock_number ilike :search or p.maker ilike :search or p.model ilike :search or p.serial_number ilike :search)
  )`;

// Each piano's work (estimate, labour logged at its plan's rate, parts), its newest trade-in answer, and
// from those the cost basis and the margin; items priced one by one as the overruns price them.
const MONEY = (scope: string) => `
  items as (
    select wi.piano_id, wp.currency, wi.status,
      round(wi.estimated_hours * wp.hourly_rate_minor) + wi.estimated_parts_minor as estimate,
      round(coalesce(l.minutes, 0) * wp.hourly_rate_minor / 60.0) as labour,
      coalesce(pt.minor, 0) as parts
    from work_items wi
    join work_plans wp on wp.id = wi.plan_id
    left join lateral (
      select sum(coalesce(te.minutes, round(extract(epoch from (coalesce(te.ended_at, :now::timestamptz) - te.started_at)) / 60)::int)) as minutes
      from time_entries te where te.work_item_id = wi.id
    ) l on true
    left join lateral (select sum(pu.cost_minor * pu.quantity) as minor from part_uses pu where pu.work_item_id = wi.id) pt on true
    where wi.piano_id in (select id from ${scope})
  ), work as (
    select piano_id, min(currency) as currency, max(currency) as last_currency,
      sum(estimate)::bigint as estimate, sum(labour)::bigint as labour, sum(parts)::bigint as parts,
      sum(case when status <> 'done' then greatest(estimate - labour - parts, 0) else 0 end)::bigint as still_to_do
    from items group by piano_id
  ), answers as (
    select distinct on (piano_id) piano_id, allowance_minor, currency
    from trade_in_answers where piano_id in (select id from ${scope})
    order by piano_id, recorded_at desc, id desc
  ), money as (
    select s.id,
      w.estimate as recon_estimate_minor, coalesce(w.labour, 0) as labour_minor, coalesce(w.parts, 0) as parts_minor,
      coalesce(w.labour, 0) + coalesce(w.parts, 0) as recon_actual_minor, coalesce(w.still_to_do, 0) as still_to_do_minor,
      an.allowance_minor,
      coalesce(s.price_currency, w.currency, an.currency) as currency,
      (select count(distinct c) from unnest(array[s.price_currency, w.currency, w.last_currency, an.currency]) c) > 1 as mixed
    from ${scope} s left join work w on w.piano_id = s.id left join answers an on an.piano_id = s.id
  ), m as (
    select money.*,
      case when not mixed and allowance_minor is not null then allowance_minor + recon_actual_minor end as cost_basis_minor,
      case when not mixed and allowance_minor is not null and s.asking_price_minor is not null
        then s.asking_price_minor - allowance_minor - recon_actual_minor - still_to_do_minor end as margin_minor
    from money join ${scope} s on s.id = money.id
  )`;

const ROW_COLUMNS = `f.id, f.stock_number, f.maker, f.model, f.serial_number, f.kind, f.size_cm, f.stage, f.days_in_stock, f.readiness, f.provisional,
  f.asking_price_minor, m.currency, m.mixed, m.recon_estimate_minor, m.labour_minor, m.parts_minor, m.recon_actual_minor, m.allowance_minor, m.cost_basis_minor, m.margin_minor`;

/**
 * One statement for a page of the stock table. Sorted by a piano's own column, the page is cut first
 * and only its pianos' money is summed; sorted by money, every filtered piano's money is summed, then
 * ordered and cut. Both count the filtered pianos in the same statement.
 */
function stockStatement(query: StockQuery, marginOnly = false): string {
  const order = orderBy(query.sort, query.descending);
  if (!MONEY_SORTS.includes(query.sort) && !marginOnly) {
    return `with ${FILTERED}, page as (
      select f.*, count(*) over () as total from filtered f order by ${order} limit :limit offset :offset
    ), ${MONEY('page')}
    select ${ROW_COLUMNS}, f.total from page f join m on m.id = f.id order by ${order}`;
  }
  return `with ${FILTERED}, ${MONEY('filtered')}
    select ${ROW_COLUMNS}, count(*) over () as total from filtered f join m on m.id = f.id
    ${marginOnly ? 'where m.margin_minor is not null' : ''} order by ${order} limit :limit offset :offset`;
}

interface RawRow {
  id: number;
  stock_number: string;
  maker: string;
  model: string | null;
  serial_number: string | null;
  kind: StockRow['kind'];
  size_cm: number | null;
  stage: Stage;
  days_in_stock: number;
  readiness: Readiness | null;
  provisional: boolean;
  asking_price_minor: number | null;
  currency: Currency | null;
  mixed: boolean;
  recon_estimate_minor: string | number | null;
  labour_minor: string | number;
  parts_minor: string | number;
  recon_actual_minor: string | number;
  allowance_minor: number | null;
  cost_basis_minor: string | number | null;
  margin_minor: string | number | null;
  total: string | number;
}

const num = (v: string | number | null) => (v == null ? null : Number(v));

function toRow(r: RawRow): StockRow {
  return {
    pianoId: r.id,
    stockNumber: r.stock_number,
    maker: r.maker,
    model: r.model,
    serialNumber: r.serial_number,
    kind: r.kind,
    sizeCm: r.size_cm,
    stage: r.stage,
    daysInStock: r.days_in_stock,
    readiness: r.readiness,
    provisional: r.provisional,
    currency: r.currency,
    mixedCurrencies: r.mixed,
    reconEstimateMinor: num(r.recon_estimate_minor),
    labourMinor: Number(r.labour_minor),
    partsMinor: Number(r.parts_minor),
    reconActualMinor: Number(r.recon_actual_minor),
    allowanceMinor: r.allowance_minor,
    costBasisMinor: num(r.cost_basis_minor),
    askingPriceMinor: r.asking_price_minor,
    marginMinor: num(r.margin_minor),
  };
}

export interface StockPage {
  total: number;
  rows: StockRow[];
  query: StockQuery;
}

function bindingsOf(query: StockQuery, now: Date, pianoId: number | null = null) {
  return {
    id: pianoId,
    gone: pgArray(GONE_STAGES),
    now: now.toISOString(),
    stages: query.stages?.length ? pgArray(query.stages) : null,
    kinds: query.kinds?.length ? pgArray(query.kinds) : null,
    readiness: query.readiness?.length ? pgArray(query.readiness) : null,
    search: query.search ? likePattern(query.search) : null,
    limit: query.limit,
    offset: query.offset,
  };
}

async function runStock(query: StockQuery, now: Date, opts: { pianoId?: number; marginOnly?: boolean } = {}): Promise<StockPage> {
  const knex = Piano.knex();
  const bindings = bindingsOf(query, now, opts.pianoId ?? null);
  const { rows } = (await knex.raw(stockStatement(query, opts.marginOnly), bindings)) as { rows: RawRow[] };
  let total = rows.length ? Number(rows[0].total) : 0;
  // A page past the end has no row to carry the count: count once more.
  if (!rows.length && query.offset > 0) total = Number((await knex.raw(`with ${FILTERED} select count(*) as n from filtered`, bindings)).rows[0].n);
  return { total, rows: rows.map(toRow), query };
}

export function parseStockQuery(raw: StockQueryInput | null | undefined): StockQuery {
  return stockQueryInput.parse(raw ?? {});
}

/** One page of the manager's stock table: every piano, filtered, sorted and paged on the server. */
export async function stockTable(deps: PricingDeps, actor: Actor, raw: StockQueryInput | null | undefined): Promise<StockPage> {
  if (!can(actor.role, 'readCostsAndMargins')) throw notAllowed('see the stock table with its costs and margins');
  return runStock(parseStockQuery(raw), deps.clock.now());
}

/** Every filtered row, in the table's order, for the CSV export (at most MAX_EXPORT_ROWS). */
export async function stockExport(deps: PricingDeps, actor: Actor, raw: StockQueryInput): Promise<StockPage> {
  if (!can(actor.role, 'readCostsAndMargins')) throw notAllowed('export the stock table with its costs and margins');
  const query = parseStockQuery({ ...raw, limit: undefined, offset: undefined });
  return runStock({ ...query, limit: MAX_EXPORT_ROWS, offset: 0 }, deps.clock.now());
}

/** One piano's money as the stock table reckons it (the caller checks the reader's rights). */
export async function pianoStockRow(deps: PricingDeps, pianoId: number): Promise<StockRow | null> {
  const page = await runStock(parseStockQuery({}), deps.clock.now(), { pianoId });
  return page.rows[0] ?? null;
}

export interface ChartBar {
  key: string;
  label: string;
  value: number;
  count: number;
  currency: string | null;
}

export interface StockCharts {
  byStage: ChartBar[];
  ageing: ChartBar[];
  margins: (ChartBar & { pianoId: number })[];
  marginsTotal: number;
  estimates: (ChartBar & { estimatedMinor: number; actualMinor: number })[];
  deposits: ChartBar[];
}

export const MARGIN_BARS = 15;
const ON_HAND = STAGES.filter((s) => !GONE_STAGES.includes(s));

/** The manager's charts: stock by stage, ageing of the stock on hand, the thinnest margins, estimates against actuals, deposits held. */
export async function stockCharts(deps: PricingDeps, actor: Actor): Promise<StockCharts> {
  if (!can(actor.role, 'readCostsAndMargins')) throw notAllowed('see the stock charts with their costs and margins');
  const knex = Piano.knex();
  const now = deps.clock.now().toISOString();
  const stageRows = (await knex('pianos').select('stage').count('* as n').groupBy('stage')) as { stage: Stage; n: string }[];
  const byStage = STAGES.map((s) => ({ key: s, label: STAGE_LABELS[s], value: Number(stageRows.find((r) => r.stage === s)?.n ?? 0), count: Number(stageRows.find((r) => r.stage === s)?.n ?? 0), currency: null }));

  const days = `floor(extract(epoch from (:now::timestamptz - created_at)) / 86400)`;
  const buckets = AGEING_BUCKETS.map((b, n) => {
    const from = n === 0 ? null : AGEING_BUCKETS[n - 1].upTo;
    const cond = [from != null ? `${days} > ${from}` : null, b.upTo != null ? `${days} <= ${b.upTo}` : null].filter(Boolean).join(' and ');
    return `count(*) filter (where ${cond}) as ${b.key}`;
  });
  const ageingRow = (await knex.raw(`select ${buckets.join(', ')} from pianos where stage = any(:onHand::text[])`, { now, onHand: pgArray(ON_HAND) })).rows[0] as Record<string, string>;
  const ageing = AGEING_BUCKETS.map((b) => ({ key: b.key, label: b.label, value: Number(ageingRow[b.key]), count: Number(ageingRow[b.key]), currency: null }));

  const marginPage = await runStock(parseStockQuery({ stages: ON_HAND, sort: 'margin', limit: MARGIN_BARS }), deps.clock.now(), { marginOnly: true });
  const margins = marginPage.rows.map((r) => ({ key: r.stockNumber, pianoId: r.pianoId, label: `${r.stockNumber} ${[r.maker, r.model].filter(Boolean).join(' ')}`, value: r.marginMinor ?? 0, count: 1, currency: r.currency }));

  const taskRows = (
    await knex.raw(
      `select wi.task, wp.currency, count(*) as items,
        sum(round(wi.estimated_hours * wp.hourly_rate_minor) + wi.estimated_parts_minor)::bigint as estimated,
        sum(round(coalesce(l.minutes, 0) * wp.hourly_rate_minor / 60.0) + coalesce(pt.minor, 0))::bigint as actual
      from work_items wi
      join work_plans wp on wp.id = wi.plan_id
      left join (select work_item_id, sum(minutes) as minutes from time_entries where minutes is not null group by work_item_id) l on l.work_item_id = wi.id
      left join (select work_item_id, sum(cost_minor * quantity) as minor from part_uses group by work_item_id) pt on pt.work_item_id = wi.id
      where wi.status = 'done'
      group by wi.task, wp.currency order by wi.task, wp.currency`,
    )
  ).rows as { task: WorkTask; currency: string; items: string; estimated: string; actual: string }[];
  const estimates = taskRows.map((r) => ({
    key: `${r.task}-${r.currency}`,
    label: WORK_TASK_LABELS[r.task] ?? r.task,
    value: Number(r.actual),
    count: Number(r.items),
    currency: r.currency,
    estimatedMinor: Number(r.estimated),
    actualMinor: Number(r.actual),
  }));

  const depositRows = (
    await knex.raw(
      `select case when status = 'refunding' then 'refunding' when hold_expires_at <= ?::timestamptz + interval '7 days' then 'holding_soon' else 'holding' end as key,
        currency, count(*) as n, sum(amount_minor - refunded_minor)::bigint as held
      from deposits where status in ('holding', 'refunding') group by 1, currency order by 1, currency`,
      [now],
    )
  ).rows as { key: string; currency: string; n: string; held: string }[];
  const DEPOSIT_WORDS: Record<string, string> = { holding_soon: 'Holding a piano, hold ends within 7 days', holding: 'Holding a piano, hold ends later', refunding: 'Being refunded' };
  const deposits = depositRows.map((r) => ({ key: `${r.key}-${r.currency}`, label: DEPOSIT_WORDS[r.key], value: Number(r.held), count: Number(r.n), currency: r.currency }));

  return { byStage, ageing, margins, marginsTotal: marginPage.total, estimates, deposits };
}

