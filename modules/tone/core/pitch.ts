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
