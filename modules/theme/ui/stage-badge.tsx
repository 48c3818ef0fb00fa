import { StyleSheet, Text, View } from 'react-native';

import { STAGE_LABELS, type Stage } from '@/modules/pianos/core/piano';
import { PALETTE, SPACE, STAGE_TONES, TYPE_SCALE } from '@/modules/theme/core/palette';

/** The eyelet punched through a stock tag's strip: the tag's own mark, the same for every stage. */
export function Eyelet({ size = 6 }: { size?: number }) {
  return <View aria-hidden style={[styles.eyelet, { width: size, height: size, borderRadius: size / 2 }]} />;
}

/** The stage of a piano as a stock tag: a strip in the stage's colour with its eyelet, then the stage's words. */
export function StageBadge({ stage, testID }: { stage: Stage; testID?: string }) {
  const tone = STAGE_TONES[stage];
  return (
    <View style={[styles.tag, { backgroundColor: tone.ground, borderColor: tone.edge }]} testID={testID}>
      <View style={[styles.strip, { backgroundColor: tone.edge }]}>
        <Eyelet />
      </View>
      <Text style={[TYPE_SCALE.badge, styles.word, { color: tone.ink }]}>{STAGE_LABELS[stage]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  tag: { flexDirection: 'row', alignItems: 'stretch', alignSelf: 'flex-start', borderWidth: 1, borderRadius: 3, overflow: 'hidden' },
  strip: { width: 14, alignItems: 'center', justifyContent: 'center' },
  eyelet: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linenDark },
  word: { paddingHorizontal: SPACE.sm, paddingVertical: 3 },
});
