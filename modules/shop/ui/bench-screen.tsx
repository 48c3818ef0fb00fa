import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { useWide } from '@/modules/theme/ui/use-wide';

import { QueueCard } from './components/queue-card';
import { useWorkQueue, type QueueItem } from './use-work-queue';
import { PRIORITIES, PRIORITY_LABELS } from './work-format';

/** The technician's bench: open items, most urgent first; a manager sees every open item. */
export function BenchScreen() {
  const { user } = useSession();
  const manager = user?.role === 'manager';
  return (
    <Screen
      title="Bench"
      eyebrow="Workshop"
      headingTestID="home-heading"
      actions={<Button label="Workshop climate" variant="secondary" href="/workshop/climate" testID="bench-climate" />}
    >
      <BenchQueue me={user?.id ?? null} manager={manager} />
    </Screen>
  );
}

function BenchQueue({ me, manager }: { me: number | null; manager: boolean }) {
  // The shell's Slot mounts the screen afresh on each visit, so cache-and-network brings back what was just logged.
  const { items, error } = useWorkQueue();
  const wide = useWide();
  const problem = graphProblem(error);
  if (!items) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the work queue…" />;
  if (!items.length) {
    return (
      <EmptyState title="Nothing waiting on the bench" testID="queue-empty">
        {manager
          ? 'No open work items on pianos in the workshop. Approve a plan to send a piano to the workshop.'
          : 'No open items are assigned to you or waiting for someone. New work arrives when a manager approves a plan.'}
      </EmptyState>
    );
  }
  const mineRunning = me != null ? items.find((i) => i.timerRunningFor.includes(me)) : undefined;
  return (
    <View style={styles.wrap} testID="work-queue">
      {problem ? <Notice tone="error">{problem.message}</Notice> : null}
      {mineRunning ? (
        <Notice tone="info" title="Your timer is running" actions={<Button label="Open it" variant="secondary" href={`/workshop/items/${mineRunning.id}`} />}>
          {mineRunning.title} on {mineRunning.stockNumber}.
        </Notice>
      ) : null}
      {PRIORITIES.map((p) => {
        const group = items.filter((i) => String(i.priority) === p);
        if (!group.length) return null;
        return (
          <Section key={p} title={PRIORITY_LABELS[p]} description={`${group.length} ${group.length === 1 ? 'item' : 'items'}${p === '1' ? ', soonest due first' : ''}`}>
            <QueueGrid items={group} me={me} wide={wide} />
          </Section>
        );
      })}
    </View>
  );
}

function QueueGrid({ items, me, wide }: { items: QueueItem[]; me: number | null; wide: boolean }) {
  return (
    <View role="list" style={[styles.grid, wide && styles.gridWide]}>
      {items.map((item) => (
        <View role="listitem" key={item.id} style={wide ? styles.cellWide : undefined}>
          <QueueCard item={item} me={me} fill={wide} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.xl },
  grid: { gap: SPACE.sm },
  // Halves with padding rather than gap, so a lone last card lines up with the pair above it.
  gridWide: { flexDirection: 'row', flexWrap: 'wrap', gap: 0, margin: -SPACE.sm / 2 - 2 },
  cellWide: { width: '50%', padding: SPACE.sm / 2 + 2 },
});
