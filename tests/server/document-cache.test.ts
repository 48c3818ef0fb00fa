import { buildSchema, specifiedRules, type ValidationRule } from 'graphql';

import { documentCache } from '@/server/graphql/document-cache';

const schema = buildSchema('type Query { piano(id: Int): String, pianos: [String] }');

// A rule that counts how often validation really ran.
function counting(): { rule: ValidationRule; runs: () => number } {
  let runs = 0;
  return {
    rule: () => {
      runs += 1;
      return {};
    },
    runs: () => runs,
  };
}

it('parses a document once and hands back the same tree for the same text', () => {
  const cache = documentCache();
  const a = cache.parse('query P($id: Int) { piano(id: $id) }');
  expect(cache.parse('query P($id: Int) { piano(id: $id) }')).toBe(a);
  expect(cache.parse('{ pianos }')).not.toBe(a);
});

it('validates a document once, errors included', () => {
  const cache = documentCache();
  const { rule, runs } = counting();
  const good = cache.parse('{ piano(id: 1) }');
  expect(cache.validate(schema, good, [...specifiedRules, rule])).toEqual([]);
  expect(cache.validate(schema, good, [...specifiedRules, rule])).toEqual([]);
  expect(runs()).toBe(1);
  const bad = cache.parse('{ organ }');
  const first = cache.validate(schema, bad, [...specifiedRules, rule]);
  expect(first.map((e) => e.message)).toEqual(['Cannot query field "organ" on type "Query".']);
  expect(cache.validate(schema, bad, [...specifiedRules, rule])).toBe(first);
  expect(runs()).toBe(2);
});

it('keeps only the most recently used documents, and never a large one', () => {
  const cache = documentCache(2);
  const a = cache.parse('{ piano(id: 1) }');
  const b = cache.parse('{ piano(id: 2) }');
  expect(cache.parse('{ piano(id: 1) }')).toBe(a);
  cache.parse('{ piano(id: 3) }');
  // 2 was the least recently used: it is parsed again; 1 was used since and stays.
  expect(cache.parse('{ piano(id: 1) }')).toBe(a);
  expect(cache.parse('{ piano(id: 2) }')).not.toBe(b);
  const big = `{ pianos ${' '.repeat(5000)}}`;
  expect(cache.parse(big)).not.toBe(cache.parse(big));
});

it('throws on a syntax error every time, remembering nothing', () => {
  const cache = documentCache();
  expect(() => cache.parse('{ piano(')).toThrow(/Syntax Error/);
  expect(() => cache.parse('{ piano(')).toThrow(/Syntax Error/);
});
