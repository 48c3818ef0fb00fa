import { StyleSheet, Text, View } from 'react-native';

import { STAGE_LABELS, type Stage } from '@/modules/pianos/core/piano';
import { RADIUS, SPACE, STAGE_TONES, TYPE_SCALE } from '@/modules/theme/core/palette';

/** The stage of a piano: its words, on a ground of its own, with a small mark so colour is not the only cue. */
export function StageBadge({ stage, testID }: { stage: Stage; testID?: string }) {
  const tone = STAGE_TONES[stage];
  return (
    <View style={[styles.badge, { backgroundColor: tone.ground }]} testID={testID}>
      <View
        aria-hidden
        style={[
          styles.mark,
          tone.mark === 'dot' && { backgroundColor: tone.ink, borderRadius: RADIUS.pill },
          tone.mark === 'ring' && { borderColor: tone.ink, borderWidth: 2, borderRadius: RADIUS.pill },
          tone.mark === 'square' && { backgroundColor: tone.ink, borderRadius: 1 },
          tone.mark === 'bar' && { backgroundColor: tone.ink, height: 3, marginTop: 0 },
        ]}
      />
      <Text style={[TYPE_SCALE.badge, { color: tone.ink }]}>{STAGE_LABELS[stage]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: SPACE.xs + 2,
    paddingHorizontal: SPACE.sm + 2,
    paddingVertical: SPACE.xs,
    borderRadius: RADIUS.pill,
  },
  mark: { width: 8, height: 8 },
});
