import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { READINESS_WORDS, gradeAssessment, type Area, type GradeView } from '@/modules/assessment/core/grade';
import type { GradeRules } from '@/modules/assessment/core/grade-rules';
import { FELT_LEFT, FELT_STATES, TUNING_PINS, measurementsInput, type Measurements } from '@/modules/assessment/core/measurements';
import { WORK_TASK_AREAS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import { ConditionSummary } from '@/modules/assessment/ui/components/condition-summary';
import { KeyListField } from '@/modules/assessment/ui/components/fields';
import { parseKeyList } from '@/modules/assessment/ui/intake-draft';
import { FELT_LEFT_LABELS, FELT_STATE_LABELS, TUNING_PIN_LABELS } from '@/modules/assessment/ui/measure-labels';
import { useRateCard } from '@/modules/shop/ui/use-rate-card';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { parseNumber } from '../work-format';
import { Feedback, type FeedbackState } from './feedback';
import { FieldRow } from './field-row';

type NumberKey = 'keySidePlayMm' | 'keyLevelDeviationMm' | 'hammerGrooveDepthMm' | 'brokenStrings' | 'a4Hz';
type RatingKey = 'bassEvenness' | 'middleEvenness' | 'trebleEvenness' | 'dynamicRange' | 'overallImpression';

const NUMBER_FIELDS: { key: NumberKey; area: Area; label: string; unit: string; hint: string; whole?: boolean }[] = [
  { key: 'keySidePlayMm', area: 'keys', label: 'Key side play', unit: 'mm', hint: 'Sideways at the key front; 1-2 mm is normal.' },
  { key: 'keyLevelDeviationMm', area: 'keys', label: 'Key level deviation', unit: 'mm', hint: 'The largest step between resting keys.' },
  { key: 'hammerGrooveDepthMm', area: 'hammers', label: 'Hammer groove depth', unit: 'mm', hint: 'The deepest string groove.' },
  { key: 'brokenStrings', area: 'strings', label: 'Broken strings', unit: 'strings', hint: 'Still broken or missing.', whole: true },
  { key: 'a4Hz', area: 'tuning', label: 'Measured A4', unit: 'Hz', hint: 'Standard pitch is 440 Hz.' },
];

const RATING_FIELDS: { key: RatingKey; label: string }[] = [
  { key: 'bassEvenness', label: 'Bass evenness' },
  { key: 'middleEvenness', label: 'Middle evenness' },
  { key: 'trebleEvenness', label: 'Treble evenness' },
  { key: 'dynamicRange', label: 'Dynamic range' },
  { key: 'overallImpression', label: 'Overall impression' },
];

type ChoiceKey = 'hammerFelt' | 'hammerFeltLeft' | 'tuningPins';
// States seen rather than measured, asked again where the work changed them (new hammers, a pin repair).
const CHOICE_FIELDS: { key: ChoiceKey; area: Area; label: string; options: readonly string[]; labels: Record<string, string> }[] = [
  { key: 'hammerFelt', area: 'hammers', label: 'Hammer felt', options: FELT_STATES, labels: FELT_STATE_LABELS },
  { key: 'hammerFeltLeft', area: 'hammers', label: 'Felt left to shape', options: FELT_LEFT, labels: FELT_LEFT_LABELS },
  { key: 'tuningPins', area: 'tuning', label: 'Tuning pins', options: TUNING_PINS, labels: TUNING_PIN_LABELS },
];

const RATINGS = ['1', '2', '3', '4', '5'] as const;
const RATING_LABELS = { 1: '1', 2: '2', 3: '3', 4: '4', 5: '5' } as Record<(typeof RATINGS)[number], string>;
const YES_NO = ['yes', 'no'] as const;
const YES_NO_LABELS: Record<(typeof YES_NO)[number], string> = { yes: 'Yes', no: 'No' };


interface RemeasurePanelProps {
  tasks: readonly string[];
  latest: { version: number; measurements: Measurements; grade: GradeView } | null;
  rules: GradeRules;
  busy: boolean;
  onSubmit: (measurements: Partial<Measurements>, changeNote: string | null) => Promise<{ ok: true; version: number; grade: GradeView } | { ok: false; message: string }>;
}

const shown = (v: unknown, unit: string) => (v == null ? 'not measured' : `${v}${unit === 'strings' ? '' : ` ${unit}`}`);

/** Re-measure what the workshop worked on; only filled fields are sent, the rest carry over from the last assessment. */
export function RemeasurePanel({ tasks, latest, rules, busy, onSubmit }: RemeasurePanelProps) {
  const worked = useMemo(() => new Set<Area>(['play', ...tasks.map((t) => WORK_TASK_AREAS[t as WorkTask]).filter((a): a is Exclude<typeof a, 'case'> => a != null && a !== 'case')]), [tasks]);
  const [everything, setEverything] = useState(false);
  const [numbers, setNumbers] = useState<Partial<Record<NumberKey, string>>>({});
  const [ratings, setRatings] = useState<Partial<Record<RatingKey, (typeof RATINGS)[number]>>>({});
  const [touches, setTouches] = useState<'yes' | 'no' | null>(null);
  const [touchKeys, setTouchKeys] = useState('');
  const [choices, setChoices] = useState<Partial<Record<ChoiceKey, string>>>({});
  const { card } = useRateCard();
  const [note, setNote] = useState('');
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const [result, setResult] = useState<{ version: number; grade: GradeView } | null>(null);

  const filled: Partial<Measurements> = {};
  const typeErrors: Record<string, string> = {};
  for (const f of NUMBER_FIELDS) {
    const v = parseNumber(numbers[f.key] ?? '');
    if (v == null) continue;
    if (Number.isNaN(v) || (f.whole && !Number.isInteger(v))) typeErrors[f.key] = f.whole ? 'A whole number.' : 'A number, e.g. 1.5.';
    else filled[f.key] = v;
  }
  for (const f of RATING_FIELDS) if (ratings[f.key]) filled[f.key] = Number(ratings[f.key]);
  if (touches) filled.keyTouchesNeighbour = touches === 'yes';
  // After work on the keys, a no clears the keys named before; a yes names them again.
  if (touches === 'no') filled.keysTouchingNeighbour = null;
  if (touches === 'yes') {
    const keys = parseKeyList(touchKeys);
    if (Array.isArray(keys)) filled.keysTouchingNeighbour = keys;
    else if (keys != null) typeErrors.keysTouchingNeighbour = 'Key numbers from 1 to 88, separated by commas.';
  }
  for (const f of CHOICE_FIELDS) if (choices[f.key]) (filled as Record<string, unknown>)[f.key] = choices[f.key];

  const parsed = measurementsInput.safeParse(filled);
  const errors: Record<string, string> = { ...typeErrors };
  if (!parsed.success) for (const issue of parsed.error.issues) errors[String(issue.path[0])] ??= issue.message.replace(/^./, (c) => c.toUpperCase());
  const valid = Object.keys(errors).length === 0;
  const count = Object.keys(filled).length;
  const preview = latest && valid && count ? gradeAssessment({ ...latest.measurements, ...filled }, rules) : null;

  const visible = (area: Area) => everything || worked.has(area);
  const submit = async () => {
    setFeedback(null);
    if (!count) {
      setFeedback({ tone: 'error', text: 'Fill in at least one re-measured value.' });
      return;
    }
    if (!valid) {
      setFeedback({ tone: 'error', text: 'Some values are out of range: see the fields marked in red.' });
      return;
    }
    const outcome = await onSubmit(filled, note.trim() || null);
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.message });
      return;
    }
    setResult({ version: outcome.version, grade: outcome.grade });
    setNumbers({});
    setRatings({});
    setTouches(null);
    setTouchKeys('');
    setChoices({});
    setNote('');
    setFeedback({ tone: 'success', text: `Re-measurement saved as assessment version ${outcome.version}.` });
  };

  const m = latest?.measurements ?? {};
  return (
    <Card role="form" accessibilityLabel="Re-measure">
      <Heading level={2}>Re-measure after the work</Heading>
      <Body tone="secondary">
        {everything ? 'Every measurement is open.' : 'The areas this plan worked on, and the play test.'} Leave a field empty to keep its last value
        {latest ? ` (from version ${latest.version})` : ''}.
      </Body>
      {NUMBER_FIELDS.some((f) => visible(f.area)) ? (
        <FieldRow>
          {NUMBER_FIELDS.filter((f) => visible(f.area)).map((f) => (
            <View key={f.key} style={styles.field}>
              <TextField
                label={f.label}
                hint={`${f.hint} Last: ${shown(m[f.key], f.unit)}.`}
                value={numbers[f.key] ?? ''}
                onChangeText={(t) => setNumbers((prev) => ({ ...prev, [f.key]: t }))}
                unit={f.unit}
                inputMode={f.whole ? 'numeric' : 'decimal'}
                keyboardType={f.whole ? 'number-pad' : 'decimal-pad'}
                error={errors[f.key]}
                testID={`remeasure-${f.key}`}
              />
            </View>
          ))}
        </FieldRow>
      ) : null}
      {visible('keys') ? (
        <ChoiceGroup
          label="Can a key still be pushed sideways until it touches its neighbour?"
          hint={`Last: ${m.keyTouchesNeighbour == null ? 'not checked' : m.keyTouchesNeighbour ? 'yes' : 'no'}. Tap again to leave it as it was.`}
          options={YES_NO}
          labels={YES_NO_LABELS}
          value={touches}
          onChange={setTouches}
          onClear={() => setTouches(null)}
          testID="remeasure-keyTouchesNeighbour"
        />
      ) : null}
      {visible('keys') && touches === 'yes' ? (
        <KeyListField label="Which keys touch a neighbour" value={touchKeys} onChange={setTouchKeys} error={errors.keysTouchingNeighbour} testID="remeasure-keysTouchingNeighbour" />
      ) : null}
      {CHOICE_FIELDS.filter((f) => visible(f.area)).map((f) => (
        <ChoiceGroup
          key={f.key}
          label={f.label}
          hint={`Last: ${m[f.key] ? (f.labels[m[f.key] as string] ?? m[f.key]).toLowerCase() : 'not noted'}. Tap again to leave it as it was.`}
          options={f.options}
          labels={f.labels}
          value={choices[f.key] ?? null}
          onChange={(v) => setChoices((prev) => ({ ...prev, [f.key]: v }))}
          onClear={() => setChoices((prev) => ({ ...prev, [f.key]: undefined }))}
          compact
          testID={`remeasure-${f.key}`}
        />
      ))}
      <View style={styles.play}>
        <Body variant="subheading">Play test, from 1 (plays badly) to 5 (a pleasure to play)</Body>
        {RATING_FIELDS.map((f) => (
          <ChoiceGroup
            key={f.key}
            label={f.label}
            hint={`Last: ${m[f.key] ?? 'not rated'}. Tap again to clear.`}
            options={RATINGS}
            labels={RATING_LABELS}
            value={ratings[f.key] ?? null}
            onChange={(v) => setRatings((prev) => ({ ...prev, [f.key]: v }))}
            onClear={() => setRatings((prev) => ({ ...prev, [f.key]: undefined }))}
            compact
            error={errors[f.key]}
            testID={`remeasure-${f.key}`}
          />
        ))}
      </View>
      <View style={styles.start}>
        <Button label={everything ? 'Show only the areas worked on' : 'Show every measurement'} variant="quiet" onPress={() => setEverything(!everything)} testID="remeasure-all" />
      </View>
      <TextField label="What changed" hint="Optional: kept with the new assessment version." value={note} onChangeText={setNote} multiline maxLength={500} testID="remeasure-note" />
      {latest ? (
        <View style={styles.preview} testID="remeasure-preview" role="status">
          <Body variant="label" tone="secondary">
            Now: {READINESS_WORDS[latest.grade.readiness]}
            {latest.grade.provisional ? ' (provisional)' : ''}
          </Body>
          <Body variant="bodyStrong">
            {preview
              ? `With these values: ${READINESS_WORDS[preview.readiness]}${preview.provisional ? ' (provisional)' : ''} (${preview.findings.filter((f) => f.mark !== 'fine').length} findings to disclose)`
              : count
                ? 'Fix the marked values to see the new grade.'
                : 'Fill in a value to see the new grade.'}
          </Body>
        </View>
      ) : null}
      <Button label={`Save the re-measurement${count ? ` (${count} ${count === 1 ? 'value' : 'values'})` : ''}`} onPress={submit} busy={busy} stretch testID="remeasure-submit" />
      <Feedback state={feedback} testID="remeasure-feedback" />
      {result ? (
        <View style={styles.result} testID="remeasure-result">
          <Heading level={3}>New grade, version {result.version}</Heading>
          <ConditionSummary grade={result.grade} card={card} testID="remeasure-condition" />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  field: { minWidth: 220, flexGrow: 1, flexBasis: 220 },
  play: { gap: SPACE.md },
  start: { alignItems: 'flex-start' },
  preview: { padding: SPACE.md, borderRadius: RADIUS.md, backgroundColor: PALETTE.feltMist, gap: SPACE.xxs },
  result: { gap: SPACE.md, borderTopWidth: 2, borderTopColor: PALETTE.brass, paddingTop: SPACE.lg },
});
