import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { dayAndTime, deviceLocality } from '@/modules/disclosure/ui/disclosure-format';
import { AbilityGate } from '@/modules/accounts/ui/ability-gate';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { rowTable, TableHead } from '@/modules/theme/ui/row-table';
import { Screen } from '@/modules/theme/ui/screen';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { JobStateTag } from './job-state-tag';
import { useBackgroundJobs, useRetryBackgroundJob, type BackgroundJob } from './use-background-jobs';

// Staff read times in their own device's zone: the shop's own tablets and desks.
const STAFF_TIME = deviceLocality();

const COLS = [
  { key: 'work', label: 'Work', flex: 2.6 },
  { key: 'state', label: 'How it stands', flex: 2.2 },
  { key: 'problem', label: 'Last problem', flex: 3.4 },
  // Room for the button on one line.
  { key: 'act', label: '', flex: 1.2, minWidth: 128 },
] as const;

const triesText = (j: BackgroundJob) => `Tried ${j.attempts} of ${j.maxAttempts} ${j.maxAttempts === 1 ? 'time' : 'times'}`;
function nextLine(j: BackgroundJob): string {
  if (j.state === 'stuck') return `Running since ${dayAndTime(j.startedAt, STAFF_TIME)}`;
  return j.nextTryAt ? `Next try ${dayAndTime(j.nextTryAt, STAFF_TIME)}` : 'No tries left';
}

/** Background work that needs a manager: refunds, e-mails and hold ends that failed, gave up or stalled. */
export function BackgroundWorkScreen() {
  return (
    <AbilityGate ability="tendBackgroundWork" title="Background work">
      <BackgroundWork />
    </AbilityGate>
  );
}

function BackgroundWork() {
  const wide = useWide();
  const { jobs, error, refresh, fetching } = useBackgroundJobs();
  const problem = graphProblem(error);
  return (
    <Screen
      title="Background work"
      eyebrow="Manager"
      headingTestID="background-heading"
      actions={
        <>
          <Button label="Check again" variant="secondary" onPress={refresh} busy={fetching && !!jobs} testID="background-refresh" />
          <Button label="Stock" variant="secondary" href="/stock" />
        </>
      }
    >
      <Body tone="secondary">
        Refunds, e-mails and the end of holds run in the background. When one fails, Feltwire tries it again by itself, waiting longer each time. Here is the work that failed at least once, ran out of tries, or stalled.
      </Body>
      {!jobs ? (
        problem ? (
          <Notice tone="error">{problem.message}</Notice>
        ) : (
          <Loading label="Looking at the background work…" />
        )
      ) : !jobs.length ? (
        <EmptyState title="Nothing needs a look" testID="background-empty">
          All background work has gone through or is on its way.
        </EmptyState>
      ) : (
        <View style={wide ? rowTable.table : undefined} testID="background-list">
          {wide ? <TableHead columns={COLS} /> : null}
          <View role="list" style={wide ? undefined : rowTable.cards}>
            {jobs.map((j, i) => (
              <View role="listitem" key={j.id} style={wide ? [rowTable.row, styles.row, i > 0 && rowTable.rule] : rowTable.card} testID={`background-job-${j.id}`}>
                {wide ? <WideRow job={j} /> : <PhoneCard job={j} />}
              </View>
            ))}
          </View>
        </View>
      )}
    </Screen>
  );
}

function RetryButton({ job }: { job: BackgroundJob }) {
  const retry = useRetryBackgroundJob();
  const [said, setSaid] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  if (job.state === 'stuck') return null;
  const run = async () => {
    setSaid(null);
    const outcome = await retry.run({ id: job.id });
    setSaid(outcome.ok ? { tone: 'success', text: 'Started again. Check again in a moment.' } : { tone: 'error', text: outcome.problem.message });
  };
  return (
    <View style={styles.retry}>
      <Button label="Try again" variant="secondary" onPress={run} busy={retry.busy} accessibilityLabel={`Try again now: ${job.about}`} testID={`background-retry-${job.id}`} />
      {said ? (
        <Body variant="small" tone={said.tone === 'error' ? 'danger' : 'success'} testID={`background-said-${job.id}`}>
          {said.text}
        </Body>
      ) : null}
    </View>
  );
}

function WideRow({ job: j }: { job: BackgroundJob }) {
  return (
    <>
      <View style={{ flex: COLS[0].flex, gap: SPACE.xxs }}>
        <Body variant="bodyStrong">{j.label}</Body>
        <Body variant="small" tone="secondary" selectable>
          {j.about}
        </Body>
      </View>
      <View style={{ flex: COLS[1].flex, gap: SPACE.xs }}>
        <JobStateTag state={j.state} text={j.stateText} />
        <Body variant="small" tone="secondary">
          {triesText(j)}
        </Body>
        <Body variant="small" tone="secondary">
          {nextLine(j)}
        </Body>
      </View>
      <Body variant="small" style={{ flex: COLS[2].flex }} selectable>
        {j.lastError ?? '—'}
      </Body>
      <View style={{ flex: COLS[3].flex, minWidth: COLS[3].minWidth }}>
        <RetryButton job={j} />
      </View>
    </>
  );
}

function PhoneCard({ job: j }: { job: BackgroundJob }) {
  return (
    <>
      <View style={styles.cardTop}>
        <Body variant="bodyStrong">{j.label}</Body>
        <JobStateTag state={j.state} text={j.stateText} />
      </View>
      <Body variant="small" tone="secondary" selectable>
        {j.about}
      </Body>
      {j.lastError ? (
        <Body variant="small" selectable>
          {j.lastError}
        </Body>
      ) : null}
      <Body variant="small" tone="secondary">
        {triesText(j)} · {nextLine(j)}
      </Body>
      <RetryButton job={j} />
    </>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: 64 },
  cardTop: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: SPACE.sm },
  retry: { gap: SPACE.xs, alignItems: 'flex-start' },
});
