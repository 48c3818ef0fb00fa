import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { READINESS_WORDS } from '@/modules/assessment/core/grade';
import { money } from '@/modules/disclosure/ui/disclosure-format';
import { openStaffPdf } from '@/modules/disclosure/ui/staff-documents';
import { PIANO_KINDS, STAGES, STAGE_LABELS, type PianoKind, type Stage } from '@/modules/pianos/core/piano';
import { formatKindAndSize, makerAndModel } from '@/modules/pianos/ui/piano-format';
import { READINESS_FILTERS, READINESS_FILTER_WORDS, STOCK_PAGE, STOCK_SORTS, STOCK_SORT_LABELS, type ReadinessFilter, type StockQueryInput, type StockRow, type StockSort } from '@/modules/pricing/core/stock-table';
import { PALETTE, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { LinkPressable } from '@/modules/theme/ui/link-pressable';
import { MultiChoice } from '@/modules/theme/ui/multi-choice';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Pager } from '@/modules/theme/ui/pager';
import { rowTable } from '@/modules/theme/ui/row-table';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { stockCsvPath, useStockTable } from './use-stock-table';

const KIND_LABELS: Record<PianoKind, string> = { upright: 'Upright', grand: 'Grand' };
const cash = (minor: number | null, r: StockRow, none = '—') => (minor != null && r.currency ? `${minor < 0 ? '−' : ''}${money(Math.abs(minor), r.currency)}` : none);
// In the wide table a page in one currency names it once, above the table, and its cells keep the numbers.
const plain = (minor: number | null, r: StockRow, none = '—') => (minor != null && r.currency ? `${minor < 0 ? '−' : ''}${money(Math.abs(minor), r.currency).replace(`${r.currency} `, '')}` : none);
// Work so far means nothing before a plan: a dash, not a zero.
const workSoFar = (r: StockRow, show: typeof cash) => (r.reconEstimateMinor == null && r.reconActualMinor === 0 ? '—' : show(r.reconActualMinor, r));
const readinessOf = (r: StockRow) => (r.readiness ? `${READINESS_WORDS[r.readiness]}${r.provisional ? ' (provisional)' : ''}` : READINESS_FILTER_WORDS.none);

const column = createColumnHelper<StockRow>();
// Each column sorts on the server under the same name; flex is its share of the wide table.
const COLUMNS = [
  column.accessor('stockNumber', { id: 'stockNumber', header: STOCK_SORT_LABELS.stockNumber, meta: { flex: 0.9 } }),
  column.accessor((r) => makerAndModel(r.maker, r.model), { id: 'makerModel', header: STOCK_SORT_LABELS.makerModel, meta: { flex: 1.8 } }),
  column.accessor((r) => formatKindAndSize(r.kind, r.sizeCm), { id: 'kindSize', header: STOCK_SORT_LABELS.kindSize, meta: { flex: 1.3 } }),
  column.accessor('stage', { id: 'stage', header: STOCK_SORT_LABELS.stage, meta: { flex: 1.3 } }),
  column.accessor('daysInStock', { id: 'daysInStock', header: 'Days', meta: { flex: 0.5, numeric: true } }),
  column.accessor(readinessOf, { id: 'readiness', header: STOCK_SORT_LABELS.readiness, meta: { flex: 1.4 } }),
  column.accessor((r) => plain(r.reconEstimateMinor, r), { id: 'reconEstimate', header: STOCK_SORT_LABELS.reconEstimate, meta: { flex: 1.1, numeric: true } }),
  column.accessor((r) => workSoFar(r, plain), { id: 'reconActual', header: STOCK_SORT_LABELS.reconActual, meta: { flex: 1.1, numeric: true } }),
  column.accessor((r) => (r.mixedCurrencies ? 'Mixed currencies' : plain(r.costBasisMinor, r, 'No allowance')), { id: 'costBasis', header: STOCK_SORT_LABELS.costBasis, meta: { flex: 1.1, numeric: true } }),
  column.accessor((r) => plain(r.askingPriceMinor, r, 'Not priced'), { id: 'askingPrice', header: STOCK_SORT_LABELS.askingPrice, meta: { flex: 1.1, numeric: true } }),
  column.accessor((r) => plain(r.marginMinor, r), { id: 'margin', header: STOCK_SORT_LABELS.margin, meta: { flex: 1.1, numeric: true } }),
];
type Meta = { flex: number; numeric?: boolean };
const SORT_LABELS = STOCK_SORT_LABELS as Record<StockSort, string>;

