import { useCallback, useEffect } from 'react';
import { useQuery } from 'urql';

import type { Stage } from '@/modules/pianos/core/piano';

import { useStaffMutation } from './use-staff-mutation';

export interface DisclosureVersions {
  token: string | null;
  versions: { id: number; version: number; digest: string; publishedAt: string }[];
}

export interface Published {
  version: number;
  digest: string;
  token: string;
  url: string;
  publishedAt: string;
  /** nothing had changed: the newest version stays */
  unchanged: boolean;
}

export interface AcknowledgementRow {
  id: number;
  version: number;
  buyerName: string;
  buyerEmail: string;
  digest: string;
  acknowledgedAt: string;
  countersignedBy: string | null;
  countersignedAt: string | null;
  hasPdf: boolean;
}

export interface PresentPiano {
  id: number;
  stockNumber: string;
  maker: string;
  model: string | null;
  stage: Stage;
  stageChangedAt: string;
  askingPriceMinor: number | null;
  priceCurrency: string | null;
}

const PIANO_QUERY = 'query PresentPiano($id: Int) { piano(idEq: $id) { id stockNumber maker model stage stageChangedAt askingPriceMinor priceCurrency } }';
const VERSIONS_QUERY = 'query Disclosures($pianoId: Int!) { disclosures(pianoId: $pianoId) }';
const ACKS_QUERY = 'query Acknowledgements($pianoId: Int!) { acknowledgements(pianoId: $pianoId) }';

/** The piano as the floor tablet needs it: its name, stage and price. */
export function usePresentPiano(id: number) {
  const [result, reexecute] = useQuery<{ piano: PresentPiano | null }>({ query: PIANO_QUERY, variables: { id }, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { piano: result.data?.piano ?? null, loaded: result.data !== undefined, error: result.error, refresh };
}

/** The piano's public link and every published version. */
export function useDisclosureVersions(pianoId: number) {
  const [result, reexecute] = useQuery<{ disclosures: DisclosureVersions }>({ query: VERSIONS_QUERY, variables: { pianoId }, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { data: result.data?.disclosures ?? null, error: result.error, refresh };
}

/** Buyers' acknowledgements, newest first; asked again every `everyMs` so a buyer's phone shows up on the tablet. */
export function useAcknowledgements(pianoId: number, everyMs = 10_000) {
  const [result, reexecute] = useQuery<{ acknowledgements: AcknowledgementRow[] }>({ query: ACKS_QUERY, variables: { pianoId }, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  useEffect(() => {
    if (!everyMs) return;
    const timer = setInterval(refresh, everyMs);
    return () => clearInterval(timer);
  }, [refresh, everyMs]);
  return { rows: result.data?.acknowledgements ?? null, error: result.error, refresh };
}

export function usePublishDisclosure() {
  return useStaffMutation<Published, { pianoId: number }>('mutation PublishDisclosure($pianoId: Int!) { publishDisclosure(pianoId: $pianoId) }', 'publishDisclosure');
}

export function useCountersign() {
  return useStaffMutation<{ id: number; countersignedAt: string; countersignedBy: string; pdfKey: string }, { acknowledgementId: number }>(
    'mutation Countersign($acknowledgementId: Int!) { countersign(acknowledgementId: $acknowledgementId) }',
    'countersign',
  );
}

