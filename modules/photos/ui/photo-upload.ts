// Sending one photo: multipart POST /api/photos through XMLHttpRequest, whose upload events give the progress.
import { MAX_PHOTO_BYTES, type PhotoArea } from '@/modules/photos/core/photo-rules';

/** A stored photo as the server describes it; `url` is a link valid for ten minutes. */
export interface PhotoView {
  id: number;
  pianoId: number | null;
  /** workshop photos: the work item, and whether taken before or after the work */
  workItemId?: number | null;
  phase?: 'before' | 'after' | null;
  area: PhotoArea;
  caption: string | null;
  contentType: string;
  bytes: number;
  createdAt: string;
  url: string;
}

/** The picked file: a File on the web, a local uri elsewhere. */
export interface PickedPhoto {
  uri: string;
  file?: Blob | null;
  fileName?: string | null;
  mimeType?: string | null;
  fileSize?: number | null;
}

export interface UploadRequest {
  photo: PickedPhoto;
  area: PhotoArea;
  caption: string;
  /** Whose photo: a draft not yet submitted, or a piano (and, in the workshop, a work item before or after the work). */
  draftKey?: string;
  pianoId?: number;
  workItemId?: number;
  phase?: 'before' | 'after';
  token: string;
  onProgress: (fraction: number) => void;
}

export type UploadOutcome =
  | { ok: true; photo: PhotoView }
  | { ok: false; message: string; status: number | null; retry: boolean };

export const TOO_LARGE = `photo: must be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB`;

/** The server says "photo: must be ..."; beside the photo it reads "The photo must be ...". */
export function photoProblem(message: string): string {
  const m = /^photo: (.*)$/.exec(message);
  if (m) return `The photo ${m[1]}.`.replace(/\.\.$/, '.');
  const field = /^(area|caption|draftKey|pianoId): (.*)$/.exec(message);
  if (field) return `${field[1] === 'area' ? 'The area' : field[1] === 'caption' ? 'The caption' : 'The draft'} ${field[2]}.`;
  return message;
}

export function photoSize(photo: PickedPhoto): number | null {
  return photo.fileSize ?? (photo.file && 'size' in photo.file ? photo.file.size : null);
}

/** Starts the upload; `abort` cancels it. The server judges the bytes; the size is checked here first. */
export function uploadPhoto(req: UploadRequest): { done: Promise<UploadOutcome>; abort: () => void } {
  const size = photoSize(req.photo);
  if (size != null && size > MAX_PHOTO_BYTES) {
    return { done: Promise.resolve({ ok: false, message: photoProblem(TOO_LARGE), status: 413, retry: false }), abort: () => undefined };
  }
  const xhr = new XMLHttpRequest();
  const done = new Promise<UploadOutcome>((resolve) => {
    const form = new FormData();
    form.append('area', req.area);
    if (req.caption.trim()) form.append('caption', req.caption.trim());
    if (req.draftKey) form.append('draftKey', req.draftKey);
    if (req.pianoId != null) form.append('pianoId', String(req.pianoId));
    if (req.workItemId != null) form.append('workItemId', String(req.workItemId));
    if (req.phase) form.append('phase', req.phase);
    if (req.photo.file) {
      form.append('photo', req.photo.file, req.photo.fileName ?? 'photo');
    } else {
      // React Native's FormData takes a file as { uri, name, type }.
      form.append('photo', { uri: req.photo.uri, name: req.photo.fileName ?? 'photo.jpg', type: req.photo.mimeType ?? 'image/jpeg' } as unknown as Blob);
    }
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
        req.onProgress(1);
        resolve({ ok: true, photo: body as PhotoView });
        return;
      }
      const error = (body as { error?: unknown } | null)?.error;
      const message =
        xhr.status === 401
          ? 'Your session has ended: sign in again, then add the photo again.'
          : xhr.status === 403
            ? 'Your role cannot add photos.'
            : typeof error === 'string'
              ? photoProblem(error)
              : `The upload failed (${xhr.status}).`;
      resolve({ ok: false, message, status: xhr.status, retry: xhr.status >= 500 });
    };
    xhr.onerror = () => resolve({ ok: false, message: 'The upload did not reach the server. Check the connection and try again.', status: null, retry: true });
    xhr.onabort = () => resolve({ ok: false, message: 'The upload was stopped.', status: null, retry: true });
    xhr.send(form);
  });
  return { done, abort: () => xhr.abort() };
}
