import { useId } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

interface MultiChoiceProps<T extends string> {
  label: string;
  options: readonly T[];
  labels: Record<T, string>;
  value: readonly T[];
  onChange: (value: T[]) => void;
  hint?: string;
  error?: string | null;
  testID?: string;
}

/** Several answers may hold at once (kinds of damage): toggles that look like the radio row, with a tick. */
export function MultiChoice<T extends string>({ label, options, labels, value, onChange, hint, error, testID }: MultiChoiceProps<T>) {
  const id = useId();
  const toggle = (option: T) => onChange(value.includes(option) ? value.filter((v) => v !== option) : options.filter((o) => o === option || value.includes(o)));
  return (
    <View style={styles.field}>
      <Text nativeID={`${id}-label`} style={[TYPE_SCALE.label, styles.label]}>
        {label}
      </Text>
      {hint ? <Text style={[TYPE_SCALE.small, styles.hint]}>{hint}</Text> : null}
      <View role="group" aria-labelledby={`${id}-label`} style={styles.row} testID={testID}>
        {options.map((option) => {
          const on = value.includes(option);
          return (
            <Pressable
              key={option}
              role="checkbox"
              aria-checked={on}
              onPress={() => toggle(option)}
              testID={testID ? `${testID}-${option}` : undefined}
              style={[styles.choice, on && styles.choiceOn]}
            >
              <View aria-hidden style={[styles.box, on && styles.boxOn]}>
                {on ? <View style={styles.tick} /> : null}
              </View>
              <Text style={[TYPE_SCALE.label, { color: on ? PALETTE.ivory : PALETTE.felt }]}>{labels[option]}</Text>
            </Pressable>
          );
        })}
      </View>
      {error ? <Text style={[TYPE_SCALE.small, styles.error]}>{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: SPACE.xs },
  label: { color: PALETTE.ebony },
  hint: { color: PALETTE.pinGrey },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  choice: {
    minHeight: LAYOUT.touchTarget,
    paddingHorizontal: SPACE.lg,
    flexDirection: 'row',
    alignItems: 'center',
    gap: SPACE.sm,
    borderRadius: RADIUS.md,
    borderWidth: 1.5,
    borderColor: PALETTE.felt,
    backgroundColor: PALETTE.vellum,
  },
  choiceOn: { backgroundColor: PALETTE.felt },
  box: { width: 16, height: 16, borderRadius: 3, borderWidth: 2, borderColor: PALETTE.felt, alignItems: 'center', justifyContent: 'center' },
  boxOn: { borderColor: PALETTE.ivory },
  tick: { width: 5, height: 9, borderColor: PALETTE.ivory, borderRightWidth: 2, borderBottomWidth: 2, transform: [{ rotate: '45deg' }], marginTop: -2 },
  error: { color: PALETTE.rosewood },
});
