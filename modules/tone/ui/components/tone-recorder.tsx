import { useCallback, useEffect, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useSession } from '@/modules/accounts/ui/use-session';
import { analyseRecording } from '@/modules/tone/core/analyse';
import { keyName } from '@/modules/tone/core/pitch';
import { encodeWav, MAX_RECORDING_SECONDS } from '@/modules/tone/core/wav';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

import { uploadRecording } from '../recording-upload';
import type { RecordingView } from '@/modules/tone/core/recording';
import { startRecording, type LiveRecording } from '../wav-recorder';
import { offsetText } from './tone-report';
import { WavFilePicker } from './wav-file-picker';

interface ToneRecorderProps {
  /** whose recording: a piano on record, or an intake's draft not yet submitted */
  pianoId?: number;
  draftKey?: string;
  onSaved: (recording: RecordingView) => void;
  testID?: string;
}

type Phase = 'idle' | 'asking' | 'recording' | 'sending';

const METER_FLOOR_DB = -60;
const clock = (s: number) => `${Math.floor(s / 60)}:${String(Math.floor(s % 60)).padStart(2, '0')}`;

/** How loud the microphone hears it, in words as well as a bar. */
function levelWords(db: number): string {
  if (db > -3) return 'too loud: move the phone back';
  if (db < -50) return 'very quiet';
  return 'good';
}

