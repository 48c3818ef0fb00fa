import './objection-adapter';

import { getNamedType, GraphQLInt, GraphQLObjectType, GraphQLSchema, GraphQLString, type GraphQLFieldResolver } from 'graphql';
import type { Model, ModelClass, QueryBuilder } from 'objection';
import { builder as graphQlBuilder, type SchemaBuilder } from 'objection-graphql';

import { hasControlCharacters, NO_CONTROL_CHARACTERS } from '@/modules/input/core/text';
import { badInput } from '@/server/errors';

import type { GraphContext } from './context';
import type { Fields, GraphDomain, ReadModel, TypeOf } from './domain';
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
function readMiddleware(policies: Map<ModelClass<Model>, ReadModel>) {
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

export function buildSchema(domains: GraphDomain[]): GraphQLSchema {
  const readModels = domains.flatMap((d) => d.readModels);
  const policies = new Map(readModels.map((r) => [r.model, r]));
  const builder: SchemaBuilder = graphQlBuilder();
  for (const r of readModels) builder.model(r.model, { fieldName: r.fieldName, listFieldName: r.listFieldName });
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
  const extraQueries: Fields = Object.assign({}, ...domains.map((d) => d.queries?.(typeOf) ?? {}));
  const schema = new GraphQLSchema({
    ...generated.toConfig(),
    query: new GraphQLObjectType({ ...queryConfig, fields: { ...queryConfig.fields, ...(extraQueries as typeof queryConfig.fields) } }),
    types: [],
  });
  guardTextArguments(schema.getQueryType());
  guardTextArguments(schema.getMutationType());
  return schema;
}
