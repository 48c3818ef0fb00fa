import { randomUUID } from 'node:crypto';

import type { QueryBuilder } from 'objection';
import { z } from '@/modules/input/core/zod';

import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { Assessment } from '@/modules/assessment/server/assessment-models';
import { currentRules } from '@/modules/assessment/server/assessment-service';
import type { PhotoStore } from '@/modules/photos/server/photo-store';
import { Piano } from '@/modules/pianos/server/piano-model';
import { analyseRecording } from '@/modules/tone/core/analyse';
import { disclosureTone, keyboardReport, type DisclosureTone } from '@/modules/tone/core/keyboard-report';
import type { RecordingView } from '@/modules/tone/core/recording';
import { decodeWav, MAX_RECORDING_BYTES, readWavInfo, WAV_CONTENT_TYPE, type WavProblem } from '@/modules/tone/core/wav';
import { AppError, badInput, notAllowed, notFound } from '@/server/errors';

import { ToneNoteRow, ToneRecording } from './tone-models';

export const recordingFields = z
  .object({
    pianoId: z.coerce.number().int().positive().optional(),
    // The same draft key the intake's photos use: the recording joins the assessment when the intake is submitted.
    draftKey: z.string().regex(/^[A-Za-z0-9-]{16,64}$/, 'must be 16-64 letters, digits or dashes').optional(),
    source: z.enum(['recorded', 'uploaded'], { message: 'must be recorded or uploaded' }).default('uploaded'),
  })
  .refine((f) => f.pianoId != null || f.draftKey != null, { message: 'give a pianoId or a draftKey', path: ['pianoId'] });

const iso = (t: string | Date) => new Date(t).toISOString();

async function recordingView(store: PhotoStore, r: ToneRecording, pitchRaiseCents: number): Promise<RecordingView> {
  const notes = [...(r.notes ?? [])].sort((a, b) => a.position - b.position).map((n) => ({ startS: n.startS, frequencyHz: n.frequencyHz, key: n.key, cents: n.cents, levelDb: n.levelDb }));
  return {
    id: r.id,
    pianoId: r.pianoId,
    assessmentId: r.assessmentId,
    source: r.source,
    durationS: r.durationS,
    sampleRate: r.sampleRate,
    bytes: r.bytes,
    recordedAt: iso(r.recordedAt),
    recordedBy: r.recordedBy?.name ?? 'unknown',
    url: await store.readUrl(r.objectKey),
    notes,
    report: keyboardReport(notes, { pitchRaiseCents }),
  };
}

const tooLarge = () => new AppError('TOO_LARGE', `recording: must be at most ${MAX_RECORDING_BYTES / 1024 / 1024} MB`, 'recording');

function wavRefusal(problem: WavProblem): AppError {
  const message = `recording: ${problem.message}`;
  if (problem.kind === 'not_wav' || problem.kind === 'unsupported') return new AppError('UNSUPPORTED_TYPE', message, 'recording');
  if (problem.kind === 'too_long') return new AppError('TOO_LARGE', message, 'recording');
  return badInput('recording', problem.message);
}

/** Checks a recording by its bytes, measures it, stores the WAV in S3 and the notes in PostgreSQL; a refusal stores nothing. */
export async function saveRecording(store: PhotoStore, actor: Actor, fields: unknown, file: { buffer: Buffer; size: number } | undefined): Promise<RecordingView> {
  if (!can(actor.role, 'recordTone')) throw notAllowed('record play tests');
  const f = recordingFields.parse(fields);
  if (!file) throw badInput('recording', 'attach a WAV file in the field "recording"');
  if (file.size > MAX_RECORDING_BYTES) throw tooLarge();
  const bytes = new Uint8Array(file.buffer.buffer, file.buffer.byteOffset, file.buffer.byteLength);
  const read = readWavInfo(bytes);
  if (!read.ok) throw wavRefusal(read.problem);
  const piano = f.pianoId != null ? await Piano.query().findById(f.pianoId) : null;
  if (f.pianoId != null && !piano) throw notFound(`piano ${f.pianoId}`);

  const { notes } = analyseRecording(decodeWav(bytes, read.info), read.info.sampleRate);
  const owner = piano ? `pianos/${piano.id}` : `drafts/${f.draftKey}`;
  const objectKey = `${owner}/recordings/${randomUUID()}.wav`;
  await store.put(objectKey, file.buffer, WAV_CONTENT_TYPE);
  try {
    const saved = await ToneRecording.transaction(async (trx) => {
      // On a piano's page the recording belongs to its assessment as it stands.
      const latest = piano ? await Assessment.query(trx).where('piano_id', piano.id).orderBy('version', 'desc').first() : undefined;
      const recording = await ToneRecording.query(trx).insertAndFetch({
        pianoId: piano?.id ?? null,
        assessmentId: latest?.id ?? null,
        draftKey: piano ? null : f.draftKey!,
        source: f.source,
        objectKey,
        bytes: file.size,
        sampleRate: read.info.sampleRate,
        channels: read.info.channels,
        durationS: read.info.durationS,
        recordedById: actor.id,
      });
      if (notes.length) await ToneNoteRow.query(trx).insert(notes.map((n, position) => ({ recordingId: recording.id, position, ...n })));
      return recording.id;
    });
    return (await loadViews(store, ToneRecording.query().where('tone_recordings.id', saved)))[0];
  } catch (err) {
    await store.remove(objectKey).catch(() => undefined);
    throw err;
  }
}

