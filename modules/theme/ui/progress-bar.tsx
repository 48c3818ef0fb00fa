import { StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS } from '@/modules/theme/core/palette';

interface ProgressBarProps {
  /** 0 to 1 */
  value: number;
  label: string;
  testID?: string;
}

/** A thin bar for work under way (an upload); read out as a percentage. */
export function ProgressBar({ value, label, testID }: ProgressBarProps) {
  const pct = Math.round(Math.max(0, Math.min(1, value)) * 100);
  return (
    <View role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} style={styles.track} testID={testID}>
      <View style={[styles.fill, { width: `${pct}%` }]} />
    </View>
  );
}

const styles = StyleSheet.create({
  track: { height: 8, borderRadius: RADIUS.pill, backgroundColor: PALETTE.linen, overflow: 'hidden', borderWidth: 1, borderColor: PALETTE.linenDark },
  fill: { height: '100%', backgroundColor: PALETTE.felt },
});
