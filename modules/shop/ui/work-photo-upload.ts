// Before and after photos of workshop work: a multipart POST /api/photos tied to the piano.
import type { PhotoArea } from '@/modules/photos/core/photo-rules';
import { uploadPhoto, type PhotoView, type PickedPhoto } from '@/modules/photos/ui/photo-upload';

export type WorkPhase = 'before' | 'after';
export const WORK_PHASES = ['before', 'after'] as const;
export const WORK_PHASE_LABELS: Record<WorkPhase, string> = { before: 'Before the work', after: 'After the work' };

const CAPTION_MAX = 200;

/** Photos carry no work item of their own: the caption names it, in words a gallery reader understands too. */
export function workCaption(phase: WorkPhase, itemId: number, title: string, text: string): string {
  const head = `${phase === 'before' ? 'Before' : 'After'} work (item ${itemId}, ${title})`;
  const body = text.trim();
  return (body ? `${head}: ${body}` : head).slice(0, CAPTION_MAX);
}

const CAPTION_RE = /^(Before|After) work \(item (\d+), [^)]*\)(?:: (.*))?$/s;

/** The phase and the photographer's own words, when a caption belongs to this item. */
export function readWorkCaption(caption: string | null, itemId: number): { phase: WorkPhase; text: string | null } | null {
  const m = caption ? CAPTION_RE.exec(caption) : null;
  if (!m || Number(m[2]) !== itemId) return null;
  return { phase: m[1] === 'Before' ? 'before' : 'after', text: m[3] ?? null };
}

export type WorkPhotoOutcome = { ok: true; photo: PhotoView } | { ok: false; message: string };

export async function uploadWorkPhoto(req: { photo: PickedPhoto; pianoId: number; area: PhotoArea; caption: string; token: string; onProgress: (fraction: number) => void; workItemId?: number; phase?: WorkPhase }): Promise<WorkPhotoOutcome> {
  const outcome = await uploadPhoto(req).done;
  return outcome.ok ? { ok: true, photo: outcome.photo } : { ok: false, message: outcome.message };
}
