// Sending a play-test WAV: multipart POST /api/recordings; the server checks the bytes, measures and stores it.
import { MAX_RECORDING_BYTES } from '@/modules/tone/core/wav';

import type { RecordingView } from '@/modules/tone/core/recording';

export interface RecordingUpload {
  wav: Blob;
  fileName: string;
  source: 'recorded' | 'uploaded';
  draftKey?: string;
  pianoId?: number;
  token: string;
}

export type RecordingUploadOutcome = { ok: true; recording: RecordingView } | { ok: false; message: string };

/** "recording: must be ..." from the server reads "The recording must be ..." here. */
export function recordingProblem(message: string): string {
  const m = /^recording: (.*)$/.exec(message);
  return m ? `The recording ${m[1]}.` : message;
}

export async function uploadRecording(req: RecordingUpload): Promise<RecordingUploadOutcome> {
  if (req.wav.size > MAX_RECORDING_BYTES) return { ok: false, message: recordingProblem(`recording: must be at most ${MAX_RECORDING_BYTES / 1024 / 1024} MB`) };
  const form = new FormData();
  form.append('source', req.source);
  if (req.draftKey) form.append('draftKey', req.draftKey);
  if (req.pianoId != null) form.append('pianoId', String(req.pianoId));
  form.append('recording', req.wav, req.fileName);
  let res: Response;
  try {
    res = await fetch('/api/recordings', { method: 'POST', headers: { Authorization: `Bearer ${req.token}`, Accept: 'application/json' }, body: form });
  } catch {
    return { ok: false, message: 'The recording did not reach the server. Check the connection and send it again.' };
  }
  const body = (await res.json().catch(() => null)) as (RecordingView & { error?: string }) | null;
  if (res.status === 201 && body && typeof body.id === 'number') return { ok: true, recording: body };
  if (res.status === 401) return { ok: false, message: 'Your session has ended: sign in again, then send the recording again.' };
  if (res.status === 403) return { ok: false, message: 'Your role cannot record play tests.' };
  return { ok: false, message: typeof body?.error === 'string' ? recordingProblem(body.error) : `The upload failed (${res.status}).` };
}
