import { GraphQLError, GraphQLScalarType, Kind, type ValueNode } from 'graphql';

function literal(node: ValueNode): unknown {
  switch (node.kind) {
    case Kind.STRING:
    case Kind.BOOLEAN:
      return node.value;
    case Kind.INT:
    case Kind.FLOAT:
      return Number(node.value);
    case Kind.OBJECT:
      return Object.fromEntries(node.fields.map((f) => [f.name.value, literal(f.value)]));
    case Kind.LIST:
      return node.values.map(literal);
    case Kind.NULL:
      return null;
    default:
      throw new GraphQLError('A JSON value written in the query cannot hold a variable: pass the whole value as one variable instead.', { nodes: node, extensions: { code: 'BAD_INPUT' } });
  }
}

// Structured documents (measurements, grades, rules) travel as JSON and are checked by the domain's zod schemas.
export const GraphQLJSON = new GraphQLScalarType({
  name: 'JSON',
  description: 'A JSON value, validated by the domain schema that receives it.',
  serialize: (v) => v,
  parseValue: (v) => v,
  parseLiteral: literal,
});
