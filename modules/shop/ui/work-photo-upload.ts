// Before and after photos of workshop work: a multipart POST /api/photos tied to the piano.
import type { PhotoArea } from '@/modules/photos/core/photo-rules';
import { uploadPhoto, type PhotoView, type PickedPhoto } from '@/modules/photos/ui/photo-upload';

import { parseWorkCaption, type WorkPhase } from '@/modules/shop/core/work-caption';

export { workCaption, type WorkPhase } from '@/modules/shop/core/work-caption';
export const WORK_PHASES = ['before', 'after'] as const;
export const WORK_PHASE_LABELS: Record<WorkPhase, string> = { before: 'Before the work', after: 'After the work' };

/** The phase and the photographer's own words, when a caption belongs to this item. */
export function readWorkCaption(caption: string | null, itemId: number): { phase: WorkPhase; text: string | null } | null {
  const work = parseWorkCaption(caption);
  return work && work.itemId === itemId ? { phase: work.phase, text: work.text } : null;
}

export type WorkPhotoOutcome = { ok: true; photo: PhotoView } | { ok: false; message: string };

export async function uploadWorkPhoto(req: { photo: PickedPhoto; pianoId: number; area: PhotoArea; caption: string; token: string; onProgress: (fraction: number) => void; workItemId?: number; phase?: WorkPhase }): Promise<WorkPhotoOutcome> {
  const outcome = await uploadPhoto(req).done;
  return outcome.ok ? { ok: true, photo: outcome.photo } : { ok: false, message: outcome.message };
}
