import { StyleSheet, View } from 'react-native';

import { PALETTE, SPACE } from '@/modules/theme/core/palette';

import { Body } from './text';
import { useWide } from './use-wide';

export interface Fact {
  label: string;
  value: string;
}

interface FactListProps {
  facts: readonly Fact[];
  /** label and value side by side in one row each: long lists read at a glance (a review) */
  dense?: boolean;
}

/** Label and value pairs: stacked on a phone, in two columns on a wide window; `dense` puts each pair on one line. */
export function FactList({ facts, dense }: FactListProps) {
  const wide = useWide();
  if (dense) {
    return (
      <View style={styles.list}>
        {facts.map((fact) => (
          <View key={fact.label} style={[styles.row, styles.rowDense]}>
            <Body variant="label" tone="secondary" style={styles.denseLabel}>
              {fact.label}
            </Body>
            <Body style={styles.denseValue}>{fact.value}</Body>
          </View>
        ))}
      </View>
    );
  }
  return (
    <View style={[styles.list, wide && styles.listWide]}>
      {facts.map((fact) => (
        <View key={fact.label} style={[styles.row, wide && styles.rowWide]}>
          <Body variant="label" tone="secondary">
            {fact.label}
          </Body>
          <Body>{fact.value}</Body>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  listWide: { flexDirection: 'row', flexWrap: 'wrap' },
  row: { paddingVertical: SPACE.sm, borderBottomWidth: 1, borderBottomColor: PALETTE.linen, gap: SPACE.xxs },
  rowWide: { width: '50%', paddingRight: SPACE.xl },
  rowDense: { flexDirection: 'row', alignItems: 'baseline', gap: SPACE.md, paddingVertical: SPACE.xs + 2 },
  denseLabel: { width: '42%', flexShrink: 0 },
  denseValue: { flex: 1, minWidth: 0 },
});
