import { useEffect } from 'react';
import { useQuery } from 'urql';

import type { Role } from '@/modules/accounts/core/roles';

import { useSession } from './use-session';

export const ME_QUERY = /* GraphQL */ `
  query Me {
    me { id email name role active }
  }
`;

interface MeData {
  me: { id: number; email: string; name: string; role: Role; active: boolean };
}

/** Asks the server who is signed in once per visit; a changed name or role reaches the shell, a refused token ends the session. */
export function useMeSync(): void {
  const { refreshUser } = useSession();
  const [{ data }] = useQuery<MeData>({ query: ME_QUERY, requestPolicy: 'network-only' });
  const me = data?.me;
  useEffect(() => {
    if (me) refreshUser({ id: me.id, email: me.email, name: me.name, role: me.role });
  }, [me, refreshUser]);
}