/** The manager's stock table: every piano with its money, sorted, filtered and paged on the server. */
export function StockTableScreen() {
  const [stages, setStages] = useState<Stage[]>([]);
  const [kinds, setKinds] = useState<PianoKind[]>([]);
  const [readiness, setReadiness] = useState<ReadinessFilter[]>([]);
  const [searchText, setSearchText] = useState('');
  const [search, setSearch] = useState('');
  const [sorting, setSorting] = useState<SortingState>([{ id: 'stockNumber', desc: false }]);
  const [offset, setOffset] = useState(0);
  const { token } = useSession();
  const [exportProblem, setExportProblem] = useState<string | null>(null);
  const wide = useWide();

  const sort = (sorting[0]?.id ?? 'stockNumber') as StockSort;
  const descending = sorting[0]?.desc ?? false;
  const query = useMemo<StockQueryInput>(
    () => ({ stages: stages.length ? stages : null, kinds: kinds.length ? kinds : null, readiness: readiness.length ? readiness : null, search: search || null, sort, descending, limit: STOCK_PAGE, offset }),
    [stages, kinds, readiness, search, sort, descending, offset],
  );
  const { page, fetching, error } = useStockTable(query);
  const problem = graphProblem(error);
  const rows = useMemo(() => page?.rows ?? [], [page]);
  const currencies = [...new Set(rows.map((r) => r.currency).filter(Boolean))];
  const [filtersOpen, setFiltersOpen] = useState(false);
  const filtersOn = stages.length + kinds.length + readiness.length;

  // The table keeps no state of its own here (sorting is ours, rows come from the server), and this app runs without the React Compiler.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns: COLUMNS,
    state: { sorting },
    onSortingChange: (next) => {
      setSorting(next);
      setOffset(0);
    },
    manualSorting: true,
    manualPagination: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    sortDescFirst: false,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (r) => String(r.pianoId),
  });

  const changed = <T,>(set: (v: T) => void) => (v: T) => {
    set(v);
    setOffset(0);
  };
  const exportCsv = async () => {
    setExportProblem(await openStaffPdf(stockCsvPath(query), token, `stock-${new Date().toISOString().slice(0, 10)}.csv`, 'download'));
  };

  return (
    <Screen
      title="Stock table"
      eyebrow="Manager"
      headingTestID="stock-table-heading"
      actions={
        <>
          <Button label="Export CSV" variant="secondary" onPress={exportCsv} testID="stock-export" accessibilityHint="Saves every row the filter keeps, in this order" />
          <Button label="Charts" variant="secondary" href="/stock/charts" testID="stock-charts-link" />
        </>
      }
    >
      <Section title="Filter" description="Every piano Feltwire holds; narrow it by stage, kind and readiness, or search.">
        <View style={[styles.filters, wide && styles.filtersRow]}>
          <View style={wide ? styles.searchWide : undefined}>
            <TextField
              label="Search"
              hint="Stock number, maker, model or serial number"
              value={searchText}
              onChangeText={setSearchText}
              onSubmitEditing={() => changed(setSearch)(searchText.trim())}
              onBlur={() => changed(setSearch)(searchText.trim())}
              maxLength={80}
              testID="stock-search"
            />
          </View>
          <View style={styles.filterButtons}>
            <Button label={filtersOpen ? 'Hide the filters' : `Filters${filtersOn ? ` (${filtersOn} on)` : ''}`} variant="secondary" onPress={() => setFiltersOpen((o) => !o)} testID="stock-filters-toggle" />
            {filtersOn || search ? (
              <Button
                label="Clear"
                variant="quiet"
                onPress={() => {
                  setStages([]);
                  setKinds([]);
                  setReadiness([]);
                  setSearch('');
                  setSearchText('');
                  setOffset(0);
                }}
                testID="stock-filters-clear"
              />
            ) : null}
          </View>
        </View>
        {filtersOpen ? (
          <View style={styles.filters}>
            <MultiChoice label="Stage" options={STAGES} labels={STAGE_LABELS} value={stages} onChange={changed(setStages)} testID="stock-filter-stage" />
            <MultiChoice label="Kind" options={PIANO_KINDS} labels={KIND_LABELS} value={kinds} onChange={changed(setKinds)} testID="stock-filter-kind" />
            <MultiChoice label="Readiness" options={READINESS_FILTERS} labels={READINESS_FILTER_WORDS} value={readiness} onChange={changed(setReadiness)} testID="stock-filter-readiness" />
          </View>
        ) : null}
      </Section>
      {exportProblem ? <Notice tone="error">{exportProblem}</Notice> : null}
      <Section title={page ? `${page.total.toLocaleString('en-US')} ${page.total === 1 ? 'piano' : 'pianos'}` : 'Pianos'} description={`Sorted by ${SORT_LABELS[sort].toLowerCase()}, ${descending ? 'highest or latest first' : 'lowest or earliest first'}.${wide && currencies.length === 1 ? ` Money in ${currencies[0]}.` : ''} Cost basis: trade-in allowance, workshop labour and parts; expected margin: the asking price less the cost basis and the work still estimated.`}>
        {!wide ? (
          <View style={styles.phoneSort}>
            <ChoiceGroup label="Sort by" options={STOCK_SORTS} labels={SORT_LABELS} value={sort} onChange={(id) => table.setSorting([{ id, desc: descending }])} scroll testID="stock-sort" />
            <Button label={descending ? 'Highest first' : 'Lowest first'} variant="secondary" onPress={() => table.setSorting([{ id: sort, desc: !descending }])} testID="stock-sort-direction" />
          </View>
        ) : null}
        {problem ? <Notice tone="error">{problem.message}</Notice> : null}
        {!page ? (
          <Loading label="Loading the stock…" />
        ) : !rows.length ? (
          <EmptyState title="No piano matches">Change or clear the filter to see more.</EmptyState>
        ) : wide ? (
          <ScrollView horizontal contentContainerStyle={styles.scroller}>
            <View role="table" aria-label="Stock table" style={[rowTable.table, styles.table]} testID="stock-table">
              {table.getHeaderGroups().map((group) => (
                <View role="row" key={group.id} style={[rowTable.row, rowTable.headRow, styles.tableRow]}>
                  {group.headers.map((header) => {
                    const meta = header.column.columnDef.meta as Meta;
                    const dir = header.column.getIsSorted();
                    return (
                      <View key={header.id} role="columnheader" aria-sort={dir === 'asc' ? 'ascending' : dir === 'desc' ? 'descending' : 'none'} style={{ flex: meta.flex }}>
                        <Pressable onPress={header.column.getToggleSortingHandler()} accessibilityRole="button" accessibilityLabel={`Sort by ${String(header.column.columnDef.header)}`} testID={`stock-sort-${header.id}`} style={styles.headButton}>
                          <Text style={[TYPE_SCALE.label, rowTable.head, meta.numeric && styles.right]}>
                            {flexRender(header.column.columnDef.header, header.getContext())}
                            {dir === 'asc' ? ' ▲' : dir === 'desc' ? ' ▼' : ''}
                          </Text>
                        </Pressable>
                      </View>
                    );
                  })}
                </View>
              ))}
              {table.getRowModel().rows.map((row, n) => (
                // A row of cells, as a table needs; the stock number is the link to the piano.
                <View role="row" key={row.id} style={[rowTable.row, styles.tableRow, n > 0 && rowTable.rule]} testID="stock-row">
                  {row.getVisibleCells().map((cell) => {
                    const meta = cell.column.columnDef.meta as Meta;
                    const text = <Text style={[TYPE_SCALE.small, styles.cell, meta.numeric && styles.right, cell.column.id === 'margin' && (row.original.marginMinor ?? 0) < 0 && styles.loss]}>{String(cell.getValue())}</Text>;
                    return (
                      <View role="cell" key={cell.id} style={{ flex: meta.flex }}>
                        {cell.column.id === 'stage' ? (
                          <StageBadge stage={row.original.stage} />
                        ) : cell.column.id === 'stockNumber' ? (
                          <LinkPressable href={`/pianos/${row.original.pianoId}`} insetFocus style={({ hovered }) => [styles.rowLink, hovered && rowTable.hover]} testID="stock-row-link">
                            <Text style={[TYPE_SCALE.small, styles.cell, styles.linkText]}>{String(cell.getValue())}</Text>
                          </LinkPressable>
                        ) : (
                          text
                        )}
                      </View>
                    );
                  })}
                </View>
              ))}
            </View>
          </ScrollView>
        ) : (
          <View style={rowTable.cards} role="list" testID="stock-cards">
            {table.getRowModel().rows.map((row) => (
              <StockCard key={row.id} r={row.original} />
            ))}
          </View>
        )}
        {page ? <Pager offset={offset} shown={rows.length} total={page.total} pageSize={STOCK_PAGE} onOffset={setOffset} noun="pianos" busy={fetching} testID="stock-pager" /> : null}
      </Section>
    </Screen>
  );
}

