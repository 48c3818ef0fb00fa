import { MAX_INTEGER, parseWholeNumber } from '@/modules/input/core/numbers';

import { badInput } from './errors';

/** A record id from a route: decimal digits within the integer column, else 400 before any query runs. */
export function idParam(raw: unknown, field = 'id', min = 1): number {
  const n = parseWholeNumber(raw, min);
  if (n == null) throw badInput(field, `must be a whole number from ${min} to ${MAX_INTEGER}`);
  return n;
}

/** An optional whole number from the query string (given once, as digits). */
export function optionalIntQuery(raw: unknown, field: string): number | undefined {
  return raw === undefined ? undefined : idParam(raw, field);
}
