import { z } from '@/modules/input/core/zod';

import { AREAS } from './grade';
import type { GradeRules } from './grade-rules';

// Each grading rule described once: its group, words, unit and range. The schema below, the manager's
// screen and the GraphQL types are made from it.

export type RuleKey = Exclude<keyof GradeRules, 'version'>;

export interface RuleField {
  key: RuleKey;
  label: string;
  unit: string;
  min: number;
  max: number;
  whole?: boolean;
  hint?: string;
}

export interface RuleGroup {
  title: string;
  description: string;
  fields: readonly RuleField[];
}

const MM = { unit: 'mm', min: 0, max: 15 } as const;
const HOURS = { unit: 'h', min: 0, max: 200 } as const;
const RATING = { unit: 'of 5', min: 1, max: 5, whole: true } as const;

export const RULE_GROUPS: readonly RuleGroup[] = [
  {
    title: 'Keys',
    description: 'Sideways play at the key front, and how far the keys rest out of level.',
    fields: [
      { key: 'keySidePlayNormalMm', label: 'Side play is normal up to', ...MM },
      { key: 'keyLevelSoundMm', label: 'Key level is sound up to', ...MM },
      { key: 'keyLevelLightRegulationMm', label: 'Light regulation up to', ...MM },
      { key: 'keyLevelFullRegulationMm', label: 'Full regulation at', ...MM, hint: 'Between the two, the hours rise step by step.' },
      { key: 'lightRegulationHours', label: 'Hours for a light regulation', ...HOURS },
      { key: 'fullRegulationHours', label: 'Hours for a full regulation', ...HOURS },
    ],
  },
  {
    title: 'Hammers',
    description: 'The depth of the string grooves worn into the hammer felt.',
    fields: [
      { key: 'hammerGrooveNormalMm', label: 'Grooves are normal up to', ...MM },
      { key: 'hammerGrooveReplaceMm', label: 'Replace the hammers at', ...MM },
    ],
  },
  {
    title: 'Soundboard',
    description: 'When a crack counts as wide.',
    fields: [
      {
        key: 'wideCrackGapMm',
        label: 'A crack is wide from a gap of',
        unit: 'mm',
        min: 0.1,
        max: 10,
        // ISO/IEC 7810 ID-1: a payment card is 0.76 mm thick.
        hint: '0.76 mm is the thickness of a payment card (ISO/IEC 7810): a card that slides in marks a wide crack.',
      },
    ],
  },
  {
    title: 'Pitch',
    description: 'Measured A4 against the standard 440 Hz.',
    fields: [
      { key: 'pitchSoundCents', label: 'Pitch is sound within', unit: 'cents', min: 0, max: 100 },
      { key: 'pitchRaiseCents', label: 'Pitch raise when flatter than', unit: 'cents', min: 1, max: 300 },
    ],
  },
  {
    title: 'Play test',
    description: 'The tester’s overall impression, from 1 to 5.',
    fields: [
      { key: 'playPoorAtOrBelow', label: 'Poor at or below', ...RATING, hint: 'A poor play test marks the piano “not for retail as it stands”.' },
      { key: 'playGoodAtOrAbove', label: 'Good at or above', ...RATING },
    ],
  },
  {
    title: 'Provisional grades',
    description: `A grade over too few areas claims too much: it is provisional, gives no readiness verdict of quality, and no disclosure is published from it. There are ${AREAS.length} areas.`,
    fields: [{ key: 'minInspectedAreas', label: 'A grade is final from this many inspected areas', unit: 'areas', min: 1, max: AREAS.length, whole: true }],
  },
];

export const RULE_FIELDS: readonly RuleField[] = RULE_GROUPS.flatMap((g) => g.fields);

/** "A number from 0 to 15 mm.": a rule's range in words. */
export function rangeText(f: RuleField): string {
  return `${f.whole ? 'A whole number' : 'A number'} from ${f.min} to ${f.max}${f.unit === 'of 5' ? '' : ` ${f.unit}`}.`;
}

function ruleSchema(f: RuleField) {
  const range = `must be ${f.whole ? 'a whole number ' : ''}from ${f.min} to ${f.max}${f.unit === 'of 5' ? '' : ` ${f.unit}`}`;
  const base = f.whole ? z.number().int(range) : z.number();
  return base.min(f.min, range).max(f.max, range);
}

type RuleShape = Record<RuleKey, ReturnType<typeof ruleSchema>>;

/** A manager's edit of the shop's grading rules; the version is given by the server. */
export const gradeRulesInput = z
  .object(Object.fromEntries(RULE_FIELDS.map((f) => [f.key, ruleSchema(f)])) as RuleShape)
  .strict()
  .superRefine((r, ctx) => {
    const order = (a: number, b: number, path: RuleKey, message: string) => {
      if (a > b) ctx.addIssue({ code: 'custom', path: [path], message });
    };
    order(r.keyLevelSoundMm, r.keyLevelLightRegulationMm, 'keyLevelLightRegulationMm', 'must not be below keyLevelSoundMm');
    order(r.keyLevelLightRegulationMm, r.keyLevelFullRegulationMm, 'keyLevelFullRegulationMm', 'must not be below keyLevelLightRegulationMm');
    order(r.lightRegulationHours, r.fullRegulationHours, 'fullRegulationHours', 'must not be below lightRegulationHours');
    order(r.hammerGrooveNormalMm, r.hammerGrooveReplaceMm, 'hammerGrooveReplaceMm', 'must not be below hammerGrooveNormalMm');
    order(r.pitchSoundCents, r.pitchRaiseCents, 'pitchRaiseCents', 'must not be below pitchSoundCents');
    order(r.playPoorAtOrBelow + 1, r.playGoodAtOrAbove, 'playGoodAtOrAbove', 'must be above playPoorAtOrBelow');
  });

export type GradeRulesInput = z.infer<typeof gradeRulesInput>;
export const withVersion = (rules: GradeRulesInput, version: string): GradeRules => ({ ...rules, version });
