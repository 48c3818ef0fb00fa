// Bounds the generated schema does not have of its own.
export const DEFAULT_PAGE_SIZE = 50;
export const MAX_PAGE_SIZE = 200;
export const MAX_QUERY_DEPTH = 6;
