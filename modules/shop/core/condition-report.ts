import { AREAS, AREA_LABELS, readinessReasons, worstMark, type Area, type AreaMark, type Finding, type GradeView, type Readiness } from '@/modules/assessment/core/grade';
import { WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';

import { estimateReconditioning, type Estimate, type EstimateLine } from './estimate';
import type { Currency } from './money';
import type { RateCard } from './rate-card';

/** One area of the piano as the dealer acts on it: what was found, and the work it needs in hours and money. */
export interface AreaReport {
  area: Area;
  label: string;
  inspected: boolean;
  /** the worst mark of its findings; "unseen" when nothing in it was measured */
  mark: AreaMark;
  findings: Finding[];
  /** the work counted here: each task once, under the first area (in area order) whose findings ask for it */
  lines: EstimateLine[];
  /** cheaper partial fixes offered here instead of a line: shown, not counted */
  options: EstimateLine[];
  /** work this area's findings ask for that is counted under an earlier area */
  countedElsewhere: { task: WorkTask; label: string; countedIn: Area }[];
  hours: number;
  workMinor: number;
}

/** The condition of a piano in Feltwire's terms: a readiness verdict, each area, and the work money in all. */
export interface ConditionReport {
  readiness: Readiness;
  provisional: boolean;
  inspectedCount: number;
  areaCount: number;
  minInspectedAreas: number;
  reasons: string[];
  areas: AreaReport[];
  estimate: Estimate;
  currency: Currency;
  workHours: number;
  /** what the work the findings call for costs on the rate card, in minor units: the figure pricing keys off */
  workMinor: number;
}

/** Builds the condition report from a grade and the shop's rate card. Pure: same grade and card, same report. */
export function conditionReport(grade: GradeView, card: RateCard): ConditionReport {
  const estimate = estimateReconditioning(grade.findings, card);
  const owner = new Map<WorkTask, Area>();
  for (const line of [...estimate.lines, ...estimate.options]) {
    const areas = line.because.map((check) => grade.findings.find((f) => f.check === check)?.area).filter((a): a is Area => !!a);
    const first = AREAS.find((a) => areas.includes(a));
    if (first) owner.set(line.task, first);
  }
  const areas = AREAS.map((area): AreaReport => {
    const findings = grade.findings.filter((f) => f.area === area);
    const inspected = grade.inspectedAreas.includes(area);
    const lines = estimate.lines.filter((l) => owner.get(l.task) === area);
    const asked = new Set(findings.flatMap((f) => f.work.filter((w) => !w.alternativeTo).map((w) => w.task)));
    const countedElsewhere = [...asked]
      .filter((t) => owner.get(t) && owner.get(t) !== area && estimate.lines.some((l) => l.task === t))
      .map((t) => ({ task: t, label: WORK_TASK_LABELS[t], countedIn: owner.get(t)! }));
    return {
      area,
      label: AREA_LABELS[area],
      inspected,
      mark: inspected ? (worstMark(findings.map((f) => f.mark)) ?? 'fine') : 'unseen',
      findings,
      lines,
      options: estimate.options.filter((l) => owner.get(l.task) === area),
      countedElsewhere,
      hours: lines.reduce((s, l) => s + l.hours, 0),
      workMinor: lines.reduce((s, l) => s + l.totalMinor, 0),
    };
  });
  return {
    readiness: grade.readiness,
    provisional: grade.provisional,
    inspectedCount: grade.inspectedAreas.length,
    areaCount: AREAS.length,
    minInspectedAreas: grade.minInspectedAreas,
    reasons: readinessReasons(grade),
    areas,
    estimate,
    currency: estimate.currency,
    workHours: estimate.totalHours,
    workMinor: estimate.totalMinor,
  };
}
