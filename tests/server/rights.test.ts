import { getNamedType, isObjectType } from 'graphql';

import { ROLES } from '@/modules/accounts/core/roles';
import { DOMAINS } from '@/server/graphql/domains';
import { buildSchema } from '@/server/graphql/schema';

import { startTestApi, type TestApi } from '../support/api';
import { listRoutes } from '../support/routes';

import { graphProbes, routeKey } from './rights/probes';
import { RIGHTS, type Caller } from './rights/rights-table';

// Every query, mutation, relation of a generated read type and REST route, asked by each staff role and
// by an anonymous caller, against the table in tests/server/rights/rights-table.ts.
const TABLE = 'tests/server/rights/rights-table.ts';
const CALLERS: readonly Caller[] = [...ROLES, 'anonymous'];
// The REST probes come from another machine: the demo inbox opens by itself on the server's own.
const REMOTE = { 'X-Forwarded-For': '203.0.113.9' };
const ROOMY = { signIn: { failuresPerAddress: 10_000, failuresPerAccount: 10_000, windowMinutes: 1 }, publicWrites: { perAddress: 10_000, windowMinutes: 1 }, publicReads: { perAddress: 10_000, windowMinutes: 1 } };

type Outcome = 'answered' | 'refused' | { broken: string };

let api: TestApi;
let token: string;
const tokens = new Map<Caller, string>();
beforeAll(async () => {
  api = await startTestApi({ limits: ROOMY });
  const floor = await api.knex('pianos').where('stage', 'on_floor').orderBy('id').first();
  token = (await api.knex('disclosure_links').where('piano_id', floor.id).first()).token;
  for (const role of ROLES) tokens.set(role, await api.tokenFor(role));
});
afterAll(() => api.close());

const list = (callers: readonly Caller[]) => (callers.length ? callers.join(', ') : 'nobody');

function graphOutcome(status: number, body: { errors?: { message: string; extensions?: { code?: string } }[] }): Outcome {
  if (status === 401) return 'refused';
  const code = body.errors?.[0]?.extensions?.code;
  if (status === 400) return { broken: `the probe is not a valid request (${body.errors?.[0]?.message}): give its row \`vars\`` };
  if (code === 'NOT_ALLOWED') return 'refused';
  if (code === 'INTERNAL' || status >= 500) return { broken: `answered ${status} ${body.errors?.[0]?.message ?? ''}` };
  return 'answered';
}

function restOutcome(status: number, text: string): Outcome {
  if (status === 401 || status === 403) return 'refused';
  if (status >= 500) return { broken: `answered ${status} ${text.slice(0, 120)}` };
  return 'answered';
}

/** Compares what each caller got with the row: a surprise names the row and what to change. */
function judge(key: string, who: readonly Caller[], outcomes: Map<Caller, Outcome>, problems: string[]): void {
  for (const [caller, outcome] of outcomes) {
    if (typeof outcome === 'object') problems.push(`${key}: as ${caller} the probe ${outcome.broken}`);
  }
  const answered = CALLERS.filter((c) => outcomes.get(c) === 'answered');
  const extra = answered.filter((c) => !who.includes(c));
  const missing = who.filter((c) => outcomes.get(c) === 'refused');
  if (extra.length) problems.push(`${key}: ${list(extra)} got an answer, but the table lets only ${list(who)}: refuse them on the server (can(role, ability)), or add them to the row in ${TABLE}`);
  if (missing.length) problems.push(`${key}: ${list(missing)} ${missing.length === 1 ? 'was' : 'were'} refused, but the table lets ${list(who)}`);
}

const sameSet = (a: readonly string[], b: readonly string[]) => a.length === b.length && [...a].sort().join() === [...b].sort().join();

