import { useState } from 'react';
import { Image, Modal, Pressable, StyleSheet, View, useWindowDimensions } from 'react-native';

import { PHOTO_AREAS } from '@/modules/photos/core/photo-rules';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Body } from '@/modules/theme/ui/text';

import { PHOTO_AREA_LABELS } from '@/modules/photos/ui/photo-labels';
import type { PhotoView } from '@/modules/photos/ui/photo-upload';

const PHASE_LABELS = { before: 'Before the work', after: 'After the work' } as const;

const DAY = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

/** A piano's photos by area; a tap opens the photo at full size. */
export function PhotoGallery({ photos }: { photos: readonly PhotoView[] }) {
  const [open, setOpen] = useState<PhotoView | null>(null);
  const { width, height } = useWindowDimensions();
  return (
    <View style={styles.wrap}>
      {PHOTO_AREAS.filter((a) => photos.some((p) => p.area === a)).map((area) => (
        <View key={area} style={styles.area}>
          <Body variant="label" tone="secondary">
            {PHOTO_AREA_LABELS[area]}
          </Body>
          <View style={styles.grid} role="list">
            {photos
              .filter((p) => p.area === area)
              .map((p) => (
                <View key={p.id} role="listitem" style={styles.cell}>
                  <Pressable
                    role="button"
                    onPress={() => setOpen(p)}
                    accessibilityLabel={`Open the photo${p.caption ? `: ${p.caption}` : ''} at full size`}
                    style={styles.thumbButton}
                    testID="photo-thumb"
                  >
                    <Image source={{ uri: p.url }} style={styles.thumb} />
                  </Pressable>
                  {p.caption || p.phase ? (
                    <Body variant="small" tone="secondary" numberOfLines={2}>
                      {[p.phase ? PHASE_LABELS[p.phase] : '', p.caption ?? ''].filter(Boolean).join(': ')}
                    </Body>
                  ) : null}
                </View>
              ))}
          </View>
        </View>
      ))}
      <Modal visible={open != null} transparent animationType="none" onRequestClose={() => setOpen(null)}>
        <View style={styles.backdrop} role="dialog" aria-modal aria-label="Photo at full size">
          {open ? (
            <View style={styles.viewer}>
              <Image source={{ uri: open.url }} style={{ width: Math.min(width - 32, 1100), height: Math.min(height - 200, 800) }} resizeMode="contain" testID="photo-full" />
              <View style={styles.viewerFoot}>
                <View style={styles.viewerText}>
                  <Body tone="inverse" variant="bodyStrong">
                    {PHOTO_AREA_LABELS[open.area]}
                    {open.caption ? `: ${open.caption}` : ''}
                  </Body>
                  <Body tone="inverse" variant="small">
                    Added {DAY.format(new Date(open.createdAt))}
                  </Body>
                </View>
                <Button label="Close" variant="secondary" onPress={() => setOpen(null)} testID="photo-close" />
              </View>
            </View>
          ) : null}
        </View>
      </Modal>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.lg },
  area: { gap: SPACE.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.md },
  cell: { width: 132, gap: SPACE.xs },
  thumbButton: { borderRadius: RADIUS.md, overflow: 'hidden', borderWidth: 1, borderColor: PALETTE.linen },
  thumb: { width: 132, height: 132, backgroundColor: PALETTE.linen },
  backdrop: { flex: 1, backgroundColor: 'rgba(22,48,42,0.94)', alignItems: 'center', justifyContent: 'center', padding: SPACE.lg },
  viewer: { gap: SPACE.md, alignItems: 'center' },
  viewerFoot: { flexDirection: 'row', alignItems: 'center', gap: SPACE.lg, flexWrap: 'wrap', justifyContent: 'space-between', alignSelf: 'stretch' },
  viewerText: { flexShrink: 1, gap: SPACE.xxs },
});
