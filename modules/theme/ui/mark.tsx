import { StyleSheet, Text, View } from 'react-native';

import { MARK_WORDS, type AreaMark } from '@/modules/assessment/core/grade';
import { MARK_LOOKS, PALETTE, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

/** A mark's shape, drawn (no icon font); the word always goes beside it, so it is hidden from screen readers. */
export function MarkShape({ mark, size = 10 }: { mark: AreaMark | 'done'; size?: number }) {
  if (mark === 'done') {
    return <View aria-hidden style={[styles.tick, { width: size * 0.55, height: size, borderRightWidth: Math.max(2, size / 4.5), borderBottomWidth: Math.max(2, size / 4.5), marginTop: -size * 0.25 }]} />;
  }
  const { shape, ink } = MARK_LOOKS[mark];
  if (shape === 'triangle') {
    return <View aria-hidden style={{ width: 0, height: 0, borderLeftWidth: size * 0.58, borderRightWidth: size * 0.58, borderBottomWidth: size, borderLeftColor: 'transparent', borderRightColor: 'transparent', borderBottomColor: ink }} />;
  }
  return (
    <View
      aria-hidden
      style={[
        shape === 'circle' && { width: size, height: size, borderRadius: size / 2, backgroundColor: ink },
        shape === 'bar' && { width: size * 1.1, height: Math.max(3, size * 0.38), backgroundColor: ink },
        shape === 'square' && { width: size * 0.9, height: size * 0.9, backgroundColor: ink },
        shape === 'dashed-ring' && { width: size, height: size, borderRadius: size / 2, borderWidth: Math.max(1.5, size / 6), borderStyle: 'dashed', borderColor: ink },
      ]}
    />
  );
}

interface MarkTagProps {
  mark: AreaMark;
  /** the words, when not the mark's own ("Not measured after the work", "Needs work first") */
  label?: string;
  large?: boolean;
  testID?: string;
}

/** A mark as a tag: its shape and word on its ground. The same tag for staff and buyers. */
export function MarkTag({ mark, label, large, testID }: MarkTagProps) {
  const look = MARK_LOOKS[mark];
  return (
    <View style={[styles.tag, large && styles.tagLarge, { backgroundColor: look.ground }, mark === 'unseen' && styles.unseen]} testID={testID}>
      <View style={[styles.slot, large && styles.slotLarge]}>
        <MarkShape mark={mark} size={large ? 14 : 10} />
      </View>
      <Text style={[large ? TYPE_SCALE.subheading : TYPE_SCALE.badge, { color: look.ink }]}>{label ?? MARK_WORDS[mark]}</Text>
    </View>
  );
}

/** A mark and its word leading a line of text, without a ground: for lists of findings. */
export function MarkLead({ mark, large }: { mark: AreaMark | 'done'; large?: boolean }) {
  return (
    // the mark sits on the first line of its text
    <View style={[styles.slot, large && styles.slotLarge, { height: large ? 32 : TYPE_SCALE.body.lineHeight }]}>
      <MarkShape mark={mark} size={large ? 14 : 11} />
    </View>
  );
}

const styles = StyleSheet.create({
  tag: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: SPACE.xs + 2,
    paddingHorizontal: SPACE.sm,
    paddingVertical: 3,
    borderRadius: 3,
  },
  tagLarge: { paddingHorizontal: SPACE.md, paddingVertical: SPACE.xs + 2, gap: SPACE.sm, borderRadius: 4 },
  unseen: { borderWidth: 1, borderStyle: 'dashed', borderColor: PALETTE.linenDark },
  slot: { width: 14, height: 14, alignItems: 'center', justifyContent: 'center' },
  slotLarge: { width: 20, height: 20 },
  tick: { borderColor: PALETTE.moss, transform: [{ rotate: '45deg' }] },
});
