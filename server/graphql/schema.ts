import './objection-adapter';

import {
  getNamedType,
  GraphQLEnumType,
  GraphQLInt,
  GraphQLList,
  GraphQLNonNull,
  GraphQLObjectType,
  GraphQLSchema,
  GraphQLString,
  isEnumType,
  isNonNullType,
  isObjectType,
  type GraphQLFieldResolver,
  type GraphQLNamedType,
} from 'graphql';
import type { Model, ModelClass, QueryBuilder } from 'objection';
import { builder as graphQlBuilder, type SchemaBuilder } from 'objection-graphql';

import { hasControlCharacters, NO_CONTROL_CHARACTERS } from '@/modules/input/core/text';
import { badInput } from '@/server/errors';

import type { GraphContext } from './context';
import type { Fields, GraphDomain, ReadModel, RootReads, TypeOf } from './domain';
import { DEFAULT_PAGE_SIZE, MAX_PAGE_SIZE } from './limits';

interface PageArgs {
  limit?: number;
  offset?: number;
  range?: number[];
}

function checkPage(args: PageArgs): void {
  if (args.limit != null && !(args.limit >= 1 && args.limit <= MAX_PAGE_SIZE)) {
    throw badInput('limit', `must be between 1 and ${MAX_PAGE_SIZE}`);
  }
  if (args.offset != null && args.offset < 0) throw badInput('offset', 'must be 0 or more');
  if (args.range != null) {
    const [from, to] = args.range;
    if (args.range.length !== 2 || from < 0 || to < from || to - from + 1 > MAX_PAGE_SIZE) {
      throw badInput('range', `must be [from, to] with at most ${MAX_PAGE_SIZE} rows`);
    }
  }
}

// Wraps every generated read: the read policy of its model, then a default page size.
function readMiddleware(policies: Map<ModelClass<Model>, RootReads>) {
  return (resolver: GraphQLFieldResolver<unknown, unknown>, modelData: { modelClass: ModelClass<Model> }) =>
    (root: unknown, args: PageArgs, ctx: GraphContext, info: Parameters<GraphQLFieldResolver<unknown, unknown>>[3]) => {
      const policy = policies.get(modelData.modelClass);
      if (!policy) throw new Error(`no read policy for ${modelData.modelClass.tableName}`);
      checkPage(args);
      const onQuery = (builder: QueryBuilder<Model>) => {
        // An absent optional variable filters nothing (objection's skipUndefined, minus its deprecated setter).
        (builder as unknown as { internalOptions(): { skipUndefined: boolean } }).internalOptions().skipUndefined = true;
        policy.readPolicy(builder, ctx);
        if (args.limit == null && args.range == null) builder.limit(DEFAULT_PAGE_SIZE);
      };
      return resolver({ onQuery }, args, ctx, info);
    };
}

// Text arguments outside the domains' schemas (filters, reasons, notes) are refused with a control character in them.
function guardTextArguments(type: GraphQLObjectType | null | undefined): void {
  for (const field of Object.values(type?.getFields() ?? {})) {
    const textArgs = field.args.filter((a) => getNamedType(a.type) === GraphQLString).map((a) => a.name);
    const resolve = field.resolve;
    if (!textArgs.length || !resolve) continue;
    field.resolve = (root, args: Record<string, unknown>, ctx, info) => {
      for (const name of textArgs) {
        const values = ([] as unknown[]).concat(args[name] ?? []);
        if (values.some((v) => typeof v === 'string' && hasControlCharacters(v, true))) throw badInput(name, NO_CONTROL_CHARACTERS);
      }
      return resolve(root, args, ctx, info);
    };
  }
}

const hasRoot = (r: ReadModel): r is ReadModel & RootReads => r.fieldName != null;

// objection-graphql names a model's type after its table: `pianos` is `Pianos`, `work_items` `WorkItems`.
const typeNameOf = (model: ModelClass<Model>) => model.tableName.replace(/(^|_)([a-z])/g, (_m, _s, c: string) => c.toUpperCase());
const neverNull = (p: unknown) => typeof p === 'object' && p !== null && 'type' in p && typeof p.type === 'string' && p.type !== 'null' && !('anyOf' in p);

type RootFieldConfigs = ReturnType<GraphQLObjectType['toConfig']>['fields'];

/**
 * objection-graphql offers every column as a filter (an e-mail `Like` included) on every read and
 * relation, and names its enums with a running number. The reads keep the filters their model names,
 * the relations none, `orderBy` the properties named, and the enums a name that stays put. Done to the
 * generated types and the root fields' configs before the schema is put together, which indexes them.
 */
