import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { AREAS, AREA_LABELS, inspectedAreas, provisionalRule, type Area } from '@/modules/assessment/core/grade';
import type { GradeRules } from '@/modules/assessment/core/grade-rules';
import { ACQUISITION_LABELS, INSPECTION_PLACE_LABELS } from '@/modules/assessment/core/intake-input';
import { diffMeasurements } from '@/modules/assessment/core/measurement-diff';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { STEP_TITLES, stepOfPath, type StepKey } from '@/modules/assessment/ui/intake-draft';
import { CASE_CONDITION_LABELS, MEASURE_LABELS, describeCrack, formatMeasure, type MeasureField } from '@/modules/assessment/ui/measure-labels';
import { PHOTO_AREA_LABELS } from '@/modules/photos/ui/photo-labels';
import { describeYear } from '@/modules/pianos/core/piano';
import { formatDay, formatKindAndSize } from '@/modules/pianos/ui/piano-format';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { FactList, type Fact } from '@/modules/theme/ui/fact-list';
import { MarkTag } from '@/modules/theme/ui/mark';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { centsText } from './measure-steps';
import { SamePianoNotice } from './same-piano-notice';
import type { StepProps } from './step-props';

const MEASURE_STEPS: readonly StepKey[] = ['keys', 'hammers', 'strings', 'soundboard', 'play'];
const FIELDS_BY_STEP: Record<string, MeasureField[]> = Object.fromEntries(MEASURE_STEPS.map((s) => [s, (Object.keys(MEASURE_LABELS) as MeasureField[]).filter((f) => stepOfPath(`measurements.${f}`) === s)]));

// The areas each measuring step covers: pitch is measured in the play step.
const STEP_AREAS: Partial<Record<StepKey, Area[]>> = { keys: ['keys'], hammers: ['hammers'], strings: ['strings'], soundboard: ['soundboard'], play: ['tuning', 'play'] };

function ReviewGroup({ step, facts, goTo, notInspected = [], children }: { step: StepKey; facts: Fact[]; goTo: (s: StepKey) => void; notInspected?: Area[]; children?: ReactNode }) {
  return (
    <Card role="group" accessibilityLabel={STEP_TITLES[step]} testID={`review-${step}`}>
      <View style={styles.groupHead}>
        <Body variant="subheading">{STEP_TITLES[step]}</Body>
        <Button label="Change" variant="quiet" onPress={() => goTo(step)} accessibilityLabel={`Change ${STEP_TITLES[step]}`} testID={`review-change-${step}`} />
      </View>
      {notInspected.map((a) => (
        <MarkTag key={a} mark="unseen" label={`${AREA_LABELS[a]}: not inspected`} testID={`review-not-inspected-${a}`} />
      ))}
      {facts.length ? <FactList facts={facts} dense /> : null}
      {children}
    </Card>
  );
}

/** Which areas the intake measured, against the shop's rule for a grade that is not provisional. */
function InspectedSummary({ measurements, rules }: { measurements: Measurements; rules: GradeRules }) {
  const inspected = inspectedAreas(measurements);
  const missing = AREAS.filter((a) => !inspected.includes(a));
  const provisional = inspected.length < rules.minInspectedAreas;
  if (!inspected.length) {
    return (
      <Notice tone="caution" title="Nothing is measured yet" testID="review-inspected">
        No area is inspected yet. An intake with nothing measured cannot be submitted: go back and measure at least one area.
      </Notice>
    );
  }
  return (
    <Card role="group" accessibilityLabel="What was inspected" testID="review-inspected">
      <Body variant="subheading">
        {inspected.length} of {AREAS.length} areas inspected
      </Body>
      <Body>Inspected: {inspected.map((a) => AREA_LABELS[a]).join(', ')}.</Body>
      {missing.length ? <Body tone="secondary">Not inspected: {missing.map((a) => AREA_LABELS[a]).join(', ')}.</Body> : null}
      {provisional ? (
        <Notice tone="caution" title="The grade will be provisional" testID="review-provisional">
          {`${provisionalRule(rules.minInspectedAreas)} It can be submitted; no readiness verdict of quality is given and no disclosure can be published until the missing areas are measured.`}
        </Notice>
      ) : null}
      {!inspected.includes('play') ? <Body tone="secondary">Without the play test, the disclosure cannot be published.</Body> : null}
    </Card>
  );
}

/** Keys in one order at every depth: the stored version comes back from jsonb with its keys reordered. */
function canonical<T>(value: T): T {
  if (Array.isArray(value)) return value.map(canonical) as T;
  if (value && typeof value === 'object') {
    return Object.fromEntries(
      Object.entries(value as Record<string, unknown>)
        .filter(([, v]) => v !== undefined)
        .sort(([a], [b]) => a.localeCompare(b))
        .map(([k, v]) => [k, canonical(v)]),
    ) as T;
  }
  return value;
}

const upper = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);

/** One line per measurement; each crack on a line of its own; A4 with its distance from 440 Hz. */
function measureFacts(f: MeasureField, m: Measurements): Fact[] {
  if (f === 'soundboardCracks') {
    const cracks = m.soundboardCracks ?? [];
    if (!cracks.length) return [{ label: 'Soundboard cracks', value: 'None noted' }];
    return cracks.map((c, i) => ({ label: `Crack ${i + 1}`, value: upper(describeCrack(c)) }));
  }
  if (f === 'a4Hz' && m.a4Hz != null) return [{ label: MEASURE_LABELS[f], value: `${formatMeasure(f, m.a4Hz)}, ${centsText(String(m.a4Hz)) ?? ''}`.replace(/, $/, '') }];
  return [{ label: MEASURE_LABELS[f], value: upper(formatMeasure(f, m[f])) }];
}

