import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';

import { Body } from './text';

interface NoticeProps {
  tone: 'error' | 'success';
  children: ReactNode;
  testID?: string;
}

/** A message at the top of a form or a page; errors are announced at once. */
export function Notice({ tone, children, testID }: NoticeProps) {
  return (
    <View role={tone === 'error' ? 'alert' : 'status'} style={[styles.notice, tone === 'error' ? styles.error : styles.success]} testID={testID}>
      <Body tone={tone === 'error' ? 'danger' : 'default'} style={tone === 'success' ? styles.successText : null}>
        {children}
      </Body>
    </View>
  );
}

/** What a list shows while its first page loads. */
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <View role="status" style={styles.loading}>
      <ActivityIndicator color={PALETTE.felt} />
      <Body tone="quiet">{label}</Body>
    </View>
  );
}

const styles = StyleSheet.create({
  notice: { borderRadius: RADIUS.md, paddingHorizontal: SPACE.lg, paddingVertical: SPACE.md, borderLeftWidth: 4 },
  error: { backgroundColor: PALETTE.rosewoodBlush, borderLeftColor: PALETTE.rosewood },
  success: { backgroundColor: PALETTE.mossMist, borderLeftColor: PALETTE.moss },
  successText: { color: PALETTE.felt },
  loading: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm, paddingVertical: SPACE.lg },
});
