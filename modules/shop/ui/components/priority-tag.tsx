import { StyleSheet, Text, View } from 'react-native';

import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

import { priorityLabel } from '../work-format';

/** The priority as a word with one to three filled pips, so the order reads without colour. */
export function PriorityTag({ priority, testID }: { priority: number; testID?: string }) {
  const filled = Math.max(0, 4 - priority);
  const urgent = priority === 1;
  return (
    <View style={[styles.tag, urgent && styles.urgent]} accessibilityLabel={`Priority ${priority}: ${priorityLabel(priority)}`} testID={testID}>
      <View aria-hidden style={styles.pips}>
        {[0, 1, 2].map((i) => (
          <View key={i} style={[styles.pip, i < filled ? (urgent ? styles.pipUrgent : styles.pipOn) : null]} />
        ))}
      </View>
      <Text style={[TYPE_SCALE.badge, { color: urgent ? PALETTE.rosewood : PALETTE.walnut }]}>{priorityLabel(priority)}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  tag: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: SPACE.xs + 2,
    paddingHorizontal: SPACE.sm,
    paddingVertical: 2,
    borderRadius: RADIUS.pill,
    borderWidth: 1,
    borderColor: PALETTE.linen,
    backgroundColor: PALETTE.vellum,
  },
  urgent: { borderColor: PALETTE.rosewood, backgroundColor: PALETTE.rosewoodBlush },
  pips: { flexDirection: 'row', gap: 2 },
  pip: { width: 6, height: 10, borderRadius: 1, borderWidth: 1, borderColor: PALETTE.linenDark },
  pipOn: { backgroundColor: PALETTE.walnut, borderColor: PALETTE.walnut },
  pipUrgent: { backgroundColor: PALETTE.rosewood, borderColor: PALETTE.rosewood },
});
