import { QueryBuilder, type AnyQueryBuilder, type Modifiers } from 'objection';

// objection-graphql 0.4 calls builder.eager(expression, filters), which objection 3 removed.
type Filters = Modifiers<AnyQueryBuilder>;
const proto = QueryBuilder.prototype as unknown as { eager?: (expr: string, filters?: Filters) => unknown };

if (!proto.eager) {
  proto.eager = function eager(this: AnyQueryBuilder, expr: string, filters?: Filters) {
    const withGraph = this.withGraphFetched(expr);
    return filters ? withGraph.modifiers(filters) : withGraph;
  };
}

export {};
