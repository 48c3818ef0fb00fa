import { useQuery } from 'urql';

import type { PhotoView } from './photo-upload';

export const PIANO_PHOTOS_QUERY = 'query PianoPhotos($pianoId: Int) { photos(pianoId: $pianoId) }';
export const DRAFT_PHOTOS_QUERY = 'query DraftPhotos($draftKey: String) { photos(draftKey: $draftKey) }';

/** A piano's photos, oldest first, each with a fresh ten-minute link. */
export function usePianoPhotos(pianoId: number | null) {
  const [result, reexecute] = useQuery<{ photos: PhotoView[] }>({
    query: PIANO_PHOTOS_QUERY,
    variables: { pianoId },
    pause: pianoId == null,
    requestPolicy: 'cache-and-network',
  });
  return { photos: result.data?.photos ?? null, error: result.error, reexecute };
}

/** The photos already uploaded for a draft, to renew their links after a reload. */
export function useDraftPhotos(draftKey: string, pause: boolean) {
  const [result] = useQuery<{ photos: PhotoView[] }>({ query: DRAFT_PHOTOS_QUERY, variables: { draftKey }, pause, requestPolicy: 'network-only' });
  return result.data?.photos ?? null;
}
