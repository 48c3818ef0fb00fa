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

export const KEY_COUNT = 88;

/** The nearest key (1-88) to `hz` at the given A4, or null when it lies more than half a semitone outside the keyboard. */
export function nearestKey(hz: number, a4Hz: number = STANDARD_A4_HZ): number | null {
  if (!(hz > 0)) return null;
  const key = Math.round(49 + 12 * Math.log2(hz / a4Hz));
  return key >= 1 && key <= KEY_COUNT ? key : null;
}

const NOTE_NAMES = ['A', 'A♯', 'B', 'C', 'C♯', 'D', 'D♯', 'E', 'F', 'F♯', 'G', 'G♯'] as const;

/** Scientific pitch name of key n: 1 is A0, 40 is C4, 49 is A4, 88 is C8 (octaves start at C). */
export function keyName(key: number): string {
  const name = NOTE_NAMES[(key - 1) % 12];
  const octave = Math.floor((key + 8) / 12);
  return `${name}${octave}`;
}

/** Cents rounded to one decimal, half away from zero, with no "-0". */
export function roundCents(c: number): number {
  const r = Math.round(Math.abs(c) * 10 + 1e-9) / 10;
  return c < 0 && r !== 0 ? -r : r;
}

const CENTS_NUMBER = new Intl.NumberFormat('en', { minimumFractionDigits: 0, maximumFractionDigits: 1 });
// Chosen with the same digits as the number shown, so "1 cent" and "1.5 cents" (CLDR plural rules).
const CENTS_PLURAL = new Intl.PluralRules('en', { minimumFractionDigits: 0, maximumFractionDigits: 1 });

/** An amount of cents in words, one decimal at most: "1 cent", "0.8 cents", "12 cents" (the sign is dropped). */
export function centsAmount(c: number): string {
  const n = Math.abs(roundCents(c));
  return `${CENTS_NUMBER.format(n)} ${CENTS_PLURAL.select(n) === 'one' ? 'cent' : 'cents'}`;
}

export interface CentsWords {
  /** after an amount above the reference: "sharp", "above standard pitch" */
  above: string;
  below: string;
  /** the whole phrase when it rounds to zero: "at standard pitch" */
  at: string;
}

export const SHARP_FLAT: CentsWords = { above: 'sharp', below: 'flat', at: 'at pitch' };
export const FROM_STANDARD: CentsWords = { above: 'above standard pitch', below: 'below standard pitch', at: 'at standard pitch' };

/** The one way Feltwire says how far off a pitch is: "0.8 cents sharp", "1 cent below standard pitch", "at pitch". */
export function centsOffset(c: number, words: CentsWords = SHARP_FLAT): string {
  const r = roundCents(c);
  if (r === 0) return words.at;
  return `${centsAmount(r)} ${r < 0 ? words.below : words.above}`;
}

/** A signed number of cents for a table: "+0.8", "−12.0", "0.0" (a real minus sign). */
export function signedCents(c: number): string {
  const r = roundCents(c);
  return `${r > 0 ? '+' : r < 0 ? '−' : ''}${Math.abs(r).toFixed(1)}`;
}