/** Record the play test with the microphone, or upload a WAV; the server measures it and keeps it with the piano. */
export function ToneRecorder({ pianoId, draftKey, onSaved, testID = 'tone-recorder' }: ToneRecorderProps) {
  const { token } = useSession();
  const [phase, setPhase] = useState<Phase>('idle');
  const [problem, setProblem] = useState<string | null>(null);
  const [level, setLevel] = useState(METER_FLOOR_DB);
  const [elapsed, setElapsed] = useState(0);
  const [heard, setHeard] = useState<string | null>(null);
  const [unsent, setUnsent] = useState<{ wav: Blob; fileName: string; source: 'recorded' | 'uploaded' } | null>(null);
  const live = useRef<LiveRecording | null>(null);
  const started = useRef(0);
  const levelRef = useRef(METER_FLOOR_DB);

  const send = useCallback(
    async (wav: Blob, fileName: string, source: 'recorded' | 'uploaded') => {
      if (!token) {
        setProblem('Your session has ended: sign in again.');
        return;
      }
      setPhase('sending');
      setProblem(null);
      const outcome = await uploadRecording({ wav, fileName, source, pianoId, draftKey, token });
      setPhase('idle');
      if (outcome.ok) {
        setUnsent(null);
        onSaved(outcome.recording);
      } else {
        setProblem(outcome.message);
        setUnsent({ wav, fileName, source });
      }
    },
    [draftKey, onSaved, pianoId, token],
  );

  const stop = useCallback(() => {
    const rec = live.current;
    if (!rec) return;
    live.current = null;
    const samples = rec.stop();
    const bytes = encodeWav(samples, rec.sampleRate);
    void send(new Blob([bytes.buffer as ArrayBuffer], { type: 'audio/wav' }), 'play-test.wav', 'recorded');
  }, [send]);

  const stopRef = useRef(stop);
  useEffect(() => {
    stopRef.current = stop;
  });

  const record = async () => {
    setProblem(null);
    setHeard(null);
    setPhase('asking');
    const outcome = await startRecording({
      // A peak that falls back slowly (about 15 dB a second): the meter stays readable between notes.
      onLevel: (db) => {
        levelRef.current = Math.max(db, levelRef.current - 1.5);
      },
      onLimit: () => stopRef.current(),
    });
    if (!outcome.ok) {
      setPhase('idle');
      setProblem(outcome.problem.message);
      return;
    }
    live.current = outcome.recording;
    started.current = Date.now();
    setElapsed(0);
    setPhase('recording');
  };

  // While recording: the meter, the clock, and the last note the analysis hears (the same code the server runs).
  useEffect(() => {
    if (phase !== 'recording') return;
    const meter = setInterval(() => {
      setLevel(levelRef.current);
      setElapsed((Date.now() - started.current) / 1000);
    }, 100);
    const listen = setInterval(() => {
      const rec = live.current;
      if (!rec) return;
      const { notes } = analyseRecording(rec.tail(1.5), rec.sampleRate);
      const last = notes[notes.length - 1];
      if (last) setHeard(`${keyName(last.key)} (key ${last.key}), ${offsetText(last.cents)}`);
    }, 700);
    return () => {
      clearInterval(meter);
      clearInterval(listen);
    };
  }, [phase]);

  useEffect(() => () => live.current?.cancel(), []);

  const cancel = () => {
    live.current?.cancel();
    live.current = null;
    setPhase('idle');
  };

  const meterPct = Math.round(Math.max(0, Math.min(1, (level - METER_FLOOR_DB) / -METER_FLOOR_DB)) * 100);
  return (
    <View style={styles.recorder} testID={testID}>
      <Body variant="small" tone="secondary">
        Play each note on its own and let it ring for about a second before the next, without the sustain pedal: a scale, a chromatic run, or one note from each register. Keep the phone near the strings. Up to {MAX_RECORDING_SECONDS / 60} minutes.
      </Body>
      {problem ? (
        <Notice tone="error" testID={`${testID}-problem`} actions={unsent ? <Button label="Send again" variant="secondary" onPress={() => void send(unsent.wav, unsent.fileName, unsent.source)} testID={`${testID}-retry`} /> : undefined}>
          {problem}
        </Notice>
      ) : null}
      {phase === 'recording' ? (
        <View style={styles.live} testID={`${testID}-live`}>
          <View style={styles.meterRow}>
            <Body variant="bodyStrong" testID={`${testID}-clock`}>
              ● Recording {clock(elapsed)}
            </Body>
            <Body variant="small" tone="secondary" testID={`${testID}-level`}>
              Level {level <= METER_FLOOR_DB ? 'below −60' : `${level < -0.5 ? '−' : ''}${Math.abs(Math.round(level))}`} dB · {levelWords(level)}
            </Body>
          </View>
          <View role="meter" aria-label="Microphone level" aria-valuemin={METER_FLOOR_DB} aria-valuemax={0} aria-valuenow={Math.round(Math.max(METER_FLOOR_DB, level))} style={styles.track} testID={`${testID}-meter`}>
            <View style={[styles.fill, { width: `${meterPct}%` }]} />
          </View>
          <Body aria-live="polite" testID={`${testID}-heard`}>
            {heard ? `Last note heard: ${heard}` : 'Listening for a note…'}
          </Body>
          <View style={styles.buttons}>
            <Button label="Stop and measure" onPress={stop} testID={`${testID}-stop`} />
            <Button label="Cancel" variant="quiet" onPress={cancel} testID={`${testID}-cancel`} />
          </View>
        </View>
      ) : (
        <View style={styles.buttons}>
          <Button label={phase === 'asking' ? 'Asking for the microphone…' : 'Record'} onPress={() => void record()} busy={phase === 'asking'} disabled={phase === 'sending'} testID={`${testID}-record`} />
          <WavFilePicker onFile={(file, name) => void send(file, name, 'uploaded')} disabled={phase !== 'idle'} testID={`${testID}-upload`} />
          {phase === 'sending' ? (
            <Body tone="secondary" testID={`${testID}-sending`}>
              Sending and measuring…
            </Body>
          ) : null}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  recorder: { gap: SPACE.md },
  live: { gap: SPACE.sm, padding: SPACE.md, borderRadius: RADIUS.md, borderWidth: 1, borderColor: PALETTE.linen, backgroundColor: PALETTE.vellum },
  meterRow: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: SPACE.sm },
  track: { height: 12, borderRadius: RADIUS.pill, backgroundColor: PALETTE.linen, overflow: 'hidden', borderWidth: 1, borderColor: PALETTE.linenDark },
  fill: { height: '100%', backgroundColor: PALETTE.felt },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.sm },
});
