// Tests ask for a hand-written answer whole: a field of an object type written without a selection gets
// every field of its type (relations and fields that need arguments left out), as the JSON answers of
// old came whole. A document that does not parse or has no such field is sent as written.
import { getNamedType, isObjectType, isNonNullType, Kind, parse, print, TypeInfo, visit, visitWithTypeInfo, type FieldNode, type GraphQLObjectType, type GraphQLSchema, type SelectionSetNode } from 'graphql';

import { DOMAINS } from '@/server/graphql/domains';
import { buildSchema } from '@/server/graphql/schema';

let schema: GraphQLSchema | undefined;
const cache = new Map<string, string>();

function selectionOf(type: GraphQLObjectType, depth: number): SelectionSetNode {
  const selections: FieldNode[] = [];
  for (const f of Object.values(type.getFields())) {
    if (f.args.some((a) => isNonNullType(a.type)) || f.extensions?.relation) continue;
    const named = getNamedType(f.type);
    const field: FieldNode = { kind: Kind.FIELD, name: { kind: Kind.NAME, value: f.name } };
    if (isObjectType(named)) {
      if (depth >= 6) continue;
      selections.push({ ...field, selectionSet: selectionOf(named, depth + 1) });
    } else selections.push(field);
  }
  return { kind: Kind.SELECTION_SET, selections };
}

export function wholeAnswers(query: string): string {
  const known = cache.get(query);
  if (known) return known;
  schema ??= buildSchema(DOMAINS);
  let out = query;
  try {
    const info = new TypeInfo(schema);
    let changed = false;
    const doc = visit(
      parse(query),
      visitWithTypeInfo(info, {
        Field: {
          leave(node) {
            if (node.selectionSet) return undefined;
            const type = getNamedType(info.getType());
            if (!type || !isObjectType(type)) return undefined;
            changed = true;
            return { ...node, selectionSet: selectionOf(type, 1) };
          },
        },
      }),
    );
    if (changed) out = print(doc);
  } catch {
    out = query;
  }
  cache.set(query, out);
  return out;
}

/** An answer with its null fields left out: GraphQL answers null where the core leaves a field out. */
export function withoutNulls<T>(value: T): T {
  if (Array.isArray(value)) return value.map(withoutNulls) as T;
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== null && v !== undefined).map(([k, v]) => [k, withoutNulls(v)])) as T;
  return value;
}
