import { StyleSheet, Text, View } from 'react-native';

import type { Severity } from '@/modules/assessment/core/grade';
import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

// Each condition has a ground, an ink and a shape, so colour is never the only cue. The ink and
// ground pairs are ones the theme's contrast test already checks (stage badges, error notice).
export const SEVERITY_TONES: Record<Severity, { ground: string; ink: string; shape: 'dot' | 'ring' | 'square' | 'diamond' }> = {
  sound: { ground: PALETTE.mossMist, ink: '#2D5A33', shape: 'dot' },
  watch: { ground: '#EFE6D2', ink: '#5E4712', shape: 'ring' },
  needs_work: { ground: '#F3DEC9', ink: '#7A3E12', shape: 'square' },
  serious: { ground: PALETTE.rosewoodBlush, ink: PALETTE.rosewood, shape: 'diamond' },
};

/** The small shape of a condition, drawn (no icon font). */
export function SeverityShape({ severity, size = 10 }: { severity: Severity; size?: number }) {
  const tone = SEVERITY_TONES[severity];
  const box = { width: size, height: size };
  return (
    <View
      aria-hidden
      style={[
        box,
        tone.shape === 'dot' && { backgroundColor: tone.ink, borderRadius: RADIUS.pill },
        tone.shape === 'ring' && { borderColor: tone.ink, borderWidth: Math.max(2, size / 5), borderRadius: RADIUS.pill },
        tone.shape === 'square' && { backgroundColor: tone.ink, borderRadius: 1 },
        tone.shape === 'diamond' && { backgroundColor: tone.ink, transform: [{ rotate: '45deg' }], width: size * 0.85, height: size * 0.85 },
      ]}
    />
  );
}

interface ConditionChipProps {
  severity: Severity;
  /** the words: "In good order", "Worth knowing"... */
  label: string;
  /** no findings in the area: a plain outline instead of a condition's colour */
  neutral?: boolean;
  large?: boolean;
  testID?: string;
}

/** How an area stands, as a chip: its words on its ground, with its shape. */
export function ConditionChip({ severity, label, neutral, large, testID }: ConditionChipProps) {
  const tone = SEVERITY_TONES[severity];
  return (
    <View style={[styles.chip, large && styles.chipLarge, neutral ? styles.neutral : { backgroundColor: tone.ground }]} testID={testID}>
      {neutral ? null : <SeverityShape severity={severity} size={large ? 13 : 9} />}
      <Text style={[large ? TYPE_SCALE.subheading : TYPE_SCALE.badge, { color: neutral ? PALETTE.walnut : tone.ink }]}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: SPACE.xs + 2,
    paddingHorizontal: SPACE.sm + 2,
    paddingVertical: SPACE.xs,
    borderRadius: RADIUS.pill,
  },
  chipLarge: { paddingHorizontal: SPACE.lg, paddingVertical: SPACE.sm, gap: SPACE.sm },
  neutral: { borderWidth: 1, borderColor: PALETTE.linenDark, backgroundColor: PALETTE.vellum },
});
