import * as ImagePicker from 'expo-image-picker';
import { useCallback, useEffect, useRef, useState } from 'react';
import { Image, Platform, StyleSheet, View } from 'react-native';

import { useSession } from '@/modules/accounts/ui/use-session';
import { PHOTO_AREAS, type PhotoArea } from '@/modules/photos/core/photo-rules';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { ProgressBar } from '@/modules/theme/ui/progress-bar';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { PHOTO_AREA_LABELS } from '@/modules/photos/ui/photo-labels';
import { uploadPhoto, type PhotoView, type PickedPhoto } from '@/modules/photos/ui/photo-upload';

/** A photo that belongs to the draft: uploaded, with its server id. */
export interface HeldPhoto {
  id: number;
  area: PhotoArea;
  caption: string | null;
  url: string;
  contentType: string;
  bytes: number;
}

interface Upload {
  localId: string;
  area: PhotoArea;
  caption: string;
  photo: PickedPhoto;
  progress: number;
  error: string | null;
  canRetry: boolean;
  abort?: () => void;
}

interface PhotoCaptureProps {
  draftKey: string;
  photos: readonly HeldPhoto[];
  onAdded: (photo: HeldPhoto) => void;
  onRemoved: (id: number) => void;
  /** the area to start on (the step the user came from) */
  initialArea?: PhotoArea;
  /** how many photos are still being sent */
  onBusyChange?: (sending: number) => void;
}

