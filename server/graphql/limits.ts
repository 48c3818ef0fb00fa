// Bounds the generated schema does not have of its own.
export const DEFAULT_PAGE_SIZE = 50;
export const MAX_PAGE_SIZE = 200;
export const MAX_QUERY_DEPTH = 6;

// What one GraphQL document may ask for; the web app's largest documents stay well inside each.
export const QUERY_LIMITS = {
  /** lexical tokens in the document: parsing stops past this, before any tree is built */
  tokens: 2000,
  /** aliased fields in one operation */
  aliases: 15,
  /** directives in one operation */
  directives: 20,
  /** nesting of an introspection query (the standard one, getIntrospectionQuery(), nests 14 levels) */
  introspectionDepth: 15,
  /** estimated cost: each field 1, each top-level field 10, lists times the rows they may return */
  cost: 10_000,
};
/** The rows a nested relation list is reckoned to return when its query does not say. */
export const NESTED_LIST_ROWS = 10;
export const ROOT_FIELD_COST = 10;
