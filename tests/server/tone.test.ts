import fs from 'node:fs';
import path from 'node:path';

import { analyseRecording } from '@/modules/tone/core/analyse';
import { keyboardReport } from '@/modules/tone/core/keyboard-report';
import { decodeWav, encodeWav, MAX_RECORDING_BYTES, readWavInfo } from '@/modules/tone/core/wav';

import { startTestApi, type TestApi } from '../support/api';
import { buildIntake } from '../support/builders';
import { run, SAMPLE_RATE } from '../support/tone-signals';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

const draftKey = 'tone-draft-0123456789abcdef';
// A run up the keyboard, 25 cents flat (a pitch raise by the shop default of 15), key 45 played 8 dB louder.
const KEYS = [16, 21, 28, 33, 37, 40, 42, 44, 45, 47, 49, 52, 56, 61, 64, 68];
const WAV = Buffer.from(encodeWav(run(KEYS, { noteS: 0.7, gapS: 0.25, centsOff: () => -25, amplitude: (k) => (k === 45 ? 0.8 : 0.32) }), SAMPLE_RATE));

const RECORDINGS = `query($where: ToneRecordingsWhere!) { toneRecordings(where: $where) {
  id pianoId assessmentId source durationS sampleRate bytes recordedAt recordedBy url
  notes { startS frequencyHz key cents levelDb }
  report { notesHeard standOutRule keys { key name cents levelDb times } registers { register keys relativeToMiddleDb levelSpreadDb evenness }
    standOut { key measure direction difference } pitch { overallCents a4Hz a4From pitchRaiseNeeded pitchRaiseCents } }
} }`;

async function upload(role: 'intake' | 'technician' | 'floor' | 'manager', body: Buffer, fields: Record<string, string>, filename = 'play.wav', contentType = 'audio/wav') {
  let req = api.http.post('/api/recordings').set('Authorization', `Bearer ${await api.tokenFor(role)}`);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('recording', body, { filename, contentType });
}

async function state() {
  return { keys: await api.objectKeys(), recordings: Number((await api.knex('tone_recordings').count('* as n').first())!.n), notes: Number((await api.knex('tone_notes').count('* as n').first())!.n) };
}

async function pianoWithAssessment() {
  const out = await api.gql(await api.tokenFor('intake'), 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake() });
  return out.body.data.submitIntake as { pianoId: number; assessmentId: number };
}

describe('POST /api/recordings', () => {
  it('measures a WAV made here exactly as the module does, stores it in S3 and its notes in PostgreSQL, tied to the assessment', async () => {
    const { pianoId, assessmentId } = await pianoWithAssessment();
    const res = await upload('technician', WAV, { pianoId: String(pianoId), source: 'uploaded' });
    expect(res.status).toBe(201);

    const read = readWavInfo(new Uint8Array(WAV));
    if (!read.ok) throw new Error(read.problem.message);
    const expected = analyseRecording(decodeWav(new Uint8Array(WAV), read.info), read.info.sampleRate);
    expect(res.body.notes).toEqual(expected.notes);
    expect(res.body.notes.map((n: { key: number }) => n.key)).toEqual(KEYS);
    expect(res.body).toMatchObject({ pianoId, assessmentId, source: 'uploaded', sampleRate: SAMPLE_RATE, bytes: WAV.length, recordedBy: expect.any(String) });

    const row = await api.knex('tone_recordings').where({ id: res.body.id }).first();
    expect(await api.objectKeys()).toContain(row.object_key);
    const fetched = await fetch(res.body.url);
    expect(Buffer.from(await fetched.arrayBuffer()).equals(WAV)).toBe(true);
    expect(Number((await api.knex('tone_notes').where({ recording_id: res.body.id }).count('* as n').first())!.n)).toBe(KEYS.length);

    // Read back through GraphQL by another role: the same notes, and the report of them.
    const listed = await api.gql(await api.tokenFor('floor'), RECORDINGS, { where: { pianoId } });
    expect(listed.body.errors).toBeUndefined();
    const [rec] = listed.body.data.toneRecordings;
    expect(rec.notes).toEqual(expected.notes);
    const report = keyboardReport(expected.notes, { pitchRaiseCents: 15 });
    expect(rec.report.pitch).toEqual({ ...report.pitch, a4From: 'key49' });
    // from memory: more than about 15-20 cents flat needs a pitch raise (shop default 15)
    expect(rec.report.pitch.pitchRaiseNeeded).toBe(true);
    expect(rec.report.pitch.overallCents).toBeCloseTo(-25, 0);
    expect(rec.report.standOut).toEqual([expect.objectContaining({ key: 45, measure: 'level', direction: 'louder' })]);
    expect(new Date(rec.recordedAt).toISOString()).toBe(rec.recordedAt);
  });

  it('keeps a recording made during an intake as a draft, then ties it to the piano and assessment on submit', async () => {
    const res = await upload('intake', WAV, { draftKey, source: 'recorded' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ pianoId: null, assessmentId: null, source: 'recorded' });
    // a draft is its maker's own
    const other = await api.gql(await api.tokenFor('manager'), RECORDINGS, { where: { draftKey } });
    expect(other.body.data.toneRecordings).toEqual([]);

    const out = await api.gql(await api.tokenFor('intake'), 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake({ recordingIds: [res.body.id] }) });
    const { pianoId, assessmentId } = out.body.data.submitIntake;
    const listed = await api.gql(await api.tokenFor('technician'), RECORDINGS, { where: { pianoId } });
    expect(listed.body.data.toneRecordings).toEqual([expect.objectContaining({ id: res.body.id, pianoId, assessmentId })]);
  });

  it('refuses to attach a recording someone else made', async () => {
    const res = await upload('floor', WAV, { draftKey });
    const out = await api.gql(await api.tokenFor('intake'), 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake({ recordingIds: [res.body.id] }) });
    expect(out.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'recordingIds' });
  });

  it('lets the maker discard a draft take, WAV and all, but not a recording on a piano', async () => {
    const take = await upload('intake', WAV, { draftKey });
    const key = (await api.knex('tone_recordings').where({ id: take.body.id }).first()).object_key;
    const discard = 'mutation($input: DiscardToneRecordingInput!) { discardToneRecording(input: $input) { id } }';
    const byOther = await api.gql(await api.tokenFor('floor'), discard, { input: { id: take.body.id } });
    expect(byOther.body.errors[0].extensions.code).toBe('NOT_FOUND');
    const own = await api.gql(await api.tokenFor('intake'), discard, { input: { id: take.body.id } });
    expect(own.body.data.discardToneRecording).toEqual({ id: take.body.id });
    expect(await api.objectKeys()).not.toContain(key);
    expect(await api.knex('tone_recordings').where({ id: take.body.id }).first()).toBeUndefined();

    const { pianoId } = await pianoWithAssessment();
    const kept = await upload('intake', WAV, { pianoId: String(pianoId) });
    const refused = await api.gql(await api.tokenFor('intake'), discard, { input: { id: kept.body.id } });
    expect(refused.body.errors[0].extensions.code).toBe('CONFLICT');
  });
});

