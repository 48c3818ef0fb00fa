import { useQuery } from 'urql';

import { withFragments } from '@/modules/api/ui/document';
import type { PianoQuery, PianoQueryVariables } from '@/modules/api/ui/graphql-types';

import { PIANO_RECORD } from './use-pianos';

export const PIANO_QUERY = withFragments(/* GraphQL */ `query Piano($id: Int) { piano(idEq: $id) { ...PianoRecord askingPriceMinor priceCurrency } }`, PIANO_RECORD);

export type PianoPage = NonNullable<PianoQuery['piano']>;

export function usePiano(id: number | null) {
  const [result] = useQuery<PianoQuery, PianoQueryVariables>({
    query: PIANO_QUERY,
    variables: { id },
    pause: id == null,
    requestPolicy: 'cache-and-network',
  });
  return { piano: result.data?.piano ?? null, loaded: result.data !== undefined, fetching: result.fetching, error: result.error };
}
