import { Link, type Href } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, type StyleProp, type ViewStyle } from 'react-native';

export interface PressState {
  hovered: boolean;
  pressed: boolean;
}

interface LinkPressableProps {
  href: Href;
  style: (state: PressState) => StyleProp<ViewStyle>;
  children: ReactNode;
  accessibilityLabel?: string;
  testID?: string;
  current?: boolean;
  /** draw the focus ring inside the edge (rows inside a clipped table) */
  insetFocus?: boolean;
}

// react-native-web turns dataSet into data-* attributes; React Native's types do not know the prop.
const INSET_FOCUS = { dataSet: { focus: 'inset' } } as object;

/**
 * A link (an <a> on the web) with the looks of a pressable. Link's asChild slot takes one flat style
 * object only, so hover and press are tracked here instead of through Pressable's style function.
 */
export function LinkPressable({ href, style, children, accessibilityLabel, testID, current, insetFocus }: LinkPressableProps) {
  const [hovered, setHovered] = useState(false);
  const [pressed, setPressed] = useState(false);
  return (
    <Link href={href} asChild>
      <Pressable
        role="link"
        aria-current={current ? 'page' : undefined}
        accessibilityLabel={accessibilityLabel}
        testID={testID}
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        onPressIn={() => setPressed(true)}
        onPressOut={() => setPressed(false)}
        style={StyleSheet.flatten(style({ hovered, pressed }))}
        {...(insetFocus ? INSET_FOCUS : null)}
      >
        {children}
      </Pressable>
    </Link>
  );
}
