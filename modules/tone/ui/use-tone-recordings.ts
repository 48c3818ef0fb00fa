import { useMemo } from 'react';
import { useMutation, useQuery } from 'urql';

import type { RecordingView } from '@/modules/tone/core/recording';

const FIELDS = `id pianoId assessmentId source durationS sampleRate bytes recordedAt recordedBy url
  notes { startS frequencyHz key cents levelDb }
  report {
    notesHeard standOutRule
    keys { key name frequencyHz cents levelDb times }
    registers { register label firstKey lastKey keys meanLevelDb relativeToMiddleDb levelSpreadDb meanCents evenness }
    standOut { key name measure direction difference zScore }
    pitch { overallCents a4Hz a4From pitchRaiseNeeded pitchRaiseCents }
  }`;

export const TONE_RECORDINGS_QUERY = `query ToneRecordings($where: ToneRecordingsWhere!) { toneRecordings(where: $where) { ${FIELDS} } }`;
const DISCARD = 'mutation DiscardToneRecording($input: DiscardToneRecordingInput!) { discardToneRecording(input: $input) { id } }';

/** A piano's play-test recordings, or your own for a draft, oldest first. */
export function useToneRecordings(pianoId: number | undefined, draftKey: string | undefined) {
  const variables = useMemo(() => ({ where: pianoId != null ? { pianoId } : { draftKey } }), [pianoId, draftKey]);
  const [result, reexecute] = useQuery<{ toneRecordings: RecordingView[] }>({
    query: TONE_RECORDINGS_QUERY,
    variables,
    pause: pianoId == null && !draftKey,
    requestPolicy: 'cache-and-network',
  });
  return { recordings: result.data?.toneRecordings ?? null, error: result.error, refresh: () => reexecute({ requestPolicy: 'network-only' }) };
}

export function useDiscardRecording() {
  const [state, run] = useMutation<{ discardToneRecording: { id: number } }>(DISCARD);
  return { discard: (id: number) => run({ input: { id } }), discarding: state.fetching };
}
