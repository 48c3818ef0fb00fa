import {
  GraphQLBoolean,
  GraphQLEnumType,
  GraphQLFloat,
  GraphQLInputObjectType,
  GraphQLInt,
  GraphQLList,
  GraphQLNonNull,
  GraphQLObjectType,
  GraphQLString,
  isType,
  type GraphQLFieldConfigMap,
  type GraphQLInputFieldConfigMap,
  type GraphQLInputType,
  type GraphQLNullableType,
  type GraphQLOutputType,
} from 'graphql';

import { CURRENCIES } from '@/modules/shop/core/money';

import type { GraphContext } from './context';

// Small builders for the hand-written types: every domain answer and input is a type of its own.
export const nn = <T extends GraphQLNullableType>(t: T) => new GraphQLNonNull(t);
export const list = <T extends GraphQLNullableType>(t: T) => nn(new GraphQLList(nn(t)));

export const str = { type: nn(GraphQLString) };
export const int = { type: nn(GraphQLInt) };
export const float = { type: nn(GraphQLFloat) };
export const bool = { type: nn(GraphQLBoolean) };
export const optStr = { type: GraphQLString };
export const optInt = { type: GraphQLInt };
export const optFloat = { type: GraphQLFloat };

/** An enum whose values are the strings the core names them by. */
export function enumOf(name: string, values: readonly string[], description?: string): GraphQLEnumType {
  return new GraphQLEnumType({ name, description, values: Object.fromEntries(values.map((v) => [v, { value: v }])) });
}

type Fields = GraphQLFieldConfigMap<unknown, GraphContext>;
/** A type; fields given as a type alone are wrapped into field configs. */
export function object(name: string, fields: Record<string, GraphQLOutputType | Fields[string]> | (() => Record<string, GraphQLOutputType | Fields[string]>), description?: string): GraphQLObjectType {
  const wrap = (f: Record<string, GraphQLOutputType | Fields[string]>) => Object.fromEntries(Object.entries(f).map(([k, v]) => [k, isType(v) ? { type: v } : v])) as Fields;
  return new GraphQLObjectType({ name, description, fields: () => wrap(typeof fields === 'function' ? fields() : fields) });
}

export function input(name: string, fields: Record<string, GraphQLInputType | GraphQLInputFieldConfigMap[string]>, description?: string): GraphQLInputObjectType {
  const wrap = Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, isType(v) ? { type: v } : v])) as GraphQLInputFieldConfigMap;
  return new GraphQLInputObjectType({ name, description, fields: wrap });
}

/** Every money field's currency, one enum for every domain. */
export const CurrencyType = enumOf('Currency', CURRENCIES, 'A currency Feltwire prices in, by its ISO 4217 code.');
