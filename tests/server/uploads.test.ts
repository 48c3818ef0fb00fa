import fs from 'node:fs';
import path from 'node:path';

import { MAX_PHOTO_BYTES } from '@/modules/photos/core/photo-rules';

import { startTestApi, type TestApi } from '../support/api';
import { buildIntake } from '../support/builders';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

const JPEG = fs.readFileSync(path.join(__dirname, '../fixtures/keys-photo.jpg'));
const draftKey = 'draft-0123456789abcdef';

async function nothingStored(before: { keys: string[]; rows: number }) {
  expect(await api.objectKeys()).toEqual(before.keys);
  expect((await api.knex('photos').count('* as n').first())!.n).toBe(before.rows);
}
async function state() {
  return { keys: await api.objectKeys(), rows: (await api.knex('photos').count('* as n').first())!.n as number };
}

describe('POST /api/photos', () => {
  it('stores a real JPEG in S3, records it, and serves it through a presigned link', async () => {
    const res = await api.http
      .post('/api/photos')
      .set('Authorization', `Bearer ${await api.tokenFor('intake')}`)
      .field('area', 'keys')
      .field('caption', 'Bass end, keys 1-14')
      .field('draftKey', draftKey)
      .attach('photo', JPEG, { filename: 'keys.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ area: 'keys', caption: 'Bass end, keys 1-14', contentType: 'image/jpeg', bytes: JPEG.length, pianoId: null });

    const row = await api.knex('photos').where({ id: res.body.id }).first();
    expect(await api.objectKeys()).toContain(row.object_key);
    const fetched = await fetch(res.body.url);
    expect(fetched.status).toBe(200);
    expect(Buffer.from(await fetched.arrayBuffer()).equals(JPEG)).toBe(true);

    // Submitting the intake attaches the draft photo to the new piano.
    const out = await api.gql(await api.tokenFor('intake'), 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake({ photoIds: [res.body.id] }) });
    const pianoId = out.body.data.submitIntake.pianoId;
    const listed = await api.gql(await api.tokenFor('floor'), `{ photos(pianoId: ${pianoId}) }`);
    expect(listed.body.data.photos).toEqual([expect.objectContaining({ id: res.body.id, pianoId, caption: 'Bass end, keys 1-14' })]);
  });

  it('refuses a file over 10 MB with 413 and stores nothing', async () => {
    const before = await state();
    const big = Buffer.concat([JPEG, Buffer.alloc(MAX_PHOTO_BYTES)]);
    const res = await api.http
      .post('/api/photos')
      .set('Authorization', `Bearer ${await api.tokenFor('intake')}`)
      .field('area', 'keys')
      .field('draftKey', draftKey)
      .attach('photo', big, { filename: 'big.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(413);
    expect(res.body.error).toMatch(/^photo: must be at most 10 MB/);
    await nothingStored(before);
  });

  it('refuses a file that only claims to be a JPEG with 415 and stores nothing', async () => {
    const before = await state();
    const res = await api.http
      .post('/api/photos')
      .set('Authorization', `Bearer ${await api.tokenFor('intake')}`)
      .field('area', 'keys')
      .field('draftKey', draftKey)
      .attach('photo', Buffer.from('<html><script>alert(1)</script></html>'), { filename: 'keys.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(415);
    expect(res.body.error).toBe('photo: must be a JPEG, PNG or WebP image');
    await nothingStored(before);
  });

  it('refuses an upload without a token with 401 and stores nothing', async () => {
    const before = await state();
    const res = await api.http.post('/api/photos').field('area', 'keys').field('draftKey', draftKey).attach('photo', JPEG, 'keys.jpg');
    expect(res.status).toBe(401);
    await nothingStored(before);
  });

  it('refuses floor staff, an unknown area and a missing file, storing nothing', async () => {
    const before = await state();
    const floor = await api.http.post('/api/photos').set('Authorization', `Bearer ${await api.tokenFor('floor')}`).field('area', 'keys').field('draftKey', draftKey).attach('photo', JPEG, 'k.jpg');
    expect(floor.status).toBe(403);
    const token = await api.tokenFor('intake');
    const area = await api.http.post('/api/photos').set('Authorization', `Bearer ${token}`).field('area', 'lid').field('draftKey', draftKey).attach('photo', JPEG, 'k.jpg');
    expect(area.status).toBe(400);
    expect(area.body.error).toMatch(/^area: /);
    const none = await api.http.post('/api/photos').set('Authorization', `Bearer ${token}`).field('area', 'keys').field('draftKey', draftKey);
    expect(none.status).toBe(400);
    expect(none.body.error).toMatch(/^photo: /);
    await nothingStored(before);
  });

  it('records a workshop photo’s item and phase, and refuses an item of another piano', async () => {
    const token = await api.tokenFor('technician');
    const item = await api.knex('work_items').first();
    const ok = await api.http.post('/api/photos').set('Authorization', `Bearer ${token}`).field('area', 'hammers').field('pianoId', String(item.piano_id)).field('workItemId', String(item.id)).field('phase', 'before').attach('photo', JPEG, 'k.jpg');
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ workItemId: item.id, phase: 'before', pianoId: item.piano_id });
    const other = await api.knex('pianos').whereNot('id', item.piano_id).first();
    const before = await state();
    const bad = await api.http.post('/api/photos').set('Authorization', `Bearer ${token}`).field('area', 'hammers').field('pianoId', String(other.id)).field('workItemId', String(item.id)).attach('photo', JPEG, 'k.jpg');
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatch(/^workItemId: /);
    await nothingStored(before);
  });

  it('will not attach another user’s draft photo to an intake', async () => {
    const up = await api.http.post('/api/photos').set('Authorization', `Bearer ${await api.tokenFor('manager')}`).field('area', 'case').field('draftKey', draftKey).attach('photo', JPEG, 'k.jpg');
    expect(up.status).toBe(201);
    const res = await api.gql(await api.tokenFor('intake'), 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake({ photoIds: [up.body.id] }) });
    expect(res.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'photoIds' });
    expect((await api.knex('photos').where({ id: up.body.id }).first()).piano_id).toBeNull();
  });
});
