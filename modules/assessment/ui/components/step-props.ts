import type { GradeRules } from '@/modules/assessment/core/grade-rules';
import type { AssessmentDraft, MeasureDraft } from '@/modules/assessment/ui/intake-draft';

export type DraftUpdate = (change: (draft: AssessmentDraft) => AssessmentDraft) => void;

/** What every step gets: the draft, a way to change it, and the sentence of a field's problem (if shown). */
export interface StepProps {
  draft: AssessmentDraft;
  update: DraftUpdate;
  errorAt: (path: string) => string | undefined;
  /** the grading rules in force, for hints that depend on them */
  rules: GradeRules;
}

/** A setter for one measurement. */
export function measureSetter(update: DraftUpdate) {
  return <K extends keyof MeasureDraft>(key: K) =>
    (value: MeasureDraft[K]) =>
      update((d) => ({ ...d, measurements: { ...d.measurements, [key]: value } }));
}
