import { StyleSheet, View } from 'react-native';

import { PALETTE, SPACE } from '@/modules/theme/core/palette';

import { Body } from './text';
import { useWide } from './use-wide';

export interface Fact {
  label: string;
  value: string;
}

/** Label and value pairs: stacked on a phone, in two columns on a wide window. */
export function FactList({ facts }: { facts: readonly Fact[] }) {
  const wide = useWide();
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
});
