import { useEffect } from 'react';
import { Image, Modal, Pressable, StyleSheet, View, useWindowDimensions } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Body } from '@/modules/theme/ui/text';

import type { DisclosurePhoto } from '../public-disclosure';

interface PhotoViewerProps {
  photos: readonly DisclosurePhoto[];
  /** the photo on screen; null keeps the viewer closed */
  index: number | null;
  onIndex: (index: number | null) => void;
  /** the area's name for each photo, shown above its caption */
  areaLabel: (area: string) => string;
}

/** A photo over the whole screen, with the previous and next photo of the same set, and Escape to close. */
export function PhotoViewer({ photos, index, onIndex, areaLabel }: PhotoViewerProps) {
  const { width, height } = useWindowDimensions();
  const open = index != null && photos[index] != null;
  const photo = open ? photos[index] : null;
  const many = photos.length > 1;

  useEffect(() => {
    if (!open || typeof window === 'undefined') return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') onIndex(null);
      if (event.key === 'ArrowRight' && many) onIndex(((index ?? 0) + 1) % photos.length);
      if (event.key === 'ArrowLeft' && many) onIndex(((index ?? 0) - 1 + photos.length) % photos.length);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [open, index, many, photos.length, onIndex]);

  const narrow = width < 600;
  return (
    <Modal visible={open} transparent animationType="none" onRequestClose={() => onIndex(null)}>
      <View style={styles.backdrop} role="dialog" aria-modal aria-label="Photo at full size">
        {photo ? (
          <>
            <Pressable style={styles.imageArea} onPress={() => onIndex(null)} accessibilityLabel="Close the photo">
              {photo.url ? (
                <Image source={{ uri: photo.url }} style={{ width: width - (narrow ? 0 : SPACE.xxl * 2), height: height - (narrow ? 180 : 150) }} resizeMode="contain" testID="disclosure-photo-full" />
              ) : (
                <Body tone="inverse">This photo is no longer available.</Body>
              )}
            </Pressable>
            <View style={[styles.foot, narrow && styles.footNarrow]}>
              <View style={styles.caption}>
                <Body tone="inverse" variant="bodyStrong">
                  {areaLabel(photo.area)}
                  {many ? ` · photo ${(index ?? 0) + 1} of ${photos.length}` : ''}
                </Body>
                {photo.caption ? (
                  <Body tone="inverse" variant="small">
                    {photo.caption}
                  </Body>
                ) : null}
              </View>
              <View style={styles.buttons}>
                {many ? (
                  <>
                    <ViewerButton label="Previous" onPress={() => onIndex(((index ?? 0) - 1 + photos.length) % photos.length)} testID="disclosure-photo-prev" />
                    <ViewerButton label="Next" onPress={() => onIndex(((index ?? 0) + 1) % photos.length)} testID="disclosure-photo-next" />
                  </>
                ) : null}
                <Button label="Close" variant="secondary" onPress={() => onIndex(null)} testID="disclosure-photo-close" />
              </View>
            </View>
          </>
        ) : null}
      </View>
    </Modal>
  );
}

function ViewerButton({ label, onPress, testID }: { label: string; onPress: () => void; testID: string }) {
  return (
    <Pressable role="button" onPress={onPress} testID={testID} style={({ pressed }) => [styles.viewerButton, pressed && styles.viewerButtonPressed]}>
      <Body variant="bodyStrong" tone="inverse">
        {label}
      </Body>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  // opaque: the photo is the only thing on screen
  backdrop: { flex: 1, backgroundColor: '#12221E' },
  imageArea: { flex: 1, alignItems: 'center', justifyContent: 'center', paddingTop: SPACE.lg },
  foot: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: SPACE.lg, paddingHorizontal: SPACE.xl, paddingVertical: SPACE.lg, flexWrap: 'wrap' },
  footNarrow: { paddingHorizontal: SPACE.lg, paddingVertical: SPACE.md, gap: SPACE.md },
  caption: { flexShrink: 1, flexGrow: 1, flexBasis: 220, gap: SPACE.xxs },
  buttons: { flexDirection: 'row', gap: SPACE.sm, flexWrap: 'wrap' },
  viewerButton: {
    minHeight: LAYOUT.touchTarget + 4,
    paddingHorizontal: SPACE.lg,
    borderRadius: RADIUS.md,
    borderWidth: 2,
    borderColor: PALETTE.feltLichen,
    alignItems: 'center',
    justifyContent: 'center',
  },
  viewerButtonPressed: { backgroundColor: PALETTE.feltShade },
});
