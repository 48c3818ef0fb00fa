import type { ReactNode } from 'react';
import { StyleSheet, Text, type StyleProp, type TextStyle } from 'react-native';

import { PALETTE, TYPE_SCALE, type TypeName } from '@/modules/theme/core/palette';

const TONES = {
  default: PALETTE.ebony,
  secondary: PALETTE.walnut,
  quiet: PALETTE.pinGrey,
  accent: PALETTE.brassShade,
  danger: PALETTE.rosewood,
  success: PALETTE.moss,
  inverse: PALETTE.ivory,
} as const;
export type TextTone = keyof typeof TONES;

interface BodyProps {
  children: ReactNode;
  variant?: TypeName;
  tone?: TextTone;
  style?: StyleProp<TextStyle>;
  testID?: string;
  nativeID?: string;
  numberOfLines?: number;
  selectable?: boolean;
}

export function Body({ children, variant = 'body', tone = 'default', style, ...rest }: BodyProps) {
  return (
    <Text style={[TYPE_SCALE[variant], { color: TONES[tone] }, style]} {...rest}>
      {children}
    </Text>
  );
}

const LEVEL_TYPE: Record<1 | 2 | 3, TypeName> = { 1: 'display', 2: 'title', 3: 'heading' };

interface HeadingProps {
  children: ReactNode;
  level?: 1 | 2 | 3;
  tone?: TextTone;
  style?: StyleProp<TextStyle>;
  testID?: string;
  nativeID?: string;
}

/** A real heading element (h1..h3 on the web) in the display face. */
export function Heading({ children, level = 2, tone = 'default', style, ...rest }: HeadingProps) {
  return (
    <Text role="heading" aria-level={level} style={[TYPE_SCALE[LEVEL_TYPE[level]], styles.heading, { color: TONES[tone] }, style]} {...rest}>
      {children}
    </Text>
  );
}

/** Small capitals above a heading: what kind of page this is. */
export function Eyebrow({ children }: { children: ReactNode }) {
  return <Text style={[TYPE_SCALE.label, styles.eyebrow]}>{children}</Text>;
}

const styles = StyleSheet.create({
  heading: { letterSpacing: -0.2 },
  eyebrow: { color: PALETTE.brassShade, textTransform: 'uppercase', letterSpacing: 1.2 },
});
