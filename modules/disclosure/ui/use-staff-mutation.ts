import { useCallback, useRef, useState } from 'react';
import { useClient } from 'urql';

import { graphProblem, type GraphProblem } from '@/modules/accounts/ui/graph-error';

export type MutationOutcome<T> = { ok: true; data: T } | { ok: false; problem: GraphProblem };

// A move through the stages changes a piano: naming the type refreshes every cached piano query.
const TOUCHES_PIANOS = { additionalTypenames: ['Pianos'] };

/**
 * Runs one mutation of the disclosure and deposit desks and hands back its answer or the server's
 * problem in words. Their answers are JSON, which urql's cache cannot follow: panels ask again after.
 */
export function useStaffMutation<T, V extends Record<string, unknown>>(document: string, field: string) {
  const client = useClient();
  const [busy, setBusy] = useState(false);
  const inFlight = useRef(false);
  const run = useCallback(
    async (variables: V): Promise<MutationOutcome<T>> => {
      // A second tap while the first is on its way would countersign or refund twice.
      if (inFlight.current) return { ok: false, problem: { message: 'Still working on the last command: wait a moment.' } };
      inFlight.current = true;
      setBusy(true);
      try {
        const result = await client.mutation<Record<string, T>, V>(document, variables, TOUCHES_PIANOS).toPromise();
        const data = result.data?.[field];
        if (result.error || data === undefined || data === null) return { ok: false, problem: graphProblem(result.error) ?? { message: 'The server gave no answer: try again.' } };
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
