// Where each mark of the keyboard chart goes: pure geometry, so the screen's SVG and a printed page draw the same chart.
import { keyName } from './pitch';

export interface ChartKey {
  key: number;
  cents: number;
  standOut?: boolean;
}

export interface ChartMark {
  key: number;
  name: string;
  cents: number;
  x: number;
  y: number;
  /** beyond the chart's range: drawn at its edge as an arrow pointing the way it goes */
  clipped: 'above' | 'below' | null;
  standOut: boolean;
}

export interface ChartLayout {
  width: number;
  height: number;
  /** the plotting area */
  left: number;
  right: number;
  top: number;
  bottom: number;
  zeroY: number;
  rangeCents: number;
  /** horizontal guide lines with their labels ("+20", "0", "-20") */
  ticks: { y: number; cents: number; label: string }[];
  /** the C of each octave along the bottom */
  octaves: { x: number; key: number; label: string }[];
  keyWidth: number;
  marks: ChartMark[];
}

const RANGES = [20, 50, 100];

/** Lays the keys 1-88 out across `width`, cents up and down from zero; the range grows to 50 or 100 cents when needed. */
export function keyboardChartLayout(keys: readonly ChartKey[], width: number, height: number): ChartLayout {
  const left = 40;
  const right = width - 8;
  const top = 10;
  const bottom = height - 22;
  const widest = keys.reduce((m, k) => Math.max(m, Math.abs(k.cents)), 0);
  const rangeCents = RANGES.find((r) => widest <= r) ?? RANGES[RANGES.length - 1];
  const keyWidth = (right - left) / 88;
  const xOf = (key: number) => left + (key - 0.5) * keyWidth;
  const zeroY = (top + bottom) / 2;
  const yOf = (c: number) => zeroY - (Math.max(-rangeCents, Math.min(rangeCents, c)) / rangeCents) * (bottom - top) / 2;
  const step = rangeCents / 2;
  const ticks = [-rangeCents, -step, 0, step, rangeCents].map((c) => ({ y: yOf(c), cents: c, label: c > 0 ? `+${c}` : c < 0 ? `−${-c}` : '0' }));
  const octaves = [4, 16, 28, 40, 52, 64, 76, 88].map((key) => ({ x: xOf(key), key, label: keyName(key) }));
  const marks = keys.map((k) => ({
    key: k.key,
    name: keyName(k.key),
    cents: k.cents,
    x: xOf(k.key),
    y: yOf(k.cents),
    clipped: k.cents > rangeCents ? ('above' as const) : k.cents < -rangeCents ? ('below' as const) : null,
    standOut: !!k.standOut,
  }));
  return { width, height, left, right, top, bottom, zeroY, rangeCents, ticks, octaves, keyWidth, marks };
}
