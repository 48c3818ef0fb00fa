import { StyleSheet, Text, View } from 'react-native';

import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { LinkPressable } from '@/modules/theme/ui/link-pressable';
import { Body } from '@/modules/theme/ui/text';

import type { QueueItem } from '../use-work-queue';
import { dueWords, STATUS_LABELS } from '../work-format';
import { HoursMeter } from './hours-meter';
import { PriorityTag } from './priority-tag';

/** One open item on the bench: a link to its page, with what a technician scans for first. */
export function QueueCard({ item, me, fill }: { item: QueueItem; me: number | null; fill?: boolean }) {
  const due = dueWords(item.dueOn);
  const mine = item.assignedToId != null && item.assignedToId === me;
  const running = item.timerRunningFor.length > 0;
  const myTimer = me != null && item.timerRunningFor.includes(me);
  return (
    <LinkPressable
      href={`/workshop/items/${item.id}`}
      testID={`queue-item-${item.id}`}
      style={({ hovered, pressed }) => [styles.card, fill && styles.fill, (hovered || pressed) && styles.hover, running && styles.running]}
    >
      <View style={styles.top}>
        <Body variant="label" tone="secondary" numberOfLines={2} style={styles.piano}>
          {item.stockNumber} · {item.piano}
        </Body>
        <PriorityTag priority={item.priority} />
      </View>
      <Body variant="subheading">{item.title}</Body>
      <View style={styles.facts}>
        <Body variant="small" tone={mine ? 'default' : 'secondary'}>
          {item.assignedTo ? (mine ? 'Yours' : item.assignedTo) : 'Unassigned'}
        </Body>
        <Body variant="small" tone="quiet">
          ·
        </Body>
        <Body variant="small" tone="secondary">
          {STATUS_LABELS[item.status] ?? item.status}
        </Body>
        {due ? (
          <>
            <Body variant="small" tone="quiet">
              ·
            </Body>
            <Body variant={due.overdue ? 'label' : 'small'} tone={due.overdue ? 'danger' : 'secondary'}>
              {due.text}
            </Body>
          </>
        ) : null}
      </View>
      <HoursMeter loggedMinutes={item.loggedMinutes} estimatedHours={item.estimatedHours} />
      {running || item.cautions.length ? (
        <View style={styles.flags}>
          {running ? (
            <View style={styles.flag}>
              <View aria-hidden style={styles.dot} />
              <Body variant="label" tone="success">
                {myTimer ? 'Your timer is running' : 'Timer running'}
              </Body>
            </View>
          ) : null}
          {item.cautions.length ? (
            <View style={styles.flag}>
              <View aria-hidden style={styles.caution}>
                <Text style={styles.cautionGlyph}>!</Text>
              </View>
              <Body variant="label" tone="accent">
                {item.cautions.length === 1 ? 'Safety caution' : `${item.cautions.length} safety cautions`}
              </Body>
            </View>
          ) : null}
        </View>
      ) : null}
    </LinkPressable>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: PALETTE.vellum,
    borderWidth: 1,
    borderColor: PALETTE.linen,
    borderRadius: RADIUS.lg,
    padding: SPACE.lg,
    gap: SPACE.sm,
    minHeight: 44,
  },
  fill: { flexGrow: 1 },
  hover: { backgroundColor: PALETTE.feltMist },
  running: { borderColor: PALETTE.moss, borderWidth: 2, borderLeftWidth: 6 },
  top: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: SPACE.sm },
  piano: { flexShrink: 1 },
  facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: SPACE.xs, rowGap: 0, alignItems: 'baseline' },
  flags: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.md },
  flag: { flexDirection: 'row', alignItems: 'center', gap: SPACE.xs },
  dot: { width: 10, height: 10, borderRadius: RADIUS.pill, backgroundColor: PALETTE.moss },
  // a "!" in a ring: apart from the triangle that marks major work
  caution: { width: 16, height: 16, borderRadius: 8, borderWidth: 1.5, borderColor: PALETTE.brassShade, alignItems: 'center', justifyContent: 'center' },
  cautionGlyph: { ...TYPE_SCALE.badge, fontSize: 11, lineHeight: 13, color: PALETTE.brassShade },
});
