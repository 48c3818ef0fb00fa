import { z } from '@/modules/input/core/zod';

import { lineText, multiLineText } from '@/modules/input/core/text';

import { WORK_TASKS } from '@/modules/assessment/core/work-tasks';

// What managers and technicians send about workshop work.
export const DECISIONS = ['recondition', 'sell_as_is', 'wholesale', 'decline'] as const;
export type Decision = (typeof DECISIONS)[number];

/** The shortest reason a manager gives for selling as it stands a piano not recommended for retail. */
export const SELL_AS_IS_REASON_MIN = 10;

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'must be a date, YYYY-MM-DD');
const hours = z.number().min(0, 'cannot be negative').max(200, 'must be at most 200 hours');
const minor = z.number().int('must be whole minor units').min(0, 'cannot be negative').max(100_000_000);

export const workItemInput = z
  .object({
    task: z.enum([...WORK_TASKS, 'custom'] as [string, ...string[]], { message: 'must be a workshop task or custom' }),
    title: lineText().trim().min(1, 'is required').max(120).optional(),
    estimatedHours: hours,
    estimatedPartsMinor: minor.default(0),
    quantity: z.number().int().min(1).max(250).default(1),
    assignedToId: z.number().int().positive().nullish(),
    priority: z.number().int().min(1, 'must be 1 (urgent) to 3 (when there is time)').max(3, 'must be 1 (urgent) to 3 (when there is time)').default(2),
    dueOn: isoDate.nullish(),
  })
  .strict();

export const workItemPatch = workItemInput.partial().omit({ task: true }).strict();

export const timeEntryInput = z
  .object({
    workItemId: z.number().int().positive(),
    minutes: z
      .number()
      .int('must be whole minutes')
      .min(0, 'cannot be negative: give the minutes worked; an entry logged by mistake is corrected instead')
      .min(1, 'must be at least 1 minute')
      .max(1440, 'must be at most 24 hours'),
    note: multiLineText().trim().max(500).nullish(),
  })
  .strict();

/** A correction of a logged time entry: the minutes it should have been (0 for one logged by mistake) and why. */
export const timeCorrectionInput = z
  .object({
    timeEntryId: z.number().int().positive(),
    minutes: z.number().int('must be whole minutes').min(0, 'cannot be negative: 0 stands for an entry logged by mistake').max(1440, 'must be at most 24 hours'),
    why: multiLineText().trim().min(1, 'is required: say why the time changes').max(500),
  })
  .strict();

/** Marking a work item done; a reason is needed when no time is logged on it. */
export const doneInput = z
  .object({
    itemId: z.number().int().positive(),
    done: z.boolean(),
    reason: multiLineText().trim().max(500).nullish(),
  })
  .strict();

export const partUseInput = z
  .object({
    workItemId: z.number().int().positive(),
    description: lineText().trim().min(1, 'is required').max(200),
    quantity: z.number().int().min(1).max(1000).default(1),
    costMinor: minor,
  })
  .strict();

export const climateInput = z
  .object({
    tempC: z.number().min(-10, 'must be between -10 and 50 deg C').max(50, 'must be between -10 and 50 deg C'),
    relativeHumidity: z.number().min(1, 'must be between 1 and 99 %').max(99, 'must be between 1 and 99 %'),
  })
  .strict();
