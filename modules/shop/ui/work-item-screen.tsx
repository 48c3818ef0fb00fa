import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { can } from '@/modules/accounts/core/roles';
import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { pianoName, STAGE_LABELS } from '@/modules/pianos/core/piano';
import { usePiano } from '@/modules/pianos/ui/use-piano';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { FactList } from '@/modules/theme/ui/fact-list';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { CautionsNotice } from './components/cautions-notice';
import { Feedback, type FeedbackState } from './components/feedback';
import { LogTimeForm } from './components/log-time-form';
import { NotesPanel } from './components/notes-panel';
import { PartsPanel } from './components/parts-panel';
import { PriorityTag } from './components/priority-tag';
import { TimerPanel } from './components/timer-panel';
import { WorkPhotos } from './components/work-photos';
import type { MutationOutcome } from './use-shop-mutation';
import { entryMinutes, isRunning, useBenchCommands, useWorkItem, type TimeEntryView, type WorkItemDetail } from './use-work-item';
import { useNow } from './use-now';
import { checkLabel, dueWords, formatDate, formatMinutes, formatWhen, STATUS_LABELS, taskLabel } from './work-format';

/** One work item at the bench: its cautions first, then the timer, time, parts, notes, photos and done. */
export function WorkItemScreen({ id }: { id: number | null }) {
  const { item, error, refresh } = useWorkItem(id);
  const problem = graphProblem(error);
  if (id == null || (problem?.code === 'NOT_FOUND' && !item)) {
    return (
      <Screen title="No such work item" eyebrow="Work item">
        <EmptyState title="This work item does not exist">It may have been dropped from the plan, or the link is mistyped.</EmptyState>
        <View style={styles.start}>
          <Button label="Back to the bench" variant="secondary" href="/bench" />
        </View>
      </Screen>
    );
  }
  if (!item) {
    return (
      <Screen title="Work item" eyebrow="Work item">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the work item…" />}
      </Screen>
    );
  }
  return <WorkItemPage item={item} refresh={refresh} />;
}

