import { useCallback, useRef, useState } from 'react';
import { useClient } from 'urql';

import { graphProblem, type GraphProblem } from './graph-error';

export type MutationOutcome<T> = { ok: true; data: T } | { ok: false; problem: GraphProblem };

/** What a mutation document answers in its one field (`M` is its generated type). */
export type MutationData<M> = NonNullable<M[keyof M]>;

/**
 * Runs one mutation and hands back its answer or the server's problem in words. A second tap while
 * the first is on its way is refused (it would log, countersign or refund twice). `typenames` names
 * the cached queries to ask again: urql's cache cannot trace an answer to every list it changes.
 */
export function useGuardedMutation<T, V extends Record<string, unknown>>(document: string, field: string, typenames: readonly string[], busyMessage: string) {
  const client = useClient();
  const [busy, setBusy] = useState(false);
  const inFlight = useRef(false);
  const run = useCallback(
    async (variables: V): Promise<MutationOutcome<T>> => {
      if (inFlight.current) return { ok: false, problem: { message: busyMessage } };
      inFlight.current = true;
      setBusy(true);
      try {
        const result = await client.mutation<Record<string, T>, V>(document, variables, { additionalTypenames: [...typenames] }).toPromise();
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
    [client, document, field, typenames, busyMessage],
  );
  return { run, busy };
}
