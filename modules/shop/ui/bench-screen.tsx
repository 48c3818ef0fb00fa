import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { useCan } from '@/modules/accounts/ui/use-can';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Pager } from '@/modules/theme/ui/pager';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { useWide } from '@/modules/theme/ui/use-wide';

import { QueueCard } from './components/queue-card';
import { QUEUE_PAGE, QUEUE_SCOPES } from '@/modules/shop/core/work-views';

import { useWorkQueue, type QueueItem, type QueueScope } from './use-work-queue';
import { PRIORITIES, PRIORITY_LABELS } from './work-format';

/** The technician's bench: their open items, most urgent first, and those waiting for someone; a manager also sees every open item. */
export function BenchScreen() {
  const { user } = useSession();
  // The whole bench is for those who plan the work.
  const manager = useCan()('planWork');
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

const SCOPE_WORDS: Record<QueueScope, string> = { mine: 'Yours', unassigned: 'Waiting for someone', all: 'Every open item' };

function BenchQueue({ me, manager }: { me: number | null; manager: boolean }) {
  // Null until the reader picks: the server answers with the reader's usual scope.
  const [scope, setScope] = useState<QueueScope | null>(null);
  const [offset, setOffset] = useState(0);
  // The shell's Slot mounts the screen afresh on each visit, so cache-and-network brings back what was just logged.
  const { page, fetching, error } = useWorkQueue(scope, offset);
  const wide = useWide();
  const problem = graphProblem(error);
  if (!page) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the work queue…" />;
  // A page that emptied (items were done meanwhile) goes back to the first.
  if (!page.items.length && offset > 0) setOffset(0);
  const scopes = QUEUE_SCOPES.filter((s) => manager || s !== 'all');
  const labels = Object.fromEntries(scopes.map((s) => [s, `${SCOPE_WORDS[s]} (${page.counts[s].toLocaleString('en-US')})`])) as Record<QueueScope, string>;
  const choose = (next: QueueScope) => {
    setScope(next);
    setOffset(0);
  };
  return (
    <View style={styles.wrap} testID="work-queue">
      {problem ? <Notice tone="error">{problem.message}</Notice> : null}
      {page.running ? (
        <Notice tone="info" title="Your timer is running" actions={<Button label="Open it" variant="secondary" href={`/workshop/items/${page.running.id}`} />}>
          {page.running.title} on {page.running.stockNumber}.
        </Notice>
      ) : null}
      <ChoiceGroup label="Show" options={scopes} labels={labels} value={page.scope} onChange={choose} testID="queue-scope" />
      {!page.counts.mine && !page.counts.unassigned && !page.counts.all ? (
        <EmptyState title="Nothing waiting on the bench" testID="queue-empty">
          {manager
            ? 'No open work items on pianos in the workshop. Approve a plan to send a piano to the workshop.'
            : 'No open items are assigned to you or waiting for someone. New work arrives when a manager approves a plan.'}
        </EmptyState>
      ) : !page.items.length ? (
        <EmptyState title={page.scope === 'mine' ? 'Nothing assigned to you' : 'Nothing here'} testID="queue-scope-empty">
          {page.scope === 'mine' ? 'No open item is assigned to you. Items waiting for someone are one choice above: starting one takes it.' : 'No open item in this list.'}
        </EmptyState>
      ) : (
        <>
          {PRIORITIES.map((p) => {
            const group = page.items.filter((i) => String(i.priority) === p);
            if (!group.length) return null;
            return (
              <Section key={p} title={PRIORITY_LABELS[p]} description={`${group.length} ${group.length === 1 ? 'item' : 'items'}${page.total > page.items.length ? ' on this page' : ''}${p === '1' ? ', soonest due first' : ''}`}>
                <QueueGrid items={group} me={me} wide={wide} />
              </Section>
            );
          })}
          <Pager offset={offset} shown={page.items.length} total={page.total} pageSize={QUEUE_PAGE} onOffset={setOffset} noun="items" busy={fetching} testID="queue-pager" />
        </>
      )}
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
