import { StyleSheet, View } from 'react-native';

import { money } from '@/modules/disclosure/ui/disclosure-format';
import type { PriceLine } from '@/modules/pricing/core/pricing';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Body } from '@/modules/theme/ui/text';

/** "− USD 640.00" for what is taken off, the figure itself for the first line. */
function signed(line: PriceLine, first: boolean, currency: string): string {
  if (first) return money(line.amountMinor, currency);
  if (line.amountMinor === 0) return money(0, currency);
  return `${line.amountMinor < 0 ? '−' : '+'} ${money(Math.abs(line.amountMinor), currency)}`;
}

interface WorkedFigureProps {
  lines: PriceLine[];
  currency: string;
  /** the last row: what the lines come to */
  totalLabel: string;
  totalMinor: number;
  testID?: string;
}

/** A figure worked step by step, each line with what it did and why, as a table a screen reader reads row by row. */
export function WorkedFigure({ lines, currency, totalLabel, totalMinor, testID }: WorkedFigureProps) {
  return (
    <View role="table" aria-label={`${totalLabel}, worked step by step`} style={styles.table} testID={testID}>
      {lines.map((line, n) => (
        <View role="row" key={`${line.key}-${n}`} style={[styles.row, n > 0 && styles.rule]} testID={testID ? `${testID}-line` : undefined}>
          <View role="cell" style={styles.what}>
            <Body variant="bodyStrong">{line.label}</Body>
            <Body variant="small" tone="secondary">
              {line.detail}
            </Body>
          </View>
          <View role="cell" style={styles.amount}>
            <Body style={styles.number}>{signed(line, n === 0, currency)}</Body>
          </View>
        </View>
      ))}
      <View role="row" style={[styles.row, styles.total]}>
        <View role="cell" style={styles.what}>
          <Body variant="bodyStrong">{totalLabel}</Body>
        </View>
        <View role="cell" style={styles.amount}>
          <Body variant="bodyStrong" style={styles.number} testID={testID ? `${testID}-total` : undefined}>
            {money(totalMinor, currency)}
          </Body>
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: PALETTE.linen, borderRadius: 6, backgroundColor: PALETTE.vellum },
  row: { flexDirection: 'row', gap: SPACE.md, paddingHorizontal: SPACE.md, paddingVertical: SPACE.sm, alignItems: 'flex-start' },
  rule: { borderTopWidth: 1, borderTopColor: PALETTE.linen },
  total: { borderTopWidth: 2, borderTopColor: PALETTE.walnut, backgroundColor: PALETTE.ivory },
  what: { flex: 1, minWidth: 0, gap: SPACE.xxs },
  amount: { flexShrink: 0, alignItems: 'flex-end', minWidth: 110 },
  number: { fontVariant: ['tabular-nums'], textAlign: 'right' },
});
