import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { inchesTextToMetric, metricToInchesText, parseKeyList, type UnitSystem } from '@/modules/assessment/ui/intake-draft';
import { RATINGS, RATING_LABELS, YES_NO, YES_NO_LABELS } from '@/modules/assessment/ui/measure-labels';
import { SPACE } from '@/modules/theme/core/palette';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import type { DraftUpdate } from './step-props';

interface MeasureInputProps {
  label: string;
  /** the stored metric text */
  value: string;
  onChange: (metric: string) => void;
  unit: 'mm' | 'cm';
  units: UnitSystem;
  hint?: string;
  error?: string;
  testID: string;
}

/** A length: typed in mm or cm, or in inches when the unit switch says so; always stored metric. */
export function MeasureInput({ label, value, onChange, unit, units, hint, error, testID }: MeasureInputProps) {
  if (units === 'metric') {
    return <TextField label={label} value={value} onChangeText={onChange} unit={unit} hint={hint} error={error} inputMode="decimal" keyboardType="decimal-pad" testID={testID} />;
  }
  return <InchesInput key={unit} label={label} value={value} onChange={onChange} unit={unit} hint={hint} error={error} testID={testID} />;
}

function InchesInput({ label, value, onChange, unit, hint, error, testID }: Omit<MeasureInputProps, 'units'>) {
  // The inches as typed stay on screen; the metric value behind them follows each keystroke.
  const [text, setText] = useState(() => metricToInchesText(value, unit));
  const metricNote = value.trim() && !Number.isNaN(Number(value)) ? `= ${value} ${unit}` : undefined;
  return (
    <View style={styles.inches}>
      <TextField
        label={label}
        value={text}
        onChangeText={(t) => {
          setText(t);
          onChange(inchesTextToMetric(t, unit));
        }}
        unit="in"
        hint={hint}
        error={error}
        inputMode="decimal"
        keyboardType="decimal-pad"
        testID={testID}
      />
      {metricNote ? (
        <Body variant="small" tone="quiet">
          {metricNote}, as stored
        </Body>
      ) : null}
    </View>
  );
}

interface YesNoProps {
  label: string;
  value: boolean | null;
  onChange: (value: boolean | null) => void;
  hint?: string;
  error?: string;
  testID: string;
}

/** A yes-or-no question that may stay unanswered: tap the answer again to clear it. */
export function YesNo({ label, value, onChange, hint, error, testID }: YesNoProps) {
  return (
    <ChoiceGroup
      label={label}
      hint={hint}
      options={YES_NO}
      labels={YES_NO_LABELS}
      value={value == null ? null : value ? 'yes' : 'no'}
      onChange={(v) => onChange(v === 'yes')}
      onClear={() => onChange(null)}
      error={error}
      testID={testID}
    />
  );
}

interface RatingProps {
  label: string;
  value: number | null;
  onChange: (value: 1 | 2 | 3 | 4 | 5 | null) => void;
  hint?: string;
  error?: string;
  testID: string;
}

/** A play-test rating from 1 (plays badly) to 5 (a pleasure to play) as one row of five large cells. */
export function RatingRow({ label, value, onChange, hint, error, testID }: RatingProps) {
  return (
    <ChoiceGroup
      label={label}
      hint={hint}
      options={RATINGS}
      labels={RATING_LABELS}
      value={value == null ? null : (String(value) as (typeof RATINGS)[number])}
      onChange={(v) => onChange(Number(v) as 1 | 2 | 3 | 4 | 5)}
      onClear={() => onChange(null)}
      error={error}
      compact
      testID={testID}
    />
  );
}

interface KeyListProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  hint?: string;
  error?: string;
  testID: string;
}

/** Key numbers (1 = lowest A, 88 = top C) typed as a list; the count is read back as a check. */
export function KeyListField({ label, value, onChange, hint, error, testID }: KeyListProps) {
  const keys = parseKeyList(value);
  const count = Array.isArray(keys) ? new Set(keys).size : 0;
  return (
    <View style={styles.inches}>
      <TextField
        label={label}
        hint={hint ?? 'Key numbers 1-88 (1 is the lowest A), separated by commas: 12, 40, 41'}
        value={value}
        onChangeText={onChange}
        inputMode="decimal"
        keyboardType="numbers-and-punctuation"
        error={error}
        testID={testID}
      />
      {count > 0 && !error ? (
        <Body variant="small" tone="quiet">
          {count} {count === 1 ? 'key' : 'keys'}
        </Body>
      ) : null}
    </View>
  );
}

const UNIT_OPTIONS = ['metric', 'inches'] as const;
const UNIT_LABELS: Record<UnitSystem, string> = { metric: 'mm and cm', inches: 'Inches' };

/** Which unit lengths are typed in; what is stored stays metric. */
export function UnitSwitch({ units, update }: { units: UnitSystem; update: DraftUpdate }) {
  return (
    <ChoiceGroup
      label="Type lengths in"
      options={UNIT_OPTIONS}
      labels={UNIT_LABELS}
      value={units}
      onChange={(u) => update((d) => ({ ...d, units: u }))}
      testID="choice-units"
    />
  );
}

const styles = StyleSheet.create({
  inches: { gap: SPACE.xs },
});
