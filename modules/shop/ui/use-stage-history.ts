import { useCallback } from 'react';
import { useQuery } from 'urql';

import type { MovePianoMutation, MovePianoMutationVariables, StageHistoryQuery } from '@/modules/api/ui/graphql-types';

import { SHOP_CONTEXT, useShopMutation } from './use-shop-mutation';

export type StageMoveView = StageHistoryQuery['stageHistory'][number];

export const STAGE_HISTORY_QUERY = /* GraphQL */ `query StageHistory($pianoId: Int!) { stageHistory(pianoId: $pianoId) { action fromStage toStage why by byRole at } }`;

export function useStageHistory(pianoId: number) {
  const [result, reexecute] = useQuery<StageHistoryQuery>({ query: STAGE_HISTORY_QUERY, variables: { pianoId }, context: SHOP_CONTEXT, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { moves: result.data?.stageHistory ?? null, error: result.error, refresh };
}

export function useMovePiano() {
  return useShopMutation<MovePianoMutation['movePiano'], MovePianoMutationVariables>(
    /* GraphQL */ `mutation MovePiano($pianoId: Int!, $action: String!, $why: String) { movePiano(pianoId: $pianoId, action: $action, why: $why) { id stage } }`,
    'movePiano',
  );
}
