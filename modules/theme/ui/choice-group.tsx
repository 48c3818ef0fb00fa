import { useId } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

interface ChoiceGroupProps<T extends string> {
  label: string;
  options: readonly T[];
  labels: Record<T, string>;
  value: T | null;
  onChange: (value: T) => void;
  error?: string | null;
  testID?: string;
  /** one row that scrolls sideways instead of wrapping (long lists on a phone) */
  scroll?: boolean;
}

/** A row of radio buttons for a short, fixed list (kind of piano, role, stage filter). */
export function ChoiceGroup<T extends string>({ label, options, labels, value, onChange, error, testID, scroll }: ChoiceGroupProps<T>) {
  const id = useId();
  const group = (
    <View role="radiogroup" aria-labelledby={`${id}-label`} style={[styles.row, scroll && styles.rowScroll]} testID={testID}>
      {options.map((option) => {
        const selected = option === value;
        return (
          <Pressable
            key={option}
            role="radio"
            aria-checked={selected}
            onPress={() => onChange(option)}
            testID={testID ? `${testID}-${option}` : undefined}
            style={[styles.choice, selected && styles.choiceSelected]}
          >
            <View aria-hidden style={[styles.dot, selected && styles.dotSelected]} />
            <Text style={[TYPE_SCALE.label, { color: selected ? PALETTE.ivory : PALETTE.felt }]}>{labels[option]}</Text>
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
      {scroll ? (
        <ScrollView horizontal showsHorizontalScrollIndicator={false} style={styles.scrollerFrame} contentContainerStyle={styles.scroller}>
          {group}
        </ScrollView>
      ) : (
        group
      )}
      {error ? <Text style={[TYPE_SCALE.small, styles.error]}>{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: SPACE.xs },
  label: { color: PALETTE.ebony },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  rowScroll: { flexWrap: 'nowrap' },
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
  choiceSelected: { backgroundColor: PALETTE.felt },
  dot: { width: 12, height: 12, borderRadius: RADIUS.pill, borderWidth: 2, borderColor: PALETTE.felt },
  dotSelected: { borderColor: PALETTE.ivory, backgroundColor: PALETTE.ivory },
  error: { color: PALETTE.rosewood },
});