const orNone = (t: string, none = 'Not noted') => (t.trim() ? t.trim() : none);
const given = (v: unknown) => v != null && !(Array.isArray(v) && v.length === 0);

interface ReviewStepProps extends StepProps {
  goTo: (step: StepKey) => void;
  /** the measurements as they will be sent */
  measurements: Measurements;
  /** correction only: the version the form started from */
  base: Measurements | null;
}

/** Everything entered, by step, each with a way back to change it; a correction also asks why. */
export function ReviewStep({ draft, update, errorAt, goTo, measurements, base, rules }: ReviewStepProps) {
  const p = draft.piano;
  const changes = base ? diffMeasurements(canonical(base), canonical(measurements)) : [];
  const inspected = inspectedAreas(measurements);
  return (
    <View style={styles.step}>
      <InspectedSummary measurements={measurements} rules={rules} />
      {draft.mode === 'intake' ? <SamePianoNotice draft={draft} update={update} error={errorAt('samePianoAs')} /> : null}
      {draft.mode === 'correction' ? (
        <Card role="group" accessibilityLabel="The correction">
          <Body variant="subheading">What this correction changes</Body>
          {changes.length ? (
            <View style={styles.changes} testID="correction-changes">
              {changes.map((c) => (
                <Body key={c.field}>
                  {MEASURE_LABELS[c.field as MeasureField] ?? c.field}: {formatMeasure(c.field, c.from)} → {formatMeasure(c.field, c.to)}
                </Body>
              ))}
            </View>
          ) : (
            <Body tone="secondary">Nothing has changed yet: every measurement is as in version {draft.baseVersion}.</Body>
          )}
          <TextField
            label="Reason for the correction"
            hint="Required. Kept in the history with your name, e.g. “re-measured key side play in daylight”."
            value={draft.changeNote}
            onChangeText={(v) => update((d) => ({ ...d, changeNote: v }))}
            error={errorAt('changeNote')}
            multiline
            maxLength={500}
            testID="field-changeNote"
          />
        </Card>
      ) : null}

      {draft.mode === 'intake' ? (
        <ReviewGroup
          step="piano"
          goTo={goTo}
          facts={[
            { label: 'Seller', value: orNone(draft.seller.name, 'Missing') },
            { label: 'Phone', value: orNone(draft.seller.phone) },
            { label: 'E-mail', value: orNone(draft.seller.email) },
            { label: 'Address', value: orNone(draft.seller.address) },
            { label: 'Acquisition', value: draft.acquisition ? ACQUISITION_LABELS[draft.acquisition] : 'Missing' },
            { label: 'Received', value: draft.receivedOn.trim() ? formatDay(`${draft.receivedOn.trim()}T12:00:00`) : 'Missing' },
            { label: 'Inspected at', value: draft.inspectedAt ? INSPECTION_PLACE_LABELS[draft.inspectedAt] : 'Missing' },
            { label: 'Maker and model', value: [p.maker.trim() || 'Maker missing', p.model.trim()].filter(Boolean).join(' ') },
            { label: 'Serial number', value: orNone(p.serialNumber) },
            { label: 'Kind and size', value: p.kind ? formatKindAndSize(p.kind, Number(p.sizeCm) > 0 ? Math.round(Number(p.sizeCm)) : null) : 'Kind missing' },
            {
              label: 'Year',
              value:
                p.yearMode === 'range'
                  ? describeYear({ yearFrom: Number(p.yearFrom) || null, yearTo: Number(p.yearTo) || null })
                  : describeYear({ year: Number(p.year) || null, yearIsEstimate: p.yearIsEstimate }),
            },
            { label: 'Finish', value: orNone(p.finish) },
            { label: 'Case', value: [p.caseCondition ? CASE_CONDITION_LABELS[p.caseCondition] : 'Condition not noted', p.caseNotes.trim()].filter(Boolean).join(': ') },
            { label: 'Internal notes', value: orNone(draft.notes, 'None') },
          ]}
        />
      ) : null}

      {MEASURE_STEPS.map((step) => (
        <ReviewGroup
          key={step}
          step={step}
          goTo={goTo}
          notInspected={(STEP_AREAS[step] ?? []).filter((a) => !inspected.includes(a))}
          facts={FIELDS_BY_STEP[step].filter((f) => given(measurements[f])).flatMap((f) => measureFacts(f, measurements))}
        />
      ))}

      <ReviewGroup step="photos" goTo={goTo} facts={[]}>
        <Body tone={draft.photos.length ? 'default' : 'secondary'} testID="review-photo-count">
          {draft.photos.length
            ? `${draft.photos.length} ${draft.photos.length === 1 ? 'photo' : 'photos'}: ${Object.entries(
                draft.photos.reduce<Record<string, number>>((acc, ph) => ({ ...acc, [ph.area]: (acc[ph.area] ?? 0) + 1 }), {}),
              )
                .map(([area, n]) => `${PHOTO_AREA_LABELS[area as keyof typeof PHOTO_AREA_LABELS]} ${n}`)
                .join(', ')}`
            : 'No photos.'}
        </Body>
      </ReviewGroup>
    </View>
  );
}

const styles = StyleSheet.create({
  step: { gap: SPACE.lg },
  groupHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: SPACE.sm },
  changes: { gap: SPACE.xs },
});
