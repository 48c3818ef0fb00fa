import { StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS } from '@/modules/theme/core/palette';

/** Feltwire's mark: three key fronts resting on a strip of brass. Drawn, not an icon font. */
export function BrandMark({ size = 28 }: { size?: number }) {
  const key = { width: size * 0.22, height: size * 0.72 };
  return (
    <View aria-hidden style={[styles.mark, { width: size, height: size }]}>
      <View style={styles.keys}>
        <View style={[styles.key, key]} />
        <View style={[styles.key, key, styles.keyShort]} />
        <View style={[styles.key, key]} />
      </View>
      <View style={[styles.rail, { height: size * 0.14 }]} />
    </View>
  );
}

const styles = StyleSheet.create({
  mark: { justifyContent: 'flex-end', gap: 2 },
  keys: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-end' },
  key: { backgroundColor: PALETTE.ivory, borderTopLeftRadius: 2, borderTopRightRadius: 2 },
  keyShort: { height: '55%', backgroundColor: PALETTE.feltLichen },
  rail: { backgroundColor: PALETTE.brass, borderRadius: RADIUS.sm / 3 },
});
