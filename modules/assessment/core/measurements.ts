import { z } from '@/modules/input/core/zod';

import { multiLineText } from '@/modules/input/core/text';

import type { Area } from './grade';

// What an inspection measures, each measurement described once: the schema, the form, the draft, the
// re-measurement panel, the words and the GraphQL types are all made from MEASURES. Metric units;
// every field optional, ranges refused with the field named. Adding one: an entry here and its rule
// in grade.ts (DEVELOPERS.md, "Adding a measurement").

/** The steps of the inspection form that hold measurements. */
export const MEASURE_STEPS = ['keys', 'hammers', 'strings', 'soundboard', 'play'] as const;
export type MeasureStep = (typeof MEASURE_STEPS)[number];

/**
 * How a measurement is taken and typed: a length (mm or cm, typed in inches too), a whole count, a
 * pitch in Hz, a yes or no, a list of key numbers, one answer of a few, any of a few, a rating from 1
 * to 5, or the soundboard's cracks (a list of their own).
 */
export type MeasureKind = 'length' | 'count' | 'pitch' | 'yesNo' | 'keys' | 'choice' | 'choices' | 'rating' | 'cracks';

interface Described<K extends string, Kind extends MeasureKind, S extends z.ZodType> {
  key: K;
  kind: Kind;
  area: Area;
  step: MeasureStep;
  /** the measurement's name, on screen, in the history and in error messages */
  label: string;
  /** how to take it */
  hint?: string;
  unit?: 'mm' | 'cm' | 'Hz' | 'strings';
  /** the values accepted, inclusive */
  range?: readonly [number, number];
  /** the answers of a choice, in the order shown, with their words */
  options?: readonly { value: string; label: string }[];
  /** asked again after workshop work, in the re-measurement panel */
  remeasure?: boolean;
  /** shown (and sent) only while another measurement has this answer */
  shownWhen?: { key: string; is: boolean };
  schema: S;
}

type Common = Pick<Described<string, MeasureKind, z.ZodType>, 'area' | 'step' | 'label' | 'hint' | 'remeasure' | 'shownWhen'>;

const number = (unitWord: string, [min, max]: readonly [number, number], whole = false) => {
  const base = whole ? z.number().int('must be a whole number') : z.number();
  return base.min(min, min === 0 ? 'cannot be negative' : `must be between ${min} and ${max}${unitWord}`).max(max, min === 0 ? `must be at most ${max}${unitWord}` : `must be between ${min} and ${max}${unitWord}`);
};
const keyNumber = z.number().int('must be a whole key number').min(1, 'must be a key number from 1 to 88').max(88, 'must be a key number from 1 to 88');
const keyList = z.array(keyNumber).max(88).transform((keys) => [...new Set(keys)].sort((a, b) => a - b));
const ratingSchema = z.number().int('must be a whole number from 1 to 5').min(1, 'must be from 1 to 5').max(5, 'must be from 1 to 5');
const words = <V extends string>(values: readonly V[], labels: Record<V, string>) => values.map((value) => ({ value, label: labels[value] }));

function length<K extends string>(key: K, unit: 'mm' | 'cm', max: number, c: Common) {
  const range = [0, max] as const;
  return { key, kind: 'length' as const, unit, range, ...c, schema: number(` ${unit}`, range) };
}
function count<K extends string>(key: K, max: number, c: Common) {
  const range = [0, max] as const;
  return { key, kind: 'count' as const, unit: 'strings' as const, range, ...c, schema: number('', range, true) };
}
function pitch<K extends string>(key: K, range: readonly [number, number], c: Common) {
  return { key, kind: 'pitch' as const, unit: 'Hz' as const, range, ...c, schema: number(' Hz', range) };
}
function yesNo<K extends string>(key: K, c: Common) {
  return { key, kind: 'yesNo' as const, ...c, schema: z.boolean() };
}
function keys<K extends string>(key: K, c: Common) {
  return { key, kind: 'keys' as const, range: [1, 88] as const, ...c, schema: keyList };
}
function choice<K extends string, V extends string>(key: K, values: readonly [V, ...V[]], labels: Record<V, string>, c: Common) {
  return { key, kind: 'choice' as const, options: words(values, labels), ...c, schema: z.enum(values) };
}
function choices<K extends string, V extends string>(key: K, values: readonly [V, ...V[]], labels: Record<V, string>, c: Common) {
  return { key, kind: 'choices' as const, options: words(values, labels), ...c, schema: z.array(z.enum(values)).max(values.length) };
}
function rating<K extends string>(key: K, c: Common) {
  return { key, kind: 'rating' as const, range: [1, 5] as const, ...c, schema: ratingSchema };
}

