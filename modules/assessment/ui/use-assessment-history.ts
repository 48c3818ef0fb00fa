import { useCallback, useMemo } from 'react';
import { useQuery } from 'urql';

import { withFragments } from '@/modules/api/ui/document';
import type { AssessmentHistoryQuery, AssessmentHistoryQueryVariables } from '@/modules/api/ui/graphql-types';
import { MEASUREMENT_FIELDS } from '@/modules/api/ui/table-fragments';
import { diffMeasurements, type FieldChange } from '@/modules/assessment/core/measurement-diff';

import { GRADE_PARTS } from './grade-fragment';

export const HISTORY_QUERY = withFragments(
  /* GraphQL */ `
    query AssessmentHistory($pianoId: Int!) {
      assessmentHistory(pianoId: $pianoId) { id version kind measurements { ...MeasurementFields } grade { ...GradeParts } rulesVersion changeNote submittedBy submittedAt remeasured }
    }
  `,
  GRADE_PARTS,
  MEASUREMENT_FIELDS,
);

/** A version as the server keeps it, with what it changed from the one before (worked out here). */
export type AssessmentVersion = AssessmentHistoryQuery['assessmentHistory'][number] & { changes: FieldChange[] };

// Hand-written answers are traced to their lists by type name: a correction refreshes these.
const CONTEXT = { additionalTypenames: ['Assessments'] };

/** Every version of a piano's assessment, oldest first; the last is the one in force. */
export function useAssessmentHistory(pianoId: number | null) {
  const [result, reexecute] = useQuery<AssessmentHistoryQuery, AssessmentHistoryQueryVariables>({
    query: HISTORY_QUERY,
    variables: { pianoId: pianoId ?? 0 },
    pause: pianoId == null,
    context: CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  const rows = result.data?.assessmentHistory;
  const history = useMemo<AssessmentVersion[] | null>(() => (rows ? rows.map((v, i) => ({ ...v, changes: i === 0 ? [] : diffMeasurements(rows[i - 1].measurements, v.measurements) })) : null), [rows]);
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { history, latest: history?.length ? history[history.length - 1] : null, fetching: result.fetching, error: result.error, reexecute, refresh };
}
