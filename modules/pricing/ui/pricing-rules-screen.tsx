import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { PIANO_KINDS, type PianoKind } from '@/modules/pianos/core/piano';
import { RETAIL_READINESS, type PricingRules, type RetailReadiness } from '@/modules/pricing/core/pricing-rules';
import { READINESS_WORDS } from '@/modules/assessment/core/grade';
import { CURRENCIES, CURRENCY_DIGITS, toMinor, type Currency } from '@/modules/shop/core/money';
import { Feedback, type FeedbackState } from '@/modules/shop/ui/components/feedback';
import { AbilityGate } from '@/modules/accounts/ui/ability-gate';
import { minorToText, parseNumber } from '@/modules/shop/ui/work-format';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { usePricingRules, useSavePricingRules } from './use-pricing-rules';

/** A band as typed: its upper limit (empty on the last, open band) and its figure. */
interface BandDraft {
  limit: string;
  value: string;
}

interface RulesDraft {
  currency: Currency;
  baseRetail: Record<PianoKind, BandDraft[]>;
  ageBands: BandDraft[];
  unknownAge: string;
  condition: Record<RetailReadiness, string>;
  workBands: BandDraft[];
  margin: string;
  holding: string;
  days: Record<PianoKind, string>;
  step: string;
  less: string;
  offerStep: string;
  wholesale: string;
  wholesaleDays: string;
}

const pct = (f: number) => String(Number((f * 100).toFixed(2)));
const KIND_WORDS: Record<PianoKind, string> = { upright: 'Uprights', grand: 'Grands' };
const CURRENCY_LABELS = Object.fromEntries(CURRENCIES.map((c) => [c, c])) as Record<Currency, string>;

function draftOf(r: PricingRules): RulesDraft {
  const m = (minor: number) => minorToText(minor, r.currency);
  return {
    currency: r.currency,
    baseRetail: { upright: r.baseRetail.upright.map((b) => ({ limit: b.upToCm == null ? '' : String(b.upToCm), value: m(b.baseMinor) })), grand: r.baseRetail.grand.map((b) => ({ limit: b.upToCm == null ? '' : String(b.upToCm), value: m(b.baseMinor) })) },
    ageBands: r.ageBands.map((b) => ({ limit: b.upToYears == null ? '' : String(b.upToYears), value: pct(b.factor) })),
    unknownAge: pct(r.unknownAgeFactor),
    condition: { floor: pct(r.conditionFactors.floor), work_first: pct(r.conditionFactors.work_first), unjudged: pct(r.conditionFactors.unjudged) },
    workBands: r.workShareBands.map((b) => ({ limit: b.upToPct == null ? '' : String(b.upToPct), value: pct(b.factor) })),
    margin: pct(r.targetMargin),
    holding: m(r.holdingCostPerDayMinor),
    days: { upright: String(r.daysToSell.upright), grand: String(r.daysToSell.grand) },
    step: m(r.priceEnding.stepMinor),
    less: m(r.priceEnding.lessMinor),
    offerStep: m(r.offerStepMinor),
    wholesale: pct(r.wholesale.factor),
    wholesaleDays: String(r.wholesale.daysToSell),
  };
}

/** The typed draft as the server's rules; a field that is not a number goes as NaN's stand-in, null, and the server names it. */
function rulesOf(d: RulesDraft): Omit<PricingRules, 'version'> {
  const num = (t: string) => parseNumber(t);
  const minor = (t: string) => {
    const n = num(t);
    return n == null || Number.isNaN(n) ? (null as never) : toMinor(n, d.currency);
  };
  const frac = (t: string) => {
    const n = num(t);
    return n == null || Number.isNaN(n) ? (null as never) : Number((n / 100).toFixed(4));
  };
  const limit = (t: string) => (t.trim() === '' ? null : (num(t) as number));
  return {
    currency: d.currency,
    baseRetail: { upright: d.baseRetail.upright.map((b) => ({ upToCm: limit(b.limit), baseMinor: minor(b.value) })), grand: d.baseRetail.grand.map((b) => ({ upToCm: limit(b.limit), baseMinor: minor(b.value) })) },
    ageBands: d.ageBands.map((b) => ({ upToYears: limit(b.limit), factor: frac(b.value) })),
    unknownAgeFactor: frac(d.unknownAge),
    conditionFactors: { floor: frac(d.condition.floor), work_first: frac(d.condition.work_first), unjudged: frac(d.condition.unjudged) },
    workShareBands: d.workBands.map((b) => ({ upToPct: limit(b.limit), factor: frac(b.value) })),
    targetMargin: frac(d.margin),
    holdingCostPerDayMinor: minor(d.holding),
    daysToSell: { upright: num(d.days.upright) as number, grand: num(d.days.grand) as number },
    priceEnding: { stepMinor: minor(d.step), lessMinor: minor(d.less) },
    offerStepMinor: minor(d.offerStep),
    wholesale: { factor: frac(d.wholesale), daysToSell: num(d.wholesaleDays) as number },
  };
}

