import { z } from '@/modules/input/core/zod';

import type { PianoKind } from '@/modules/pianos/core/piano';
import { CURRENCIES, type Currency } from '@/modules/shop/core/money';

/** A size band of one kind: pianos up to `upToCm` (the last band has none) start from `baseMinor`. */
export interface SizeBand {
  upToCm: number | null;
  baseMinor: number;
}

/** Pianos up to `upToYears` old (the last band has none) keep `factor` of their base value. */
export interface AgeBand {
  upToYears: number | null;
  factor: number;
}

/** Work money up to `upToPct` of the value before condition (the last band has none) keeps `factor` of it. */
export interface WorkShareBand {
  upToPct: number | null;
  factor: number;
}

/** The readiness verdicts a retail price is worked from; a piano for wholesale has a figure of its own. */
export const RETAIL_READINESS = ['floor', 'work_first', 'unjudged'] as const;
export type RetailReadiness = (typeof RETAIL_READINESS)[number];

/**
 * What the manager sets to price the stock, versioned like the grading rules. Money is in the rules'
 * currency, in integer minor units; factors are fractions (0.85 keeps 85 %).
 */
export interface PricingRules {
  version: string;
  currency: Currency;
  baseRetail: Record<PianoKind, SizeBand[]>;
  ageBands: AgeBand[];
  /** a piano whose year is not known at all */
  unknownAgeFactor: number;
  conditionFactors: Record<RetailReadiness, number>;
  workShareBands: WorkShareBand[];
  /** the gross margin the dealer aims for, as a share of the asking price */
  targetMargin: number;
  holdingCostPerDayMinor: number;
  daysToSell: Record<PianoKind, number>;
  /** asking prices go to the nearest `stepMinor`, less `lessMinor` (a step of 10000 less 500: 3,495.00) */
  priceEnding: { stepMinor: number; lessMinor: number };
  /** offers go down to a whole `offerStepMinor` */
  offerStepMinor: number;
  /** a piano not recommended for retail: a wholesale buyer's figure as a share of the value before condition */
  wholesale: { factor: number; daysToSell: number };
}

// Invented demo values, in USD: the manager edits them. They are the shop's numbers, not the trade's.
export const demoPricingRules: PricingRules = {
  version: 'demo-1',
  currency: 'USD',
  baseRetail: {
    upright: [
      { upToCm: 110, baseMinor: 240000 },
      { upToCm: 125, baseMinor: 380000 },
      { upToCm: null, baseMinor: 520000 },
    ],
    grand: [
      { upToCm: 160, baseMinor: 850000 },
      { upToCm: 200, baseMinor: 1450000 },
      { upToCm: null, baseMinor: 2600000 },
    ],
  },
  ageBands: [
    { upToYears: 10, factor: 1 },
    { upToYears: 25, factor: 0.85 },
    { upToYears: 50, factor: 0.7 },
    { upToYears: 80, factor: 0.55 },
    { upToYears: null, factor: 0.45 },
  ],
  unknownAgeFactor: 0.55,
  conditionFactors: { floor: 1, work_first: 0.95, unjudged: 0.85 },
  workShareBands: [
    { upToPct: 10, factor: 1 },
    { upToPct: 25, factor: 0.95 },
    { upToPct: 50, factor: 0.9 },
    { upToPct: null, factor: 0.8 },
  ],
  targetMargin: 0.35,
  holdingCostPerDayMinor: 250,
  daysToSell: { upright: 60, grand: 90 },
  priceEnding: { stepMinor: 10000, lessMinor: 500 },
  offerStepMinor: 2500,
  wholesale: { factor: 0.3, daysToSell: 21 },
};

const factor = z.number().min(0, 'must be 0 or more').max(2, 'must be at most 2');
const minor = (max: number) => z.number().int('must be whole minor units').min(0, 'must be 0 or more').max(max);
const bands = <T extends z.ZodTypeAny>(item: T, key: 'upToCm' | 'upToYears' | 'upToPct') =>
  z
    .array(item)
    .min(1, 'needs at least one band')
    .max(12, 'has at most 12 bands')
    .superRefine((items, ctx) => {
      const list = items as Record<string, number | null>[];
      list.forEach((b, n) => {
        const last = n === list.length - 1;
        if (last && b[key] != null) ctx.addIssue({ code: 'custom', path: [n, key], message: 'the last band has no upper limit (null)' });
        if (!last && b[key] == null) ctx.addIssue({ code: 'custom', path: [n, key], message: 'only the last band may be open-ended' });
        const before = n > 0 ? list[n - 1][key] : null;
        if (b[key] != null && before != null && (b[key] as number) <= before) ctx.addIssue({ code: 'custom', path: [n, key], message: 'must be above the band before' });
      });
    });

const sizeBand = z.object({ upToCm: z.number().int().min(50).max(400).nullable(), baseMinor: minor(1_000_000_000) }).strict();
const ageBand = z.object({ upToYears: z.number().int().min(0).max(400).nullable(), factor }).strict();
const workBand = z.object({ upToPct: z.number().min(0).max(1000).nullable(), factor }).strict();
const days = z.number().int('must be whole days').min(1, 'must be at least 1 day').max(1000, 'must be at most 1000 days');

/** A manager's edit of the pricing rules; the version is given by the server. */
export const pricingRulesInput = z
  .object({
    currency: z.enum(CURRENCIES as [Currency, ...Currency[]], { message: `must be one of ${CURRENCIES.join(', ')}` }),
    baseRetail: z.object({ upright: bands(sizeBand, 'upToCm'), grand: bands(sizeBand, 'upToCm') }).strict(),
    ageBands: bands(ageBand, 'upToYears'),
    unknownAgeFactor: factor,
    conditionFactors: z.object({ floor: factor, work_first: factor, unjudged: factor }).strict(),
    workShareBands: bands(workBand, 'upToPct'),
    targetMargin: z.number().min(0, 'must be 0 or more').max(0.9, 'must be at most 0.9'),
    holdingCostPerDayMinor: minor(10_000_000),
    daysToSell: z.object({ upright: days, grand: days }).strict(),
    priceEnding: z
      .object({ stepMinor: z.number().int().min(1, 'must be at least 1 minor unit').max(100_000_000), lessMinor: minor(100_000_000) })
      .strict()
      .refine((p) => p.lessMinor < p.stepMinor, { message: 'the amount taken off must be less than the step', path: ['lessMinor'] }),
    offerStepMinor: z.number().int().min(1, 'must be at least 1 minor unit').max(100_000_000),
    wholesale: z.object({ factor, daysToSell: days }).strict(),
  })
  .strict();
export type PricingRulesInput = z.infer<typeof pricingRulesInput>;

export function withPricingVersion(input: PricingRulesInput, version: string): PricingRules {
  return { ...(input as Omit<PricingRules, 'version'>), version };
}
