import { useId, useState } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

interface TextFieldProps {
  label: string;
  value: string;
  onChangeText: (value: string) => void;
  /** shown below the field in rosewood; also marks the field invalid */
  error?: string | null;
  /** a short help line below the label */
  hint?: string;
  /** the unit the number is typed in (mm, cm, Hz), shown beside the input and read with the label */
  unit?: string;
  /** a field sized for a short number instead of the full width */
  short?: boolean;
  /** several lines of free text (notes) */
  multiline?: boolean;
  secureTextEntry?: boolean;
  keyboardType?: TextInputProps['keyboardType'];
  autoComplete?: TextInputProps['autoComplete'];
  autoCapitalize?: TextInputProps['autoCapitalize'];
  inputMode?: TextInputProps['inputMode'];
  onSubmitEditing?: () => void;
  onBlur?: () => void;
  testID?: string;
  maxLength?: number;
}

// How a unit is read out by a screen reader.
const UNIT_NAMES: Record<string, string> = { mm: 'millimetres', cm: 'centimetres', in: 'inches', Hz: 'hertz' };

/** A labelled text input: label above, hint, the field (with its unit), and its error below. */
export function TextField({ label, error, hint, unit, short, multiline, onBlur, testID, ...input }: TextFieldProps) {
  const id = useId();
  const [focused, setFocused] = useState(false);
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ');
  const field = (
    <TextInput
      {...input}
      multiline={multiline}
      numberOfLines={multiline ? 3 : undefined}
      accessibilityLabel={unit ? `${label}, in ${UNIT_NAMES[unit] ?? unit}` : label}
      aria-invalid={error ? true : undefined}
      aria-describedby={describedBy || undefined}
      testID={testID}
      onFocus={() => setFocused(true)}
      onBlur={() => {
        setFocused(false);
        onBlur?.();
      }}
      style={[
        TYPE_SCALE.body,
        styles.input,
        multiline && styles.multiline,
        unit ? styles.inputWithUnit : null,
        short && styles.short,
        focused && styles.inputFocused,
        error ? styles.inputError : null,
      ]}
    />
  );
  return (
    <View style={styles.field}>
      <Text nativeID={`${id}-label`} style={[TYPE_SCALE.label, styles.label]}>
        {label}
      </Text>
      {hint ? (
        <Text nativeID={`${id}-hint`} style={[TYPE_SCALE.small, styles.hint]}>
          {hint}
        </Text>
      ) : null}
      {unit ? (
        <View style={styles.unitRow}>
          {field}
          <View aria-hidden style={[styles.unit, focused && styles.inputFocused, error ? styles.inputError : null]}>
            <Text style={[TYPE_SCALE.bodyStrong, styles.unitText]}>{unit}</Text>
          </View>
        </View>
      ) : (
        field
      )}
      {error ? (
        <Text nativeID={`${id}-error`} role="alert" style={[TYPE_SCALE.small, styles.error]}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: SPACE.xs },
  label: { color: PALETTE.ebony },
  hint: { color: PALETTE.pinGrey },
  input: {
    minHeight: LAYOUT.touchTarget + 4,
    paddingHorizontal: SPACE.md,
    paddingVertical: SPACE.sm,
    backgroundColor: PALETTE.vellum,
    color: PALETTE.ebony,
    borderWidth: 1.5,
    borderColor: PALETTE.linenDark,
    borderRadius: RADIUS.md,
  },
  multiline: { minHeight: 96, textAlignVertical: 'top' },
  short: { width: 140, flexGrow: 0 },
  unitRow: { flexDirection: 'row', alignItems: 'stretch', alignSelf: 'flex-start', maxWidth: '100%' },
  inputWithUnit: { borderTopRightRadius: 0, borderBottomRightRadius: 0, borderRightWidth: 0, width: 140, minWidth: 0, flexShrink: 1 },
  unit: {
    minWidth: 52,
    paddingHorizontal: SPACE.md,
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: PALETTE.ivory,
    borderWidth: 1.5,
    borderColor: PALETTE.linenDark,
    borderTopRightRadius: RADIUS.md,
    borderBottomRightRadius: RADIUS.md,
  },
  unitText: { color: PALETTE.walnut },
  inputFocused: { borderColor: PALETTE.felt },
  inputError: { borderColor: PALETTE.rosewood, borderWidth: 2 },
  error: { color: PALETTE.rosewood },
});