function WorkItemPage({ item, refresh }: { item: WorkItemDetail; refresh: () => Promise<void> }) {
  const { user } = useSession();
  const me = user?.id ?? 0;
  const wide = useWide();
  const { piano } = usePiano(item.pianoId);
  const cmd = useBenchCommands();
  const [timerFeedback, setTimerFeedback] = useState<FeedbackState>(null);
  const [doneFeedback, setDoneFeedback] = useState<FeedbackState>(null);
  const [doneReason, setDoneReason] = useState('');

  const done = item.status === 'done';
  const someoneElses = !!user && !can(user.role, 'workOnAnyItem') && item.assignedToId != null && item.assignedToId !== me;
  const blockedHard =
    piano && piano.stage !== 'in_workshop'
      ? `This piano is ${STAGE_LABELS[piano.stage].toLowerCase()}, not in the workshop: work is logged only while it is there.`
      : someoneElses
        ? `This item is ${item.assignedTo ?? 'someone else'}’s: only they or a manager can log work on it.`
        : null;
  const blocked = blockedHard ?? (done ? 'This item is done: reopen it to log more work.' : null);

  // Every command ends the same way: the server's word on failure, a fresh item on success.
  async function settle<T>(outcome: MutationOutcome<T>, success: string): Promise<FeedbackState> {
    if (!outcome.ok) return { tone: 'error', text: outcome.problem.message };
    await refresh();
    return { tone: 'success', text: success };
  }

  const authorName = (id: number) => (id === me ? 'You' : id === item.assignedToId && item.assignedTo ? item.assignedTo : 'A colleague');
  const stock = piano?.stockNumber ?? `piano ${item.pianoId}`;
  const due = dueWords(item.dueOn);

  const timer = (
    <TimerPanel
      item={item}
      me={me}
      blocked={blocked}
      busy={cmd.start.busy || cmd.stop.busy}
      feedback={timerFeedback}
      onStart={async () => setTimerFeedback(await settle(await cmd.start.run({ itemId: item.id }), 'Timer started.'))}
      onStop={async () => setTimerFeedback(await settle(await cmd.stop.run({ itemId: item.id }), 'Timer stopped: the time is logged.'))}
    />
  );
  const logTime = (
    <LogTimeForm
      blocked={blocked}
      busy={cmd.logTime.busy}
      onLog={async (minutes, note) => settle(await cmd.logTime.run({ e: { workItemId: item.id, minutes, note } }), `${formatMinutes(minutes)} logged.`)}
    />
  );
  const parts = (
    <PartsPanel
      parts={item.parts}
      currency={item.currency}
      blocked={blocked}
      busy={cmd.addPart.busy}
      onAdd={async (p) => settle(await cmd.addPart.run({ p: { workItemId: item.id, ...p } }), `Part added: ${p.description}.`)}
    />
  );
  const notes = (
    <NotesPanel
      notes={item.notes}
      authorName={authorName}
      blocked={blockedHard}
      busy={cmd.addNote.busy}
      onAdd={async (body) => settle(await cmd.addNote.run({ itemId: item.id, body }), 'Note added.')}
    />
  );
  const mayCorrect = (e: TimeEntryView) => !!user && !isRunning(e) && ((e.technicianId === me && can(user.role, 'correctOwnTime')) || can(user.role, 'correctAnyTime'));
  const entries = (
    <TimeEntries
      item={item}
      authorName={authorName}
      mayCorrect={mayCorrect}
      busy={cmd.correctTime.busy}
      onCorrect={async (timeEntryId, minutes, why) => settle(await cmd.correctTime.run({ c: { timeEntryId, minutes, why } }), `Corrected to ${formatMinutes(minutes)}.`)}
    />
  );
  const photos = <WorkPhotos itemId={item.id} pianoId={item.pianoId} title={item.title} task={item.task} blocked={blockedHard} />;
  // Done needs time on the item or the reason it took none; a running timer may still bring time.
  const noTime = !done && item.loggedMinutes === 0 && !item.timerRunningFor.length;
  const reasonMissing = noTime && !doneReason.trim();
  const finish = (
    <Card role="region" accessibilityLabel="Done">
      <Heading level={2}>{done ? 'Done' : 'Finished?'}</Heading>
      <Body tone="secondary">
        {done
          ? 'This item is marked done. Reopen it if more work is needed.'
          : item.timerRunningFor.length
            ? 'Marking it done stops every timer still running on it.'
            : noTime
              ? 'No time is logged on this item. Log the time it took, or say why it took none: the reason is kept on the item for the manager.'
              : 'Mark it done when the work is finished and tidied away.'}
      </Body>
      {done && item.doneReason ? (
        <Body testID="item-done-reason">Done with no time logged: {item.doneReason}</Body>
      ) : null}
      {noTime ? (
        <TextField
          label="Why no time is logged"
          hint="For example: done by the visiting tuner on his own invoice."
          value={doneReason}
          onChangeText={setDoneReason}
          multiline
          maxLength={500}
          testID="done-reason"
        />
      ) : null}
      <Button
        label={done ? 'Reopen the item' : 'Mark done'}
        variant={done ? 'secondary' : 'primary'}
        stretch
        busy={cmd.setDone.busy}
        disabled={!!blockedHard || reasonMissing}
        testID="item-done"
        onPress={async () => {
          const outcome = await settle(await cmd.setDone.run({ itemId: item.id, done: !done, reason: noTime ? doneReason.trim() : null }), done ? 'Reopened.' : 'Marked done.');
          if (outcome?.tone === 'success') setDoneReason('');
          setDoneFeedback(outcome);
        }}
      />
      {reasonMissing && !blockedHard ? (
        <Body variant="small" tone="secondary" testID="done-needs-reason">
          Log time, or give the reason above, to mark it done.
        </Body>
      ) : null}
      <Feedback state={doneFeedback} testID="done-feedback" />
      {done ? <Button label="Back to the bench" variant="quiet" href="/bench" /> : null}
    </Card>
  );

  return (
    <Screen
      title={item.title}
      eyebrow={`Work item · ${stock}`}
      headingTestID="item-heading"
      actions={
        <>
          <Button label="Bench" variant="secondary" href="/bench" />
          <Button label="Piano’s workshop page" variant="secondary" href={`/workshop/pianos/${item.pianoId}`} testID="item-piano-link" />
        </>
      }
    >
      <CautionsNotice cautions={item.cautions} testID="item-cautions" />
      <ItemSummary wide={wide} item={item} piano={piano ? `${piano.stockNumber} · ${pianoName(piano)}` : stock} due={due} />
      {blockedHard ? <Notice tone="info">{blockedHard}</Notice> : null}
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.column}>
            {timer}
            {logTime}
            {parts}
            {finish}
          </View>
          <View style={styles.column}>
            {notes}
            {photos}
            {entries}
          </View>
        </View>
      ) : (
        <View style={styles.stack}>
          {timer}
          {logTime}
          {parts}
          {notes}
          {photos}
          {entries}
          {finish}
        </View>
      )}
    </Screen>
  );
}

