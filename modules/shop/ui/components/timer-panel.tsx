import { StyleSheet, Text, View } from 'react-native';

import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Body, Heading } from '@/modules/theme/ui/text';

import { entryMinutes, isRunning, type WorkItemDetail } from '../use-work-item';
import { useNow } from '../use-now';
import { formatClock, money } from '../work-format';
import { Feedback, type FeedbackState } from './feedback';
import { HoursMeter } from './hours-meter';
import { VarianceTag } from './variance-tag';

interface TimerPanelProps {
  item: WorkItemDetail;
  me: number;
  /** why nothing can be logged here now, or null */
  blocked: string | null;
  busy: boolean;
  feedback: FeedbackState;
  onStart: () => void;
  onStop: () => void;
}

/** The timer: start and stop with a thumb, the running time ticking, and the item's time and cost against its estimate. */
export function TimerPanel({ item, me, blocked, busy, feedback, onStart, onStop }: TimerPanelProps) {
  const mine = item.entries.find((e) => e.technicianId === me && isRunning(e));
  const others = item.timerRunningFor.filter((id) => id !== me);
  const now = useNow(item.entries.some(isRunning));
  const loggedMinutes = item.entries.reduce((sum, e) => sum + entryMinutes(e, now), 0);
  return (
    <Card role="region" accessibilityLabel="Timer">
      <Heading level={2}>Time</Heading>
      <View style={[styles.clock, mine && styles.clockRunning]}>
        <Body variant="label" tone={mine ? 'success' : 'secondary'}>
          {mine ? 'Your timer is running' : 'Timer stopped'}
        </Body>
        <Text style={[TYPE_SCALE.display, styles.clockText]} testID="timer-clock" aria-live="off">
          {mine ? formatClock(now - Date.parse(mine.startedAt)) : '0:00:00'}
        </Text>
      </View>
      {others.length ? (
        <Body variant="small" tone="secondary">
          {others.length === 1 ? 'A colleague’s timer is' : `${others.length} colleagues’ timers are`} running on this item too.
        </Body>
      ) : null}
      {mine ? (
        <Button label="Stop the timer" onPress={onStop} busy={busy} stretch testID="timer-stop" />
      ) : (
        <Button label="Start the timer" onPress={onStart} busy={busy} disabled={!!blocked} stretch testID="timer-start" />
      )}
      <Feedback state={feedback} testID="timer-feedback" />
      <HoursMeter loggedMinutes={loggedMinutes} estimatedHours={item.estimatedHours} testID="item-hours" />
      <View style={styles.cost}>
        <Body variant="small" tone="secondary">
          Cost so far {money(item.actualCostMinor, item.currency)} (time and parts) of {money(item.estimatedCostMinor, item.currency)} estimated
        </Body>
        {item.status === 'done' || item.actualCostMinor > item.estimatedCostMinor ? (
          <VarianceTag varianceMinor={item.actualCostMinor - item.estimatedCostMinor} currency={item.currency} testID="item-variance" />
        ) : (
          <Body variant="label" tone="secondary" testID="item-variance">
            {money(item.estimatedCostMinor - item.actualCostMinor, item.currency)} left in the estimate
          </Body>
        )}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  clock: { alignItems: 'center', paddingVertical: SPACE.md, borderRadius: RADIUS.md, backgroundColor: PALETTE.ivory, borderWidth: 1, borderColor: PALETTE.linen, gap: SPACE.xxs },
  clockRunning: { backgroundColor: PALETTE.mossMist, borderColor: PALETTE.moss },
  clockText: { color: PALETTE.ebony, fontVariant: ['tabular-nums'] },
  cost: { gap: SPACE.xs },
});
