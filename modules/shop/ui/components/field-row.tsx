import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { SPACE } from '@/modules/theme/core/palette';

/** Fields side by side when there is room, stacked when not. */
export function FieldRow({ children }: { children: ReactNode }) {
  return <View style={styles.row}>{children}</View>;
}

export function Buttons({ children }: { children: ReactNode }) {
  return <View style={styles.buttons}>{children}</View>;
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.md, alignItems: 'flex-start' },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, alignItems: 'center' },
});
