import type { CombinedError } from '@urql/core';
import { useCallback, useState } from 'react';
import { useClient } from 'urql';

import type { Grade } from '@/modules/assessment/core/grade';

import type { DraftMode } from './intake-draft';

export const SUBMIT_INTAKE = 'mutation SubmitIntake($input: JSON!) { submitIntake(input: $input) }';
export const CORRECT_ASSESSMENT = 'mutation CorrectAssessment($input: JSON!) { correctAssessment(input: $input) }';

export interface SubmittedAssessment {
  pianoId: number;
  stockNumber: string;
  assessmentId: number;
  version: number;
  grade: Grade;
}

export type SubmitOutcome = { ok: true; result: SubmittedAssessment } | { ok: false; error: CombinedError | undefined };

// Whatever is asked next about pianos, assessments and photos must come from the server again.
const TYPENAMES = { additionalTypenames: ['Pianos', 'Assessments'] };

/** Sends an intake or a correction; the caller decides what a failure means (offline, a field, a conflict). */
export function useSubmitAssessment(mode: DraftMode) {
  const client = useClient();
  const [submitting, setSubmitting] = useState(false);
  const submit = useCallback(
    async (input: Record<string, unknown>): Promise<SubmitOutcome> => {
      setSubmitting(true);
      try {
        const doc = mode === 'intake' ? SUBMIT_INTAKE : CORRECT_ASSESSMENT;
        const result = await client.mutation<Record<string, SubmittedAssessment>>(doc, { input }, TYPENAMES).toPromise();
        const data = result.data?.[mode === 'intake' ? 'submitIntake' : 'correctAssessment'];
        if (data && !result.error) return { ok: true, result: data };
        return { ok: false, error: result.error };
      } finally {
        setSubmitting(false);
      }
    },
    [client, mode],
  );
  return { submit, submitting };
}
