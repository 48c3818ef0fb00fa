import { useEffect, useState } from 'react';
import { useQuery } from 'urql';

import type { SamePianosQuery, SamePianosQueryVariables } from '@/modules/api/ui/graphql-types';

export type SamePiano = SamePianosQuery['samePianos'][number];

export const SAME_PIANOS_QUERY = /* GraphQL */ `query SamePianos($maker: String!, $model: String, $serialNumber: String!, $exceptPianoId: Int) {
  samePianos(maker: $maker, model: $model, serialNumber: $serialNumber, exceptPianoId: $exceptPianoId) { id stockNumber stage maker model serialNumber createdAt }
}`;

/** Asks the server once typing pauses; null while there is nothing to ask or no answer yet. */
export function useSamePianos(maker: string, model: string, serialNumber: string, exceptPianoId: number | null): SamePiano[] | null {
  const typed = { maker: maker.trim(), model: model.trim() || null, serialNumber: serialNumber.trim(), exceptPianoId };
  const key = JSON.stringify(typed);
  const [asked, setAsked] = useState(key);
  useEffect(() => {
    const timer = setTimeout(() => setAsked(key), 400);
    return () => clearTimeout(timer);
  }, [key]);
  const variables = JSON.parse(asked) as typeof typed;
  const [result] = useQuery<SamePianosQuery, SamePianosQueryVariables>({
    query: SAME_PIANOS_QUERY,
    variables,
    pause: !variables.maker || !variables.serialNumber,
    requestPolicy: 'network-only',
  });
  if (!variables.maker || !variables.serialNumber) return null;
  return result.data?.samePianos ?? null;
}
