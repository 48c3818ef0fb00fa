import { GraphQLScalarType, Kind, type ValueNode } from 'graphql';

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
      throw new TypeError('variables are not accepted inside a JSON literal');
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
