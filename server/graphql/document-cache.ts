import { parse, validate, type DocumentNode, type GraphQLError, type GraphQLSchema, type Source, type ValidationRule } from 'graphql';

// The screens send the same few documents over and over; parsing and validating one costs more than
// running it. Each is parsed and checked once, and kept while it is among the most recently used.
const MAX_DOCUMENTS = 200;
// Bigger documents are no screen's: they are parsed afresh, so a flood of them cannot fill memory.
const MAX_CACHED_SOURCE = 4096;

export interface DocumentCache {
  parse: (source: string | Source) => DocumentNode;
  validate: (schema: GraphQLSchema, document: DocumentNode, rules?: readonly ValidationRule[]) => readonly GraphQLError[];
}

/** Parse and validate with a memory: one schema and one set of rules per cache, as the server has. */
export function documentCache(max = MAX_DOCUMENTS, parser: (source: string) => DocumentNode = (source) => parse(source)): DocumentCache {
  const parsed = new Map<string, DocumentNode>();
  const checked = new WeakMap<DocumentNode, readonly GraphQLError[]>();
  return {
    parse(input) {
      if (typeof input !== 'string') return parse(input);
      const source = input;
      const hit = parsed.get(source);
      if (hit) {
        // Map keeps insertion order: moving a hit to the end makes the first entry the least recently used.
        parsed.delete(source);
        parsed.set(source, hit);
        return hit;
      }
      const document = parser(source);
      if (source.length <= MAX_CACHED_SOURCE) {
        parsed.set(source, document);
        if (parsed.size > max) parsed.delete(parsed.keys().next().value!);
      }
      return document;
    },
    validate(schema, document, rules) {
      const known = checked.get(document);
      if (known) return known;
      const errors = validate(schema, document, rules);
      checked.set(document, errors);
      return errors;
    },
  };
}
