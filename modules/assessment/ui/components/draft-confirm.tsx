import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Body } from '@/modules/theme/ui/text';

interface DraftConfirmProps {
  title: string;
  children: ReactNode;
  /** the buttons: the one that throws the draft away, and the way out that keeps it */
  commands: ReactNode;
  testID?: string;
}

/** A question before a draft on this device is thrown away. */
export function DraftConfirm({ title, children, commands, testID }: DraftConfirmProps) {
  return (
    <View style={styles.confirm} role="alert" testID={testID}>
      <Body variant="bodyStrong">{title}</Body>
      <Body tone="secondary">{children}</Body>
      <View style={styles.commands}>{commands}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  confirm: { gap: SPACE.sm, padding: SPACE.lg, backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderLeftWidth: 4, borderLeftColor: PALETTE.rosewood, borderRadius: RADIUS.md },
  commands: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
});
