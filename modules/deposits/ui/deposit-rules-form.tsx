import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { depositRulesInput, type DepositRules } from '@/modules/deposits/core/deposit';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { useSetDepositRules } from './use-deposits';

type Field = keyof DepositRules;
const FIELDS: { field: Field; label: string; unit?: string; hint: string }[] = [
  { field: 'percent', label: 'Deposit', unit: '%', hint: 'Share of the asking price, 1 to 100 %.' },
  { field: 'minimumMajor', label: 'Least deposit', hint: 'In whole units of the piano’s currency: 250 means USD 250 on a dollar price.' },
  { field: 'holdDays', label: 'Hold', unit: 'days', hint: 'How long a paid deposit keeps the piano off the floor, 1 to 90 days.' },
  { field: 'salesTaxPct', label: 'Sales tax', unit: '%', hint: 'Added to the price at the sale; 0 where none applies.' },
];

/** A manager's deposit rules: shop defaults, not facts. New deposits use them; paid ones keep theirs. */
export function DepositRulesForm({ rules, onSaved }: { rules: DepositRules; onSaved?: (rules: DepositRules) => void }) {
  const [text, setText] = useState<Record<Field, string>>(() => ({
    percent: String(rules.percent),
    minimumMajor: String(rules.minimumMajor),
    holdDays: String(rules.holdDays),
    salesTaxPct: String(rules.salesTaxPct),
  }));
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const [feedback, setFeedback] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const save = useSetDepositRules();

  const submit = async () => {
    setFeedback(null);
    const numbers = Object.fromEntries(Object.entries(text).map(([k, v]) => [k, v.trim() === '' ? Number.NaN : Number(v.replace(',', '.'))])) as Record<Field, number>;
    const parsed = depositRulesInput.safeParse(numbers);
    if (!parsed.success) {
      const found: Partial<Record<Field, string>> = {};
      for (const issue of parsed.error.issues) {
        const f = issue.path[0] as Field;
        found[f] ??= Number.isNaN(numbers[f]) ? 'Type a number.' : `${issue.message.charAt(0).toUpperCase()}${issue.message.slice(1)}.`.replace('..', '.');
      }
      setErrors(found);
      return;
    }
    setErrors({});
    const outcome = await save.run({ r: parsed.data });
    if (!outcome.ok) {
      const field = outcome.problem.field as Field | undefined;
      if (field && field in text) setErrors({ [field]: outcome.problem.message.replace(`${field}: `, '') });
      else setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setFeedback({ tone: 'success', text: 'Deposit rules saved. New deposits use them from now on; deposits already paid keep their amount and hold.' });
    onSaved?.(outcome.data);
  };

  return (
    <View style={styles.form} testID="deposit-rules-form">
      <View style={styles.grid}>
        {FIELDS.map((f) => (
          <View key={f.field} style={styles.cell}>
            <TextField
              label={f.label}
              hint={f.hint}
              unit={f.unit}
              value={text[f.field]}
              onChangeText={(v) => setText((t) => ({ ...t, [f.field]: v }))}
              error={errors[f.field]}
              inputMode="decimal"
              keyboardType="decimal-pad"
              testID={`rules-${f.field}`}
            />
          </View>
        ))}
      </View>
      <Body variant="small" tone="quiet">
        These are the shop’s own defaults: set them to the dealer’s terms of sale and local law.
      </Body>
      <View style={styles.buttons}>
        <Button label="Save the deposit rules" onPress={submit} busy={save.busy} testID="rules-save" />
      </View>
      {feedback ? (
        <Notice tone={feedback.tone} testID="rules-feedback">
          {feedback.text}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: SPACE.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.lg },
  cell: { flexGrow: 1, flexBasis: 240, minWidth: 0 },
  buttons: { flexDirection: 'row' },
});