function StockCard({ r }: { r: StockRow }) {
  const facts: [string, string][] = [
    ['Days in stock', String(r.daysInStock)],
    ['Readiness', readinessOf(r)],
    ['Work estimate / so far', `${cash(r.reconEstimateMinor, r)} / ${workSoFar(r, cash)}`],
    ['Cost basis', r.mixedCurrencies ? 'Mixed currencies' : cash(r.costBasisMinor, r, 'No allowance')],
    ['Asking price', cash(r.askingPriceMinor, r, 'Not priced')],
    ['Expected margin', cash(r.marginMinor, r)],
  ];
  return (
    <View role="listitem">
      <LinkPressable href={`/pianos/${r.pianoId}`} style={({ hovered }) => [rowTable.card, hovered && rowTable.hover]} testID="stock-card">
        <View style={styles.cardHead}>
          <Body variant="bodyStrong">{r.stockNumber}</Body>
          <StageBadge stage={r.stage} />
        </View>
        <Body>
          {makerAndModel(r.maker, r.model)} · {formatKindAndSize(r.kind, r.sizeCm)}
        </Body>
        {facts.map(([label, value]) => (
          <View key={label} style={styles.fact}>
            <Body variant="small" tone="secondary" style={styles.factLabel}>
              {label}
            </Body>
            <Body variant="small" style={styles.factValue}>
              {value}
            </Body>
          </View>
        ))}
      </LinkPressable>
    </View>
  );
}

const styles = StyleSheet.create({
  filters: { gap: SPACE.md },
  filtersRow: { flexDirection: 'row', alignItems: 'flex-end', flexWrap: 'wrap' },
  searchWide: { width: 420 },
  filterButtons: { flexDirection: 'row', gap: SPACE.sm, alignItems: 'center' },
  phoneSort: { gap: SPACE.sm, alignItems: 'flex-start' },
  scroller: { flexGrow: 1 },
  table: { minWidth: 940, flexGrow: 1 },
  tableRow: { gap: SPACE.sm, paddingHorizontal: SPACE.md },
  headButton: { minHeight: 32, justifyContent: 'center' },
  rowLink: { minHeight: 32, justifyContent: 'center' },
  linkText: { textDecorationLine: 'underline' },
  cell: { color: PALETTE.ebony },
  right: { textAlign: 'right' },
  loss: { color: PALETTE.rosewood },
  cardHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: SPACE.sm },
  fact: { flexDirection: 'row', gap: SPACE.md },
  factLabel: { width: '45%' },
  factValue: { flex: 1 },
});