async function loadViews(store: PhotoStore, q: QueryBuilder<ToneRecording, ToneRecording[]>): Promise<RecordingView[]> {
  const [rows, rules] = await Promise.all([q.withGraphFetched('[recordedBy, notes]').orderBy('tone_recordings.id'), currentRules()]);
  return Promise.all(rows.map((r) => recordingView(store, r, rules.pitchRaiseCents)));
}

/** How many recordings one list shows: the newest, enough to compare takes before and after the work. */
export const MAX_RECORDINGS_LISTED = 12;

/** A piano's newest recordings, or your own recordings for an intake not yet submitted. Every staff role reads results. */
export async function listRecordings(store: PhotoStore, actor: Actor, where: { pianoId?: number | null; draftKey?: string | null }): Promise<RecordingView[]> {
  if (!can(actor.role, 'readToneResults')) throw notAllowed('read play-test results');
  const newest = ToneRecording.query().select('id').orderBy('id', 'desc').limit(MAX_RECORDINGS_LISTED);
  if (where.pianoId != null) newest.where('piano_id', where.pianoId);
  else if (where.draftKey) newest.where({ draft_key: where.draftKey, recorded_by_id: actor.id }).whereNull('piano_id');
  else throw badInput('pianoId', 'give a pianoId or a draftKey');
  return loadViews(store, ToneRecording.query().whereIn('id', newest));
}

/** Throws away one of your own draft recordings (a take gone wrong): the WAV and its results. */
export async function discardRecording(store: PhotoStore, actor: Actor, id: number): Promise<number> {
  if (!can(actor.role, 'recordTone')) throw notAllowed('record play tests');
  const recording = await ToneRecording.query().findById(id);
  if (!recording || recording.recordedById !== actor.id) throw notFound(`recording ${id} of yours`);
  if (recording.pianoId != null) throw new AppError('CONFLICT', 'This recording belongs to a piano now: it stays with its record.', 'id');
  await ToneRecording.query().deleteById(id);
  await store.remove(recording.objectKey).catch(() => undefined);
  return id;
}

/**
 * What a disclosure shows of a piano's play test: its newest recording in which notes were heard, as
 * `disclosureTone` puts it (no sign-in needed: the disclosure is built on the server for publishing).
 */
export async function latestPlayTest(pianoId: number): Promise<{ recordedAt: string; tone: DisclosureTone } | null> {
  const newest = await ToneRecording.query()
    .where('piano_id', pianoId)
    .whereExists(ToneNoteRow.query().select(1).whereColumn('tone_notes.recording_id', 'tone_recordings.id'))
    .orderBy('recorded_at', 'desc')
    .orderBy('id', 'desc')
    .first();
  if (!newest) return null;
  const [notes, rules] = await Promise.all([ToneNoteRow.query().where('recording_id', newest.id).orderBy('position'), currentRules()]);
  const recordedAt = iso(newest.recordedAt);
  const report = keyboardReport(
    notes.map((n) => ({ startS: n.startS, frequencyHz: n.frequencyHz, key: n.key, cents: n.cents, levelDb: n.levelDb })),
    { pitchRaiseCents: rules.pitchRaiseCents },
  );
  return { recordedAt, tone: disclosureTone(recordedAt, report) };
}
