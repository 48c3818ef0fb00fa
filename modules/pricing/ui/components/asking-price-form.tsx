import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { CURRENCIES, CURRENCY_DIGITS, toMinor, type Currency } from '@/modules/shop/core/money';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Notice } from '@/modules/theme/ui/notice';
import { TextField } from '@/modules/theme/ui/text-field';

import { isCurrency, money } from '@/modules/disclosure/ui/disclosure-format';
import { PRICE_REASON_MIN } from '@/modules/pricing/core/offer-input';

import { useChangeAskingPrice } from '../use-piano-money';

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
  /** what to say once saved, beyond the new price */
  savedNote?: string;
  testID?: string;
}

/**
 * A manager sets the asking price in major units, with why; it is stored in minor units (ISO 4217).
 * Every screen that sets a price uses this form and the one mutation behind it, so the history keeps each change.
 */
export function AskingPriceForm({ pianoId, priceMinor, currency, onSaved, savedNote = 'Publish the disclosure again so buyers see it.', testID = 'present-price-form' }: AskingPriceFormProps) {
  const start: Currency = currency && isCurrency(currency) ? currency : 'USD';
  const [cur, setCur] = useState<Currency>(start);
  const [text, setText] = useState(priceMinor != null ? (priceMinor / 10 ** CURRENCY_DIGITS[start]).toFixed(CURRENCY_DIGITS[start]) : '');
  const [error, setError] = useState<string | null>(null);
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string | null>(null);
  const [feedback, setFeedback] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const save = useChangeAskingPrice();

  const submit = async () => {
    setFeedback(null);
    const major = parseMajor(text, cur);
    if (major == null) {
      setError(CURRENCY_DIGITS[cur] ? `Type the price in ${cur}, e.g. 4275 or 4275.50.` : `Type the price in whole ${cur}, e.g. 450000.`);
      return;
    }
    setError(null);
    if (reason.trim().length < PRICE_REASON_MIN) {
      setReasonError('Say why the price is set or changed: it is kept in the price history.');
      return;
    }
    setReasonError(null);
    const minor = toMinor(major, cur);
    const outcome = await save.run({ i: { pianoId, askingPriceMinor: minor, currency: cur, reason: reason.trim() } });
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    setFeedback({ tone: 'success', text: `Asking price set to ${money(minor, cur)}. ${savedNote}` });
    setReason('');
    onSaved?.();
  };

  return (
    <View style={styles.form} testID={testID}>
      <ChoiceGroup label="Currency" options={CURRENCIES} labels={CURRENCY_LABELS} value={cur} onChange={setCur} testID="price-currency" />
      <TextField label="Asking price" unit={cur} value={text} onChangeText={setText} error={error} inputMode="decimal" keyboardType="decimal-pad" testID="price-amount" />
      <TextField label="Why" hint="Kept with the price, e.g. “first price after the work” or “60 days on the floor”." value={reason} onChangeText={setReason} error={reasonError} maxLength={200} onSubmitEditing={submit} testID="price-reason" />
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
