import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { money } from '@/modules/disclosure/ui/disclosure-format';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { BarChart, type BarRow } from './components/bar-chart';
import { useStockCharts, type StockCharts } from './use-stock-table';

const pianos = (n: number) => `${n} ${n === 1 ? 'piano' : 'pianos'}`;
// A loss with a real minus sign before the currency: “−USD 683.08”.
const cash = (minor: number, currency: string | null | undefined) => (minor < 0 ? '−' : '') + (currency ? money(Math.abs(minor), currency) : String(Math.abs(minor)));

/** Where the money is: stock by stage, how long it has waited, the thinnest margins, the workshop's estimates against what the work cost, deposits held. */
export function StockChartsScreen() {
  const { charts, error } = useStockCharts();
  const problem = graphProblem(error);
  return (
    <Screen
      title="Stock charts"
      eyebrow="Manager"
      headingTestID="stock-charts-heading"
      actions={<Button label="Stock table" variant="secondary" href="/stock/table" testID="stock-table-link" />}
    >
      {problem ? <Notice tone="error">{problem.message}</Notice> : null}
      {charts ? <Charts charts={charts} /> : problem ? null : <Loading label="Drawing the charts…" />}
    </Screen>
  );
}

function Charts({ charts }: { charts: StockCharts }) {
  const wide = useWide();
  const count = (bars: { key: string; label: string; value: number }[]): BarRow[] => bars.map((b) => ({ key: b.key, label: b.label, values: [{ value: b.value, text: pianos(b.value) }] }));
  const margins: BarRow[] = charts.margins.map((m) => ({ key: m.key, label: m.label, values: [{ value: m.value, text: cash(m.value, m.currency) }] }));
  const estimates: BarRow[] = charts.estimates.map((e) => ({
    key: e.key,
    label: `${e.label} (${e.count})`,
    values: [
      { value: e.estimatedMinor, text: cash(e.estimatedMinor, e.currency) },
      { value: e.actualMinor, text: cash(e.actualMinor, e.currency) },
    ],
  }));
  const deposits: BarRow[] = charts.deposits.map((d) => ({ key: d.key, label: `${d.label} (${d.count})`, values: [{ value: d.value, text: cash(d.value, d.currency) }] }));
  const held = charts.deposits.reduce<Record<string, number>>((s, d) => ({ ...s, [d.currency ?? '']: (s[d.currency ?? ''] ?? 0) + d.value }), {});

  const cards = [
    <ChartCard key="stage" title="Stock by stage" note="Every piano on record, in stage order." testID="chart-stage">
      <BarChart title="Stock by stage" series={[{ name: 'Pianos', look: 'solid' }]} rows={count(charts.byStage)} rowHeading="Stage" testID="chart-stage-bars" />
    </ChartCard>,
    <ChartCard key="ageing" title="How long the stock on hand has waited" note="Days since each piano not yet sold was taken in." testID="chart-ageing">
      <BarChart title="Ageing of the stock on hand" series={[{ name: 'Pianos', look: 'solid' }]} rows={count(charts.ageing)} rowHeading="Days in stock" testID="chart-ageing-bars" />
    </ChartCard>,
    <ChartCard
      key="margins"
      title="Margin by piano"
      note={charts.marginsTotal ? `The ${Math.min(charts.margins.length, charts.marginsTotal)} thinnest of ${pianos(charts.marginsTotal)} on hand with an asking price and an agreed allowance; a loss is drawn left of the line.` : 'No piano on hand has both an asking price and an agreed allowance yet.'}
      testID="chart-margins"
    >
      {margins.length ? <BarChart title="Expected margin by piano" series={[{ name: 'Expected margin', look: 'solid' }]} rows={margins} rowHeading="Piano" testID="chart-margins-bars" /> : null}
    </ChartCard>,
    <ChartCard key="estimates" title="Workshop estimate against actual" note="Finished items by kind of task (how many in brackets): what was estimated, and what the hours and parts cost." testID="chart-estimates">
      {estimates.length ? (
        <BarChart title="Workshop estimate against actual by task" series={[{ name: 'Estimate', look: 'solid' }, { name: 'Actual', look: 'hatched' }]} rows={estimates} rowHeading="Task" testID="chart-estimates-bars" />
      ) : (
        <EmptyState title="No finished work yet">The chart fills as workshop items are done.</EmptyState>
      )}
    </ChartCard>,
    <ChartCard
      key="deposits"
      title="Cash held in deposits"
      note={Object.keys(held).length ? `In all: ${Object.entries(held).map(([c, v]) => cash(v, c)).join(', ')}. Deposits holding a piano, and those being refunded (how many in brackets).` : 'No deposit is held now.'}
      testID="chart-deposits"
    >
      {deposits.length ? <BarChart title="Cash held in deposits" series={[{ name: 'Held', look: 'solid' }]} rows={deposits} rowHeading="Deposits" testID="chart-deposits-bars" /> : null}
    </ChartCard>,
  ];
  if (!wide) return <View style={styles.column}>{cards}</View>;
  return (
    <View style={styles.grid}>
      {cards.map((c) => (
        <View key={c.key} style={styles.cell}>
          {c}
        </View>
      ))}
    </View>
  );
}

function ChartCard({ title, note, children, testID }: { title: string; note: string; children: React.ReactNode; testID: string }) {
  return (
    <Card testID={testID} role="region" accessibilityLabel={title}>
      <Body variant="subheading">{title}</Body>
      <Body variant="small" tone="secondary">
        {note}
      </Body>
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  column: { gap: SPACE.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', marginHorizontal: -SPACE.sm },
  cell: { width: '50%', padding: SPACE.sm },
});