export const KEYTOP_DAMAGE = ['chipped', 'stained', 'yellowed', 'missing'] as const;
export const FELT_STATES = ['soft', 'firm', 'hard', 'chemically_hardened'] as const;
export const FELT_LEFT = ['ample', 'thin', 'none'] as const;
export const STEEL_CORROSION = ['none', 'light', 'moderate', 'heavy'] as const;
export const BASS_WINDING = ['bright', 'dull', 'dark', 'green'] as const;
export const TUNING_PINS = ['firm', 'some_loose', 'loose'] as const;

/** One soundboard crack: its length, its widest gap and what it does. */
export const CRACK_FIELDS = {
  lengthCm: { label: 'Crack length', unit: 'cm', range: [0, 200] },
  widestGapMm: { label: 'Widest gap', unit: 'mm', range: [0, 10] },
  crossesRib: { label: 'Crosses a rib' },
  buzzes: { label: 'Buzzes' },
  hurtsTuning: { label: 'Affects tuning stability' },
  note: { label: 'Crack note' },
} as const;

export const crackInput = z.object({
  lengthCm: number(' cm', CRACK_FIELDS.lengthCm.range),
  widestGapMm: number(' mm', CRACK_FIELDS.widestGapMm.range),
  crossesRib: z.boolean().default(false),
  buzzes: z.boolean().default(false),
  hurtsTuning: z.boolean().default(false),
  note: multiLineText().trim().max(200).nullish(),
});
export type Crack = z.infer<typeof crackInput>;

const KEYS = { area: 'keys', step: 'keys' } as const;
const HAMMERS = { area: 'hammers', step: 'hammers' } as const;
const STRINGS = { area: 'strings', step: 'strings' } as const;
const SOUNDBOARD = { area: 'soundboard', step: 'soundboard' } as const;
const TUNING = { area: 'tuning', step: 'play' } as const;
const PLAY = { area: 'play', step: 'play' } as const;

