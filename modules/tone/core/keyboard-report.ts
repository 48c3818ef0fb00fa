// What a recording says about the whole keyboard: pitch per key, the balance of the registers, the notes that stand out,
// and whether the piano needs a pitch raise before it can be fine-tuned.
import { defaultRules } from '@/modules/assessment/core/grade-rules';

import type { ToneNote } from './analyse';
import { keyName, STANDARD_A4_HZ } from './pitch';

export type RegisterName = 'bass' | 'middle' | 'treble';

/** Feltwire's split of the keyboard (common practice, no published source): A0-B2, C3-B4, C5-C8. */
export const REGISTERS: readonly { name: RegisterName; label: string; firstKey: number; lastKey: number }[] = [
  { name: 'bass', label: 'Bass', firstKey: 1, lastKey: 27 },
  { name: 'middle', label: 'Middle', firstKey: 28, lastKey: 51 },
  { name: 'treble', label: 'Treble', firstKey: 52, lastKey: 88 },
];

export const registerOf = (key: number): RegisterName => REGISTERS.find((r) => key >= r.firstKey && key <= r.lastKey)!.name;

/** The stand-out rule's numbers (shop defaults; the 3.5 cut-off is Iglewicz and Hoaglin's, from memory). */
export const STAND_OUT = {
  neighbourKeys: 6,
  minNeighbours: 2,
  minKeys: 5,
  zScore: 3.5,
  minCents: 5,
  minDb: 3,
  /** the spread below which differences are treated as measurement noise */
  floorMadCents: 1,
  floorMadDb: 0.5,
} as const;

export const STAND_OUT_RULE =
  `A note stands out when its pitch or level differs from the median of its neighbours (up to ${STAND_OUT.neighbourKeys} keys either side) ` +
  `with a modified z-score above ${STAND_OUT.zScore} (Iglewicz and Hoaglin's outlier rule), and by at least ${STAND_OUT.minCents} cents or ${STAND_OUT.minDb} dB.`;

/** Evenness from 1 to 5 by the spread of the level from key to key within a register, in dB (shop default, no published source). */
export const EVENNESS_SPREAD_DB: readonly { atMostDb: number; rating: 1 | 2 | 3 | 4 | 5 }[] = [
  { atMostDb: 1.5, rating: 5 },
  { atMostDb: 3, rating: 4 },
  { atMostDb: 4.5, rating: 3 },
  { atMostDb: 6, rating: 2 },
  { atMostDb: Infinity, rating: 1 },
];

export interface KeyReading {
  key: number;
  name: string;
  /** the median over the times the key was played */
  frequencyHz: number;
  cents: number;
  levelDb: number;
  times: number;
}

export interface RegisterBalance {
  register: RegisterName;
  label: string;
  firstKey: number;
  lastKey: number;
  keys: number;
  meanLevelDb: number | null;
  /** the register's mean level less the middle register's */
  relativeToMiddleDb: number | null;
  /** standard deviation of each key's level from its neighbours', dB */
  levelSpreadDb: number | null;
  meanCents: number | null;
  /** suggested play-test evenness from the spread, when at least three keys were heard */
  evenness: 1 | 2 | 3 | 4 | 5 | null;
}

export interface StandOutNote {
  key: number;
  name: string;
  measure: 'pitch' | 'level';
  direction: 'sharp' | 'flat' | 'louder' | 'quieter';
  /** cents or dB away from the median of its neighbours */
  difference: number;
  zScore: number;
}

export interface PitchVerdict {
  /** median cents of every key heard from its equal-tempered frequency at A4 = 440 Hz */
  overallCents: number | null;
  /** the A4 to put in the assessment: the measured key 49, or 440 Hz moved by the overall offset */
  a4Hz: number | null;
  a4From: 'key49' | 'overall' | null;
  pitchRaiseNeeded: boolean;
  /** flatter than this many cents overall needs a pitch raise (the shop's grading rule) */
  pitchRaiseCents: number;
}

export interface KeyboardReport {
  keys: KeyReading[];
  registers: RegisterBalance[];
  standOut: StandOutNote[];
  standOutRule: string;
  pitch: PitchVerdict;
  notesHeard: number;
}

