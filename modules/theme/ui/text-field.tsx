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
  secureTextEntry?: boolean;
  keyboardType?: TextInputProps['keyboardType'];
  autoComplete?: TextInputProps['autoComplete'];
  autoCapitalize?: TextInputProps['autoCapitalize'];
  inputMode?: TextInputProps['inputMode'];
  onSubmitEditing?: () => void;
  testID?: string;
  maxLength?: number;
}

/** A labelled text input: label above, hint, the field, and its error below. */
export function TextField({ label, error, hint, testID, ...input }: TextFieldProps) {
  const id = useId();
  const [focused, setFocused] = useState(false);
  const describedBy = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ');
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
      <TextInput
        {...input}
        accessibilityLabel={label}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        testID={testID}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={[TYPE_SCALE.body, styles.input, focused && styles.inputFocused, error ? styles.inputError : null]}
      />
      {error ? (
        <Text nativeID={`${id}-error`} style={[TYPE_SCALE.small, styles.error]}>
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
  inputFocused: { borderColor: PALETTE.felt },
  inputError: { borderColor: PALETTE.rosewood, borderWidth: 2 },
  error: { color: PALETTE.rosewood },
});
