import type { CombinedError } from '@urql/core';
import { useCallback, useState } from 'react';
import { useClient } from 'urql';

import { withFragments } from '@/modules/api/ui/document';
import type { CorrectAssessmentMutation, CorrectionInput, IntakeInput, SubmitIntakeMutation } from '@/modules/api/ui/graphql-types';

import { GRADE_PARTS } from './grade-fragment';
import type { DraftMode } from './intake-draft';

const SUBMITTED = /* GraphQL */ `fragment SubmittedParts on SubmittedAssessment { pianoId stockNumber assessmentId version grade { ...GradeParts } }`;
export const SUBMIT_INTAKE = withFragments(/* GraphQL */ `mutation SubmitIntake($input: IntakeInput!) { submitIntake(input: $input) { ...SubmittedParts } }`, SUBMITTED, GRADE_PARTS);
export const CORRECT_ASSESSMENT = withFragments(/* GraphQL */ `mutation CorrectAssessment($input: CorrectionInput!) { correctAssessment(input: $input) { ...SubmittedParts } }`, SUBMITTED, GRADE_PARTS);

export type SubmittedAssessment = SubmitIntakeMutation['submitIntake'];

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
        // The input was checked with the server's own schema (intake-input.ts) when the draft was built.
        const result =
          mode === 'intake'
            ? await client.mutation<SubmitIntakeMutation>(SUBMIT_INTAKE, { input: input as IntakeInput }, TYPENAMES).toPromise()
            : await client.mutation<CorrectAssessmentMutation>(CORRECT_ASSESSMENT, { input: input as CorrectionInput }, TYPENAMES).toPromise();
        const data = result.data && ('submitIntake' in result.data ? result.data.submitIntake : result.data.correctAssessment);
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
