import { useQuery } from 'urql';

import type { Acquisition, InspectionPlace } from './intake-draft';

export const INTAKE_QUERY = 'query IntakeRecord($pianoId: Int!) { intake(pianoId: $pianoId) }';

/** Where a piano came from; `seller` and `notes` only reach intake staff and managers. */
export interface IntakeRecord {
  pianoId: number;
  acquisition: Acquisition;
  receivedOn: string;
  inspectedAt: InspectionPlace;
  createdAt: string;
  seller?: { name: string; phone: string | null; email: string | null; address: string | null };
  /** the earlier record intake staff matched it with: the same piano taken in again */
  samePianoAs?: { id: number; stockNumber: string } | null;
  notes?: string | null;
}

const CONTEXT = { additionalTypenames: ['Assessments'] };

export function useIntakeRecord(pianoId: number | null) {
  const [result] = useQuery<{ intake: IntakeRecord | null }>({
    query: INTAKE_QUERY,
    variables: { pianoId },
    pause: pianoId == null,
    context: CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  return { intake: result.data?.intake ?? null, loaded: result.data !== undefined, error: result.error };
}