describe('bad uploads', () => {
  const jpeg = fs.readFileSync(path.join(__dirname, '../fixtures/keys-photo.jpg'));
  const webp = fs.readFileSync(path.join(__dirname, '../fixtures/keys-photo.webp'));
  const mpegInWav = (() => {
    const b = Buffer.from(WAV.subarray(0, 44 + 16000));
    b.writeUInt16LE(0x55, 20);
    return b;
  })();
  // 301 s of 8 kHz mono: a real file, one second over the limit
  const tooLong = Buffer.from(encodeWav(new Float32Array(301 * 8000), 8000));

  it.each([
    ['a JPEG named .wav', 415, 'must be a WAV file', jpeg],
    ['a WebP (another RIFF form)', 415, 'must be a WAV file', webp],
    ['compressed audio in a WAV container', 415, 'must hold uncompressed samples', mpegInWav],
    ['a header cut short', 400, 'recording:', WAV.subarray(0, 30)],
    ['a tenth of a second', 400, 'at least 0.5 seconds', Buffer.from(encodeWav(new Float32Array(4410), SAMPLE_RATE))],
    ['a recording over five minutes', 413, 'at most 5 minutes', tooLong],
  ])('refuses %s with %i and stores nothing', async (_what, status, message, body) => {
    const before = await state();
    const res = await upload('technician', body as Buffer, { draftKey });
    expect(res.status).toBe(status);
    expect(res.body.error).toContain(message);
    expect(await state()).toEqual(before);
  });

  it('refuses a file over 48 MB with 413 and stores nothing', async () => {
    const before = await state();
    const res = await upload('technician', Buffer.concat([WAV, Buffer.alloc(MAX_RECORDING_BYTES)]), { draftKey });
    expect(res.status).toBe(413);
    expect(res.body.error).toBe('recording: must be at most 48 MB');
    expect(await state()).toEqual(before);
  });

  it('refuses no file, no owner, an unknown piano and no sign-in, storing nothing', async () => {
    const before = await state();
    const none = await api.http.post('/api/recordings').set('Authorization', `Bearer ${await api.tokenFor('technician')}`).field('draftKey', draftKey);
    expect(none.status).toBe(400);
    expect((await upload('technician', WAV, {})).status).toBe(400);
    expect((await upload('technician', WAV, { pianoId: '999999' })).status).toBe(404);
    expect((await upload('technician', WAV, { draftKey, source: 'borrowed' })).status).toBe(400);
    expect((await api.http.post('/api/recordings').attach('recording', WAV, 'play.wav')).status).toBe(401);
    expect(await state()).toEqual(before);
  });

  it('asks GraphQL for a piano or a draft', async () => {
    const res = await api.gql(await api.tokenFor('technician'), RECORDINGS, { where: {} });
    expect(res.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'pianoId' });
  });
});
