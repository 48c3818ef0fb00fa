import { createHash } from 'node:crypto';

import { canonicalJson } from '@/modules/disclosure/core/disclosure';

/** SHA-256 (FIPS 180-4) of a text, as lower-case hex. */
export function sha256Hex(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** The digest a disclosure version is known by: SHA-256 of its content as canonical JSON. */
export function contentDigest(content: unknown): string {
  return sha256Hex(canonicalJson(content));
}
