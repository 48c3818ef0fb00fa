import { StyleSheet, Text, View } from 'react-native';

import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

import { varianceKind, varianceWords } from '../work-format';

/**
 * Actual against estimate. An overrun reads "USD 49.00 over" in the caution colour (the brass of a
 * caution notice) with a raised mark; under and even stay quiet. The word carries the meaning, never the colour alone.
 */
export function VarianceTag({ varianceMinor, currency, testID }: { varianceMinor: number; currency: string; testID?: string }) {
  const kind = varianceKind(varianceMinor);
  const words = varianceWords(varianceMinor, currency);
  if (kind !== 'over') {
    return (
      <Text style={[TYPE_SCALE.label, styles.quiet]} testID={testID} accessibilityLabel={kind === 'even' ? 'On the estimate' : `${words} the estimate`}>
        {words}
      </Text>
    );
  }
  return (
    <View style={styles.over} testID={testID} accessibilityLabel={`Over the estimate by ${words.replace(/ over$/, '')}`}>
      <View aria-hidden style={styles.mark} />
      <Text style={[TYPE_SCALE.label, styles.overText]}>{words}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  quiet: { color: PALETTE.walnut },
  over: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: SPACE.xs + 2,
    paddingHorizontal: SPACE.sm,
    paddingVertical: 1,
    borderRadius: RADIUS.sm,
    borderWidth: 1.5,
    borderColor: PALETTE.brass,
    backgroundColor: PALETTE.vellum,
  },
  // an upward wedge drawn with borders: "above the line"
  mark: { width: 0, height: 0, borderLeftWidth: 5, borderRightWidth: 5, borderBottomWidth: 8, borderLeftColor: 'transparent', borderRightColor: 'transparent', borderBottomColor: PALETTE.brassShade },
  overText: { color: PALETTE.brassShade },
});
