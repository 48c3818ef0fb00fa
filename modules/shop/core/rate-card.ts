import { z } from '@/modules/input/core/zod';

import { WORK_TASKS, type WorkTask } from '@/modules/assessment/core/work-tasks';

import { CURRENCIES, type Currency } from './money';

/** What one task usually takes: hours and parts, per job or per unit (a string, a keytop). */
export interface TaskRate {
  hours: number;
  partsMinor: number;
  perUnit?: boolean;
}

export interface RateCard {
  version: string;
  currency: Currency;
  hourlyRateMinor: number;
  tasks: Record<WorkTask, TaskRate>;
}

// Invented demo values, in USD: the manager edits them. They are the shop's numbers, not the trade's.
export const demoRateCard: RateCard = {
  version: 'demo-1',
  currency: 'USD',
  hourlyRateMinor: 9500,
  tasks: {
    regulation: { hours: 2, partsMinor: 0 },
    rebush_keys: { hours: 8, partsMinor: 6500 },
    ease_front_rail_pins: { hours: 1.5, partsMinor: 0 },
    ease_sticking_keys: { hours: 1, partsMinor: 0 },
    replace_keytops: { hours: 0.5, partsMinor: 1200, perUnit: true },
    reshape_voice_hammers: { hours: 4, partsMinor: 1500 },
    replace_hammers: { hours: 12, partsMinor: 68000 },
    voicing: { hours: 2, partsMinor: 0 },
    replace_broken_strings: { hours: 0.5, partsMinor: 1800, perUnit: true },
    restring_section: { hours: 10, partsMinor: 42000 },
    soundboard_repair: { hours: 6, partsMinor: 4000 },
    reglue_ribs: { hours: 4, partsMinor: 1500 },
    pitch_raise: { hours: 1.5, partsMinor: 0 },
    fine_tuning: { hours: 1.5, partsMinor: 0 },
    tuning_pin_repair: { hours: 6, partsMinor: 9000 },
    cabinet_touch_up: { hours: 3, partsMinor: 2500 },
  },
};

const taskRate = z.object({ hours: z.number().min(0).max(200), partsMinor: z.number().int().min(0).max(100_000_000), perUnit: z.boolean().optional() }).strict();

export const rateCardInput = z
  .object({
    currency: z.enum(CURRENCIES as [Currency, ...Currency[]], { message: `must be one of ${CURRENCIES.join(', ')}` }),
    hourlyRateMinor: z.number().int('must be whole minor units').min(0).max(10_000_000),
    tasks: z.object(Object.fromEntries(WORK_TASKS.map((t) => [t, taskRate])) as Record<WorkTask, typeof taskRate>).strict(),
  })
  .strict();
