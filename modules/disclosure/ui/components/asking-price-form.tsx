import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { CURRENCIES, CURRENCY_DIGITS, toMinor, type Currency } from '@/modules/shop/core/money';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Notice } from '@/modules/theme/ui/notice';
import { TextField } from '@/modules/theme/ui/text-field';

import { isCurrency, money } from '../disclosure-format';
import { useSetAskingPrice } from '../use-disclosures';

const CURRENCY_LABELS = Object.fromEntries(CURRENCIES.map((c) => [c, c])) as Record<Currency, string>;

/** "4,275.00" or "4275" typed in major units; null when it is not a price. */
export function parseMajor(text: string, currency: Currency): number | null {
  const cleaned = text.replace(/[\s,]/g, '');
  const digits = CURRENCY_DIGITS[currency];
  const pattern = digits ? new RegExp(`^\\d{1,9}(\\.\\d{1,${digits}})?$`) : /^\d{1,12}$/;
  return pattern.test(cleaned) ? Number(cleaned) : null;
}

interface AskingPriceFormProps {
  pianoId: number;
  priceMinor: number | null;
  currency: string | null;
  onSaved?: () => void;
  testID?: string;
}

/** A manager sets the asking price in major units; it is stored in minor units (ISO 4217). */
export function AskingPriceForm({ pianoId, priceMinor, currency, onSaved, testID = 'present-price-form' }: AskingPriceFormProps) {
  const start: Currency = currency && isCurrency(currency) ? currency : 'USD';
  const [cur, setCur] = useState<Currency>(start);
  const [text, setText] = useState(priceMinor != null ? (priceMinor / 10 ** CURRENCY_DIGITS[start]).toFixed(CURRENCY_DIGITS[start]) : '');
  const [error, setError] = useState<string | null>(null);
  const [feedback, setFeedback] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const save = useSetAskingPrice();

  const submit = async () => {
    setFeedback(null);
    const major = parseMajor(text, cur);
    if (major == null) {
      setError(CURRENCY_DIGITS[cur] ? `Type the price in ${cur}, e.g. 4275 or 4275.50.` : `Type the price in whole ${cur}, e.g. 450000.`);
      return;
    }
    setError(null);
    const minor = toMinor(major, cur);
    const outcome = await save.run({ i: { pianoId, askingPriceMinor: minor, currency: cur } });
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setFeedback({ tone: 'success', text: `Asking price set to ${money(minor, cur)}. Publish the disclosure again so buyers see it.` });
    onSaved?.();
  };

  return (
    <View style={styles.form} testID={testID}>
      <ChoiceGroup label="Currency" options={CURRENCIES} labels={CURRENCY_LABELS} value={cur} onChange={setCur} testID="price-currency" />
      <TextField label="Asking price" unit={cur} value={text} onChangeText={setText} error={error} inputMode="decimal" keyboardType="decimal-pad" onSubmitEditing={submit} testID="price-amount" />
      <View style={styles.buttons}>
        <Button label="Save the price" onPress={submit} busy={save.busy} testID="price-save" />
      </View>
      {feedback ? (
        <Notice tone={feedback.tone} testID="price-feedback">
          {feedback.text}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: SPACE.md },
  buttons: { flexDirection: 'row' },
});