/** Every measurement, in the order the form asks for them. */
export const MEASURES = [
  length('keySidePlayMm', 'mm', 10, { ...KEYS, label: 'Key side play', hint: 'Push a key sideways at its front: 1-2 mm is normal, even on a new piano.', remeasure: true }),
  yesNo('keyTouchesNeighbour', { ...KEYS, label: 'A key can be pushed until it touches its neighbour', hint: 'Yes means worn key bushings.', remeasure: true }),
  keys('keysTouchingNeighbour', { ...KEYS, label: 'Keys that touch a neighbour', hint: 'Key numbers from 1 (the lowest A) to 88, separated by commas.', remeasure: true, shownWhen: { key: 'keyTouchesNeighbour', is: true } }),
  length('keyLevelDeviationMm', 'mm', 15, { ...KEYS, label: 'Key level deviation', hint: 'How far the most uneven key rests above or below its neighbours.', remeasure: true }),
  choices('keytopDamage', KEYTOP_DAMAGE, { chipped: 'Chipped', stained: 'Stained', yellowed: 'Yellowed', missing: 'Missing' }, { ...KEYS, label: 'Keytop damage', hint: 'Pick all that apply.' }),
  keys('stickingKeys', { ...KEYS, label: 'Sticking keys' }),
  keys('deadKeys', { ...KEYS, label: 'Silent (dead) keys' }),
  length('hammerGrooveDepthMm', 'mm', 10, { ...HAMMERS, label: 'Deepest string groove', hint: 'Depth of the deepest groove the strings have cut into a hammer’s felt. Shallow grooves are normal.', remeasure: true }),
  choice('hammerFelt', FELT_STATES, { soft: 'Soft', firm: 'Firm', hard: 'Hard', chemically_hardened: 'Chemically hardened' }, { ...HAMMERS, label: 'Hammer felt', remeasure: true }),
  choice('hammerFeltLeft', FELT_LEFT, { ample: 'Ample', thin: 'Thin', none: 'None left' }, { ...HAMMERS, label: 'Felt left to shape', hint: 'Chemically hardened felt, or none left to shape: the hammers must be replaced.', remeasure: true }),
  choice('steelCorrosion', STEEL_CORROSION, { none: 'None', light: 'Light', moderate: 'Moderate', heavy: 'Heavy' }, { ...STRINGS, label: 'Steel (treble) string corrosion', hint: 'Plain steel strings: look for rust and pitting.' }),
  choice('bassWinding', BASS_WINDING, { bright: 'Bright', dull: 'Dull', dark: 'Dark', green: 'Green' }, { ...STRINGS, label: 'Bass string winding', hint: 'The copper winding: bright when new; dark or green with oxidation.' }),
  count('brokenStrings', 250, { ...STRINGS, label: 'Broken strings', hint: 'Broken or missing.', remeasure: true }),
  { key: 'soundboardCracks' as const, kind: 'cracks' as const, ...SOUNDBOARD, label: 'Soundboard cracks', schema: z.array(crackInput).max(40) },
  yesNo('ribsSeparated', { ...SOUNDBOARD, label: 'Ribs separated from the board' }),
  // A piano far out of tune may sit a semitone or more flat; 300-600 Hz covers any real A4.
  pitch('a4Hz', [300, 600], { ...TUNING, label: 'Measured A4', hint: 'The A above middle C (key 49), read with a tuning app or a fork; standard pitch is 440 Hz.', remeasure: true }),
  choice('tuningPins', TUNING_PINS, { firm: 'Firm', some_loose: 'Some loose', loose: 'Loose' }, { ...TUNING, label: 'Tuning pins', remeasure: true }),
  rating('bassEvenness', { ...PLAY, label: 'Bass evenness', hint: 'Even from key to key.', remeasure: true }),
  rating('middleEvenness', { ...PLAY, label: 'Middle evenness', hint: 'Even from key to key.', remeasure: true }),
  rating('trebleEvenness', { ...PLAY, label: 'Treble evenness', hint: 'Even from key to key.', remeasure: true }),
  rating('dynamicRange', { ...PLAY, label: 'Dynamic range', hint: 'From soft to loud.', remeasure: true }),
  rating('overallImpression', { ...PLAY, label: 'Overall impression', remeasure: true }),
  keys('notesStickingOut', { ...PLAY, label: 'Notes that stand out', hint: 'Keys louder, brighter or duller than their neighbours: 1-88, separated by commas.' }),
] as const;

type Entry = (typeof MEASURES)[number];
export type MeasureKey = Entry['key'];
/** One measurement's description, whichever it is. */
export type MeasureEntry = Described<MeasureKey, MeasureKind, z.ZodType>;
export type MeasureOf<K extends MeasureKey> = Extract<Entry, { key: K }>;

export const MEASURE_BY_KEY = Object.fromEntries(MEASURES.map((m) => [m.key, m])) as { [K in MeasureKey]: MeasureOf<K> };

type Shape = { [E in Entry as E['key']]: z.ZodOptional<z.ZodNullable<E['schema']>> };

export const measurementsInput = z
  .object(Object.fromEntries(MEASURES.map((m) => [m.key, m.schema.nullish()])) as unknown as Shape)
  .strict()
  .superRefine((m, ctx) => {
    const keys = m.keysTouchingNeighbour ?? [];
    if (m.keyTouchesNeighbour === true && !keys.length) ctx.addIssue({ code: 'custom', path: ['keysTouchingNeighbour'], message: 'is needed: name the keys that touch a neighbour' });
    if (m.keyTouchesNeighbour !== true && keys.length) ctx.addIssue({ code: 'custom', path: ['keysTouchingNeighbour'], message: 'is only for a key that touches its neighbour: answer that question yes first' });
  });
export type Measurements = z.infer<typeof measurementsInput>;

/** The measurements a form step asks for, in order. */
export const measuresOf = (step: MeasureStep): readonly Entry[] => MEASURES.filter((m) => m.step === step);

export const MM_PER_INCH = 25.4;
export const mmToInches = (mmValue: number) => mmValue / MM_PER_INCH;
export const inchesToMm = (inches: number) => inches * MM_PER_INCH;