describe('the rights table', () => {
  it('holds on every query, mutation, relation and route, for every role and an anonymous caller', async () => {
    const schema = buildSchema(DOMAINS);
    const probes = graphProbes(schema, (key) => RIGHTS[key]?.vars);
    const routes = listRoutes(api.app).map((route) => ({ key: routeKey(route), route }));
    const problems: string[] = [];
    const seen = new Set<string>();

    for (const probe of probes) {
      seen.add(probe.key);
      const row = RIGHTS[probe.key];
      if (!row) {
        problems.push(`${probe.key} has no row: add \`'${probe.key}': { who: [...] },\` to ${TABLE} with the callers who may use it`);
        continue;
      }
      const generated = probe.target || probe.field.extensions?.generatedRead;
      const args = probe.field.args.map((a) => a.name);
      const named = args.length > 20 ? `${args.slice(0, 20).join(', ')} and ${args.length - 20} more` : args.join(', ');
      if (generated && !row.args) problems.push(`${probe.key}: give its row \`args\`: the filters it takes are ${named || 'none'}`);
      if (row.args && !sameSet(args, row.args)) problems.push(`${probe.key}: takes the arguments [${named}], the table [${row.args.join(', ')}]: offer only the filters a screen needs (ReadModel filters), or change the row's \`args\``);
      if (probe.target) {
        const fields = Object.keys(probe.target.getFields());
        if (!row.fields) problems.push(`${probe.key}: give its row \`fields\`: it leads to ${probe.target.name} { ${fields.join(' ')} }`);
        else if (!sameSet(fields, row.fields)) problems.push(`${probe.key}: leads to ${probe.target.name} { ${fields.join(' ')} }, the table lets ${list(row.who)} read { ${row.fields.join(' ')} }: lead the relation to a type with only those fields, or change the row's \`fields\``);
        const leaks = Object.values(probe.target.getFields()).filter((f) => isObjectType(getNamedType(f.type)) && !RIGHTS[`relation ${probe.target!.name}.${f.name}`]);
        if (leaks.length) problems.push(`${probe.key}: ${probe.target.name} leads on to ${leaks.map((f) => f.name).join(', ')}`);
      }
      if (!probe.query) continue;
      const outcomes = new Map<Caller, Outcome>();
      for (const caller of CALLERS) {
        let req = api.http.post('/graphql');
        if (caller !== 'anonymous') req = req.set('Authorization', `Bearer ${tokens.get(caller)}`);
        const res = await req.send({ query: probe.query, variables: probe.variables });
        outcomes.set(caller, graphOutcome(res.status, res.body));
      }
      judge(probe.key, row.who, outcomes, problems);
    }

    for (const { key, route } of routes) {
      seen.add(key);
      const row = RIGHTS[key];
      if (!row) {
        problems.push(`${key} has no row: add \`'${key}': { who: [...] },\` to ${TABLE} with the callers who may use it`);
        continue;
      }
      const [method, pattern] = route.split(' ');
      const path = pattern.replace(/:token/g, token).replace(/:(\w+)/g, '0') + (pattern === '/graphql' && method === 'GET' ? '?query=%7B__typename%7D' : '');
      const outcomes = new Map<Caller, Outcome>();
      for (const caller of CALLERS) {
        let req = method === 'GET' ? api.http.get(path) : api.http.post(path);
        req = req.set(REMOTE);
        if (caller !== 'anonymous') req = req.set('Authorization', `Bearer ${tokens.get(caller)}`);
        const body = row.body ?? (pattern === '/graphql' ? { query: '{ __typename }' } : undefined);
        const res = await (method === 'POST' && body !== undefined ? req.send(body as object) : req);
        outcomes.set(caller, restOutcome(res.status, res.text));
      }
      judge(key, row.who, outcomes, problems);
    }

    for (const key of Object.keys(RIGHTS)) {
      if (!seen.has(key)) problems.push(`${key} is in ${TABLE} but the server has no such operation, relation or route: remove its row`);
    }
    console.log(`rights table: ${probes.length} GraphQL probes, ${routes.length} routes, ${problems.length} surprises`);
    expect(problems).toEqual([]);
  });
});
