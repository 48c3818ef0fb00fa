import type { GraphQLFieldConfig, GraphQLObjectType } from 'graphql';
import type { Model, ModelClass, QueryBuilder } from 'objection';

import type { GraphContext } from './context';

/** Looks up the read type objection-graphql generated for a model. */
export type TypeOf = (model: ModelClass<Model>) => GraphQLObjectType;
export type Fields = Record<string, GraphQLFieldConfig<unknown, GraphContext>>;

export interface ReadModel {
  model: ModelClass<Model>;
  fieldName: string;
  listFieldName: string;
  /** Narrows or refuses a generated read for the signed-in user; throw to refuse. */
  readPolicy: (builder: QueryBuilder<Model>, ctx: GraphContext) => void;
}

/** What a domain adds to the one GraphQL schema. */
export interface GraphDomain {
  readModels: ReadModel[];
  queries?: (typeOf: TypeOf) => Fields;
  mutations?: (typeOf: TypeOf) => Fields;
}
