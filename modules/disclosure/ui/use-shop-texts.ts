import { useCallback } from 'react';
import { useQuery } from 'urql';

import { useGuardedMutation } from '@/modules/accounts/ui/use-guarded-mutation';

export type { MutationOutcome } from '@/modules/accounts/ui/use-guarded-mutation';

/** The dealer's name and warranty text that new disclosures carry. */
export interface ShopTexts {
  dealerName: string;
  warranty: string;
}

// JSON answers carry no type name: the query and the save share this one so a save asks again.
const TEXTS_TYPENAMES = ['ShopTexts'];
const TEXTS_CONTEXT = { additionalTypenames: TEXTS_TYPENAMES };

export function useShopTexts() {
  const [result, reexecute] = useQuery<{ shopTexts: ShopTexts }>({ query: 'query ShopTexts { shopTexts }', context: TEXTS_CONTEXT, requestPolicy: 'network-only' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { texts: result.data?.shopTexts ?? null, error: result.error, refresh };
}

export function useSaveShopTexts() {
  return useGuardedMutation<ShopTexts, { t: ShopTexts }>(
    'mutation SetShopTexts($t: JSON!) { setShopTexts(texts: $t) }',
    'setShopTexts',
    TEXTS_TYPENAMES,
    'Still saving the texts: wait a moment.',
  );
}
