import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';

import { Body } from './text';

interface NoticeProps {
  /** error: something failed; success: it worked; caution: a safety or money warning; info: how things stand */
  tone: 'error' | 'success' | 'caution' | 'info';
  children: ReactNode;
  /** a bold first line */
  title?: string;
  /** commands under the message (retry, discard) */
  actions?: ReactNode;
  testID?: string;
}

/** A message at the top of a form or a page; errors are announced at once. */
export function Notice({ tone, children, title, actions, testID }: NoticeProps) {
  const textTone = tone === 'error' ? 'danger' : 'default';
  return (
    <View role={tone === 'error' ? 'alert' : 'status'} style={[styles.notice, styles[tone]]} testID={testID}>
      {title ? (
        <Body variant="bodyStrong" tone={textTone} style={tone === 'success' ? styles.successText : null}>
          {title}
        </Body>
      ) : null}
      <Body tone={textTone} style={tone === 'success' ? styles.successText : null}>
        {children}
      </Body>
      {actions ? <View style={styles.actions}>{actions}</View> : null}
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
  notice: { borderRadius: RADIUS.md, paddingHorizontal: SPACE.lg, paddingVertical: SPACE.md, borderLeftWidth: 4, gap: SPACE.xs },
  error: { backgroundColor: PALETTE.rosewoodBlush, borderLeftColor: PALETTE.rosewood },
  success: { backgroundColor: PALETTE.mossMist, borderLeftColor: PALETTE.moss },
  caution: { backgroundColor: PALETTE.vellum, borderLeftColor: PALETTE.brass, borderWidth: 1, borderColor: PALETTE.linen, borderLeftWidth: 4 },
  info: { backgroundColor: PALETTE.feltMist, borderLeftColor: PALETTE.felt },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, paddingTop: SPACE.xs },
  successText: { color: PALETTE.felt },
  loading: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm, paddingVertical: SPACE.lg },
});
