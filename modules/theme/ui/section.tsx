import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { SPACE } from '@/modules/theme/core/palette';

import { Body, Heading } from './text';

interface SectionProps {
  title: string;
  description?: string;
  children: ReactNode;
  testID?: string;
}

/** A titled part of a page (an h2 and what belongs under it). */
export function Section({ title, description, children, testID }: SectionProps) {
  return (
    <View role="region" aria-label={title} style={styles.section} testID={testID}>
      <View style={styles.head}>
        <Heading level={2}>{title}</Heading>
        {description ? <Body tone="secondary">{description}</Body> : null}
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: SPACE.md },
  head: { gap: SPACE.xs },
});
