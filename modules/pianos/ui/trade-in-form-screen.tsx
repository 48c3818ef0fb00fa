import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem, problemWithoutField } from '@/modules/accounts/ui/graph-error';
import { ROLE_HOME } from '@/modules/accounts/ui/staff-nav';
import { useSession } from '@/modules/accounts/ui/use-session';
import { PIANO_KINDS, pianoInput, type PianoInput, type PianoKind } from '@/modules/pianos/core/piano';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Checkbox } from '@/modules/theme/ui/checkbox';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { useCreatePiano } from './use-create-piano';

type Field = keyof PianoInput;
type Draft = Record<'maker' | 'model' | 'serialNumber' | 'year' | 'sizeCm' | 'finish', string> & { kind: PianoKind | null; yearIsEstimate: boolean };
type Errors = Partial<Record<Field | 'form', string>>;

const FIELD_LABELS: Record<Field, string> = {
  maker: 'Maker',
  model: 'Model',
  serialNumber: 'Serial number',
  year: 'Year',
  yearIsEstimate: 'Year is an estimate',
  kind: 'Kind',
  sizeCm: 'Size',
  finish: 'Finish',
};

const KIND_LABELS: Record<PianoKind, string> = { upright: 'Upright', grand: 'Grand' };

const EMPTY: Draft = { maker: '', model: '', serialNumber: '', year: '', sizeCm: '', finish: '', kind: null, yearIsEstimate: false };

const optional = (text: string) => (text.trim() ? text.trim() : null);

/** Draft to input; numbers that do not parse become errors of their own. */
function toInput(draft: Draft): { input?: PianoInput; errors: Errors } {
  const errors: Errors = {};
  const whole = (field: 'year' | 'sizeCm') => {
    const text = draft[field].trim();
    if (!text) return null;
    if (!/^\d+$/.test(text)) {
      errors[field] = `${FIELD_LABELS[field]} must be a whole number`;
      return null;
    }
    return Number(text);
  };
  const raw = {
    maker: draft.maker,
    model: optional(draft.model),
    serialNumber: optional(draft.serialNumber),
    year: whole('year'),
    yearIsEstimate: draft.yearIsEstimate,
    kind: draft.kind ?? undefined,
    sizeCm: whole('sizeCm'),
    finish: optional(draft.finish),
  };
  const parsed = pianoInput.safeParse(raw);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = issue.path[0] as Field;
      errors[field] ??= `${FIELD_LABELS[field] ?? 'Input'} ${issue.message}`;
    }
  }
  return Object.keys(errors).length ? { errors } : { input: parsed.data, errors };
}

/** Taking a piano in: what it is, as far as intake can tell before the assessment. */
export function TradeInFormScreen() {
  const router = useRouter();
  const { user } = useSession();
  const { createPiano, creating } = useCreatePiano();
  const [draft, setDraft] = useState<Draft>(EMPTY);
  const [errors, setErrors] = useState<Errors>({});
  const set = <K extends keyof Draft>(key: K) => (value: Draft[K]) => setDraft((d) => ({ ...d, [key]: value }));

  const submit = async () => {
    const { input, errors: found } = toInput(draft);
    setErrors(found);
    if (!input) return;
    const result = await createPiano(input);
    const created = result.data?.createPiano;
    if (created) {
      router.replace({ pathname: '/pianos/[id]', params: { id: String(created.id), created: '1' } });
      return;
    }
    const problem = graphProblem(result.error);
    if (!problem) return;
    const field = problem.field as Field | undefined;
    if (field && field in FIELD_LABELS) setErrors({ [field]: `${FIELD_LABELS[field]} ${problemWithoutField(problem)}` });
    else setErrors({ form: problem.message });
  };

  const count = Object.keys(errors).filter((k) => k !== 'form').length;
  return (
    <Screen title="Start a trade-in" eyebrow="Intake" width="form">
      <Body tone="secondary">Note what you can see now; the assessment comes later. Only the maker and the kind are needed.</Body>
      {errors.form ? <Notice tone="error">{errors.form}</Notice> : null}
      {count > 0 && !errors.form ? <Notice tone="error">{count === 1 ? 'One field needs a look.' : `${count} fields need a look.`}</Notice> : null}
      <Card role="form" accessibilityLabel="New trade-in" style={styles.form}>
        <TextField label="Maker" value={draft.maker} onChangeText={set('maker')} error={errors.maker} autoCapitalize="words" testID="trade-in-maker" />
        <TextField label="Model" value={draft.model} onChangeText={set('model')} error={errors.model} testID="trade-in-model" />
        <TextField
          label="Serial number"
          hint="Usually stamped on the plate or the pin block."
          value={draft.serialNumber}
          onChangeText={set('serialNumber')}
          error={errors.serialNumber}
          autoCapitalize="characters"
          testID="trade-in-serial"
        />
        <ChoiceGroup label="Kind" options={PIANO_KINDS} labels={KIND_LABELS} value={draft.kind} onChange={set('kind')} error={errors.kind} testID="trade-in-kind" />
        <TextField
          label="Size in cm"
          hint="Height of an upright, length of a grand."
          value={draft.sizeCm}
          onChangeText={set('sizeCm')}
          error={errors.sizeCm}
          inputMode="numeric"
          maxLength={3}
          testID="trade-in-size"
        />
        <View style={styles.yearGroup}>
          <TextField label="Year made" value={draft.year} onChangeText={set('year')} error={errors.year} inputMode="numeric" maxLength={4} testID="trade-in-year" />
          <Checkbox label="The year is an estimate" checked={draft.yearIsEstimate} onChange={set('yearIsEstimate')} testID="trade-in-year-estimate" />
        </View>
        <TextField label="Finish" hint="For example satin walnut or polished black." value={draft.finish} onChangeText={set('finish')} error={errors.finish} testID="trade-in-finish" />
        <View style={styles.buttons}>
          <Button label="Record the trade-in" onPress={submit} busy={creating} testID="trade-in-submit" />
          <Button label="Cancel" variant="quiet" href={user ? ROLE_HOME[user.role] : '/'} />
        </View>
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  form: { gap: SPACE.lg, padding: SPACE.xl },
  yearGroup: { gap: SPACE.xs },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, paddingTop: SPACE.sm },
});
