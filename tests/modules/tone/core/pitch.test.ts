import { cents, keyFrequency, keyName, nearestKey, STANDARD_A4_HZ } from '@/modules/tone/core/pitch';

describe('keyFrequency', () => {
  // twelve-tone equal temperament with ISO 16 pitch (A4 = 440 Hz), values as in TRADE.md
  it.each([
    [1, 27.5],
    [40, 261.626],
    [49, 440],
    [88, 4186.009],
  ])('key %i is %f Hz', (key, hz) => expect(keyFrequency(key)).toBeCloseTo(hz, 3));

  it.each([0, 89, 1.5])('refuses key %p', (key) => expect(() => keyFrequency(key)).toThrow(RangeError));
});

describe('cents', () => {
  // ISO 16:1975: standard pitch is A4 = 440 Hz
  it('is zero at standard pitch', () => expect(cents(STANDARD_A4_HZ)).toBe(0));
  // A. J. Ellis, 1885: 100 cents to the equal-tempered semitone, 1200 to the octave
  it.each([
    [keyFrequency(50), 100],
    [keyFrequency(48), -100],
    [880, 1200],
    [220, -1200],
  ])('%f Hz is %f cents from 440 Hz', (hz, expected) => expect(cents(hz)).toBeCloseTo(expected, 9));
  it('refuses a frequency that is not positive', () => expect(() => cents(0)).toThrow(RangeError));
});

describe('the equal-tempered table', () => {
  // twelve-tone equal temperament with ISO 16 pitch: f(n) = 440 * 2^((n - 49) / 12) for every key
  it.each(Array.from({ length: 88 }, (_, i) => i + 1))('key %i follows the formula', (key) => expect(keyFrequency(key)).toBeCloseTo(440 * 2 ** ((key - 49) / 12), 9));
  // ISO 16:1975 with equal temperament: each key is 100 cents above the one below (Ellis, 1885)
  it('every key is 100 cents above the one below', () => {
    for (let key = 2; key <= 88; key++) expect(cents(keyFrequency(key), keyFrequency(key - 1))).toBeCloseTo(100, 9);
  });
});

describe('nearestKey and keyName', () => {
  // twelve-tone equal temperament with ISO 16 pitch: A0 27.500 Hz, C4 261.626 Hz, A4 440 Hz, C8 4186.009 Hz
  it.each([
    [27.5, 1, 'A0'],
    [261.626, 40, 'C4'],
    [440, 49, 'A4'],
    [4186.009, 88, 'C8'],
  ])('%f Hz is key %i, %s', (hz, key, name) => {
    expect(nearestKey(hz)).toBe(key);
    expect(keyName(key)).toBe(name);
  });
  // half a semitone is 50 cents (Ellis, 1885): 49 cents sharp is still the key, 51 cents is the next
  it.each([
    [440 * 2 ** (49 / 1200), 49],
    [440 * 2 ** (51 / 1200), 50],
    [440 * 2 ** (-51 / 1200), 48],
  ])('%f Hz rounds to key %i', (hz, key) => expect(nearestKey(hz)).toBe(key));
  it('is null off the keyboard', () => {
    expect(nearestKey(27.5 * 2 ** (-60 / 1200))).toBeNull();
    expect(nearestKey(4186.009 * 2 ** (60 / 1200))).toBeNull();
    expect(nearestKey(0)).toBeNull();
  });
  it.each([
    [2, 'A♯0'],
    [3, 'B0'],
    [4, 'C1'],
    [52, 'C5'],
  ])('key %i is %s', (key, name) => expect(keyName(key)).toBe(name));
});
