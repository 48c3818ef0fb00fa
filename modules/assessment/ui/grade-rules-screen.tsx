import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem, problemWithoutField } from '@/modules/accounts/ui/graph-error';
import { MARKS, MARK_WORDS, READINESS_WORDS, gradeAssessment, type Grade } from '@/modules/assessment/core/grade';
import { defaultRules, type GradeRules } from '@/modules/assessment/core/grade-rules';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { RULE_FIELDS, RULE_GROUPS, gradeRulesInput, rangeText, type GradeRulesInput, type RuleKey } from '@/modules/assessment/core/rules-input';
import { CellInput } from '@/modules/shop/ui/components/cell-input';
import { Feedback, type FeedbackState } from '@/modules/shop/ui/components/feedback';
import { AbilityGate } from '@/modules/accounts/ui/ability-gate';
import { useRateCard } from '@/modules/shop/ui/use-rate-card';
import { conditionReport } from '@/modules/shop/core/condition-report';
import type { RateCard } from '@/modules/shop/core/rate-card';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { ConditionSummary } from './components/condition-summary';
import { useGradeRulesInForce, useSaveGradeRules } from './use-grade-rules-editor';

const FIELDS = RULE_FIELDS;
const LABELS = Object.fromEntries(FIELDS.map((f) => [f.key, f.label])) as Record<RuleKey, string>;

type Draft = Record<RuleKey, string>;

function valueAt(rules: GradeRules, key: RuleKey): number {
  return rules[key];
}

function draftOf(rules: GradeRules): Draft {
  return Object.fromEntries(FIELDS.map((f) => [f.key, String(valueAt(rules, f.key))])) as Draft;
}

const toNumber = (text: string): number | null => {
  const t = text.trim().replace(',', '.');
  if (!t || !/^-?\d*\.?\d+$/.test(t)) return null;
  return Number(t);
};

/** The draft as the schema's input, or null while a value is not a number. */
function numbersOf(d: Draft): GradeRulesInput | null {
  const n = {} as Record<RuleKey, number>;
  for (const f of FIELDS) {
    const v = toNumber(d[f.key]);
    if (v == null) return null;
    n[f.key] = v;
  }
  return n;
}

/** "must not be below keyLevelSoundMm" reads "must not be below “Key level is sound up to”". */
function inWords(message: string): string {
  return FIELDS.reduce((text, f) => text.split(f.key).join(`“${f.label}”`), message);
}

/** Each field's problem in words, from the same schema the server checks with. */
function problemsOf(d: Draft): Partial<Record<RuleKey, string>> {
  const out: Partial<Record<RuleKey, string>> = {};
  for (const f of FIELDS) if (toNumber(d[f.key]) == null) out[f.key] = rangeText(f);
  const input = numbersOf(d);
  if (!input) return out;
  const parsed = gradeRulesInput.safeParse(input);
  if (parsed.success) return out;
  for (const issue of parsed.error.issues) {
    const key = issue.path.join('.') as RuleKey;
    const field = FIELDS.find((f) => f.key === key);
    if (!field || out[key]) continue;
    out[key] = issue.code === 'custom' ? `This ${inWords(issue.message)}.` : rangeText(field);
  }
  return out;
}

/** An inspection of our own making that touches most rules, so a change shows in the preview. */
export function buildSample(): Measurements {
  return {
    keySidePlayMm: 1.8,
    keyLevelDeviationMm: 1.8,
    hammerGrooveDepthMm: 2.0,
    soundboardCracks: [{ lengthCm: 25, widestGapMm: 0.8, crossesRib: false, buzzes: false, hurtsTuning: false, note: 'cosmetic, between ribs' }],
    a4Hz: 436,
    overallImpression: 4,
  };
}

const SAMPLE = buildSample();
const SAMPLE_WORDS = 'Side play 1.8 mm, keys 1.8 mm out of level, hammer grooves 2.0 mm, one cosmetic soundboard crack 0.8 mm wide, A4 at 436 Hz, play test 4 of 5.';

