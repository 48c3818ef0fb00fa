import { buildSchema as buildGraphSchema, getIntrospectionQuery, parse } from 'graphql';

import { HISTORY_QUERY } from '@/modules/assessment/ui/use-assessment-history';
import { PIANOS_QUERY, pianoListVariables } from '@/modules/pianos/ui/use-pianos';
import { validateDocument } from '@/server/graphql/http';
import { MAX_QUERY_DEPTH, QUERY_LIMITS } from '@/server/graphql/limits';

import { startTestApi, type TestApi } from '../support/api';

let api: TestApi;
let token: string;
beforeAll(async () => {
  api = await startTestApi();
  token = await api.tokenFor('manager');
});
afterAll(() => api.close());

async function refused(query: string, message: RegExp, variables?: Record<string, unknown>) {
  const res = await api.gql(token, query, variables);
  expect(res.status).toBe(400);
  expect(res.body.data).toBeUndefined();
  expect(res.body.errors[0].extensions.code).toBe('BAD_INPUT');
  expect(res.body.errors[0].message).toMatch(message);
}

const aliased = (n: number, field = 'pianos(limit:200){id}') => `{${Array.from({ length: n }, (_, i) => `a${i}:${field}`).join(' ')}}`;

describe('what one GraphQL document may ask for', () => {
  it('refuses the 97 KB document of 3,500 aliased pianos(limit:200) before it runs', async () => {
    const doc = aliased(3500);
    expect(JSON.stringify({ query: doc }).length).toBeLessThan(100 * 1024);
    await refused(doc, new RegExp(`at most ${QUERY_LIMITS.tokens} tokens`));
  });

  it('refuses more aliases than the limit in a short document', async () => {
    await refused(aliased(QUERY_LIMITS.aliases + 1, 'me{id}'), new RegExp(`Aliases limit of ${QUERY_LIMITS.aliases} exceeded, found ${QUERY_LIMITS.aliases + 1}`));
    const ok = await api.gql(token, aliased(QUERY_LIMITS.aliases, 'me{id}'));
    expect(ok.status).toBe(200);
    expect(ok.body.data.a0.id).toEqual(expect.any(Number));
  });

  it('refuses a document whose lists multiply past the cost limit', async () => {
    // Pianos (50 reckoned per page), each asked for four times over, each with its creator.
    const page = 'pianos { id stockNumber maker model serialNumber year kind sizeCm finish stage stageChangedAt createdAt updatedAt createdBy { id name } }';
    await refused(`{ a: ${page} b: ${page} c: ${page} d: ${page} e: ${page} f: ${page} g: ${page} h: ${page} i: ${page} j: ${page} k: ${page} l: ${page} m: ${page} n: ${page} }`, /estimated cost is \d+, at most 10000/);
  });

  it('counts a list inside a hand-written answer once with its row: the history screen asks for every version whole', async () => {
    // Findings and their work come with the version's row; only the versions are reckoned as rows (50).
    const { piano_id: pianoId } = await api.knex('assessments').orderBy('id').first();
    const res = await api.gql(token, HISTORY_QUERY, { pianoId });
    expect(res.status).toBe(200);
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data.assessmentHistory.length).toBeGreaterThan(0);
    expect(res.body.data.assessmentHistory[0].grade.findings.length).toBeGreaterThan(0);
  });

  it('counts the rows a variable asks for', async () => {
    const page = 'pianos(limit: $n) { id stockNumber maker model serialNumber year kind sizeCm finish stage stageChangedAt createdAt updatedAt createdBy { id name } }';
    const query = `query($n: Int) { a: ${page} b: ${page} c: ${page} d: ${page} }`;
    await refused(query, /estimated cost/, { n: 200 });
    const ok = await api.gql(token, query, { n: 2 });
    expect(ok.status).toBe(200);
    expect(ok.body.data.d).toHaveLength(2);
  });

  // The schema has no cycle today (no relation leads back): the depth limit guards the next one.
  const LOOPED = buildGraphSchema('type Query { node: Node } type Node { name: String next: Node }');
  const nested = (depth: number) => `{ node { ${'next { '.repeat(depth - 1)}name${' }'.repeat(depth - 1)} } }`;

  it('refuses a query nested deeper than the limit below its top field, and answers one at it', () => {
    const deep = validateDocument(LOOPED, parse(nested(MAX_QUERY_DEPTH + 1)));
    expect(deep.map((e) => e.message)).toEqual([`The query nests deeper than ${MAX_QUERY_DEPTH} levels below its top field.`]);
    expect(validateDocument(LOOPED, parse(nested(MAX_QUERY_DEPTH)))).toEqual([]);
  });

  it('refuses a fragment cycle with a message, before any limit walks it', async () => {
    await refused('{ me { ...A } } fragment A on Users { id ...B } fragment B on Users { name ...A }', /Cannot spread fragment "A" within itself/);
  });

  it('refuses fragments that spread each other into an exponential document', async () => {
    const levels = 16;
    const fragments = Array.from({ length: levels }, (_, i) => `fragment F${i} on Users { ${i + 1 < levels ? `...F${i + 1} ...F${i + 1}` : 'id'} }`).join(' ');
    await refused(`{ me { ...F0 } } ${fragments}`, /maximum allowed number of nodes|estimated cost/);
  });

  it('refuses too many directives', async () => {
    const fields = Array.from({ length: QUERY_LIMITS.directives + 1 }, () => 'id @include(if: true)').join(' ');
    await refused(`{ me { ${fields} } }`, new RegExp(`Directives limit of ${QUERY_LIMITS.directives} exceeded`));
  });

  it('answers the standard introspection query, and refuses one nested deeper than its bound', async () => {
    const standard = await api.gql(token, getIntrospectionQuery());
    expect(standard.status).toBe(200);
    expect(standard.body.data.__schema.queryType.name).toBe('Query');
    let deep = 'name';
    for (let i = 0; i < 40; i++) deep = `ofType { ${deep} }`;
    await refused(`{ __schema { types { fields { type { ${deep} } } } } }`, new RegExp(`deeper than ${QUERY_LIMITS.introspectionDepth} levels`));
    await refused(`{ __type(name: "Pianos") { fields { type { ofType { ofType { ofType { ofType { ofType { name } } } } } } } } }`, new RegExp(`deeper than ${MAX_QUERY_DEPTH} levels`));
  });

  it('refuses variables of the wrong type before running, with 400', async () => {
    await refused('query($id: Int) { piano(idEq: $id) { id } }', /\$id/, { id: 'abc' });
  });

  it('answers the largest list the web app asks for, as urql sends it', async () => {
    const query = PIANOS_QUERY.replace(/\{\s*(id stockNumber[^}]*)\}/, '{ $1 __typename }');
    const res = await api.gql(token, query, pianoListVariables({ order: 'newest', limit: 200 }));
    expect(res.status).toBe(200);
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data.pianos.length).toBeGreaterThan(10);
  });
});
