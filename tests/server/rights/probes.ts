// What the rights test asks: one request per operation, relation and route, built from the schema and
// the Express app, with placeholder arguments a refused caller never gets past and an allowed one may
// (a wrong id or a bad value answers NOT_FOUND or BAD_INPUT: the caller got past the rights check).
import {
  getNamedType,
  getNullableType,
  isEnumType,
  isInputObjectType,
  isListType,
  isNonNullType,
  isObjectType,
  isScalarType,
  type GraphQLArgument,
  type GraphQLField,
  type GraphQLInputType,
  type GraphQLObjectType,
  type GraphQLSchema,
} from 'graphql';

export interface GraphProbe {
  key: string;
  /** the field the probe asks for, for the argument and field checks */
  field: GraphQLField<unknown, unknown>;
  /** the type a relation leads to */
  target?: GraphQLObjectType;
  query: string;
  variables: Record<string, unknown>;
}

/** A value of the type that passes GraphQL's own checks and no domain's: ids that are no row, empty text, no rows. */
export function placeholder(type: GraphQLInputType): unknown {
  const t = getNullableType(type);
  if (isListType(t)) return [];
  if (isEnumType(t)) return t.getValues()[0].value;
  if (isInputObjectType(t)) {
    return Object.fromEntries(
      Object.values(t.getFields())
        .filter((f) => isNonNullType(f.type))
        .map((f) => [f.name, placeholder(f.type)]),
    );
  }
  if (isScalarType(t)) {
    switch (t.name) {
      case 'Int':
        return 0;
      case 'Float':
        return -1;
      case 'Boolean':
        return false;
      case 'ID':
        return '0';
      case 'String':
        return '';
      default:
        return {};
    }
  }
  throw new Error(`no placeholder for ${String(type)}`);
}

const selection = (field: GraphQLField<unknown, unknown>) => (isObjectType(getNamedType(field.type)) ? ' { __typename }' : '');

function rootProbe(kind: 'query' | 'mutation', field: GraphQLField<unknown, unknown>, vars: Record<string, unknown> | undefined): GraphProbe {
  const required = field.args.filter((a: GraphQLArgument) => isNonNullType(a.type));
  const given = vars ? Object.keys(vars) : required.map((a) => a.name);
  const args = field.args.filter((a) => given.includes(a.name));
  const header = args.length ? `(${args.map((a) => `$${a.name}: ${String(a.type)}`).join(', ')})` : '';
  const passed = args.length ? `(${args.map((a) => `${a.name}: $${a.name}`).join(', ')})` : '';
  return {
    key: `${kind} ${field.name}`,
    field,
    query: `${kind} Probe${header} { ${field.name}${passed}${selection(field)} }`,
    variables: vars ?? Object.fromEntries(args.map((a) => [a.name, placeholder(a.type)])),
  };
}

/** The generated read types and the list field that reads each one (types reached only by a relation have none). */
function generatedTypes(schema: GraphQLSchema): Map<GraphQLObjectType, string | null> {
  const out = new Map<GraphQLObjectType, string | null>();
  for (const f of Object.values(schema.getQueryType()!.getFields())) {
    if (f.extensions?.generatedRead && isListType(getNullableType(f.type))) out.set(getNamedType(f.type) as GraphQLObjectType, f.name);
  }
  // Relations lead to generated types too.
  for (const type of [...out.keys()]) {
    for (const f of Object.values(type.getFields())) {
      const target = getNamedType(f.type);
      if (isObjectType(target) && !out.has(target)) out.set(target, null);
    }
  }
  return out;
}

/** Every query, every mutation and every relation of a generated read type, as a request. */
export function graphProbes(schema: GraphQLSchema, vars: (key: string) => Record<string, unknown> | undefined): GraphProbe[] {
  const probes: GraphProbe[] = [];
  for (const f of Object.values(schema.getQueryType()!.getFields())) probes.push(rootProbe('query', f, vars(`query ${f.name}`)));
  for (const f of Object.values(schema.getMutationType()?.getFields() ?? {})) probes.push(rootProbe('mutation', f, vars(`mutation ${f.name}`)));
  const types = generatedTypes(schema);
  for (const [type, listField] of types) {
    for (const f of Object.values(type.getFields())) {
      const target = getNamedType(f.type);
      if (!isObjectType(target)) continue;
      const key = `relation ${type.name}.${f.name}`;
      // Through the parent's list read, where the relation is loaded with its parent's rows.
      const query = listField ? `query Probe { ${listField}(limit: 5) { ${f.name} { __typename } } }` : '';
      probes.push({ key, field: f, target, query, variables: {} });
    }
  }
  return probes;
}

export const routeKey = (route: string) => `route ${route}`;
