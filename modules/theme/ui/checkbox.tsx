import { Pressable, StyleSheet, Text, View } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

interface CheckboxProps {
  label: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  testID?: string;
}

export function Checkbox({ label, checked, onChange, testID }: CheckboxProps) {
  return (
    <Pressable role="checkbox" aria-checked={checked} onPress={() => onChange(!checked)} testID={testID} style={styles.row}>
      <View aria-hidden style={[styles.box, checked && styles.boxChecked]}>
        {checked ? <View style={styles.tick} /> : null}
      </View>
      <Text style={[TYPE_SCALE.body, styles.label]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: LAYOUT.touchTarget, flexDirection: 'row', alignItems: 'center', gap: SPACE.md, alignSelf: 'flex-start', paddingRight: SPACE.sm, maxWidth: '100%' },
  box: {
    width: 24,
    height: 24,
    borderRadius: RADIUS.sm,
    borderWidth: 2,
    borderColor: PALETTE.felt,
    backgroundColor: PALETTE.vellum,
    alignItems: 'center',
    justifyContent: 'center',
  },
  boxChecked: { backgroundColor: PALETTE.felt },
  // a drawn tick: two borders of a rotated box
  tick: { width: 7, height: 13, borderColor: PALETTE.ivory, borderRightWidth: 3, borderBottomWidth: 3, transform: [{ rotate: '45deg' }], marginTop: -3 },
  label: { color: PALETTE.ebony, flexShrink: 1 },
});