/** The manager's page for the grading rules: the shop defaults that turn measurements into a grade. Saving makes a new version. */
export function GradeRulesScreen() {
  return (
    <AbilityGate ability="setGradeRules" title="Grading rules">
      <GradeRulesLoader />
    </AbilityGate>
  );
}

function GradeRulesLoader() {
  const { rules, error, refresh } = useGradeRulesInForce();
  const problem = graphProblem(error);
  if (!rules) {
    return (
      <Screen title="Grading rules" eyebrow="Workshop">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the grading rules…" />}
      </Screen>
    );
  }
  return <GradeRulesEditor rules={rules} onSaved={refresh} />;
}

function GradeRulesEditor({ rules, onSaved }: { rules: GradeRules; onSaved: () => void }) {
  const wide = useWide();
  const save = useSaveGradeRules();
  const { card } = useRateCard();
  const [d, setD] = useState<Draft>(() => draftOf(rules));
  const [errors, setErrors] = useState<Partial<Record<RuleKey, string>>>({});
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const inForce = useMemo(() => gradeAssessment(SAMPLE, rules), [rules]);
  const draftInput = useMemo(() => numbersOf(d), [d]);
  const preview = useMemo(() => (draftInput ? gradeAssessment(SAMPLE, { ...draftInput, version: 'your unsaved changes' }) : null), [draftInput]);
  const changed = FIELDS.some((f) => toNumber(d[f.key]) !== valueAt(rules, f.key));

  const setField = (key: RuleKey, text: string) => {
    setD((prev) => ({ ...prev, [key]: text }));
    setErrors((prev) => ({ ...prev, [key]: undefined }));
  };

  const submit = async () => {
    setFeedback(null);
    const problems = problemsOf(d);
    setErrors(problems);
    if (!draftInput || Object.keys(problems).length) {
      setFeedback({ tone: 'error', text: 'Some values need fixing: see the fields marked in red.' });
      return;
    }
    const outcome = await save.run({ r: draftInput });
    if (!outcome.ok) {
      const field = outcome.problem.field as RuleKey | undefined;
      if (field && LABELS[field]) setErrors({ [field]: `This ${inWords(problemWithoutField(outcome.problem))}.` });
      setFeedback({ tone: 'error', text: inWords(outcome.problem.message) });
      return;
    }
    setD(draftOf(outcome.data));
    setFeedback({ tone: 'success', text: `Saved as version ${outcome.data.version}. Intakes graded from now on use it; intakes already graded keep the version they were graded with.` });
    onSaved();
  };

  const fillDefaults = () => {
    setD(draftOf(defaultRules));
    setErrors({});
    setFeedback(null);
  };

  const previewPanel = (
    <Card role="region" accessibilityLabel="Preview on a sample inspection" testID="grading-preview">
      <Heading level={2}>Preview</Heading>
      <Body tone="secondary">{SAMPLE_WORDS}</Body>
      <InForceLine grade={inForce} preview={preview} card={card} />
      {preview ? <ConditionSummary grade={preview} card={card} testID="grading-preview-condition" areaLevel={2} /> : <Notice tone="info">Fill in every value with a number to see the preview.</Notice>}
    </Card>
  );

  const fields = RULE_GROUPS.map((g) => (
    <Card key={g.title} role="group" accessibilityLabel={g.title} testID={`grading-group-${g.title.toLowerCase().replace(/\s+/g, '-')}`}>
      <View style={styles.groupHead}>
        <Heading level={2}>{g.title}</Heading>
        <Body variant="small" tone="secondary">
          {g.description}
        </Body>
      </View>
      {g.fields.map((f, i) =>
        wide ? (
          <View key={f.key} style={[styles.row, i > 0 && styles.rule]}>
            <View style={styles.rowLabel}>
              <Body variant="bodyStrong">{f.label}</Body>
              {f.hint ? (
                <Body variant="small" tone="quiet">
                  {f.hint}
                </Body>
              ) : null}
            </View>
            <View style={styles.rowInput}>
              <CellInput accessibilityLabel={`${g.title}: ${f.label}`} value={d[f.key]} onChangeText={(v) => setField(f.key, v)} unit={f.unit} error={errors[f.key]} testID={`grading-${f.key.replace('.', '-')}`} />
            </View>
          </View>
        ) : (
          <TextField
            key={f.key}
            label={f.label}
            hint={f.hint}
            value={d[f.key]}
            onChangeText={(v) => setField(f.key, v)}
            unit={f.unit}
            inputMode="decimal"
            error={errors[f.key]}
            testID={`grading-${f.key.replace('.', '-')}`}
          />
        ),
      )}
    </Card>
  ));

  return (
    <Screen
      title="Grading rules"
      eyebrow="Workshop"
      headingTestID="grading-heading"
      actions={<Button label="Rate card" variant="secondary" href="/workshop/rates" />}
    >
      <Body tone="secondary">
        In force: version{' '}
        <Body variant="bodyStrong" testID="grading-version">
          {rules.version}
        </Body>
        . These are the shop’s own starting values, not facts of the trade: set them to how your workshop judges a piano. Intakes already graded keep the rules version they were graded with.
      </Body>
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.fieldsColumn}>{fields}</View>
          <View style={styles.previewColumn}>{previewPanel}</View>
        </View>
      ) : (
        <>
          <Section title="Rules" description="Every value with its unit. The preview below follows your changes as you type.">
            <View style={styles.stack}>{fields}</View>
          </Section>
          {previewPanel}
        </>
      )}
      <View style={styles.save}>
        <Button label="Save as a new version" onPress={submit} busy={save.busy} testID="grading-save" />
        <Button label="Undo my changes" variant="quiet" onPress={() => setD(draftOf(rules))} disabled={!changed} testID="grading-undo" />
        <Button label="Fill in the shop defaults" variant="quiet" onPress={fillDefaults} testID="grading-defaults" />
      </View>
      <Feedback state={feedback} testID="grading-feedback" />
    </Screen>
  );
}

