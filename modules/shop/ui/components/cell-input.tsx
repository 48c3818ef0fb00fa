import { useState } from 'react';
import { StyleSheet, Text, TextInput, View } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

interface CellInputProps {
  /** read out with the value: the column header and the row, e.g. "Regulation, hours" */
  accessibilityLabel: string;
  value: string;
  onChangeText: (value: string) => void;
  unit: string;
  error?: string | null;
  testID?: string;
}

/** A number in a table cell: the column header labels it on screen, the accessible name says row and column. */
export function CellInput({ accessibilityLabel, value, onChangeText, unit, error, testID }: CellInputProps) {
  const [focused, setFocused] = useState(false);
  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        <TextInput
          value={value}
          onChangeText={onChangeText}
          inputMode="decimal"
          keyboardType="decimal-pad"
          accessibilityLabel={`${accessibilityLabel}, in ${unit}`}
          aria-invalid={error ? true : undefined}
          onFocus={() => setFocused(true)}
          onBlur={() => setFocused(false)}
          testID={testID}
          style={[TYPE_SCALE.body, styles.input, focused && styles.focused, error ? styles.error : null]}
        />
        <View aria-hidden style={[styles.unit, focused && styles.focused, error ? styles.error : null]}>
          <Text style={[TYPE_SCALE.label, styles.unitText]}>{unit}</Text>
        </View>
      </View>
      {error ? <Text style={[TYPE_SCALE.small, styles.errorText]}>{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.xxs },
  row: { flexDirection: 'row', alignItems: 'stretch' },
  input: {
    width: 110,
    minHeight: LAYOUT.touchTarget,
    paddingHorizontal: SPACE.sm,
    backgroundColor: PALETTE.vellum,
    color: PALETTE.ebony,
    borderWidth: 1.5,
    borderRightWidth: 0,
    borderColor: PALETTE.linenDark,
    borderTopLeftRadius: RADIUS.md,
    borderBottomLeftRadius: RADIUS.md,
  },
  unit: {
    minWidth: 48,
    paddingHorizontal: SPACE.sm,
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: PALETTE.ivory,
    borderWidth: 1.5,
    borderColor: PALETTE.linenDark,
    borderTopRightRadius: RADIUS.md,
    borderBottomRightRadius: RADIUS.md,
  },
  unitText: { color: PALETTE.walnut },
  focused: { borderColor: PALETTE.felt },
  error: { borderColor: PALETTE.rosewood, borderWidth: 2 },
  errorText: { color: PALETTE.rosewood },
});
