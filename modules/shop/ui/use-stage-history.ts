import { useCallback } from 'react';
import { useQuery } from 'urql';

import type { Role } from '@/modules/accounts/core/roles';
import type { Stage } from '@/modules/pianos/core/piano';
import type { StageAction } from '@/modules/pianos/core/stage-machine';

import { SHOP_CONTEXT, useShopMutation } from './use-shop-mutation';

export interface StageMoveView {
  action: string;
  fromStage: Stage | null;
  toStage: Stage;
  why: string | null;
  by: string | null;
  byRole: Role | 'system' | null;
  at: string;
}

export const STAGE_HISTORY_QUERY = 'query StageHistory($pianoId: Int!) { stageHistory(pianoId: $pianoId) }';

export function useStageHistory(pianoId: number) {
  const [result, reexecute] = useQuery<{ stageHistory: StageMoveView[] }>({ query: STAGE_HISTORY_QUERY, variables: { pianoId }, context: SHOP_CONTEXT, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { moves: result.data?.stageHistory ?? null, error: result.error, refresh };
}

export function useMovePiano() {
  return useShopMutation<{ id: number; stage: Stage }, { pianoId: number; action: StageAction; why: string | null }>(
    'mutation MovePiano($pianoId: Int!, $action: String!, $why: String) { movePiano(pianoId: $pianoId, action: $action, why: $why) { id stage } }',
    'movePiano',
  );
}
