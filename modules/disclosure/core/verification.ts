// The short code printed on a disclosure's papers: the first 60 bits of the version's SHA-256 digest,
// written as 12 characters of Crockford's base32 in three groups ("7K3Q-M9TD-20XF"). Anyone can type
// it on the check page to find the published version it belongs to. Pure.

// Crockford's base32: no I, L, O or U, so a code read aloud or copied by hand is not misread.
const ALPHABET = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';
const CODE_CHARS = 12;
/** The digest's leading hex digits a code stands for: 12 characters of 5 bits are 60 bits, or 15 hex digits. */
export const CODE_HEX_DIGITS = 15;

/** The verification code of a version, from its digest (64 hex digits): each 5 hex digits (20 bits) make one group of 4. */
export function verificationCode(digestHex: string): string {
  if (!/^[0-9a-f]{64}$/.test(digestHex)) throw new RangeError('the digest must be 64 lower-case hex digits');
  const groups: string[] = [];
  for (let g = 0; g < 3; g += 1) {
    const v = parseInt(digestHex.slice(g * 5, g * 5 + 5), 16);
    groups.push([15, 10, 5, 0].map((shift) => ALPHABET[(v >> shift) & 31]).join(''));
  }
  return groups.join('-');
}

/**
 * A code as someone typed it, in the printed form, or null when it cannot be one: any case, spaces and
 * dashes anywhere, and the letters people mistake for digits (I and L for 1, O for 0) read as meant.
 */
export function parseVerificationCode(typed: string): string | null {
  if (typeof typed !== 'string' || typed.length > 40) return null;
  const plain = typed
    .toUpperCase()
    .replace(/[\s\-–—.]/g, '')
    .replace(/[IL]/g, '1')
    .replace(/O/g, '0');
  if (plain.length !== CODE_CHARS || [...plain].some((ch) => !ALPHABET.includes(ch))) return null;
  return `${plain.slice(0, 4)}-${plain.slice(4, 8)}-${plain.slice(8)}`;
}

/** The leading hex digits of every digest whose code this is (a code in the printed form). */
export function digestPrefixOf(code: string): string {
  const groups = code.split('-');
  if (groups.length !== 3 || groups.some((g) => g.length !== 4)) throw new RangeError(`not a verification code: ${code}`);
  return groups
    .map((g) => {
      const v = [...g].reduce((acc, ch) => {
        const d = ALPHABET.indexOf(ch);
        if (d < 0) throw new RangeError(`not a verification code: ${code}`);
        return acc * 32 + d;
      }, 0);
      return v.toString(16).padStart(5, '0');
    })
    .join('');
}

/** True when the code was made from this digest. */
export function codeMatches(code: string, digestHex: string): boolean {
  const parsed = parseVerificationCode(code);
  return parsed != null && /^[0-9a-f]{64}$/.test(digestHex) && digestPrefixOf(parsed) === digestHex.slice(0, CODE_HEX_DIGITS);
}

/** What the check proves, in the buyer's words: shown on the check page and beside the code on the papers. */
export const CODE_MEANING =
  'The code is worked out from every word of the version the dealer published: change one word and the code changes. ' +
  'Type it on the check page to see which piano and which version it belongs to, and to read that version as it was published.';
