import { cents, keyFrequency, STANDARD_A4_HZ } from '@/modules/tone/core/pitch';

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
