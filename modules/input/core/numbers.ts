// The largest value of PostgreSQL's integer, the type of every id and version column.
export const MAX_INTEGER = 2_147_483_647;

/** A whole number written in plain decimal digits, from `min` to the integer column's maximum; null otherwise. */
export function parseWholeNumber(raw: unknown, min = 1): number | null {
  if (typeof raw !== 'string' || !/^[0-9]{1,10}$/.test(raw)) return null;
  const n = Number(raw);
  return n >= min && n <= MAX_INTEGER ? n : null;
}
