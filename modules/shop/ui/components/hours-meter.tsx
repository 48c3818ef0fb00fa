import { StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Body } from '@/modules/theme/ui/text';

import { formatHours, formatMinutes } from '../work-format';

/** Logged time against the estimate: the words first, then a bar that turns to brass, with a notch, past the estimate. */
export function HoursMeter({ loggedMinutes, estimatedHours, testID }: { loggedMinutes: number; estimatedHours: number; testID?: string }) {
  const estimateMin = estimatedHours * 60;
  const over = estimateMin > 0 ? loggedMinutes > estimateMin : loggedMinutes > 0;
  const fraction = estimateMin > 0 ? Math.min(1, loggedMinutes / estimateMin) : loggedMinutes > 0 ? 1 : 0;
  return (
    <View style={styles.wrap} testID={testID}>
      <Body variant="small" tone="secondary">
        <Body variant="label">{formatMinutes(loggedMinutes)}</Body> logged of {formatHours(estimatedHours)} estimated
        {over ? <Body variant="label" tone="accent">{' · over the estimate'}</Body> : null}
      </Body>
      <View aria-hidden style={styles.track}>
        <View style={[styles.fill, { width: `${Math.round(fraction * 100)}%` }, over && styles.fillOver]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.xs },
  track: { height: 6, borderRadius: RADIUS.pill, backgroundColor: PALETTE.linen, overflow: 'hidden' },
  fill: { height: '100%', backgroundColor: PALETTE.felt },
  fillOver: { backgroundColor: PALETTE.brass },
});