function narrowGenerated(generated: GraphQLSchema, roots: RootFieldConfigs, readModels: ReadModel[]): void {
  const types = new Set<GraphQLObjectType>();
  const keep = (name: string, names: readonly string[], order?: GraphQLEnumType) => {
    const field = roots[name];
    field.args = Object.fromEntries(Object.entries(field.args ?? {}).filter(([arg]) => names.includes(arg)).map(([arg, config]) => [arg, order && arg.startsWith('orderBy') ? { ...config, type: order } : config]));
    field.extensions = { ...field.extensions, generatedRead: true };
  };
  for (const r of readModels.filter(hasRoot)) {
    const type = getNamedType(roots[r.listFieldName].type) as GraphQLObjectType;
    types.add(type);
    const order = r.orderBy?.length ? new GraphQLEnumType({ name: `${type.name}Order`, values: Object.fromEntries(r.orderBy.map((p) => [p, { value: p }])) }) : undefined;
    keep(r.fieldName, r.filters.single);
    keep(r.listFieldName, [...r.filters.list, ...(order ? ['orderBy', 'orderByDesc'] : [])], order);
    // A list read answers a list, and each row is a row.
    roots[r.listFieldName].type = new GraphQLNonNull(new GraphQLList(new GraphQLNonNull(type)));
  }
  const schemas = new Map(readModels.map((r) => [typeNameOf(r.model), r.model.jsonSchema?.properties ?? {}]));
  for (const type of [...types]) {
    const properties = schemas.get(type.name) ?? {};
    for (const f of Object.values(type.getFields())) {
      const target = getNamedType(f.type);
      if (!isObjectType(target)) {
        // A column the model says is never null (its database column is NOT NULL) reads as such.
        if (neverNull(properties[f.name]) && !isNonNullType(f.type)) f.type = new GraphQLNonNull(f.type);
        continue;
      }
      f.args = [];
      f.extensions = { ...f.extensions, relation: true };
      types.add(target);
    }
  }
  // Generated enums are named `<Type><Property>Enum<n>`, n counting every enum built before.
  for (const type of Object.values(generated.getTypeMap()) as GraphQLNamedType[]) {
    if (isEnumType(type) && /Enum\d+$/.test(type.name)) (type as { name: string }).name = type.name.replace(/Enum\d+$/, '');
  }
}

// objection-graphql gives every model root reads; a model read only through relations has them under this prefix, dropped.
const RELATION_ONLY = 'relationOnly_';

export function buildSchema(domains: GraphDomain[]): GraphQLSchema {
  const readModels = domains.flatMap((d) => d.readModels);
  const policies = new Map(readModels.filter(hasRoot).map((r) => [r.model, r]));
  const builder: SchemaBuilder = graphQlBuilder();
  for (const r of readModels) {
    const names = hasRoot(r) ? r : { fieldName: `${RELATION_ONLY}${r.model.tableName}`, listFieldName: `${RELATION_ONLY}${r.model.tableName}_list` };
    builder.model(r.model, { fieldName: names.fieldName, listFieldName: names.listFieldName });
  }
  builder.extendWithMiddleware(readMiddleware(policies) as never);
  // objection-graphql types limit and offset as [Int]; a plain Int is what clients mean and what checkPage checks.
  builder.argFactory(() => ({
    limit: { type: GraphQLInt, query: (q: QueryBuilder<Model>, v: number) => q.limit(v) },
    offset: { type: GraphQLInt, query: (q: QueryBuilder<Model>, v: number) => q.offset(v) },
  }));

  let typeOf: TypeOf = () => {
    throw new Error('types are not ready yet');
  };
  builder.extendWithMutations((b) => {
    typeOf = (model) => {
      const data = Object.values(b.models).find((m) => m.modelClass === model);
      if (!data) throw new Error(`model ${model.tableName} is not in the schema`);
      return b._typeForModel(data);
    };
    const fields: Fields = Object.assign({}, ...domains.map((d) => d.mutations?.(typeOf) ?? {}));
    return new GraphQLObjectType({ name: 'Mutation', fields: fields as never });
  });
  const generated = builder.build();

  const queryConfig = generated.getQueryType()!.toConfig();
  const rootReads = Object.fromEntries(Object.entries(queryConfig.fields).filter(([name]) => !name.startsWith(RELATION_ONLY)));
  narrowGenerated(generated, rootReads, readModels);
  const extraQueries: Fields = Object.assign({}, ...domains.map((d) => d.queries?.(typeOf) ?? {}));
  const schema = new GraphQLSchema({
    ...generated.toConfig(),
    query: new GraphQLObjectType({ ...queryConfig, fields: { ...rootReads, ...(extraQueries as typeof queryConfig.fields) } }),
    types: [],
  });
  guardTextArguments(schema.getQueryType());
  guardTextArguments(schema.getMutationType());
  return schema;
}