/** The sample in words: its verdict, its findings by mark, and the hours of work they call for. */
function sampleWords(grade: Grade, card: RateCard | null): string {
  const counts = MARKS.map((m) => [m, grade.findings.filter((f) => f.mark === m).length] as const).filter(([, n]) => n > 0);
  const work = card ? `, ${String(Number(conditionReport(grade, card).workHours.toFixed(2)))} h of work` : '';
  return `${READINESS_WORDS[grade.readiness]}${grade.provisional ? ' (provisional)' : ''}; ${counts.map(([m, n]) => `${n} ${MARK_WORDS[m].toLowerCase()}`).join(', ')}${work}`;
}

/** How the sample stands under the rules in force, beside how it stands with the draft. */
function InForceLine({ grade, preview, card }: { grade: Grade; preview: Grade | null; card: RateCard | null }) {
  const now = sampleWords(grade, card);
  const next = preview ? sampleWords(preview, card) : null;
  return (
    <View style={styles.inForce} testID="grading-preview-compare">
      <Body variant="small" tone="secondary" testID="grading-in-force">
        Under the rules in force: {now}.
      </Body>
      <Body variant="small" tone={next === now ? 'quiet' : 'accent'} testID="grading-with-changes">
        {next == null ? 'With your changes: not yet a number in every field.' : next === now ? 'Your changes do not move this sample.' : `With your changes: ${next}.`}
      </Body>
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: SPACE.xl },
  fieldsColumn: { flex: 3, minWidth: 0, gap: SPACE.lg },
  previewColumn: { flex: 2, minWidth: 0 },
  stack: { gap: SPACE.md },
  groupHead: { gap: SPACE.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md, paddingTop: SPACE.sm },
  rule: { borderTopWidth: 1, borderTopColor: PALETTE.linen },
  rowLabel: { flex: 1, minWidth: 0, gap: 2 },
  rowInput: { width: 190 },
  inForce: { gap: 2, paddingVertical: SPACE.xs, borderTopWidth: 1, borderBottomWidth: 1, borderColor: PALETTE.linen },
  save: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, alignItems: 'center' },
});
