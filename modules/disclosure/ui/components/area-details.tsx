import { Image, Pressable, StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { MarkLead } from '@/modules/theme/ui/mark';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import type { ShownArea } from '../disclosure-view';
import type { DisclosurePhoto } from '../public-disclosure';

interface AreaDetailsProps {
  area: ShownArea;
  photos: readonly DisclosurePhoto[];
  onOpenPhoto: (photoId: number) => void;
  /** the floor tablet's larger type */
  large?: boolean;
}

/** One area of the piano, in the order it happened: found at intake, the work done, measured after the work. */
export function AreaDetails({ area, photos, onOpenPhoto, large }: AreaDetailsProps) {
  const text = large ? styles.largeText : null;
  return (
    <View style={[styles.wrap, large && styles.wrapLarge]}>
      {area.sections.map((section) => (
        <View key={section.kind} style={styles.part} testID={`area-section-${area.area}-${section.kind}`}>
          <PartTitle large={large}>{section.title}</PartTitle>
          <View role="list" style={styles.list}>
            {section.items.map((item, i) => (
              <View role="listitem" key={i} style={styles.finding}>
                {item.mark ? <MarkLead mark={item.mark} large={large} /> : <View style={[styles.plainSlot, large && styles.plainSlotLarge]}>{section.kind === 'not_done' ? <View style={[styles.openBox, large && styles.openBoxLarge]} /> : null}</View>}
                <Body style={[styles.findingText, text]}>
                  {item.word ? (
                    <Body variant="bodyStrong" style={text}>
                      {item.word}:{' '}
                    </Body>
                  ) : null}
                  {item.text}
                </Body>
              </View>
            ))}
          </View>
        </View>
      ))}
      {area.closing ? (
        <Body variant={large ? 'bodyStrong' : 'label'} tone="secondary" style={text}>
          {area.closing}
        </Body>
      ) : null}
      {photos.length ? <PhotoStrip photos={photos} onOpen={onOpenPhoto} size={large ? 184 : undefined} /> : null}
    </View>
  );
}

function PartTitle({ children, large }: { children: string; large?: boolean }) {
  return (
    <Body variant={large ? 'subheading' : 'label'} tone="accent" style={styles.partTitle}>
      {children}
    </Body>
  );
}

/** Thumbnails; each opens its photo over the whole screen. */
export function PhotoStrip({ photos, onOpen, size }: { photos: readonly DisclosurePhoto[]; onOpen: (photoId: number) => void; size?: number }) {
  const wide = useWide();
  // two to a row on a phone, so a caption has room to be read whole
  size ??= wide ? 176 : 144;
  return (
    <View role="list" style={styles.strip}>
      {photos.map((p) => (
        <View role="listitem" key={p.id} style={[styles.thumbCell, { width: size }]}>
          <Pressable
            role="button"
            onPress={() => onOpen(p.id)}
            accessibilityLabel={`Open the photo${p.caption ? `: ${p.caption}` : ''} at full size`}
            testID={`disclosure-photo-${p.id}`}
            style={({ pressed }) => [styles.thumbButton, pressed && styles.thumbPressed]}
          >
            {p.url ? <Image source={{ uri: p.url }} style={{ width: size, height: size, backgroundColor: PALETTE.linen }} /> : <View style={{ width: size, height: size, backgroundColor: PALETTE.linen }} />}
          </Pressable>
          {p.caption ? (
            <Body variant="small" tone="secondary">
              {p.caption}
            </Body>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.lg },
  wrapLarge: { gap: SPACE.xl },
  part: { gap: SPACE.sm },
  partTitle: { textTransform: 'uppercase', letterSpacing: 1 },
  list: { gap: SPACE.sm },
  finding: { flexDirection: 'row', alignItems: 'flex-start', gap: SPACE.sm },
  findingText: { flex: 1, minWidth: 0 },
  largeText: { fontSize: 22, lineHeight: 32 },
  // items with no mark of their own: work not done gets an open box, the rest only their place
  plainSlot: { width: 14, height: 25, alignItems: 'center', justifyContent: 'center' },
  plainSlotLarge: { width: 20, height: 32 },
  openBox: { width: 10, height: 10, borderWidth: 1.5, borderColor: PALETTE.walnut },
  openBoxLarge: { width: 13, height: 13, borderWidth: 2 },
  strip: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.md },
  thumbCell: { gap: SPACE.xs },
  thumbButton: { borderRadius: RADIUS.md, overflow: 'hidden', borderWidth: 1, borderColor: PALETTE.linen },
  thumbPressed: { opacity: 0.8 },
});