/** The manager's pricing rules: what each piano is worth by kind, size, age and condition, and what an offer keeps back. */
export function PricingRulesScreen() {
  return (
    <AbilityGate ability="setPricingRules" title="Pricing rules" eyebrow="Manager">
      <Loader />
    </AbilityGate>
  );
}

function Loader() {
  const { rules, error } = usePricingRules();
  const problem = graphProblem(error);
  if (!rules) {
    return (
      <Screen title="Pricing rules" eyebrow="Manager">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the pricing rules…" />}
      </Screen>
    );
  }
  return <Editor key={rules.version} rules={rules} />;
}

function BandList({ title, hint, limitLabel, valueLabel, unit, bands, onChange, testID }: { title: string; hint: string; limitLabel: string; valueLabel: string; unit: string; bands: BandDraft[]; onChange: (b: BandDraft[]) => void; testID: string }) {
  const set = (n: number, patch: Partial<BandDraft>) => onChange(bands.map((b, i) => (i === n ? { ...b, ...patch } : b)));
  return (
    <View style={styles.bands} testID={testID}>
      <Body variant="subheading">{title}</Body>
      <Body variant="small" tone="secondary">
        {hint}
      </Body>
      {bands.map((b, n) => (
        <View key={n} style={styles.band}>
          <View style={styles.bandField}>
            <TextField short label={n === bands.length - 1 ? `${limitLabel} (empty: no limit)` : limitLabel} value={b.limit} onChangeText={(limit) => set(n, { limit })} inputMode="decimal" testID={`${testID}-limit-${n}`} />
          </View>
          <View style={styles.bandField}>
            <TextField short label={valueLabel} unit={unit} value={b.value} onChangeText={(value) => set(n, { value })} inputMode="decimal" testID={`${testID}-value-${n}`} />
          </View>
          {bands.length > 1 ? <Button label="Remove" variant="quiet" onPress={() => onChange(bands.filter((_, i) => i !== n))} /> : null}
        </View>
      ))}
      <View style={styles.left}>
        <Button label="Add a band" variant="secondary" onPress={() => onChange([...bands.slice(0, -1), { limit: '', value: bands[bands.length - 1]?.value ?? '' }, ...bands.slice(-1)])} />
      </View>
    </View>
  );
}

