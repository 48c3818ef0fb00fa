import { useEffect } from 'react';
import { useQuery } from 'urql';

import type { MeQuery } from '@/modules/api/ui/graphql-types';

import { useSession } from './use-session';

export const ME_QUERY = /* GraphQL */ `
  query Me {
    me { id email name role active }
  }
`;

/** Asks the server who is signed in once per visit; a changed name or role reaches the shell, a refused token ends the session. */
export function useMeSync(): void {
  const { refreshUser } = useSession();
  const [{ data }] = useQuery<MeQuery>({ query: ME_QUERY, requestPolicy: 'network-only' });
  const me = data?.me;
  useEffect(() => {
    if (me) refreshUser({ id: me.id, email: me.email, name: me.name, role: me.role });
  }, [me, refreshUser]);
}
