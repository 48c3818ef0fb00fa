import { useCallback, useRef, useState } from 'react';
import { useClient } from 'urql';

import { graphProblem, type GraphProblem } from '@/modules/accounts/ui/graph-error';

export type MutationOutcome<T> = { ok: true; data: T } | { ok: false; problem: GraphProblem };

/**
 * Workshop answers are JSON, which urql's document cache cannot trace to a type. Every workshop query
 * says it depends on these type names and every workshop mutation says it touches them, so any change
 * made here asks the workshop (and piano) queries on screen again.
 */
export const SHOP_TYPENAMES = ['Pianos', 'Assessments', 'WorkItems'];
export const SHOP_CONTEXT = { additionalTypenames: SHOP_TYPENAMES };

/** Runs one workshop mutation and hands back its answer or the server's problem in words. */
export function useShopMutation<T, V extends Record<string, unknown>>(document: string, field: string) {
  const client = useClient();
  const [busy, setBusy] = useState(false);
  const inFlight = useRef(false);
  const run = useCallback(
    async (variables: V): Promise<MutationOutcome<T>> => {
      // A second tap while the first is on its way would log the same work twice.
      if (inFlight.current) return { ok: false, problem: { message: 'Still saving the last change: wait a moment.' } };
      inFlight.current = true;
      setBusy(true);
      try {
        const result = await client.mutation<Record<string, T>, V>(document, variables, SHOP_CONTEXT).toPromise();
        const data = result.data?.[field];
        if (result.error || data === undefined || data === null) {
          return { ok: false, problem: graphProblem(result.error) ?? { message: 'The server gave no answer: try again.' } };
        }
        return { ok: true, data };
      } finally {
        inFlight.current = false;
        setBusy(false);
      }
    },
    [client, document, field],
  );
  return { run, busy };
}
