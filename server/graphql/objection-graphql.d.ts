declare module 'objection-graphql' {
  import type { GraphQLObjectType, GraphQLSchema, GraphQLFieldResolver } from 'graphql';
  import type { ModelClass, Model } from 'objection';

  interface ModelOptions {
    listFieldName?: string;
    fieldName?: string;
    include?: string[];
    exclude?: string[];
  }
  interface ModelData {
    modelClass: ModelClass<Model>;
    opt: ModelOptions;
  }
  interface SchemaBuilder {
    model(modelClass: ModelClass<Model>, opt?: ModelOptions): SchemaBuilder;
    extendWithMutations(mutations: GraphQLObjectType | ((builder: SchemaBuilder) => GraphQLObjectType)): SchemaBuilder;
    extendWithMiddleware(
      middleware: (resolver: GraphQLFieldResolver<unknown, unknown>, modelData: ModelData) => GraphQLFieldResolver<unknown, unknown>,
    ): SchemaBuilder;
    setBuilderOptions(options: { skipUndefined?: boolean }): SchemaBuilder;
    argFactory(factory: (fields: unknown, modelClass: ModelClass<Model>) => Record<string, { type: unknown; query: (...args: never[]) => unknown }>): SchemaBuilder;
    build(): GraphQLSchema;
    models: Record<string, ModelData>;
    _typeForModel(modelData: ModelData): GraphQLObjectType;
  }
  export function builder(): SchemaBuilder;
}
