import { Image, Pressable, StyleSheet, View } from 'react-native';

import type { DisclosureAreaContent } from '@/modules/disclosure/core/disclosure';
import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { SEVERITY_WORDS } from '../disclosure-format';
import type { DisclosurePhoto } from '../public-disclosure';
import { SeverityShape } from './condition-mark';

interface AreaDetailsProps {
  area: DisclosureAreaContent;
  photos: readonly DisclosurePhoto[];
  onOpenPhoto: (photoId: number) => void;
  /** the findings come from the inspection after the workshop work */
  afterWorkshop: boolean;
  /** the floor tablet's larger type */
  large?: boolean;
}

/** One area of the piano: what was found, what was done, and its photos. */
export function AreaDetails({ area, photos, onOpenPhoto, afterWorkshop, large }: AreaDetailsProps) {
  const text = large ? styles.largeText : null;
  const remaining = area.findings.filter((f) => f.severity !== 'sound').length;
  return (
    <View style={[styles.wrap, large && styles.wrapLarge]}>
      {area.findings.length ? (
        <View style={styles.part}>
          <PartTitle large={large}>{afterWorkshop ? 'As it stands now' : 'What we found'}</PartTitle>
          <View role="list" style={styles.list}>
            {area.findings.map((f, i) => (
              <View role="listitem" key={i} style={styles.finding}>
                <View style={[styles.markSlot, large && styles.markSlotLarge]}>
                  <SeverityShape severity={f.severity} size={large ? 14 : 11} />
                </View>
                <Body style={[styles.findingText, text]}>
                  {/* good news reads plainly; anything else says what kind of point it is, in words as well as shape */}
                  {f.severity === 'sound' ? null : (
                    <Body variant="bodyStrong" style={text}>
                      {SEVERITY_WORDS[f.severity]}:{' '}
                    </Body>
                  )}
                  {f.text}
                </Body>
              </View>
            ))}
          </View>
        </View>
      ) : (
        <Body tone="secondary" style={text}>
          No findings were recorded in this area.
        </Body>
      )}
      {area.workDone.length ? (
        <View style={styles.part}>
          <PartTitle large={large}>What we did</PartTitle>
          <View role="list" style={styles.list}>
            {area.workDone.map((w, i) => (
              <View role="listitem" key={i} style={styles.finding}>
                <View style={[styles.markSlot, large && styles.markSlotLarge]}>
                  <View aria-hidden style={[styles.tick, large && styles.tickLarge]} />
                </View>
                <Body style={[styles.findingText, text]}>{w}</Body>
              </View>
            ))}
          </View>
        </View>
      ) : null}
      {area.findings.length ? (
        <Body variant={large ? 'bodyStrong' : 'label'} tone="secondary" style={text}>
          {remaining === 0 ? 'Nothing outstanding in this area.' : `${remaining === 1 ? 'One point' : `${remaining} points`} to know about in this area.`}
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
  // the mark sits on the first line of its text
  markSlot: { width: 16, height: TYPE_SCALE.body.lineHeight, alignItems: 'center', justifyContent: 'center' },
  markSlotLarge: { width: 22, height: 32 },
  findingText: { flex: 1, minWidth: 0 },
  largeText: { fontSize: 22, lineHeight: 32 },
  tick: { width: 6, height: 11, borderColor: PALETTE.moss, borderRightWidth: 2.5, borderBottomWidth: 2.5, transform: [{ rotate: '45deg' }], marginTop: -3 },
  tickLarge: { width: 8, height: 15, borderRightWidth: 3, borderBottomWidth: 3 },
  strip: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.md },
  thumbCell: { gap: SPACE.xs },
  thumbButton: { borderRadius: RADIUS.md, overflow: 'hidden', borderWidth: 1, borderColor: PALETTE.linen },
  thumbPressed: { opacity: 0.8 },
});
