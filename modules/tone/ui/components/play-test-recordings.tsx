import { useState } from 'react';
import { Linking, StyleSheet, View } from 'react-native';

import { can } from '@/modules/accounts/core/roles';
import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { playTestFill, type PlayTestFill } from '@/modules/tone/core/keyboard-report';
import { formatDayTime } from '@/modules/pianos/ui/piano-format';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { FactList } from '@/modules/theme/ui/fact-list';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

import type { RecordingView } from '@/modules/tone/core/recording';
import { useDiscardRecording, useToneRecordings } from '../use-tone-recordings';
import { ToneRecorder } from './tone-recorder';
import { ToneReport } from './tone-report';

interface PlayTestRecordingsProps {
  /** a piano's recordings, or (with draftKey) the ones made for an intake or correction not yet submitted */
  pianoId?: number;
  draftKey?: string;
  /** in the assessment form: the measured values, once the user has confirmed them */
  onFill?: (fill: PlayTestFill) => void;
  /** in the assessment form: the recordings the draft holds changed */
  onDraftRecordings?: (ids: number[]) => void;
  testID?: string;
}

const minutes = (s: number) => `${Math.floor(s / 60)}:${String(Math.round(s % 60)).padStart(2, '0')}`;

/** The values a fill would put in the form, in words, leaving out what the recording did not measure. */
function fillFacts(fill: PlayTestFill) {
  const facts: { label: string; value: string }[] = [];
  if (fill.a4Hz != null) facts.push({ label: 'Measured A4', value: `${fill.a4Hz.toFixed(1)} Hz` });
  for (const [label, value] of [
    ['Bass evenness', fill.bassEvenness],
    ['Middle evenness', fill.middleEvenness],
    ['Treble evenness', fill.trebleEvenness],
  ] as const) {
    if (value != null) facts.push({ label, value: `${value} of 5 (from the level spread)` });
  }
  facts.push({ label: 'Notes that stand out', value: fill.notesStickingOut.length ? fill.notesStickingOut.join(', ') : 'none' });
  return facts;
}

function RecordingCard({ recording, onFill, onDiscard, discarding }: { recording: RecordingView; onFill?: (fill: PlayTestFill) => void; onDiscard?: () => void; discarding: boolean }) {
  const [confirming, setConfirming] = useState(false);
  const fill = playTestFill(recording.report);
  return (
    <Card testID={`recording-${recording.id}`}>
      <View style={styles.head}>
        <Body variant="subheading">{formatDayTime(recording.recordedAt)}</Body>
        <Body variant="small" tone="secondary">
          {minutes(recording.durationS)} · {recording.source === 'recorded' ? 'recorded here' : 'uploaded WAV'} · {recording.recordedBy}
        </Body>
      </View>
      <ToneReport report={recording.report} testID={`recording-${recording.id}-report`} />
      <View style={styles.actions}>
        {onFill && recording.report.keys.length ? <Button label="Fill in the play test from this recording" variant="secondary" onPress={() => setConfirming(true)} testID={`recording-${recording.id}-fill`} /> : null}
        <Button label="Download the WAV" variant="quiet" onPress={() => void Linking.openURL(recording.url)} testID={`recording-${recording.id}-wav`} />
        {onDiscard ? <Button label="Discard this take" variant="quiet" onPress={onDiscard} busy={discarding} testID={`recording-${recording.id}-discard`} /> : null}
      </View>
      {confirming && onFill ? (
        <View style={styles.confirm} testID={`recording-${recording.id}-confirm`} role="group" aria-label="Fill in from the recording">
          <Body variant="bodyStrong">Put these measured values into the form?</Body>
          <FactList dense facts={fillFacts(fill)} />
          <Body variant="small" tone="secondary">
            They replace what is typed in those fields; dynamic range and the overall impression stay yours to judge.
          </Body>
          <View style={styles.actions}>
            <Button
              label="Fill these in"
              onPress={() => {
                onFill(fill);
                setConfirming(false);
              }}
              testID={`recording-${recording.id}-fill-confirm`}
            />
            <Button label="Not now" variant="quiet" onPress={() => setConfirming(false)} />
          </View>
        </View>
      ) : null}
    </Card>
  );
}

/** Recordings with their results, newest first, and the recorder for roles that may record. */
export function PlayTestRecordings({ pianoId, draftKey, onFill, onDraftRecordings, testID = 'play-test-recordings' }: PlayTestRecordingsProps) {
  const { user } = useSession();
  const canRecord = !!user && can(user.role, 'recordTone');
  const { recordings, error, refresh } = useToneRecordings(pianoId, draftKey);
  const { discard, discarding } = useDiscardRecording();
  const [problem, setProblem] = useState<string | null>(null);
  const [fresh, setFresh] = useState<RecordingView[]>([]);
  // What the server listed, with any saved since that the list has not caught up with yet.
  const all = [...(recordings ?? []), ...fresh.filter((f) => !recordings?.some((r) => r.id === f.id))].sort((a, b) => b.id - a.id);

  const saved = (rec: RecordingView) => {
    setFresh((f) => [...f, rec]);
    onDraftRecordings?.([...new Set([...all.map((r) => r.id), rec.id])]);
    refresh();
  };
  const drop = async (id: number) => {
    const out = await discard(id);
    const p = graphProblem(out.error);
    if (p) {
      setProblem(p.message);
      return;
    }
    setFresh((f) => f.filter((r) => r.id !== id));
    onDraftRecordings?.(all.filter((r) => r.id !== id).map((r) => r.id));
    refresh();
  };
  const listProblem = graphProblem(error);
  return (
    <View style={styles.wrap} testID={testID}>
      {canRecord ? <ToneRecorder pianoId={pianoId} draftKey={pianoId == null ? draftKey : undefined} onSaved={saved} /> : null}
      {problem ? <Notice tone="error">{problem}</Notice> : null}
      {recordings == null && !fresh.length ? (
        listProblem ? <Notice tone="error">{listProblem.message}</Notice> : <Loading label="Loading the recordings…" />
      ) : all.length ? (
        all.map((r) => <RecordingCard key={r.id} recording={r} onFill={onFill} onDiscard={pianoId == null ? () => void drop(r.id) : undefined} discarding={discarding} />)
      ) : (
        <Body tone="secondary" testID={`${testID}-none`}>
          No play-test recordings yet.
        </Body>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.lg },
  head: { gap: SPACE.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, alignItems: 'center' },
  confirm: { gap: SPACE.sm, padding: SPACE.md, borderRadius: RADIUS.md, borderWidth: 1, borderColor: PALETTE.brass, backgroundColor: PALETTE.ivory },
});
