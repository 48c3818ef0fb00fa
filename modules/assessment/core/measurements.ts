import { z } from '@/modules/input/core/zod';

import { multiLineText } from '@/modules/input/core/text';

// What an inspection measures. Metric units; every field optional, ranges refused with the field named.
export const KEYTOP_DAMAGE = ['chipped', 'stained', 'yellowed', 'missing'] as const;
export const FELT_STATES = ['soft', 'firm', 'hard', 'chemically_hardened'] as const;
export const FELT_LEFT = ['ample', 'thin', 'none'] as const;
export const STEEL_CORROSION = ['none', 'light', 'moderate', 'heavy'] as const;
export const BASS_WINDING = ['bright', 'dull', 'dark', 'green'] as const;
export const TUNING_PINS = ['firm', 'some_loose', 'loose'] as const;

export const FIELD_LABELS: Record<string, string> = {
  keySidePlayMm: 'key side play',
  keyLevelDeviationMm: 'key level deviation',
  hammerGrooveDepthMm: 'hammer groove depth',
  brokenStrings: 'broken strings',
  a4Hz: 'measured A4',
  keysTouchingNeighbour: 'keys that touch a neighbour',
  lengthCm: 'crack length',
  widestGapMm: 'crack gap',
};

const keyNumber = z.number().int('must be a whole key number').min(1, 'must be a key number from 1 to 88').max(88, 'must be a key number from 1 to 88');
const keyList = z.array(keyNumber).max(88).transform((keys) => [...new Set(keys)].sort((a, b) => a - b));
const rating = z.number().int('must be a whole number from 1 to 5').min(1, 'must be from 1 to 5').max(5, 'must be from 1 to 5');
const mm = (max: number) => z.number().min(0, 'cannot be negative').max(max, `must be at most ${max} mm`);

export const crackInput = z.object({
  lengthCm: z.number().min(0, 'cannot be negative').max(200, 'must be at most 200 cm'),
  widestGapMm: mm(10),
  crossesRib: z.boolean().default(false),
  buzzes: z.boolean().default(false),
  hurtsTuning: z.boolean().default(false),
  note: multiLineText().trim().max(200).nullish(),
});
export type Crack = z.infer<typeof crackInput>;

export const measurementsInput = z
  .object({
    keySidePlayMm: mm(10).nullish(),
    keyTouchesNeighbour: z.boolean().nullish(),
    /** The keys that can be pushed against a neighbour, when any can. */
    keysTouchingNeighbour: keyList.nullish(),
    keyLevelDeviationMm: mm(15).nullish(),
    keytopDamage: z.array(z.enum(KEYTOP_DAMAGE)).max(4).nullish(),
    stickingKeys: keyList.nullish(),
    deadKeys: keyList.nullish(),
    hammerGrooveDepthMm: mm(10).nullish(),
    hammerFelt: z.enum(FELT_STATES).nullish(),
    hammerFeltLeft: z.enum(FELT_LEFT).nullish(),
    steelCorrosion: z.enum(STEEL_CORROSION).nullish(),
    bassWinding: z.enum(BASS_WINDING).nullish(),
    brokenStrings: z.number().int('must be a whole number').min(0, 'cannot be negative').max(250, 'must be at most 250').nullish(),
    soundboardCracks: z.array(crackInput).max(40).nullish(),
    ribsSeparated: z.boolean().nullish(),
    // A piano far out of tune may sit a semitone or more flat; 300-600 Hz covers any real A4.
    a4Hz: z.number().min(300, 'must be between 300 and 600 Hz').max(600, 'must be between 300 and 600 Hz').nullish(),
    tuningPins: z.enum(TUNING_PINS).nullish(),
    bassEvenness: rating.nullish(),
    middleEvenness: rating.nullish(),
    trebleEvenness: rating.nullish(),
    dynamicRange: rating.nullish(),
    notesStickingOut: keyList.nullish(),
    overallImpression: rating.nullish(),
  })
  .strict()
  .superRefine((m, ctx) => {
    const keys = m.keysTouchingNeighbour ?? [];
    if (m.keyTouchesNeighbour === true && !keys.length) ctx.addIssue({ code: 'custom', path: ['keysTouchingNeighbour'], message: 'is needed: name the keys that touch a neighbour' });
    if (m.keyTouchesNeighbour !== true && keys.length) ctx.addIssue({ code: 'custom', path: ['keysTouchingNeighbour'], message: 'is only for a key that touches its neighbour: answer that question yes first' });
  });
export type Measurements = z.infer<typeof measurementsInput>;

export const MM_PER_INCH = 25.4;
export const mmToInches = (mmValue: number) => mmValue / MM_PER_INCH;
export const inchesToMm = (inches: number) => inches * MM_PER_INCH;