function ItemSummary({ item, piano, due, wide }: { item: WorkItemDetail; piano: string; due: ReturnType<typeof dueWords>; wide: boolean }) {
  if (!wide) {
    // On a phone the facts fit in two lines, so the timer is near the top.
    return (
      <Card>
        <View style={styles.summaryTop}>
          <Body variant="bodyStrong">{piano}</Body>
          <PriorityTag priority={item.priority} testID="item-priority" />
        </View>
        <Body tone="secondary">
          {taskLabel(item.task)}
          {item.quantity > 1 ? ` × ${item.quantity}` : ''} · {STATUS_LABELS[item.status] ?? item.status} · {item.assignedTo ?? 'Unassigned: starting the timer takes it'}
        </Body>
        <Body variant="small" tone={due?.overdue ? 'danger' : 'secondary'}>
          {item.dueOn ? `Due ${formatDate(item.dueOn)}${due?.overdue ? ' (overdue)' : ''}` : 'No due date'}
          {item.because.length ? ` · for ${item.because.map(checkLabel).join(', ')}` : ''}
        </Body>
      </Card>
    );
  }
  return (
    <Card>
      <View style={styles.summaryTop}>
        <Body variant="subheading">{piano}</Body>
        <PriorityTag priority={item.priority} testID="item-priority" />
      </View>
      <FactList
        facts={[
          { label: 'Task', value: `${taskLabel(item.task)}${item.quantity > 1 ? ` × ${item.quantity}` : ''}` },
          { label: 'State', value: STATUS_LABELS[item.status] ?? item.status },
          { label: 'Assigned to', value: item.assignedTo ?? 'Unassigned: starting the timer takes it' },
          { label: 'Due', value: item.dueOn ? `${formatDate(item.dueOn)}${due?.overdue ? ' (overdue)' : ''}` : 'No date set' },
          ...(item.because.length ? [{ label: 'Called for by the check of', value: item.because.map(checkLabel).join(', ') }] : []),
        ]}
      />
    </Card>
  );
}

interface TimeEntriesProps {
  item: WorkItemDetail;
  authorName: (id: number) => string;
  mayCorrect: (e: TimeEntryView) => boolean;
  busy: boolean;
  onCorrect: (timeEntryId: number, minutes: number, why: string) => Promise<FeedbackState>;
}

