import { useQuery } from 'urql';

import { PIANO_FIELDS, type PianoRecord } from './use-pianos';

export const PIANO_QUERY = `query Piano($id: Int) {
  piano(idEq: $id) { ${PIANO_FIELDS} askingPriceMinor priceCurrency }
}`;

export interface PianoPage extends PianoRecord {
  askingPriceMinor: number | null;
  priceCurrency: string | null;
}

export function usePiano(id: number | null) {
  const [result] = useQuery<{ piano: PianoPage | null }>({
    query: PIANO_QUERY,
    variables: { id },
    pause: id == null,
    requestPolicy: 'cache-and-network',
  });
  return { piano: result.data?.piano ?? null, loaded: result.data !== undefined, fetching: result.fetching, error: result.error };
}
