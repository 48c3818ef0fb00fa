import { useCallback, useEffect } from 'react';
import { useQuery } from 'urql';

import type { MutationData } from '@/modules/accounts/ui/use-guarded-mutation';
import type { AcknowledgementsQuery, AcknowledgementsQueryVariables, CountersignMutation, DisclosuresQuery, DisclosuresQueryVariables, PublishDisclosureMutation } from '@/modules/api/ui/graphql-types';
import type { Stage } from '@/modules/pianos/core/piano';

import { useStaffMutation } from './use-staff-mutation';

export type DisclosureVersions = DisclosuresQuery['disclosures'];
export type Published = MutationData<PublishDisclosureMutation>;
export type AcknowledgementRow = AcknowledgementsQuery['acknowledgements'][number];

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
const VERSIONS_QUERY = /* GraphQL */ `
  query Disclosures($pianoId: Int!) {
    disclosures(pianoId: $pianoId) { token versions { id version digest publishedAt } }
  }
`;
const ACKS_QUERY = /* GraphQL */ `
  query Acknowledgements($pianoId: Int!) {
    acknowledgements(pianoId: $pianoId) { id version buyerName buyerEmail digest acknowledgedAt countersignedBy countersignedAt hasPdf }
  }
`;

/** The piano as the floor tablet needs it: its name, stage and price. */
export function usePresentPiano(id: number) {
  const [result, reexecute] = useQuery<{ piano: PresentPiano | null }>({ query: PIANO_QUERY, variables: { id }, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { piano: result.data?.piano ?? null, loaded: result.data !== undefined, error: result.error, refresh };
}

/** The piano's public link and every published version. */
export function useDisclosureVersions(pianoId: number) {
  const [result, reexecute] = useQuery<DisclosuresQuery, DisclosuresQueryVariables>({ query: VERSIONS_QUERY, variables: { pianoId }, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { data: result.data?.disclosures ?? null, error: result.error, refresh };
}

/** Buyers' acknowledgements, newest first; asked again every `everyMs` so a buyer's phone shows up on the tablet. */
export function useAcknowledgements(pianoId: number, everyMs = 10_000) {
  const [result, reexecute] = useQuery<AcknowledgementsQuery, AcknowledgementsQueryVariables>({ query: ACKS_QUERY, variables: { pianoId }, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  useEffect(() => {
    if (!everyMs) return;
    const timer = setInterval(refresh, everyMs);
    return () => clearInterval(timer);
  }, [refresh, everyMs]);
  return { rows: result.data?.acknowledgements ?? null, error: result.error, refresh };
}

export function usePublishDisclosure() {
  return useStaffMutation<Published, { pianoId: number }>(
    /* GraphQL */ `
      mutation PublishDisclosure($pianoId: Int!) {
        publishDisclosure(pianoId: $pianoId) { version digest token url publishedAt unchanged }
      }
    `,
    'publishDisclosure',
  );
}

export function useCountersign() {
  return useStaffMutation<MutationData<CountersignMutation>, { acknowledgementId: number }>(
    /* GraphQL */ `
      mutation Countersign($acknowledgementId: Int!) {
        countersign(acknowledgementId: $acknowledgementId) { id countersignedAt countersignedBy }
      }
    `,
    'countersign',
  );
}