function Editor({ rules }: { rules: PricingRules }) {
  const [draft, setDraft] = useState<RulesDraft>(() => draftOf(rules));
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const save = useSavePricingRules();
  const set = <K extends keyof RulesDraft>(key: K, value: RulesDraft[K]) => setDraft((d) => ({ ...d, [key]: value }));
  const cur = draft.currency;
  const submit = async () => {
    setFeedback(null);
    const outcome = await save.run({ r: rulesOf(draft) });
    setFeedback(outcome.ok ? { tone: 'success', text: `Saved as ${outcome.data.version}. New offers and suggested prices use it; offers already answered keep the version they were made with.` } : { tone: 'error', text: outcome.problem.message });
  };
  return (
    <Screen title="Pricing rules" eyebrow={`Manager · version ${rules.version}`} width="form" headingTestID="pricing-rules-heading">
      <Notice tone="info">These are the shop’s own figures (the demo starts with invented ones). Saving makes a new version; nothing already recorded changes.</Notice>
      <Section title="Value">
        <Card>
          <ChoiceGroup label="Currency" hint={`Money is typed in ${cur} (${CURRENCY_DIGITS[cur]} decimals); the rate card must be in the same currency.`} options={CURRENCIES} labels={CURRENCY_LABELS} value={cur} onChange={(c) => set('currency', c)} testID="pricing-currency" />
          {PIANO_KINDS.map((k) => (
            <BandList key={k} title={`Base retail value: ${KIND_WORDS[k].toLowerCase()}`} hint="By size: height of an upright, length of a grand. A piano with no size measured is priced in the first band." limitLabel="Up to (cm)" valueLabel="Base value" unit={cur} bands={draft.baseRetail[k]} onChange={(b) => set('baseRetail', { ...draft.baseRetail, [k]: b })} testID={`pricing-base-${k}`} />
          ))}
          <BandList title="Age" hint="The share of the base value kept, by age in years." limitLabel="Up to (years)" valueLabel="Kept" unit="%" bands={draft.ageBands} onChange={(b) => set('ageBands', b)} testID="pricing-age" />
          <TextField short label="Year not known: kept" unit="%" value={draft.unknownAge} onChangeText={(v) => set('unknownAge', v)} inputMode="decimal" />
        </Card>
      </Section>
      <Section title="Condition">
        <Card>
          {RETAIL_READINESS.map((r) => (
            <TextField key={r} short label={`${READINESS_WORDS[r]}: kept`} unit="%" value={draft.condition[r]} onChangeText={(v) => set('condition', { ...draft.condition, [r]: v })} inputMode="decimal" testID={`pricing-condition-${r}`} />
          ))}
          <BandList title="Work it needs" hint="The work money as a share of the value after age, and the share of the value kept." limitLabel="Up to (% of value)" valueLabel="Kept" unit="%" bands={draft.workBands} onChange={(b) => set('workBands', b)} testID="pricing-work" />
        </Card>
      </Section>
      <Section title="Offers and prices">
        <Card>
          <TextField short label="Target gross margin" hint="A share of the asking price an offer keeps back." unit="%" value={draft.margin} onChangeText={(v) => set('margin', v)} inputMode="decimal" testID="pricing-margin" />
          <TextField short label="Holding cost a day" unit={cur} value={draft.holding} onChangeText={(v) => set('holding', v)} inputMode="decimal" />
          {PIANO_KINDS.map((k) => (
            <TextField key={k} short label={`${KIND_WORDS[k]}: days to sell`} unit="days" value={draft.days[k]} onChangeText={(v) => set('days', { ...draft.days, [k]: v })} inputMode="numeric" />
          ))}
          <TextField short label="Asking prices to the nearest" unit={cur} value={draft.step} onChangeText={(v) => set('step', v)} inputMode="decimal" />
          <TextField short label="…less" hint="0 for round prices; 5 with a step of 100 gives 3,495." unit={cur} value={draft.less} onChangeText={(v) => set('less', v)} inputMode="decimal" />
          <TextField short label="Offers down to a whole" unit={cur} value={draft.offerStep} onChangeText={(v) => set('offerStep', v)} inputMode="decimal" />
          <TextField short label="Wholesale figure: share of the value" unit="%" value={draft.wholesale} onChangeText={(v) => set('wholesale', v)} inputMode="decimal" />
          <TextField short label="Wholesale: days to sell" unit="days" value={draft.wholesaleDays} onChangeText={(v) => set('wholesaleDays', v)} inputMode="numeric" />
        </Card>
      </Section>
      <View style={styles.left}>
        <Button label="Save as a new version" onPress={submit} busy={save.busy} testID="pricing-save" />
      </View>
      <Feedback state={feedback} testID="pricing-feedback" />
    </Screen>
  );
}

const styles = StyleSheet.create({
  bands: { gap: SPACE.sm, paddingTop: SPACE.sm },
  band: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: SPACE.sm },
  bandField: { minWidth: 150 },
  left: { alignItems: 'flex-start' },
});
