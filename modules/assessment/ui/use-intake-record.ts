import { useQuery } from 'urql';

import type { IntakeRecordQuery, IntakeRecordQueryVariables } from '@/modules/api/ui/graphql-types';

export const INTAKE_QUERY = /* GraphQL */ `
  query IntakeRecord($pianoId: Int!) {
    intake(pianoId: $pianoId) { pianoId acquisition receivedOn inspectedAt createdAt samePianoAs { id stockNumber } seller { name phone email address } notes }
  }
`;

/** Where a piano came from; `seller` and `notes` only reach intake staff and managers. */
export type IntakeRecord = NonNullable<IntakeRecordQuery['intake']>;

const CONTEXT = { additionalTypenames: ['Assessments'] };

export function useIntakeRecord(pianoId: number | null) {
  const [result] = useQuery<IntakeRecordQuery, IntakeRecordQueryVariables>({
    query: INTAKE_QUERY,
    variables: { pianoId: pianoId ?? 0 },
    pause: pianoId == null,
    context: CONTEXT,
    requestPolicy: 'cache-and-network',
  });
  return { intake: result.data?.intake ?? null, loaded: result.data !== undefined, error: result.error };
}
