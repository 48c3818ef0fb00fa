import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { WORK_TASKS, WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import { CURRENCIES, toMinor, type Currency } from '@/modules/shop/core/money';
import type { RateCard } from '@/modules/shop/core/rate-card';
import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Checkbox } from '@/modules/theme/ui/checkbox';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { CellInput } from './components/cell-input';
import { Feedback, type FeedbackState } from './components/feedback';
import { AbilityGate } from '@/modules/accounts/ui/ability-gate';
import { useRateCard, useSaveRateCard } from './use-rate-card';
import { minorToText, money, parseAmount, parseNumber } from './work-format';

interface TaskDraft {
  hours: string;
  parts: string;
  perUnit: boolean;
}

interface CardDraft {
  currency: Currency;
  hourly: string;
  tasks: Record<WorkTask, TaskDraft>;
}

function draftOf(card: RateCard): CardDraft {
  return {
    currency: card.currency,
    hourly: minorToText(card.hourlyRateMinor, card.currency),
    tasks: Object.fromEntries(
      WORK_TASKS.map((t) => {
        const r = card.tasks[t] ?? { hours: 0, partsMinor: 0 };
        return [t, { hours: String(r.hours), parts: minorToText(r.partsMinor, card.currency), perUnit: !!r.perUnit }];
      }),
    ) as Record<WorkTask, TaskDraft>,
  };
}

const CURRENCY_LABELS = Object.fromEntries(CURRENCIES.map((c) => [c, c])) as Record<Currency, string>;

/** The workshop's rate card: the hourly rate and, per task, the usual hours and parts. Saving makes a new version. */
export function RateCardScreen() {
  return (
    <AbilityGate ability="setRates" title="Rate card">
      <RateCardLoader />
    </AbilityGate>
  );
}

function RateCardLoader() {
  const { card, error, refresh } = useRateCard();
  const problem = graphProblem(error);
  if (!card) {
    return (
      <Screen title="Rate card" eyebrow="Workshop">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the rate card…" />}
      </Screen>
    );
  }
  return <RateCardEditor key={card.version} card={card} onSaved={refresh} />;
}

