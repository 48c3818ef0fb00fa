import { useState } from 'react';
import { Pressable, StyleSheet, Text } from 'react-native';

import { LAYOUT, PALETTE, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

interface ExternalLinkProps {
  /** an address outside the app's routes: a server page or document */
  href: string;
  label: string;
  /** open in a new tab (documents, the demo inbox) */
  newTab?: boolean;
  testID?: string;
  accessibilityLabel?: string;
}

/**
 * A plain link to a page the app does not route (the printable disclosure, the demo inbox).
 * react-native-web renders a Pressable with `href` as an <a>; React Native's types do not know the prop.
 */
export function ExternalLink({ href, label, newTab, testID, accessibilityLabel }: ExternalLinkProps) {
  const [hovered, setHovered] = useState(false);
  const web = { href, hrefAttrs: newTab ? { target: '_blank', rel: 'noopener' } : undefined } as object;
  return (
    <Pressable
      role="link"
      testID={testID}
      accessibilityLabel={accessibilityLabel ?? (newTab ? `${label} (opens in a new tab)` : undefined)}
      onHoverIn={() => setHovered(true)}
      onHoverOut={() => setHovered(false)}
      style={styles.link}
      {...web}
    >
      <Text style={[TYPE_SCALE.bodyStrong, styles.text, hovered && styles.hovered]}>
        {label}
        {newTab ? ' ↗' : ''}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  link: { minHeight: LAYOUT.touchTarget, justifyContent: 'center', alignSelf: 'flex-start', paddingVertical: SPACE.xs },
  text: { color: PALETTE.felt, textDecorationLine: 'underline' },
  hovered: { color: PALETTE.feltShade, textDecorationStyle: 'double' },
});