const sizeText = (bytes: number) => (bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`);

let uploadSeq = 0;

/** The photo step: pick an area, say what the photo shows, take or choose it; each upload shows its progress. */
export function PhotoCapture({ draftKey, photos, onAdded, onRemoved, initialArea = 'general', onBusyChange }: PhotoCaptureProps) {
  const { token } = useSession();
  const [area, setArea] = useState<PhotoArea>(initialArea);
  const [caption, setCaption] = useState('');
  const [uploads, setUploads] = useState<Upload[]>([]);
  const [pickProblem, setPickProblem] = useState<string | null>(null);
  const mounted = useRef(true);
  useEffect(
    () => () => {
      mounted.current = false;
    },
    [],
  );

  const sending = uploads.filter((u) => !u.error).length;
  useEffect(() => onBusyChange?.(sending), [onBusyChange, sending]);

  const patch = useCallback((localId: string, change: Partial<Upload>) => {
    if (mounted.current) setUploads((list) => list.map((u) => (u.localId === localId ? { ...u, ...change } : u)));
  }, []);

  const send = useCallback(
    async (u: Upload) => {
      if (!token) {
        patch(u.localId, { error: 'Your session has ended: sign in again.', canRetry: false });
        return;
      }
      const { done, abort } = uploadPhoto({
        photo: u.photo,
        area: u.area,
        caption: u.caption,
        draftKey,
        token,
        onProgress: (progress) => patch(u.localId, { progress }),
      });
      patch(u.localId, { abort, error: null, progress: 0 });
      const outcome = await done;
      if (outcome.ok) {
        const p: PhotoView = outcome.photo;
        onAdded({ id: p.id, area: p.area, caption: p.caption, url: p.url, contentType: p.contentType, bytes: p.bytes });
        if (mounted.current) setUploads((list) => list.filter((x) => x.localId !== u.localId));
      } else {
        patch(u.localId, { error: outcome.message, canRetry: outcome.retry, abort: undefined });
      }
    },
    [draftKey, onAdded, patch, token],
  );

  const pick = async (source: 'camera' | 'files') => {
    setPickProblem(null);
    let result: ImagePicker.ImagePickerResult;
    try {
      if (source === 'camera') {
        if (Platform.OS !== 'web') {
          const permission = await ImagePicker.requestCameraPermissionsAsync();
          if (!permission.granted) {
            setPickProblem('Feltwire may not use the camera: allow it in the phone’s settings, or choose a photo from files.');
            return;
          }
        }
        result = await ImagePicker.launchCameraAsync({ mediaTypes: ['images'], quality: 0.85 });
      } else {
        result = await ImagePicker.launchImageLibraryAsync({ mediaTypes: ['images'], quality: 0.85, allowsMultipleSelection: true });
      }
    } catch {
      setPickProblem('That file cannot be used: the photo must be a JPEG, PNG or WebP image.');
      return;
    }
    if (result.canceled || !result.assets?.length) return;
    const added: Upload[] = result.assets.map((asset) => {
      uploadSeq += 1;
      return {
        localId: `u${uploadSeq}`,
        area,
        caption,
        photo: { uri: asset.uri, file: asset.file ?? null, fileName: asset.fileName, mimeType: asset.mimeType, fileSize: asset.fileSize },
        progress: 0,
        error: null,
        canRetry: false,
      };
    });
    setUploads((list) => [...list, ...added]);
    setCaption('');
    for (const u of added) void send(u);
  };

  const areasInUse = PHOTO_AREAS.filter((a) => photos.some((p) => p.area === a) || uploads.some((u) => u.area === a));

  return (
    <View style={styles.wrap}>
      <Card>
        <ChoiceGroup label="Area of the piano" options={PHOTO_AREAS} labels={PHOTO_AREA_LABELS} value={area} onChange={setArea} testID="photo-area" />
        <TextField
          label="Caption"
          hint="Optional: what the photo shows, e.g. “crack beside the third rib, bass side”. Add it before the photo."
          value={caption}
          onChangeText={setCaption}
          maxLength={200}
          testID="photo-caption"
        />
        <View style={styles.pickButtons}>
          <Button label="Take a photo" onPress={() => pick('camera')} stretch testID="photo-camera" />
          <Button label="Choose from files" variant="secondary" onPress={() => pick('files')} stretch testID="photo-add" />
        </View>
        <Body variant="small" tone="quiet">
          JPEG, PNG or WebP, at most 10 MB each. Several photos per area are welcome.
        </Body>
        {pickProblem ? (
          <Body variant="small" tone="danger">
            {pickProblem}
          </Body>
        ) : null}
      </Card>

      {areasInUse.length === 0 ? (
        <Body tone="secondary" testID="photo-none">
          No photos yet. A photo of each finding helps the workshop and the buyer’s disclosure.
        </Body>
      ) : null}

      {areasInUse.map((a) => (
        <View key={a} style={styles.areaGroup} role="list" aria-label={`${PHOTO_AREA_LABELS[a]} photos`}>
          <Body variant="subheading">{PHOTO_AREA_LABELS[a]}</Body>
          {photos
            .filter((p) => p.area === a)
            .map((p) => (
              <View key={p.id} role="listitem" style={styles.item}>
                <Image source={{ uri: p.url }} style={styles.thumb} accessibilityLabel={p.caption ?? `${PHOTO_AREA_LABELS[a]} photo`} testID="photo-thumb" />
                <View style={styles.itemText}>
                  <Body>{p.caption ?? 'No caption'}</Body>
                  <Body variant="small" tone="quiet">
                    Uploaded · {sizeText(p.bytes)}
                  </Body>
                </View>
                <Button label="Leave out" variant="quiet" onPress={() => onRemoved(p.id)} accessibilityLabel={`Leave out the photo ${p.caption ?? ''}`.trim()} testID={`photo-remove-${p.id}`} />
              </View>
            ))}
          {uploads
            .filter((u) => u.area === a)
            .map((u) => (
              <View key={u.localId} role="listitem" style={styles.item} testID="photo-upload">
                <Image source={{ uri: u.photo.uri }} style={[styles.thumb, styles.thumbPending]} accessibilityLabel="Photo being sent" />
                <View style={styles.itemText}>
                  <Body>{u.caption || 'No caption'}</Body>
                  {u.error ? (
                    <Body variant="small" tone="danger" testID="photo-error">
                      {u.error}
                    </Body>
                  ) : (
                    <>
                      <ProgressBar value={u.progress} label={`Sending the photo: ${Math.round(u.progress * 100)} %`} testID="photo-progress" />
                      <Body variant="small" tone="quiet">
                        Sending… {Math.round(u.progress * 100)} %
                      </Body>
                    </>
                  )}
                  {u.error ? (
                    <View style={styles.buttons}>
                      {u.canRetry ? <Button label="Try again" variant="secondary" onPress={() => send(u)} /> : null}
                      <Button label="Dismiss" variant="quiet" onPress={() => setUploads((list) => list.filter((x) => x.localId !== u.localId))} />
                    </View>
                  ) : (
                    <View style={styles.buttons}>
                      <Button label="Stop" variant="quiet" onPress={() => u.abort?.()} />
                    </View>
                  )}
                </View>
              </View>
            ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.lg },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  pickButtons: { gap: SPACE.sm, maxWidth: 420 },
  areaGroup: { gap: SPACE.sm },
  item: {
    flexDirection: 'row',
    gap: SPACE.md,
    alignItems: 'flex-start',
    backgroundColor: PALETTE.vellum,
    borderWidth: 1,
    borderColor: PALETTE.linen,
    borderRadius: RADIUS.md,
    padding: SPACE.sm,
  },
  thumb: { width: 84, height: 84, borderRadius: RADIUS.sm, backgroundColor: PALETTE.linen },
  thumbPending: { opacity: 0.6 },
  itemText: { flex: 1, gap: SPACE.xs, minWidth: 0 },
});
