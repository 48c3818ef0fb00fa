import { useCallback } from 'react';
import { useQuery } from 'urql';

import { useGuardedMutation } from '@/modules/accounts/ui/use-guarded-mutation';
import type { ShopTextsQuery } from '@/modules/api/ui/graphql-types';

export type { MutationOutcome } from '@/modules/accounts/ui/use-guarded-mutation';

/** The dealer's name and warranty text that new disclosures carry. */
export type ShopTexts = ShopTextsQuery['shopTexts'];

// The query and the save name the type, so a save asks again.
const TEXTS_TYPENAMES = ['ShopTexts'];
const TEXTS_CONTEXT = { additionalTypenames: TEXTS_TYPENAMES };

const TEXTS_QUERY = /* GraphQL */ `
  query ShopTexts {
    shopTexts { dealerName warranty }
  }
`;

export function useShopTexts() {
  const [result, reexecute] = useQuery<ShopTextsQuery>({ query: TEXTS_QUERY, context: TEXTS_CONTEXT, requestPolicy: 'network-only' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { texts: result.data?.shopTexts ?? null, error: result.error, refresh };
}

export function useSaveShopTexts() {
  return useGuardedMutation<ShopTexts, { t: ShopTexts }>(
    /* GraphQL */ `
      mutation SetShopTexts($t: ShopTextsInput!) {
        setShopTexts(texts: $t) { dealerName warranty }
      }
    `,
    'setShopTexts',
    TEXTS_TYPENAMES,
    'Still saving the texts: wait a moment.',
  );
}
