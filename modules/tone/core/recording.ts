import type { ToneNote } from './analyse';
import type { KeyboardReport } from './keyboard-report';

/** A stored play-test recording as the API gives it (the ToneRecording GraphQL type and the upload's answer). */
export interface RecordingView {
  id: number;
  pianoId: number | null;
  assessmentId: number | null;
  source: 'recorded' | 'uploaded';
  durationS: number;
  sampleRate: number;
  bytes: number;
  /** ISO 8601 */
  recordedAt: string;
  recordedBy: string;
  /** a link to the WAV, valid for ten minutes */
  url: string;
  notes: ToneNote[];
  report: KeyboardReport;
}
