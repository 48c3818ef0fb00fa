import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';

import { Body } from './text';

/** A dashed frame saying why a list is empty and what comes next. */
export function EmptyState({ title, children, testID }: { title: string; children?: ReactNode; testID?: string }) {
  return (
    <View style={styles.empty} testID={testID}>
      <Body variant="subheading">{title}</Body>
      {children ? <Body tone="secondary">{children}</Body> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  empty: {
    borderWidth: 1.5,
    borderStyle: 'dashed',
    borderColor: PALETTE.linenDark,
    borderRadius: RADIUS.lg,
    padding: SPACE.xl,
    gap: SPACE.xs,
  },
});
