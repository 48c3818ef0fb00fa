import { useCallback, useEffect, useMemo, useState, type ReactNode } from 'react';
import { Provider as GraphProvider } from 'urql';

import { createGraphClient } from './graph-client';
import { SESSION_KEY, forgetReturnPath, parseSession, readStoredSession, requestSignIn, writeStoredSession, type Session, type SessionUser } from './session';
import { SessionContext, type SessionState } from './use-session';

const ENDED_BY_SERVER = 'Your session has ended. Sign in again to carry on.';

/** Holds the session, keeps it on the device, and gives the screens a GraphQL client that carries the token. */
export function SessionProvider({ children }: { children: ReactNode }) {
  const [session, setSession] = useState<Session | null>(() => readStoredSession());
  const [endedReason, setEndedReason] = useState<string | null>(null);
  const [signedOutByUser, setSignedOutByUser] = useState(false);

  // The device copy follows the state; writing an unchanged value fires no storage event elsewhere.
  useEffect(() => writeStoredSession(session), [session]);

  // Signing in or out in another tab counts here too.
  useEffect(() => {
    if (typeof window === 'undefined') return;
    const onStorage = (event: StorageEvent) => {
      if (event.key === SESSION_KEY || event.key === null) setSession(parseSession(event.newValue));
    };
    window.addEventListener('storage', onStorage);
    return () => window.removeEventListener('storage', onStorage);
  }, []);

  const signIn = useCallback(async (email: string, password: string) => {
    const result = await requestSignIn(email, password);
    if (result.ok) {
      setEndedReason(null);
      setSignedOutByUser(false);
      setSession(result.session);
    }
    return result;
  }, []);

  const signOut = useCallback(() => {
    forgetReturnPath();
    setEndedReason(null);
    setSignedOutByUser(true);
    setSession(null);
  }, []);

  const refreshUser = useCallback((user: SessionUser) => {
    setSession((current) => {
      if (!current) return current;
      const same = current.user.name === user.name && current.user.role === user.role && current.user.email === user.email;
      return same ? current : { ...current, user };
    });
  }, []);

  const token = session?.token ?? null;
  const client = useMemo(
    () =>
      createGraphClient({
        token,
        onUnauthorized: () => {
          // Only the session this client was made for ends; a newer sign-in stays.
          setSession((current) => (current?.token === token ? null : current));
          setEndedReason(ENDED_BY_SERVER);
        },
      }),
    [token],
  );

  const value = useMemo<SessionState>(
    () => ({ user: session?.user ?? null, token, signIn, signOut, refreshUser, endedReason, signedOutByUser }),
    [session, token, signIn, signOut, refreshUser, endedReason, signedOutByUser],
  );

  return (
    <SessionContext.Provider value={value}>
      <GraphProvider value={client}>{children}</GraphProvider>
    </SessionContext.Provider>
  );
}
