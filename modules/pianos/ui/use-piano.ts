import { useQuery } from 'urql';

import { PIANO_FIELDS, type PianoRecord } from './use-pianos';

export const PIANO_QUERY = `query Piano($id: Int) {
  piano(idEq: $id) { ${PIANO_FIELDS} }
}`;

export function usePiano(id: number | null) {
  const [result] = useQuery<{ piano: PianoRecord | null }>({
    query: PIANO_QUERY,
    variables: { id },
    pause: id == null,
    requestPolicy: 'cache-and-network',
  });
  return { piano: result.data?.piano ?? null, loaded: result.data !== undefined, fetching: result.fetching, error: result.error };
}
