import { useEffect, type ReactNode } from 'react';
import { Platform, ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

/** The reading width of a buyer's page: a comfortable line on a desk, the full width on a phone. */
export const BUYER_COLUMN = 760;

interface BuyerFrameProps {
  /** the dealer's name once the page knows it; undefined while loading; null when there is none to show */
  dealerName?: string | null;
  /** what kind of page: "Condition disclosure", "Your deposit" */
  kind: string;
  /** the browser tab's title */
  documentTitle: string;
  /** the dealer's address and contact, for the foot of the page */
  contact?: readonly string[];
  /** the column's widest, for a page of many cards (the catalogue); the reading width otherwise */
  maxWidth?: number;
  /** the footnote, when not the one for a page shared by link */
  foot?: string;
  children: ReactNode;
}

/** A public page for a buyer: the dealer's name on a band of felt, one readable column, no staff navigation. */
export function BuyerFrame({ dealerName, kind, documentTitle, contact, maxWidth, foot, children }: BuyerFrameProps) {
  const wide = useWide();
  const insets = useSafeAreaInsets();
  const column = [styles.column, maxWidth ? { maxWidth } : null];
  useEffect(() => {
    if (Platform.OS === 'web' && typeof document !== 'undefined') document.title = documentTitle;
  }, [documentTitle]);
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content}>
      <View role="banner" style={[styles.band, { paddingTop: insets.top + (wide ? SPACE.xl : SPACE.lg) }]}>
        <View style={column}>
          <Body variant="heading" tone="inverse" testID="buyer-dealer">
            {dealerName === undefined ? ' ' : dealerName || 'Feltwire'}
          </Body>
          <Body variant="label" style={styles.kind}>
            {kind}
          </Body>
        </View>
      </View>
      <View role="main" style={[styles.main, wide && styles.mainWide]}>
        <View style={[column, styles.body]}>{children}</View>
      </View>
      <View role="contentinfo" style={[styles.foot, { paddingBottom: insets.bottom + SPACE.xl }]}>
        <View style={[column, styles.footColumn]}>
          {dealerName && contact?.length ? (
            <View testID="buyer-dealer-contact">
              <Body variant="bodyStrong">{dealerName}</Body>
              {contact.map((line) => (
                <Body key={line} variant="small" tone="secondary" selectable>
                  {line}
                </Body>
              ))}
            </View>
          ) : null}
          {foot ? (
            <Body variant="small" tone="quiet">
              {foot}
            </Body>
          ) : dealerName ? (
            <Body variant="small" tone="quiet">
              Shared by {dealerName} through Feltwire.
            </Body>
          ) : null}
        </View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: PALETTE.ivory },
  content: { flexGrow: 1 },
  band: { backgroundColor: PALETTE.felt, paddingHorizontal: SPACE.lg, paddingBottom: SPACE.lg, borderBottomWidth: 3, borderBottomColor: PALETTE.brass },
  kind: { color: PALETTE.feltLichen, textTransform: 'uppercase', letterSpacing: 1.2 },
  column: { width: '100%', maxWidth: BUYER_COLUMN, alignSelf: 'center' },
  main: { flexGrow: 1, paddingHorizontal: SPACE.lg, paddingTop: SPACE.xl, paddingBottom: SPACE.xxl },
  mainWide: { paddingTop: SPACE.xxl },
  body: { gap: SPACE.xl },
  footColumn: { gap: SPACE.md },
  foot: { paddingHorizontal: SPACE.lg, paddingTop: SPACE.lg, borderTopWidth: 1, borderTopColor: PALETTE.linen },
});