function TimeEntries({ item, authorName, mayCorrect, busy, onCorrect }: TimeEntriesProps) {
  const now = useNow(item.entries.some(isRunning), 30_000);
  const [open, setOpen] = useState<number | null>(null);
  return (
    <Card role="region" accessibilityLabel="Time logged">
      <Heading level={2}>Time logged</Heading>
      {item.entries.length ? (
        <View role="list" testID="entries-list">
          {[...item.entries].reverse().map((e) => (
            <View role="listitem" key={e.id} style={styles.entry} testID={`entry-${e.id}`}>
              <View style={styles.entryTop}>
                <Body variant="bodyStrong">{isRunning(e) ? `${formatMinutes(entryMinutes(e, now))} so far` : formatMinutes(entryMinutes(e, now))}</Body>
                <Body variant="small" tone="quiet">
                  {authorName(e.technicianId)} · {e.minutes != null ? `logged ${formatWhen(e.startedAt)}` : `timer from ${formatWhen(e.startedAt)}`}
                </Body>
              </View>
              {e.note ? <Body tone="secondary">{e.note}</Body> : null}
              {e.corrections?.length ? (
                <View style={styles.corrections} testID={`entry-history-${e.id}`}>
                  {e.corrections.map((c, i) => (
                    <Body key={i} variant="small" tone="secondary">
                      Corrected by {c.by}, {formatWhen(c.at)}: {formatMinutes(c.oldMinutes)} → {formatMinutes(c.newMinutes)}. “{c.why}”
                    </Body>
                  ))}
                </View>
              ) : null}
              {mayCorrect(e) ? (
                open === e.id ? (
                  <CorrectEntry entry={e} minutesNow={entryMinutes(e, now)} busy={busy} onCancel={() => setOpen(null)} onCorrect={onCorrect} onDone={() => setOpen(null)} />
                ) : (
                  <View style={styles.start}>
                    <Button label="Correct this entry" variant="quiet" onPress={() => setOpen(e.id)} accessibilityLabel={`Correct this entry of ${formatMinutes(entryMinutes(e, now))}`} testID={`entry-correct-${e.id}`} />
                  </View>
                )
              ) : null}
            </View>
          ))}
        </View>
      ) : (
        <Body tone="secondary">No time logged yet.</Body>
      )}
    </Card>
  );
}

/** A time entry put right: the minutes it should have been (0 for one logged by mistake) and why, kept in its history. */
function CorrectEntry({ entry, minutesNow, busy, onCorrect, onCancel, onDone }: { entry: TimeEntryView; minutesNow: number; busy: boolean; onCorrect: TimeEntriesProps['onCorrect']; onCancel: () => void; onDone: () => void }) {
  const [minutes, setMinutes] = useState(String(minutesNow));
  const [why, setWhy] = useState('');
  const [errors, setErrors] = useState<{ minutes?: string; why?: string }>({});
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const submit = async () => {
    const n = Number(minutes.trim());
    const next: typeof errors = {};
    if (!minutes.trim() || !Number.isInteger(n)) next.minutes = 'Give whole minutes, from 0 to 1440.';
    else if (n < 0) next.minutes = 'Minutes cannot be negative: 0 stands for an entry logged by mistake.';
    else if (n > 1440) next.minutes = 'At most 1440 minutes (24 hours).';
    else if (n === minutesNow) next.minutes = 'That is what the entry says already.';
    if (!why.trim()) next.why = 'Say why the time changes: it is kept with the entry.';
    setErrors(next);
    if (Object.keys(next).length) return;
    const outcome = await onCorrect(entry.id, n, why.trim());
    setFeedback(outcome);
    if (outcome?.tone === 'success') onDone();
  };
  return (
    <View style={styles.correct} role="form" aria-label="Correct the entry">
      <TextField label="Minutes it should be" value={minutes} onChangeText={(t) => setMinutes(t.replace(/[^0-9-]/g, ''))} unit="min" inputMode="numeric" error={errors.minutes} short testID={`entry-minutes-${entry.id}`} />
      <TextField label="Why" hint="Kept in the entry’s history with your name." value={why} onChangeText={setWhy} multiline maxLength={500} error={errors.why} testID={`entry-why-${entry.id}`} />
      <View style={styles.buttons}>
        <Button label="Save the correction" onPress={submit} busy={busy} testID={`entry-save-${entry.id}`} />
        <Button label="Cancel" variant="quiet" onPress={onCancel} />
      </View>
      <Feedback state={feedback} testID={`entry-feedback-${entry.id}`} />
    </View>
  );
}

const styles = StyleSheet.create({
  start: { alignItems: 'flex-start' },
  columns: { flexDirection: 'row', gap: SPACE.xl, alignItems: 'flex-start' },
  column: { flex: 1, gap: SPACE.lg, minWidth: 0 },
  stack: { gap: SPACE.lg },
  summaryTop: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: SPACE.sm },
  entry: { paddingVertical: SPACE.sm, borderBottomWidth: 1, borderBottomColor: PALETTE.linen, gap: SPACE.xxs },
  entryTop: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: SPACE.sm },
  corrections: { gap: SPACE.xxs, paddingLeft: SPACE.md, borderLeftWidth: 2, borderLeftColor: PALETTE.linen },
  correct: { gap: SPACE.md, paddingTop: SPACE.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
});
