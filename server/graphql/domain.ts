import type { GraphQLFieldConfig, GraphQLObjectType } from 'graphql';
import type { Model, ModelClass, QueryBuilder } from 'objection';

import type { GraphContext } from './context';

/** Looks up the read type objection-graphql generated for a model. */
export type TypeOf = (model: ModelClass<Model>) => GraphQLObjectType;
export type Fields = Record<string, GraphQLFieldConfig<unknown, GraphContext>>;

/** The generated single and list reads of a model, and what they may be asked. */
export interface RootReads {
  fieldName: string;
  listFieldName: string;
  /** Narrows or refuses a generated read for the signed-in user; throw to refuse. */
  readPolicy: (builder: QueryBuilder<Model>, ctx: GraphContext) => void;
  /** The filter arguments the screens need (objection-graphql's names: `idEq`, `stageEq`, `makerLikeNoCase`...). */
  filters: { single: readonly string[]; list: readonly string[] };
  /** The properties `orderBy` and `orderByDesc` may name, when the list is ordered at all. */
  orderBy?: readonly string[];
}

/**
 * A model objection-graphql makes a read type of. With root reads it is read directly, under its
 * policy; without, only through a relation of another read type, which applies no policy of its own:
 * such a model (a view with the few columns fit for every reader) must be safe for every role that
 * can read the parent. Relations take no arguments.
 */
export type ReadModel = { model: ModelClass<Model> } & (RootReads | { fieldName?: undefined; listFieldName?: undefined });

/** What a domain adds to the one GraphQL schema. */
export interface GraphDomain {
  readModels: ReadModel[];
  queries?: (typeOf: TypeOf) => Fields;
  mutations?: (typeOf: TypeOf) => Fields;
}

/**
 * Hand-written types that name generated ones (a piano's stage enum) are made once per schema: each
 * build generates its types afresh, and one schema may not hold two types of one name.
 */
export function perSchema<T>(make: (typeOf: TypeOf) => T): (typeOf: TypeOf) => T {
  const made = new WeakMap<TypeOf, T>();
  return (typeOf) => {
    if (!made.has(typeOf)) made.set(typeOf, make(typeOf));
    return made.get(typeOf)!;
  };
}
