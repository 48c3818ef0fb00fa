import type { ReactNode } from 'react';
import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';

interface CardProps {
  children: ReactNode;
  style?: StyleProp<ViewStyle>;
  testID?: string;
  /** 'region' with a label makes the card a landmark */
  role?: 'region' | 'group' | 'form';
  accessibilityLabel?: string;
}

/** A sheet of paper on the page. */
export function Card({ children, style, ...rest }: CardProps) {
  return (
    <View style={[styles.card, style]} {...rest}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: PALETTE.vellum,
    borderWidth: 1,
    borderColor: PALETTE.linen,
    borderRadius: RADIUS.lg,
    padding: SPACE.lg,
    gap: SPACE.md,
  },
});