export interface ReportOptions {
  /** the shop's pitch-raise threshold in cents (grading rules; from memory 15-20 cents flat) */
  pitchRaiseCents?: number;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

const mean = (values: number[]) => values.reduce((a, b) => a + b, 0) / values.length;

function perKey(notes: readonly ToneNote[]): KeyReading[] {
  const byKey = new Map<number, ToneNote[]>();
  for (const n of notes) byKey.set(n.key, [...(byKey.get(n.key) ?? []), n]);
  return [...byKey.entries()]
    .sort(([a], [b]) => a - b)
    .map(([key, ns]) => ({
      key,
      name: keyName(key),
      frequencyHz: median(ns.map((n) => n.frequencyHz)),
      cents: median(ns.map((n) => n.cents)),
      levelDb: median(ns.map((n) => n.levelDb)),
      times: ns.length,
    }));
}

/** Each key's value less the median of its neighbours' (null with too few neighbours). */
function neighbourDifferences(keys: KeyReading[], value: (k: KeyReading) => number): (number | null)[] {
  return keys.map((k) => {
    const near = keys.filter((o) => o.key !== k.key && Math.abs(o.key - k.key) <= STAND_OUT.neighbourKeys).map(value);
    return near.length >= STAND_OUT.minNeighbours ? value(k) - median(near) : null;
  });
}

/** Modified z-scores 0.6745 (x - median) / MAD (Iglewicz and Hoaglin, from memory), with the MAD floored at `floorMad`. */
export function modifiedZScores(values: number[], floorMad: number): number[] {
  if (!values.length) return [];
  const m = median(values);
  const mad = Math.max(floorMad, median(values.map((v) => Math.abs(v - m))));
  return values.map((v) => (0.6745 * (v - m)) / mad);
}

function standOut(keys: KeyReading[], measure: 'pitch' | 'level', diffs: (number | null)[]): StandOutNote[] {
  const present = diffs.map((d, i) => ({ d, k: keys[i] })).filter((x): x is { d: number; k: KeyReading } => x.d != null);
  const floor = measure === 'pitch' ? STAND_OUT.floorMadCents : STAND_OUT.floorMadDb;
  const least = measure === 'pitch' ? STAND_OUT.minCents : STAND_OUT.minDb;
  const z = modifiedZScores(
    present.map((x) => x.d),
    floor,
  );
  return present
    .map((x, i) => ({ ...x, z: z[i] }))
    .filter((x) => Math.abs(x.z) > STAND_OUT.zScore && Math.abs(x.d) >= least)
    .map((x) => ({
      key: x.k.key,
      name: x.k.name,
      measure,
      direction: measure === 'pitch' ? (x.d > 0 ? 'sharp' : 'flat') : x.d > 0 ? 'louder' : 'quieter',
      difference: x.d,
      zScore: x.z,
    }));
}

function evennessOf(spreadDb: number): RegisterBalance['evenness'] {
  return EVENNESS_SPREAD_DB.find((band) => spreadDb <= band.atMostDb)!.rating;
}

/** The keyboard report of the notes of one recording (or several, put together). */
export function keyboardReport(notes: readonly ToneNote[], options: ReportOptions = {}): KeyboardReport {
  const pitchRaiseCents = options.pitchRaiseCents ?? defaultRules.pitchRaiseCents;
  const keys = perKey(notes);
  const levelDiffs = neighbourDifferences(keys, (k) => k.levelDb);
  const centsDiffs = neighbourDifferences(keys, (k) => k.cents);

  const middleKeys = keys.filter((k) => registerOf(k.key) === 'middle');
  const middleLevel = middleKeys.length ? mean(middleKeys.map((k) => k.levelDb)) : null;
  const registers = REGISTERS.map((r): RegisterBalance => {
    const inside = keys.map((k, i) => ({ k, d: levelDiffs[i] })).filter((x) => x.k.key >= r.firstKey && x.k.key <= r.lastKey);
    const level = inside.length ? mean(inside.map((x) => x.k.levelDb)) : null;
    const diffs = inside.map((x) => x.d).filter((d): d is number => d != null);
    const spread = diffs.length >= 3 ? Math.sqrt(mean(diffs.map((d) => d * d))) : null;
    return {
      register: r.name,
      label: r.label,
      firstKey: r.firstKey,
      lastKey: r.lastKey,
      keys: inside.length,
      meanLevelDb: level,
      relativeToMiddleDb: level != null && middleLevel != null ? level - middleLevel : null,
      levelSpreadDb: spread,
      meanCents: inside.length ? mean(inside.map((x) => x.k.cents)) : null,
      evenness: spread != null ? evennessOf(spread) : null,
    };
  });

  const flagged = keys.length >= STAND_OUT.minKeys ? [...standOut(keys, 'pitch', centsDiffs), ...standOut(keys, 'level', levelDiffs)].sort((a, b) => a.key - b.key) : [];

  const overallCents = keys.length ? median(keys.map((k) => k.cents)) : null;
  const a4 = keys.find((k) => k.key === 49);
  const pitch: PitchVerdict = {
    overallCents,
    a4Hz: a4 ? a4.frequencyHz : overallCents != null ? STANDARD_A4_HZ * 2 ** (overallCents / 1200) : null,
    a4From: a4 ? 'key49' : overallCents != null ? 'overall' : null,
    pitchRaiseNeeded: overallCents != null && overallCents < -pitchRaiseCents,
    pitchRaiseCents,
  };
  return { keys, registers, standOut: flagged, standOutRule: STAND_OUT_RULE, pitch, notesHeard: notes.length };
}

/** What the play-test step can take from a report: only what the recording measured, for the user to confirm. */
export interface PlayTestFill {
  a4Hz: number | null;
  bassEvenness: number | null;
  middleEvenness: number | null;
  trebleEvenness: number | null;
  notesStickingOut: number[];
}

export function playTestFill(report: KeyboardReport): PlayTestFill {
  const rating = (name: RegisterName) => report.registers.find((r) => r.register === name)?.evenness ?? null;
  return {
    // One decimal, as the field takes it.
    a4Hz: report.pitch.a4Hz != null ? Math.round(report.pitch.a4Hz * 10) / 10 : null,
    bassEvenness: rating('bass'),
    middleEvenness: rating('middle'),
    trebleEvenness: rating('treble'),
    notesStickingOut: [...new Set(report.standOut.map((s) => s.key))],
  };
}

/** What a buyer's disclosure would show of a recording: the measured pitch, the day, and cents per key for the chart. */
export interface DisclosureTone {
  measuredOn: string;
  a4Hz: number | null;
  overallCents: number | null;
  pitchRaiseNeeded: boolean;
  keys: { key: number; name: string; cents: number }[];
}

export function disclosureTone(recordedAt: string, report: KeyboardReport): DisclosureTone {
  const day = /^\d{4}-\d{2}-\d{2}/.exec(recordedAt);
  if (!day) throw new RangeError('recordedAt must be an ISO date-time');
  return {
    measuredOn: day[0],
    a4Hz: report.pitch.a4Hz,
    overallCents: report.pitch.overallCents,
    pitchRaiseNeeded: report.pitch.pitchRaiseNeeded,
    keys: report.keys.map((k) => ({ key: k.key, name: k.name, cents: k.cents })),
  };
}
