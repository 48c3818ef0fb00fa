import { answerType, plainResponse } from '@/server/graphql/plain-response';

const req = (accept?: string) => ({ method: 'POST', url: '/graphql', headers: accept == null ? {} : { accept }, body: null, raw: null, context: null });

it.each([
  [undefined, 'application/json'],
  ['application/json', 'application/json'],
  ['application/graphql-response+json, application/graphql+json, application/json, text/event-stream, multipart/mixed', 'application/graphql-response+json'],
  ['application/json;charset=utf-8, application/graphql-response+json', 'application/json'],
  ['text/html', null],
  ['application/json; charset=latin1', null],
])('answers Accept %s with %s, as graphql-http would', (accept, type) => {
  expect(answerType(accept)).toBe(type);
});

it('writes an answer without errors as it is, in the accepted type', () => {
  const result = { data: { pianos: [{ id: 1, stockNumber: 'FW-0001', caseNotes: null }] } };
  const answer = plainResponse(req('application/graphql-response+json'), null, result)!;
  expect(JSON.parse(answer[0] as string)).toEqual(result);
  expect(answer[1]).toEqual({ status: 200, statusText: 'OK', headers: { 'content-type': 'application/graphql-response+json; charset=utf-8' } });
});

it('leaves answers with errors, and media types it cannot write, to graphql-http', () => {
  expect(plainResponse(req(), null, { data: null, errors: [new Error('no') as never] })).toBeUndefined();
  expect(plainResponse(req('text/html'), null, { data: {} })).toBeUndefined();
});
