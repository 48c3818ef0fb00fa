// What the browser journeys ask the server directly: a token, a GraphQL answer, an e-mail in the demo inbox.
import { baseUrl } from './browser';

export const TABLET = { width: 1024, height: 768 };

export async function login(email: string): Promise<string> {
  const res = await fetch(`${baseUrl()}/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password: 'feltwire-demo' }) });
  return ((await res.json()) as { token: string }).token;
}

export async function gql<T>(token: string, query: string): Promise<T> {
  const res = await fetch(`${baseUrl()}/graphql`, { method: 'POST', headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` }, body: JSON.stringify({ query }) });
  const body = (await res.json()) as { data: T; errors?: { message: string }[] };
  if (body.errors?.length) throw new Error(body.errors[0].message);
  return body.data;
}

export interface InboxMessage {
  to: string[];
  subject: string;
  attachments: { filename: string; contentType: string; size: number }[];
}

/** Polls the demo inbox until a message matches, or fails after `timeoutMs`. */
export async function waitForMail(match: (m: InboxMessage) => boolean, timeoutMs = 20_000): Promise<InboxMessage> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const messages = (await (await fetch(`${baseUrl()}/dev/inbox.json`)).json()) as InboxMessage[];
    const found = messages.find(match);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error('no matching e-mail reached the demo inbox');
}
