import { useQuery } from 'urql';

import type { Grade } from '@/modules/assessment/core/grade';
import type { FieldChange } from '@/modules/assessment/core/measurement-diff';
import type { Measurements } from '@/modules/assessment/core/measurements';

export const HISTORY_QUERY = 'query AssessmentHistory($pianoId: Int!) { assessmentHistory(pianoId: $pianoId) }';

export interface AssessmentVersion {
  id: number;
  version: number;
  kind: 'intake' | 'post_workshop';
  measurements: Measurements;
  grade: Grade;
  rulesVersion: string;
  changeNote: string | null;
  submittedBy: string;
  submittedAt: string;
  changes: FieldChange[];
  /** a re-measurement after the work: the fields measured again */
  remeasured?: string[];
}

// JSON answers carry no type names: say which records they come from, so a correction refreshes them.
const CONTEXT = { additionalTypenames: ['Assessments'] };

/** Every version of a piano's assessment, oldest first; the last is the one in force. */
export function useAssessmentHistory(pianoId: number | null) {
  const [result, reexecute] = useQuery<{ assessmentHistory: AssessmentVersion[] }>({
    query: HISTORY_QUERY,
    variables: { pianoId },
    pause: pianoId == null,
    context: CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  return { history: result.data?.assessmentHistory ?? null, fetching: result.fetching, error: result.error, reexecute };
}
