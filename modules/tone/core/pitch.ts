// Standard tuning pitch, A4 = 440 Hz (ISO 16:1975).
export const STANDARD_A4_HZ = 440;

/** Cents from `refHz` to `hz`: 1200 * log2(hz / refHz); 100 cents is one equal-tempered semitone (Ellis, 1885). */
export function cents(hz: number, refHz: number = STANDARD_A4_HZ): number {
  if (!(hz > 0) || !(refHz > 0)) throw new RangeError('frequencies must be positive');
  return 1200 * Math.log2(hz / refHz);
}

/** Equal-tempered frequency of key n (1 = A0 ... 49 = A4 ... 88 = C8) at the given A4. */
export function keyFrequency(key: number, a4Hz: number = STANDARD_A4_HZ): number {
  if (!Number.isInteger(key) || key < 1 || key > 88) throw new RangeError('key must be a whole number from 1 to 88');
  return a4Hz * 2 ** ((key - 49) / 12);
}
