// Shop defaults for grading: the product's own starting values, configurable and versioned.
// Where a value rests on the trade or a standard, the comment says which.
export interface GradeRules {
  version: string;
  /** Key side play at the key front that is still normal (common practice: 1-2 mm even on new pianos). */
  keySidePlayNormalMm: number;
  keyLevelSoundMm: number;
  /** Up to this, light regulation (about 2 hours); above it the hours rise toward a full regulation. */
  keyLevelLightRegulationMm: number;
  keyLevelFullRegulationMm: number;
  lightRegulationHours: number;
  fullRegulationHours: number;
  /** Shallow string grooves are normal up to this depth. */
  hammerGrooveNormalMm: number;
  /** "Several millimetres": the hammer is at the end of its life. */
  hammerGrooveReplaceMm: number;
  /** A crack this wide admits a payment card (0.76 mm thick, ISO/IEC 7810): a wide crack. */
  wideCrackGapMm: number;
  /** Within this many cents of A4 = 440 Hz the pitch is sound. */
  pitchSoundCents: number;
  /** Flatter than this needs a pitch raise before fine tuning (from memory: 15-20 cents). */
  pitchRaiseCents: number;
  /** A play-test rating at or below this sets "not recommended for retail as it stands". */
  playPoorAtOrBelow: number;
  playGoodAtOrAbove: number;
  /** A grade over fewer inspected areas than this (of the six) is provisional: no readiness verdict of quality, no disclosure. */
  minInspectedAreas: number;
}

export const defaultRules: GradeRules = {
  version: 'shop-default-2026-12',
  keySidePlayNormalMm: 2.0,
  keyLevelSoundMm: 0.5,
  keyLevelLightRegulationMm: 1.5,
  keyLevelFullRegulationMm: 3.0,
  lightRegulationHours: 2,
  fullRegulationHours: 16,
  hammerGrooveNormalMm: 1.0,
  hammerGrooveReplaceMm: 3.0,
  wideCrackGapMm: 0.76,
  pitchSoundCents: 5,
  pitchRaiseCents: 15,
  playPoorAtOrBelow: 2,
  playGoodAtOrAbove: 4,
  // Shop default: one area may be left for later (an upright's soundboard seen from the back, say).
  minInspectedAreas: 5,
};

/** Rules as stored in an older version (with fields since dropped, without ones since added): complete and trimmed. */
export function completeRules(stored: object): GradeRules {
  const known = Object.keys(defaultRules) as (keyof GradeRules)[];
  const given = stored as Partial<GradeRules>;
  return Object.fromEntries(known.map((k) => [k, given[k] ?? defaultRules[k]])) as unknown as GradeRules;
}
