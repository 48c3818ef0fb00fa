import { useId } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

interface ChoiceGroupProps<T extends string> {
  label: string;
  options: readonly T[];
  labels: Record<T, string>;
  value: T | null;
  onChange: (value: T) => void;
  /** when given, tapping the chosen option again clears the answer (an optional question) */
  onClear?: () => void;
  error?: string | null;
  /** a short help line below the label */
  hint?: string;
  testID?: string;
  /** one row that scrolls sideways instead of wrapping (long lists on a phone) */
  scroll?: boolean;
  /** equal cells without the radio dot, for a scale such as 1 to 5 */
  compact?: boolean;
}

/** A row of radio buttons for a short, fixed list (kind of piano, role, stage filter, a rating). */
export function ChoiceGroup<T extends string>({ label, options, labels, value, onChange, onClear, error, hint, testID, scroll, compact }: ChoiceGroupProps<T>) {
  const id = useId();
  const group = (
    <View
      role="radiogroup"
      aria-labelledby={`${id}-label`}
      aria-describedby={[hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined}
      aria-invalid={error ? true : undefined}
      style={[styles.row, scroll && styles.rowScroll, compact && styles.rowCompact]}
      testID={testID}
    >
      {options.map((option) => {
        const selected = option === value;
        return (
          <Pressable
            key={option}
            role="radio"
            aria-checked={selected}
            accessibilityLabel={compact ? `${label}: ${labels[option]}` : undefined}
            onPress={() => (selected && onClear ? onClear() : onChange(option))}
            testID={testID ? `${testID}-${option}` : undefined}
            style={[styles.choice, compact && styles.choiceCompact, selected && styles.choiceSelected, error && !selected ? styles.choiceError : null]}
          >
            {compact ? null : <View aria-hidden style={[styles.dot, selected && styles.dotSelected]} />}
            <Text style={[compact ? TYPE_SCALE.bodyStrong : TYPE_SCALE.label, { color: selected ? PALETTE.ivory : PALETTE.felt }]}>{labels[option]}</Text>
          </Pressable>
        );
      })}
    </View>
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
      {scroll ? (
        <ScrollView horizontal showsHorizontalScrollIndicator={false} style={styles.scrollerFrame} contentContainerStyle={styles.scroller}>
          {group}
        </ScrollView>
      ) : (
        group
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
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  rowScroll: { flexWrap: 'nowrap' },
  rowCompact: { flexWrap: 'nowrap', maxWidth: 360 },
  // room for the focus ring inside the scroller's clip
  scroller: { padding: SPACE.xs },
  scrollerFrame: { marginHorizontal: -SPACE.xs },
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
  choiceCompact: { flex: 1, minWidth: LAYOUT.touchTarget, paddingHorizontal: 0, justifyContent: 'center' },
  choiceSelected: { backgroundColor: PALETTE.felt },
  choiceError: { borderColor: PALETTE.rosewood },
  dot: { width: 12, height: 12, borderRadius: RADIUS.pill, borderWidth: 2, borderColor: PALETTE.felt },
  dotSelected: { borderColor: PALETTE.ivory, backgroundColor: PALETTE.ivory },
  error: { color: PALETTE.rosewood },
});
