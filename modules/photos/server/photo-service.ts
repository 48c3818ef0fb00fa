import { randomUUID } from 'node:crypto';

import { z } from '@/modules/input/core/zod';

import { lineText } from '@/modules/input/core/text';
import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { IMAGE_EXTENSIONS, MAX_PHOTO_BYTES, PHOTO_AREAS, sniffImageType } from '@/modules/photos/core/photo-rules';
import { Piano } from '@/modules/pianos/server/piano-model';
import { AppError, badInput, notAllowed, notFound } from '@/server/errors';

import { Photo } from './photo-model';
import type { PhotoStore } from './photo-store';

export const photoFields = z
  .object({
    area: z.enum(PHOTO_AREAS, { message: `must be one of ${PHOTO_AREAS.join(', ')}` }),
    caption: lineText().trim().max(200).optional(),
    pianoId: z.coerce.number().int().positive().optional(),
    // A draft key is made by the phone for an intake not yet submitted.
    draftKey: z.string().regex(/^[A-Za-z0-9-]{16,64}$/, 'must be 16-64 letters, digits or dashes').optional(),
    // Workshop photos: which item, and before or after the work (before-photos stay off the disclosure).
    workItemId: z.coerce.number().int().positive().optional(),
    phase: z.enum(['before', 'after'], { message: 'must be before or after' }).optional(),
  })
  .refine((f) => f.pianoId != null || f.draftKey != null, { message: 'give a pianoId or a draftKey', path: ['pianoId'] })
  .refine((f) => f.workItemId == null || f.pianoId != null, { message: 'a workshop photo needs its pianoId', path: ['pianoId'] });

export interface PhotoView {
  id: number;
  pianoId: number | null;
  workItemId: number | null;
  phase: string | null;
  area: string;
  caption: string | null;
  contentType: string;
  bytes: number;
  createdAt: string;
  url: string;
}

export async function photoView(store: PhotoStore, p: Photo): Promise<PhotoView> {
  return { id: p.id, pianoId: p.pianoId, workItemId: p.workItemId, phase: p.phase, area: p.area, caption: p.caption, contentType: p.contentType, bytes: p.bytes, createdAt: p.createdAt, url: await store.readUrl(p.objectKey) };
}

/** Checks an upload by its bytes, stores it in S3, then records it; a failed record removes the object. */
export async function savePhoto(store: PhotoStore, actor: Actor, fields: unknown, file: { buffer: Buffer; size: number } | undefined): Promise<PhotoView> {
  if (!can(actor.role, 'uploadPhotos')) throw notAllowed('upload photos');
  const f = photoFields.parse(fields);
  if (!file) throw badInput('photo', 'attach an image file in the field "photo"');
  if (file.size > MAX_PHOTO_BYTES) throw new AppError('TOO_LARGE', `photo: must be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB`, 'photo');
  const type = sniffImageType(file.buffer);
  if (!type) throw new AppError('UNSUPPORTED_TYPE', 'photo: must be a JPEG, PNG or WebP image', 'photo');
  if (f.pianoId != null && !(await Piano.query().findById(f.pianoId))) throw notFound(`piano ${f.pianoId}`);
  if (f.workItemId != null) {
    const item = await Photo.knex()('work_items').where({ id: f.workItemId, piano_id: f.pianoId }).first('id');
    if (!item) throw badInput('workItemId', `is not a work item of piano ${f.pianoId}`);
  }

  const owner = f.pianoId != null ? `pianos/${f.pianoId}` : `drafts/${f.draftKey}`;
  const objectKey = `${owner}/${randomUUID()}.${IMAGE_EXTENSIONS[type]}`;
  await store.put(objectKey, file.buffer, type);
  try {
    const photo = await Photo.query().insertAndFetch({
      pianoId: f.pianoId ?? null,
      draftKey: f.pianoId != null ? null : f.draftKey!,
      area: f.area,
      caption: f.caption || null,
      workItemId: f.workItemId ?? null,
      phase: f.phase ?? null,
      objectKey,
      contentType: type,
      bytes: file.size,
      uploadedById: actor.id,
    });
    return await photoView(store, photo);
  } catch (err) {
    await store.remove(objectKey).catch(() => undefined);
    throw err;
  }
}

export async function listPhotos(store: PhotoStore, actor: Actor, where: { pianoId?: number; draftKey?: string }): Promise<PhotoView[]> {
  if (!can(actor.role, 'readPianos')) throw notAllowed('see photos');
  const q = Photo.query().orderBy('id');
  if (where.pianoId != null) q.where('piano_id', where.pianoId);
  else if (where.draftKey) q.where({ draft_key: where.draftKey, uploaded_by_id: actor.id }).whereNull('piano_id');
  else throw badInput('pianoId', 'give a pianoId or a draftKey');
  return Promise.all((await q).map((p) => photoView(store, p)));
}
