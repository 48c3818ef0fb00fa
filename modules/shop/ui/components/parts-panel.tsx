import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { toMinor } from '@/modules/shop/core/money';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import type { PartView } from '../use-work-item';
import { asCurrency, money, parseAmount } from '../work-format';
import { Feedback, type FeedbackState } from './feedback';
import { Buttons, FieldRow } from './field-row';

interface PartsPanelProps {
  parts: readonly PartView[];
  currency: string;
  blocked: string | null;
  busy: boolean;
  onAdd: (part: { description: string; quantity: number; costMinor: number }) => Promise<FeedbackState>;
}

/** Parts used on the item: what, how many, and the cost of each, typed in the plan's currency. */
export function PartsPanel({ parts, currency, blocked, busy, onAdd }: PartsPanelProps) {
  const [description, setDescription] = useState('');
  const [quantity, setQuantity] = useState('1');
  const [cost, setCost] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const [open, setOpen] = useState(false);
  const cur = asCurrency(currency);
  const total = parts.reduce((s, p) => s + p.costMinor * p.quantity, 0);

  const submit = async () => {
    setFeedback(null);
    const next: Record<string, string> = {};
    const q = Number(quantity);
    const amount = parseAmount(cost);
    if (!description.trim()) next.description = 'Say what the part is.';
    if (!Number.isInteger(q) || q < 1 || q > 1000) next.quantity = 'From 1 to 1000.';
    if (amount == null) next.cost = `The cost of one, in ${cur}, e.g. 18.50.`;
    setErrors(next);
    if (Object.keys(next).length) return;
    const outcome = await onAdd({ description: description.trim(), quantity: q, costMinor: toMinor(amount!, cur) });
    setFeedback(outcome);
    if (outcome?.tone === 'success') {
      setDescription('');
      setQuantity('1');
      setCost('');
      setOpen(false);
    }
  };

  return (
    <Card role="region" accessibilityLabel="Parts used">
      <Heading level={2}>Parts used</Heading>
      {parts.length ? (
        <View role="list" testID="parts-list">
          {parts.map((p) => (
            <View role="listitem" key={p.id} style={styles.row}>
              <View style={styles.grow}>
                <Body>{p.description}</Body>
                <Body variant="small" tone="secondary">
                  {p.quantity} × {money(p.costMinor, cur)}
                </Body>
              </View>
              <Body variant="bodyStrong">{money(p.costMinor * p.quantity, cur)}</Body>
            </View>
          ))}
          <View style={[styles.row, styles.total]}>
            <Body variant="label" tone="secondary">
              Parts in all
            </Body>
            <Body variant="bodyStrong" testID="parts-total">
              {money(total, cur)}
            </Body>
          </View>
        </View>
      ) : (
        <Body tone="secondary">No parts logged yet.</Body>
      )}
      {open ? (
        <>
          <TextField label="Part" hint="e.g. treble string, size 17" value={description} onChangeText={setDescription} error={errors.description} maxLength={200} testID="part-description" />
          <FieldRow>
            <TextField label="How many" value={quantity} onChangeText={(t) => setQuantity(t.replace(/[^0-9]/g, ''))} short inputMode="numeric" keyboardType="number-pad" error={errors.quantity} testID="part-quantity" />
            <TextField label="Cost of one" value={cost} onChangeText={setCost} unit={cur} inputMode="decimal" keyboardType="decimal-pad" error={errors.cost} testID="part-cost" />
          </FieldRow>
          <Buttons>
            <Button label="Add the part" onPress={submit} busy={busy} disabled={!!blocked} testID="part-add" />
            <Button label="Cancel" variant="quiet" onPress={() => setOpen(false)} />
          </Buttons>
        </>
      ) : (
        <Button
          label="Log a part used"
          variant="secondary"
          onPress={() => {
            setFeedback(null);
            setOpen(true);
          }}
          disabled={!!blocked}
          stretch
          testID="part-open"
        />
      )}
      <Feedback state={feedback} testID="part-feedback" />
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md, paddingVertical: SPACE.sm, borderBottomWidth: 1, borderBottomColor: PALETTE.linen },
  grow: { flex: 1, minWidth: 0 },
  total: { justifyContent: 'space-between', borderBottomWidth: 0 },
});
