// Before and after photos of workshop work: a multipart POST /api/photos tied to the piano.
import { MAX_PHOTO_BYTES, type PhotoArea } from '@/modules/photos/core/photo-rules';
import { photoProblem, type PhotoView, type PickedPhoto } from '@/modules/photos/ui/photo-upload';

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

export function uploadWorkPhoto(req: { photo: PickedPhoto; pianoId: number; area: PhotoArea; caption: string; token: string; onProgress: (fraction: number) => void; workItemId?: number; phase?: WorkPhase }): Promise<WorkPhotoOutcome> {
  const size = req.photo.fileSize ?? (req.photo.file && 'size' in req.photo.file ? req.photo.file.size : null);
  if (size != null && size > MAX_PHOTO_BYTES) return Promise.resolve({ ok: false, message: `The photo must be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB.` });
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    const form = new FormData();
    form.append('area', req.area);
    form.append('caption', req.caption);
    form.append('pianoId', String(req.pianoId));
    if (req.workItemId != null) form.append('workItemId', String(req.workItemId));
    if (req.phase) form.append('phase', req.phase);
    if (req.photo.file) form.append('photo', req.photo.file, req.photo.fileName ?? 'photo');
    // React Native's FormData takes a file as { uri, name, type }.
    else form.append('photo', { uri: req.photo.uri, name: req.photo.fileName ?? 'photo.jpg', type: req.photo.mimeType ?? 'image/jpeg' } as unknown as Blob);
    xhr.open('POST', '/api/photos');
    xhr.setRequestHeader('Authorization', `Bearer ${req.token}`);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) req.onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        body = null;
      }
      if (xhr.status === 201 && body && typeof (body as PhotoView).id === 'number') {
        resolve({ ok: true, photo: body as PhotoView });
        return;
      }
      const error = (body as { error?: unknown } | null)?.error;
      resolve({
        ok: false,
        message:
          xhr.status === 401
            ? 'Your session has ended: sign in again, then add the photo again.'
            : xhr.status === 403
              ? 'Your role cannot add photos.'
              : typeof error === 'string'
                ? photoProblem(error)
                : `The upload failed (${xhr.status}).`,
      });
    };
    xhr.onerror = () => resolve({ ok: false, message: 'The upload did not reach the server. Check the connection and try again.' });
    xhr.send(form);
  });
}
