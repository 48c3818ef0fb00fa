import { useEffect, type ReactNode } from 'react';
import { Platform, ScrollView, StyleSheet, View } from 'react-native';

import { LAYOUT, PALETTE, SPACE } from '@/modules/theme/core/palette';

import { Eyebrow, Heading } from './text';
import { useWide } from './use-wide';

interface ScreenProps {
  title: string;
  /** a word above the title: what kind of page this is */
  eyebrow?: string;
  /** controls beside the title on a wide window, below it on a phone */
  actions?: ReactNode;
  children?: ReactNode;
  headingTestID?: string;
  /** narrow pages (forms) keep a reading width */
  width?: 'wide' | 'form';
}

/** The scrolling page: an eyebrow, the page heading, its actions, then the content. */
export function Screen({ title, eyebrow, actions, children, headingTestID, width = 'wide' }: ScreenProps) {
  const wide = useWide();
  useEffect(() => {
    if (Platform.OS === 'web' && typeof document !== 'undefined') document.title = `${title} · Feltwire`;
  }, [title]);

  return (
    <ScrollView style={styles.scroll} contentContainerStyle={[styles.content, wide && styles.contentWide]}>
      <View style={[styles.column, width === 'form' && styles.formColumn]}>
        <View style={[styles.header, wide && styles.headerWide]}>
          <View style={styles.titles}>
            {eyebrow ? <Eyebrow>{eyebrow}</Eyebrow> : null}
            <Heading level={1} testID={headingTestID}>
              {title}
            </Heading>
          </View>
          {actions ? <View style={[styles.actions, wide && styles.actionsWide]}>{actions}</View> : null}
        </View>
        <View style={styles.body}>{children}</View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: PALETTE.ivory },
  content: { paddingHorizontal: SPACE.lg, paddingTop: SPACE.xl, paddingBottom: SPACE.xxxl },
  contentWide: { paddingHorizontal: SPACE.xxl, paddingTop: SPACE.xxl },
  column: { width: '100%', maxWidth: LAYOUT.contentMaxWidth, alignSelf: 'center' },
  formColumn: { maxWidth: LAYOUT.formMaxWidth, alignSelf: 'flex-start' },
  header: { gap: SPACE.lg, paddingBottom: SPACE.lg, marginBottom: SPACE.xl, borderBottomWidth: 2, borderBottomColor: PALETTE.brass },
  headerWide: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between' },
  titles: { gap: SPACE.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  actionsWide: { justifyContent: 'flex-end' },
  body: { gap: SPACE.xl },
});
