import { createContext, useContext } from 'react';

import type { SessionUser, SignInResult } from './session';

export interface SessionState {
  user: SessionUser | null;
  token: string | null;
  signIn: (email: string, password: string) => Promise<SignInResult>;
  signOut: () => void;
  /** keep the stored user in step with the server (a manager changed the role or name) */
  refreshUser: (user: SessionUser) => void;
  /** why the last session ended, when it was not the user's choice */
  endedReason: string | null;
  /** true right after the user signed out here: no page to return to after the next sign-in */
  signedOutByUser: boolean;
}

export const SessionContext = createContext<SessionState | null>(null);

export function useSession(): SessionState {
  const session = useContext(SessionContext);
  if (!session) throw new Error('useSession needs a SessionProvider above it');
  return session;
}
