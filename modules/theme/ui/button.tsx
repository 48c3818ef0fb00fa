import type { Href } from 'expo-router';
import { ActivityIndicator, Pressable, StyleSheet, Text, type PressableStateCallbackType } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

import { LinkPressable } from './link-pressable';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';

interface ButtonProps {
  label: string;
  onPress?: () => void;
  /** makes the button a link to a route */
  href?: Href;
  variant?: ButtonVariant;
  disabled?: boolean;
  /** shows a spinner and blocks presses while work is under way */
  busy?: boolean;
  /** fill the width of the parent (phone forms) */
  stretch?: boolean;
  testID?: string;
  accessibilityLabel?: string;
  accessibilityHint?: string;
}

type WebPressState = PressableStateCallbackType & { hovered?: boolean };

const INK: Record<ButtonVariant, string> = {
  primary: PALETTE.vellum,
  secondary: PALETTE.felt,
  danger: PALETTE.vellum,
  quiet: PALETTE.felt,
};

/** A command with a touch target of at least 48 px. */
export function Button({ label, onPress, href, variant = 'primary', disabled, busy, stretch, testID, accessibilityLabel, accessibilityHint }: ButtonProps) {
  const inactive = disabled || busy;
  const look = (pressed: boolean, hovered: boolean) => [
    styles.base,
    styles[variant],
    (pressed || hovered) && !inactive && styles[`${variant}Pressed`],
    stretch && styles.stretch,
    inactive && styles.inactive,
  ];
  const content = (
    <>
      {busy ? <ActivityIndicator size="small" color={INK[variant]} /> : null}
      <Text style={[TYPE_SCALE.bodyStrong, { color: INK[variant] }]}>{label}</Text>
    </>
  );
  if (href && !inactive) {
    return (
      <LinkPressable href={href} accessibilityLabel={accessibilityLabel} testID={testID} style={({ pressed, hovered }) => look(pressed, hovered)}>
        {content}
      </LinkPressable>
    );
  }
  return (
    <Pressable
      onPress={inactive ? undefined : onPress}
      disabled={inactive}
      role="button"
      aria-disabled={inactive || undefined}
      aria-busy={busy || undefined}
      accessibilityLabel={accessibilityLabel}
      accessibilityHint={accessibilityHint}
      testID={testID}
      style={(state) => look(state.pressed, !!(state as WebPressState).hovered)}
    >
      {content}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: LAYOUT.touchTarget + 4,
    minWidth: LAYOUT.touchTarget,
    paddingHorizontal: SPACE.xl,
    paddingVertical: SPACE.sm,
    borderRadius: RADIUS.md,
    borderWidth: 2,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: SPACE.sm,
  },
  stretch: { alignSelf: 'stretch' },
  primary: { backgroundColor: PALETTE.felt, borderColor: PALETTE.felt },
  primaryPressed: { backgroundColor: PALETTE.feltShade, borderColor: PALETTE.feltShade },
  secondary: { backgroundColor: PALETTE.vellum, borderColor: PALETTE.felt },
  secondaryPressed: { backgroundColor: PALETTE.feltMist },
  danger: { backgroundColor: PALETTE.rosewood, borderColor: PALETTE.rosewood },
  dangerPressed: { backgroundColor: PALETTE.rosewoodShade, borderColor: PALETTE.rosewoodShade },
  quiet: { backgroundColor: 'transparent', borderColor: 'transparent', paddingHorizontal: SPACE.md },
  quietPressed: { backgroundColor: PALETTE.feltMist },
  inactive: { opacity: 0.55 },
});
