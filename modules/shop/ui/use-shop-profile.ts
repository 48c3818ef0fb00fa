import { useCallback } from 'react';
import { useQuery } from 'urql';

import { useGuardedMutation } from '@/modules/accounts/ui/use-guarded-mutation';
import type { IdlePiano, ShopProfile } from '@/modules/shop/core/shop-profile';

const PROFILE_FIELDS = 'address phone email website locale timeZone workshopIdleDays';
export const SHOP_PROFILE_QUERY = `query ShopProfile { shopProfile { ${PROFILE_FIELDS} } }`;

/** The dealer's address, contact, locale, time zone and workshop rule. */
export function useShopProfile() {
  const [result, reexecute] = useQuery<{ shopProfile: ShopProfile }>({ query: SHOP_PROFILE_QUERY, requestPolicy: 'cache-and-network' });
  const refresh = useCallback(() => reexecute({ requestPolicy: 'network-only' }), [reexecute]);
  return { profile: result.data?.shopProfile ?? null, error: result.error, refresh };
}

// A typed answer: the cache sees the ShopProfile type and asks every query of it again.
export function useSaveShopProfile() {
  return useGuardedMutation<ShopProfile, { input: ShopProfile }>(
    `mutation SetShopProfile($input: ShopProfileInput!) { setShopProfile(input: $input) { ${PROFILE_FIELDS} } }`,
    'setShopProfile',
    ['ShopProfile', 'IdleInWorkshop'],
    'Still saving the shop details: wait a moment.',
  );
}


/** Pianos in the workshop past the shop's idle days with no work items (managers). */
export function useIdleInWorkshop() {
  const [result] = useQuery<{ idleInWorkshop: { idleDays: number; pianos: IdlePiano[] } }>({
    query: 'query IdleInWorkshop { idleInWorkshop { idleDays pianos { pianoId stockNumber maker model inWorkshopSince days } } }',
    requestPolicy: 'cache-and-network',
  });
  return { idle: result.data?.idleInWorkshop ?? null, error: result.error };
}
