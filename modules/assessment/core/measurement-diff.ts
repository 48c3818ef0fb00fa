import { canonicalJson } from '@/modules/disclosure/core/disclosure';

import type { Measurements } from './measurements';

export interface FieldChange {
  field: string;
  from: unknown;
  to: unknown;
}

// Compared as canonical JSON: a version read back from the database may order a crack's keys differently.
const same = (a: unknown, b: unknown) => canonicalJson(a ?? null) === canonicalJson(b ?? null);

/** The fields that differ between two versions of an assessment, in a stable order. */
export function diffMeasurements(before: Measurements, after: Measurements): FieldChange[] {
  const fields = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
  return fields
    .filter((f) => !same(before[f as keyof Measurements], after[f as keyof Measurements]))
    .map((f) => ({ field: f, from: before[f as keyof Measurements] ?? null, to: after[f as keyof Measurements] ?? null }));
}
