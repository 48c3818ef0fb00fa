import { codeMatches, digestPrefixOf, parseVerificationCode, verificationCode } from '@/modules/disclosure/core/verification';

// Crockford's base32 alphabet (Douglas Crockford, "Base32", 2002): 0-9 and A-Z without I, L, O, U.
const CROCKFORD = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';

/** The code worked out another way, for the check: the digest's first 60 bits, five at a time, through BigInt. */
function slowCode(digest: string): string {
  const bits = BigInt(`0x${digest.slice(0, 15)}`).toString(2).padStart(60, '0');
  const chars = bits.match(/.{5}/g)!.map((b) => CROCKFORD[parseInt(b, 2)]).join('');
  return `${chars.slice(0, 4)}-${chars.slice(4, 8)}-${chars.slice(8)}`;
}

describe('the verification code', () => {
  // FIPS 180-4's example: SHA-256("abc")
  const abc = 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad';

  it('is the first 60 bits of the digest in three groups of Crockford base32', () => {
    const code = verificationCode(abc);
    expect(code).toMatch(/^[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}$/);
    expect(code).toBe(slowCode(abc));
    expect(digestPrefixOf(code)).toBe(abc.slice(0, 15));
    expect(codeMatches(code, abc)).toBe(true);
  });

  it.each([
    '0000000000000000000000000000000000000000000000000000000000000000',
    'ffffffffffffffffffffffffffffffffffffffffffffffffffffffffffffffff',
    '0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef',
    'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855',
  ])('matches its digest and goes back to its leading digits: %s', (digest) => {
    const code = verificationCode(digest);
    expect(code).toBe(slowCode(digest));
    expect(digestPrefixOf(code)).toBe(digest.slice(0, 15));
    expect(codeMatches(code, digest)).toBe(true);
  });

  it('changes when one digit of the first fifteen changes, and does not match another digest', () => {
    const other = `${abc.slice(0, 14)}${abc[14] === '0' ? '1' : '0'}${abc.slice(15)}`;
    expect(verificationCode(other)).not.toBe(verificationCode(abc));
    expect(codeMatches(verificationCode(abc), other)).toBe(false);
  });

  it.each([
    ['q9w1-dfwf-077y', 'Q9W1-DFWF-077Y'],
    [' Q9W1 DFWF 077Y ', 'Q9W1-DFWF-077Y'],
    ['Q9W1DFWF077Y', 'Q9W1-DFWF-077Y'],
    // the letters read as digits by hand
    ['OOOO-IIII-LLLL', '0000-1111-1111'],
  ])('reads %j as typed by hand', (typed, code) => expect(parseVerificationCode(typed)).toBe(code));

  it.each(['', 'Q9W1-DFWF-077', 'Q9W1-DFWF-077YY', 'Q9W1-DFWF-077U', 'Q9W1-DFWF-07!Y', 'x'.repeat(41)])('refuses %j', (typed) => {
    expect(parseVerificationCode(typed)).toBeNull();
    expect(codeMatches(typed, abc)).toBe(false);
  });

  it('refuses a digest that is not one', () => {
    expect(() => verificationCode('abc')).toThrow(RangeError);
    expect(() => verificationCode(abc.toUpperCase())).toThrow(RangeError);
  });
});
