// The signed-in session on this device: the token and the user, kept in localStorage on the web.
import { z } from '@/modules/input/core/zod';

import { ROLES } from '@/modules/accounts/core/roles';

export const SESSION_KEY = 'feltwire.session';

const sessionUser = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
});
export type SessionUser = z.infer<typeof sessionUser>;

const storedSession = z.object({ token: z.string().min(1), user: sessionUser });
export type Session = z.infer<typeof storedSession>;

function storage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    // Some privacy modes throw on access: the session then lasts as long as the page.
    return null;
  }
}

export function parseSession(raw: string | null): Session | null {
  if (!raw) return null;
  try {
    const parsed = storedSession.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export function readStoredSession(): Session | null {
  return parseSession(storage()?.getItem(SESSION_KEY) ?? null);
}

export function writeStoredSession(session: Session | null): void {
  const store = storage();
  if (!store) return;
  if (session) store.setItem(SESSION_KEY, JSON.stringify(session));
  else store.removeItem(SESSION_KEY);
}

export type SignInResult = { ok: true; session: Session } | { ok: false; message: string };

/** POST /auth/login; a 401 carries the server's own words. */
export async function requestSignIn(email: string, password: string): Promise<SignInResult> {
  let response: Response;
  try {
    response = await fetch('/auth/login', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
      body: JSON.stringify({ email: email.trim(), password }),
    });
  } catch {
    return { ok: false, message: 'The server cannot be reached. Check the connection and try again.' };
  }
  const body: unknown = await response.json().catch(() => null);
  if (response.ok) {
    const parsed = storedSession.safeParse(body);
    if (parsed.success) return { ok: true, session: parsed.data };
    return { ok: false, message: 'The server sent an answer this page does not understand.' };
  }
  const error = (body as { error?: unknown } | null)?.error;
  return { ok: false, message: typeof error === 'string' ? error : `Signing in failed (${response.status}).` };
}

// Where a visitor was heading when sent to sign in; kept for this tab only, never in the address.
const RETURN_KEY = 'feltwire.return-to';

function tabStorage(): Storage | null {
  try {
    return typeof sessionStorage === 'undefined' ? null : sessionStorage;
  } catch {
    return null;
  }
}

export function rememberReturnPath(path: string): void {
  tabStorage()?.setItem(RETURN_KEY, path);
}

export function takeReturnPath(): string | null {
  const store = tabStorage();
  const path = store?.getItem(RETURN_KEY) ?? null;
  store?.removeItem(RETURN_KEY);
  return path;
}

export function forgetReturnPath(): void {
  tabStorage()?.removeItem(RETURN_KEY);
}
