import { StyleSheet, Text, View } from 'react-native';

import type { JobState } from '@/modules/jobs/core/job-kinds';
import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

// Gave up wants the manager now (rosewood); the rest may still right themselves (brass). The words carry the meaning.
const TONE: Record<JobState, { edge: string; ground: string; ink: string }> = {
  gave_up: { edge: PALETTE.rosewood, ground: PALETTE.rosewoodBlush, ink: PALETTE.rosewoodShade },
  retrying: { edge: PALETTE.brass, ground: PALETTE.vellum, ink: PALETTE.brassShade },
  stuck: { edge: PALETTE.brass, ground: PALETTE.vellum, ink: PALETTE.brassShade },
  late: { edge: PALETTE.brass, ground: PALETTE.vellum, ink: PALETTE.brassShade },
};

export function JobStateTag({ state, text, testID }: { state: JobState; text: string; testID?: string }) {
  const tone = TONE[state];
  return (
    <View style={[styles.tag, { borderColor: tone.edge, backgroundColor: tone.ground }]} testID={testID}>
      <View aria-hidden style={[styles.mark, { backgroundColor: tone.edge }, state === 'gave_up' && styles.square]} />
      <Text style={[TYPE_SCALE.badge, { color: tone.ink }]}>{text}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  tag: { flexDirection: 'row', alignItems: 'center', alignSelf: 'flex-start', gap: SPACE.xs + 2, paddingHorizontal: SPACE.sm, paddingVertical: 2, borderRadius: RADIUS.sm, borderWidth: 1.5 },
  mark: { width: 8, height: 8, borderRadius: 4 },
  square: { borderRadius: 1 },
});
