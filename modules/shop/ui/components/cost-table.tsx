import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';

import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { formatHours, money } from '../work-format';
import { VarianceTag } from './variance-tag';

export interface CostRow {
  key: string;
  label: ReactNode;
  /** plain words of the label, for the row's accessible name on a phone */
  sub?: ReactNode;
  estimatedHours: number;
  loggedHours: number;
  estimatedCostMinor: number;
  actualCostMinor: number;
  varianceMinor: number;
  /** work still open: an underspend is only what is left, not a saving */
  inProgress?: boolean;
  actions?: ReactNode;
  below?: ReactNode;
  testID?: string;
}

const COLS = [
  { key: 'what', label: '', flex: 3 },
  { key: 'hours', label: 'Hours estimated, logged', flex: 1.6 },
  { key: 'cost', label: 'Cost estimated, so far', flex: 2.2 },
  { key: 'variance', label: 'Variance', flex: 1.5 },
] as const;

/** Over the estimate is always flagged; while work is open, the rest reads as what is left. */
function Variance({ row, currency }: { row: CostRow; currency: string }) {
  if (row.inProgress && row.varianceMinor <= 0) {
    return (
      <Body variant="label" tone="secondary">
        {money(-row.varianceMinor, currency)} left
      </Body>
    );
  }
  return <VarianceTag varianceMinor={row.varianceMinor} currency={currency} />;
}

/** Estimate against actual: a table on a wide screen, one card a row on a phone. */
export function CostTable({ rows, firstColumn, total, currency, testID }: { rows: readonly CostRow[]; firstColumn: string; total?: CostRow; currency: string; testID?: string }) {
  const wide = useWide();
  const all = total ? [...rows, total] : rows;
  if (!wide) {
    return (
      <View role="list" style={styles.cards} testID={testID}>
        {all.map((r) => (
          <View role="listitem" key={r.key} style={[styles.card, r === total && styles.totalCard]} testID={r.testID}>
            <View style={styles.cardHead}>
              <View style={styles.grow}>
                {typeof r.label === 'string' ? <Body variant="bodyStrong">{r.label}</Body> : r.label}
                {r.sub}
              </View>
              <Variance row={r} currency={currency} />
            </View>
            <View style={styles.pairs}>
              <Pair label="Hours logged" value={`${formatHours(r.loggedHours)} of ${formatHours(r.estimatedHours)}`} />
              <Pair label="Cost so far" value={`${money(r.actualCostMinor, currency)} of ${money(r.estimatedCostMinor, currency)}`} />
            </View>
            {r.actions}
            {r.below}
          </View>
        ))}
      </View>
    );
  }
  return (
    <View style={styles.table} testID={testID} role="table">
      <View style={[styles.row, styles.head]} role="row">
        {COLS.map((c) => (
          <Text key={c.key} role="columnheader" style={[TYPE_SCALE.label, styles.headText, { flex: c.flex }]}>
            {c.key === 'what' ? firstColumn : c.label}
          </Text>
        ))}
      </View>
      {all.map((r, i) => (
        <View key={r.key} style={[i > 0 && styles.rule, r === total && styles.totalRow]} testID={r.testID}>
          <View style={styles.row} role="row">
            <View style={{ flex: COLS[0].flex, gap: SPACE.xxs }} role="cell">
              {typeof r.label === 'string' ? <Body variant="bodyStrong">{r.label}</Body> : r.label}
              {r.sub}
            </View>
            <View style={{ flex: COLS[1].flex }} role="cell">
              <Body>{formatHours(r.estimatedHours)}</Body>
              <Body tone="secondary">{formatHours(r.loggedHours)}</Body>
            </View>
            <View style={{ flex: COLS[2].flex }} role="cell">
              <Body>{money(r.estimatedCostMinor, currency)}</Body>
              <Body tone="secondary">{money(r.actualCostMinor, currency)}</Body>
            </View>
            <View style={{ flex: COLS[3].flex }} role="cell">
              <Variance row={r} currency={currency} />
            </View>
          </View>
          {/* A table holds only rows of cells: an item's buttons and editor are a row of one cell each. */}
          {r.actions ? (
            <View role="row">
              <View role="cell" style={styles.actionsRow}>
                {r.actions}
              </View>
            </View>
          ) : null}
          {r.below ? (
            <View role="row">
              <View role="cell" style={styles.below}>
                {r.below}
              </View>
            </View>
          ) : null}
        </View>
      ))}
    </View>
  );
}

function Pair({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.pair}>
      <Body variant="small" tone="secondary">
        {label}
      </Body>
      <Body variant="small">{value}</Body>
    </View>
  );
}

const styles = StyleSheet.create({
  cards: { gap: SPACE.sm },
  card: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, padding: SPACE.lg, gap: SPACE.sm },
  totalCard: { borderColor: PALETTE.felt, borderWidth: 2 },
  cardHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: SPACE.sm },
  grow: { flex: 1, minWidth: 0, gap: SPACE.xxs },
  pairs: { gap: SPACE.xxs },
  pair: { flexDirection: 'row', gap: SPACE.sm, justifyContent: 'space-between' },
  table: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md, paddingHorizontal: SPACE.lg, paddingVertical: SPACE.md },
  head: { backgroundColor: PALETTE.ivory, borderBottomWidth: 2, borderBottomColor: PALETTE.linen, paddingVertical: SPACE.sm },
  headText: { color: PALETTE.walnut },
  rule: { borderTopWidth: 1, borderTopColor: PALETTE.linen },
  totalRow: { borderTopWidth: 2, borderTopColor: PALETTE.felt, backgroundColor: PALETTE.ivory },
  actionsRow: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, paddingHorizontal: SPACE.lg, paddingBottom: SPACE.md, marginTop: -SPACE.xs },
  below: { paddingHorizontal: SPACE.lg, paddingBottom: SPACE.lg },
});
