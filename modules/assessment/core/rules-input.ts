import { z } from '@/modules/input/core/zod';

import type { GradeRules } from './grade-rules';

const mm = z.number().min(0).max(15);
const hours = z.number().min(0).max(200);
const rating = z.number().int().min(1).max(5);

/** A manager's edit of the shop's grading rules; the version is given by the server. */
export const gradeRulesInput = z
  .object({
    keySidePlayNormalMm: mm,
    keyLevelSoundMm: mm,
    keyLevelLightRegulationMm: mm,
    keyLevelFullRegulationMm: mm,
    lightRegulationHours: hours,
    fullRegulationHours: hours,
    hammerGrooveNormalMm: mm,
    hammerGrooveReplaceMm: mm,
    wideCrackGapMm: z.number().min(0.1).max(10),
    pitchSoundCents: z.number().min(0).max(100),
    pitchRaiseCents: z.number().min(1).max(300),
    playPoorAtOrBelow: rating,
    playGoodAtOrAbove: rating,
    minInspectedAreas: z.number().int('must be a whole number of areas').min(1, 'must be from 1 to 6 areas').max(6, 'must be from 1 to 6 areas'),
  })
  .strict()
  .superRefine((r, ctx) => {
    const order = (a: number, b: number, path: string, message: string) => {
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
