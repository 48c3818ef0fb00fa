import { StyleSheet, Text, View } from 'react-native';

import { PALETTE, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

import { priorityLabel } from '../work-format';

/** One chevron pointing up, drawn from two borders of a turned square. */
function Chevron({ colour }: { colour: string }) {
  return <View style={[styles.chevron, { borderColor: colour }]} />;
}

/**
 * The priority as its word with a shape of its own: two chevrons for urgent, one for soon, a flat
 * line for when there is time; so the order reads without colour.
 */
export function PriorityTag({ priority, testID }: { priority: number; testID?: string }) {
  const urgent = priority === 1;
  const ink = urgent ? PALETTE.rosewood : PALETTE.walnut;
  return (
    <View style={[styles.tag, urgent && styles.urgent]} accessibilityLabel={`Priority ${priority}: ${priorityLabel(priority)}`} testID={testID}>
      <View aria-hidden style={styles.mark}>
        {priority <= 2 ? <Chevron colour={ink} /> : <View style={[styles.flat, { backgroundColor: ink }]} />}
        {priority === 1 ? <Chevron colour={ink} /> : null}
      </View>
      <Text style={[TYPE_SCALE.badge, { color: ink }]}>{priorityLabel(priority)}</Text>
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
    borderRadius: 3,
    borderWidth: 1,
    borderColor: PALETTE.linenDark,
    backgroundColor: PALETTE.vellum,
  },
  urgent: { borderColor: PALETTE.rosewood, backgroundColor: PALETTE.rosewoodBlush },
  mark: { width: 12, height: 14, alignItems: 'center', justifyContent: 'center' },
  chevron: { width: 7, height: 7, borderTopWidth: 2, borderLeftWidth: 2, transform: [{ rotate: '45deg' }], marginBottom: -3 },
  flat: { width: 10, height: 2 },
});
