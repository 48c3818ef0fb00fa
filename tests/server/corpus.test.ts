import { startTestApi, type TestApi } from '../support/api';
import { tableStates, type TableStates } from '../support/db-state';
import { listRoutes } from '../support/routes';

import { BAD_REQUESTS, NO_ROUTE, type BadRequest } from './corpus/bad-requests';

// Routes that take no input at all, so no request to them is malformed.
const NO_INPUT = ['GET /healthz'];
// Limits out of the way: the corpus is about what each route says to bad input, not about 429.
const ROOMY = { signIn: { failuresPerAddress: 10_000, failuresPerAccount: 10_000, windowMinutes: 1 }, publicWrites: { perAddress: 10_000, windowMinutes: 1 }, publicReads: { perAddress: 10_000, windowMinutes: 1 } };

let api: TestApi;
let before: TableStates;
let places: Record<string, string>;
beforeAll(async () => {
  api = await startTestApi({ limits: ROOMY });
  const floor = await api.knex('pianos').where('stage', 'on_floor').orderBy('id').first();
  const link = await api.knex('disclosure_links').where('piano_id', floor.id).first();
  // one e-mail in the inbox, so its attachments have a message to hang from
  await api.mail.messages.unshift({ id: 'corpus-message', from: 'a@feltwire.test', to: ['b@example.test'], subject: 'x', text: 'x', html: null, date: new Date(0).toISOString(), attachments: [] });
  places = { token: link.token, pianoId: String(floor.id), messageId: 'corpus-message' };
  for (const role of ['intake', 'technician', 'floor', 'manager'] as const) await api.tokenFor(role);
  before = await tableStates(api.knex);
});
afterAll(() => api.close());

const fill = (text: string) => text.replace(/\{(token|pianoId|messageId)\}/g, (_m, key: string) => places[key]);

async function send(r: BadRequest) {
  const [method, pattern] = r.route === NO_ROUTE ? [r.raw || r.json ? 'POST' : 'GET', r.url!] : r.route.split(' ');
  const verb = r.route === NO_ROUTE && r.name.includes('DELETE') ? 'delete' : (method.toLowerCase() as 'get' | 'post');
  let req = api.http[verb](fill(r.url ?? pattern));
  if (r.as) req = req.set('Authorization', `Bearer ${await api.tokenFor(r.as)}`);
  for (const [k, v] of Object.entries(r.headers ?? {})) req = req.set(k, v);
  if (r.gql) return req.send({ query: fill(r.gql.query), variables: r.gql.variables });
  if (r.json !== undefined) return req.send(r.json as object);
  if (r.raw) return req.set('Content-Type', r.raw.type).send(r.raw.body);
  if (r.multipart) {
    for (const [k, v] of Object.entries(r.multipart.fields ?? {})) req = req.field(k, v);
    if (r.multipart.file) req = req.attach('photo', r.multipart.file.content, { filename: r.multipart.file.filename, contentType: r.multipart.file.contentType });
  }
  return req;
}

// The words a caller is given: the REST error, or the first GraphQL error (never an internal one).
function messageOf(res: Awaited<ReturnType<typeof send>>): string | null {
  const body = res.body as { error?: unknown; errors?: { message?: unknown; extensions?: { code?: unknown } }[] };
  if (typeof body?.error === 'string') return body.error;
  const first = body?.errors?.[0];
  if (first && typeof first.message === 'string' && first.extensions?.code !== 'INTERNAL') return first.message;
  return null;
}

describe('the bad-request corpus', () => {
  it('is large enough and names every route the app serves', () => {
    expect(BAD_REQUESTS.length).toBeGreaterThanOrEqual(80);
    expect(new Set(BAD_REQUESTS.map((r) => r.name)).size).toBe(BAD_REQUESTS.length);
    const served = listRoutes(api.app);
    const named = new Set(BAD_REQUESTS.map((r) => r.route));
    // a new route fails here until the corpus has bad requests for it (see DEVELOPERS.md)
    expect(served.filter((route) => !named.has(route) && !NO_INPUT.includes(route))).toEqual([]);
    expect([...named].filter((route) => route !== NO_ROUTE && !served.includes(route))).toEqual([]);
  });

  it('answers every request below 500, with a message, and changes nothing', async () => {
    const wrong: string[] = [];
    for (const r of BAD_REQUESTS) {
      const res = await send(r);
      const message = messageOf(res);
      if (res.status >= 500 || !message || (res.status < 400 && !r.gql)) wrong.push(`${r.name}: ${res.status} ${JSON.stringify(res.body ?? res.text).slice(0, 200)}`);
    }
    expect(wrong).toEqual([]);
    expect(await tableStates(api.knex)).toEqual(before);
    expect(await api.objectKeys()).toEqual([]);
  });
});
