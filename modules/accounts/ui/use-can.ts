import { useCallback } from 'react';

import { can, type Ability } from '@/modules/accounts/core/roles';
import { useSession } from '@/modules/accounts/ui/use-session';

/** What the signed-in user may do, asked of the rights table; nobody signed in may do nothing. */
export function useCan(): (ability: Ability) => boolean {
  const { user } = useSession();
  const role = user?.role;
  return useCallback((ability: Ability) => role != null && can(role, ability), [role]);
}