function RateCardEditor({ card, onSaved }: { card: RateCard; onSaved: () => void }) {
  const wide = useWide();
  const save = useSaveRateCard();
  const [d, setD] = useState<CardDraft>(() => draftOf(card));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const setTask = (t: WorkTask, change: Partial<TaskDraft>) => setD((prev) => ({ ...prev, tasks: { ...prev.tasks, [t]: { ...prev.tasks[t], ...change } } }));

  const submit = async () => {
    setFeedback(null);
    const next: Record<string, string> = {};
    const hourly = parseAmount(d.hourly);
    if (hourly == null) next.hourly = `An amount in ${d.currency}, e.g. 95.00.`;
    const tasks = {} as RateCard['tasks'];
    for (const t of WORK_TASKS) {
      const h = parseNumber(d.tasks[t].hours);
      const p = d.tasks[t].parts.trim() ? parseAmount(d.tasks[t].parts) : 0;
      if (h == null || Number.isNaN(h) || h < 0 || h > 200) next[`${t}.hours`] = '0 to 200 hours.';
      if (p == null) next[`${t}.parts`] = `An amount in ${d.currency}.`;
      if (h != null && !Number.isNaN(h) && p != null) tasks[t] = { hours: h, partsMinor: toMinor(p, d.currency), ...(d.tasks[t].perUnit ? { perUnit: true } : {}) };
    }
    setErrors(next);
    if (Object.keys(next).length) {
      setFeedback({ tone: 'error', text: 'Some values need fixing: see the fields marked in red.' });
      return;
    }
    const outcome = await save.run({ c: { currency: d.currency, hourlyRateMinor: toMinor(hourly!, d.currency), tasks } });
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setFeedback({ tone: 'success', text: `Saved as version ${outcome.data.version}. New plans use it; plans already drafted keep their own rate.` });
    onSaved();
  };

  return (
    <Screen
      title="Rate card"
      eyebrow="Workshop"
      headingTestID="rates-heading"
      actions={<Button label="Overruns" variant="secondary" href="/workshop/overruns" />}
    >
      <Body tone="secondary">
        Version <Body variant="bodyStrong">{card.version}</Body>, {money(card.hourlyRateMinor, card.currency)} an hour. These are the shop’s own numbers: a plan takes the card in force when it is drafted.
      </Body>
      <Card role="form" accessibilityLabel="Hourly rate">
        <ChoiceGroup label="Currency" options={CURRENCIES} labels={CURRENCY_LABELS} value={d.currency} onChange={(c) => setD((prev) => ({ ...prev, currency: c }))} testID="rates-currency" />
        <TextField label="Hourly rate" value={d.hourly} onChangeText={(t) => setD((prev) => ({ ...prev, hourly: t }))} unit={d.currency} inputMode="decimal" error={errors.hourly} testID="rates-hourly" />
      </Card>
      <Section title="Tasks" description="The usual hours and parts of each task. “Per unit” multiplies both by the quantity (strings, keytops).">
        {wide ? (
          <View style={styles.table} role="table">
            <View style={[styles.tr, styles.th]} role="row">
              <Text role="columnheader" style={[TYPE_SCALE.label, styles.thText, styles.taskCol]}>
                Task
              </Text>
              <Text role="columnheader" style={[TYPE_SCALE.label, styles.thText, styles.numCol]}>
                Usual hours
              </Text>
              <Text role="columnheader" style={[TYPE_SCALE.label, styles.thText, styles.numCol]}>
                Usual parts
              </Text>
              <Text role="columnheader" style={[TYPE_SCALE.label, styles.thText, styles.unitCol]}>
                Per unit
              </Text>
            </View>
            {WORK_TASKS.map((t, i) => (
              <View key={t} style={[styles.tr, i > 0 && styles.rule]} role="row" testID={`rates-task-${t}`}>
                <View style={styles.taskCol} role="cell">
                  <Body variant="bodyStrong">{WORK_TASK_LABELS[t]}</Body>
                </View>
                <View style={styles.numCol} role="cell">
                  <CellInput accessibilityLabel={`${WORK_TASK_LABELS[t]}, usual hours`} value={d.tasks[t].hours} onChangeText={(v) => setTask(t, { hours: v })} unit="h" error={errors[`${t}.hours`]} testID={`rates-${t}-hours`} />
                </View>
                <View style={styles.numCol} role="cell">
                  <CellInput accessibilityLabel={`${WORK_TASK_LABELS[t]}, usual parts`} value={d.tasks[t].parts} onChangeText={(v) => setTask(t, { parts: v })} unit={d.currency} error={errors[`${t}.parts`]} testID={`rates-${t}-parts`} />
                </View>
                <View style={styles.unitCol} role="cell">
                  <Checkbox label="Per unit" checked={d.tasks[t].perUnit} onChange={(v) => setTask(t, { perUnit: v })} testID={`rates-${t}-per-unit`} />
                </View>
              </View>
            ))}
          </View>
        ) : (
          <View role="list" style={styles.tasks}>
            {WORK_TASKS.map((t) => (
              <View role="listitem" key={t} style={styles.task} testID={`rates-task-${t}`}>
                <Body variant="bodyStrong">{WORK_TASK_LABELS[t]}</Body>
                <View style={styles.taskFields}>
                  <TextField label="Hours" value={d.tasks[t].hours} onChangeText={(v) => setTask(t, { hours: v })} unit="h" inputMode="decimal" error={errors[`${t}.hours`]} testID={`rates-${t}-hours`} />
                  <TextField label="Parts" value={d.tasks[t].parts} onChangeText={(v) => setTask(t, { parts: v })} unit={d.currency} inputMode="decimal" error={errors[`${t}.parts`]} testID={`rates-${t}-parts`} />
                </View>
                <Checkbox label="Per unit" checked={d.tasks[t].perUnit} onChange={(v) => setTask(t, { perUnit: v })} testID={`rates-${t}-per-unit`} />
              </View>
            ))}
          </View>
        )}
      </Section>
      <View style={styles.save}>
        <Button label="Save as a new version" onPress={submit} busy={save.busy} testID="rates-save" />
        <Button label="Undo my changes" variant="quiet" onPress={() => setD(draftOf(card))} />
      </View>
      <Feedback state={feedback} testID="rates-feedback" />
    </Screen>
  );
}

const styles = StyleSheet.create({
  tasks: { gap: SPACE.sm },
  task: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.md, padding: SPACE.md, gap: SPACE.sm },
  table: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, overflow: 'hidden' },
  tr: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md, paddingHorizontal: SPACE.lg, paddingVertical: SPACE.sm },
  th: { backgroundColor: PALETTE.ivory, borderBottomWidth: 2, borderBottomColor: PALETTE.linen },
  thText: { color: PALETTE.walnut },
  rule: { borderTopWidth: 1, borderTopColor: PALETTE.linen },
  taskCol: { flex: 2.4, minWidth: 0 },
  numCol: { flex: 1.5 },
  unitCol: { flex: 1 },
  taskFields: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.md },
  save: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, alignItems: 'center' },
});
