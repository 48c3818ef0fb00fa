import { z } from '@/modules/input/core/zod';

import type { GradeRules } from './grade-rules';

const mm = z.number().min(0).max(15);
const hours = z.number().min(0).max(200);
const rating = z.number().int().min(1).max(5);
const points = z.number().int().min(0).max(100);

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
    scorePenalty: z.object({ watch: points, needsWork: points, serious: points }).strict(),
    bands: z.object({ excellent: points, good: points, fair: points }).strict(),
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
    order(r.bands.fair, r.bands.good, 'bands.good', 'must not be below bands.fair');
    order(r.bands.good, r.bands.excellent, 'bands.excellent', 'must not be below bands.good');
  });

export type GradeRulesInput = z.infer<typeof gradeRulesInput>;
export const withVersion = (rules: GradeRulesInput, version: string): GradeRules => ({ ...rules, version });
