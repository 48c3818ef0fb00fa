import type { Finding } from '@/modules/assessment/core/grade';
import { WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';

import { roundMinor, type Currency } from './money';
import type { RateCard } from './rate-card';

export interface EstimateLine {
  task: WorkTask;
  label: string;
  hours: number;
  quantity: number;
  labourMinor: number;
  partsMinor: number;
  totalMinor: number;
  /** The checks that called for it. */
  because: string[];
  /** A cheaper partial fix offered instead of another line: shown, not counted in the total. */
  alternativeTo?: WorkTask;
}

export interface Estimate {
  currency: Currency;
  hourlyRateMinor: number;
  rateCardVersion: string;
  lines: EstimateLine[];
  options: EstimateLine[];
  totalHours: number;
  labourMinor: number;
  partsMinor: number;
  totalMinor: number;
}

/** Rounding: each line's labour (hours x rate) is rounded to a whole minor unit, half away from zero; totals add the rounded lines. */
export function priceLine(task: WorkTask, hours: number, quantity: number, card: RateCard, because: string[], alternativeTo?: WorkTask): EstimateLine {
  const rate = card.tasks[task];
  const partsMinor = rate.partsMinor * (rate.perUnit ? quantity : 1);
  const labourMinor = roundMinor(hours * card.hourlyRateMinor);
  return { task, label: WORK_TASK_LABELS[task], hours, quantity, labourMinor, partsMinor, totalMinor: labourMinor + partsMinor, because, ...(alternativeTo ? { alternativeTo } : {}) };
}

/**
 * One line per task the findings call for. A task asked for twice is done once: the larger hours
 * and quantity count. A finding's own hours (regulation sized by key level) beat the rate card's.
 */
export function estimateReconditioning(findings: Finding[], card: RateCard): Estimate {
  const wanted = new Map<WorkTask, { hours: number; quantity: number; because: string[]; alternativeTo?: WorkTask }>();
  for (const f of findings) {
    for (const w of f.work) {
      const rate = card.tasks[w.task];
      const quantity = w.quantity ?? 1;
      const hours = w.hours ?? rate.hours * (rate.perUnit ? quantity : 1);
      const prev = wanted.get(w.task);
      if (!prev) wanted.set(w.task, { hours, quantity, because: [f.check], alternativeTo: w.alternativeTo ?? undefined });
      else {
        prev.hours = Math.max(prev.hours, hours);
        prev.quantity = Math.max(prev.quantity, quantity);
        prev.because.push(f.check);
        if (!w.alternativeTo) prev.alternativeTo = undefined;
      }
    }
  }
  const priced = [...wanted].map(([task, w]) => priceLine(task, w.hours, w.quantity, card, w.because, w.alternativeTo));
  const lines = priced.filter((l) => !l.alternativeTo || !wanted.has(l.alternativeTo));
  const options = priced.filter((l) => !lines.includes(l));
  return {
    currency: card.currency,
    hourlyRateMinor: card.hourlyRateMinor,
    rateCardVersion: card.version,
    lines,
    options,
    totalHours: lines.reduce((s, l) => s + l.hours, 0),
    labourMinor: lines.reduce((s, l) => s + l.labourMinor, 0),
    partsMinor: lines.reduce((s, l) => s + l.partsMinor, 0),
    totalMinor: lines.reduce((s, l) => s + l.totalMinor, 0),
  };
}
