import * as ImagePicker from 'expo-image-picker';
import { useState } from 'react';
import { Image, Modal, Platform, Pressable, StyleSheet, View, useWindowDimensions } from 'react-native';

import { WORK_TASK_AREAS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import type { PhotoView } from '@/modules/photos/ui/photo-upload';
import { useSession } from '@/modules/accounts/ui/use-session';
import { PHOTO_AREAS, type PhotoArea } from '@/modules/photos/core/photo-rules';
import { PHOTO_AREA_LABELS } from '@/modules/photos/ui/photo-labels';
import { usePianoPhotos } from '@/modules/photos/ui/use-photos';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { ProgressBar } from '@/modules/theme/ui/progress-bar';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { readWorkCaption, uploadWorkPhoto, workCaption, WORK_PHASE_LABELS, WORK_PHASES, type WorkPhase } from '../work-photo-upload';
import { Feedback, type FeedbackState } from './feedback';
import { Buttons } from './field-row';


interface WorkPhotosProps {
  itemId: number;
  pianoId: number;
  title: string;
  task: string;
  blocked: string | null;
}

/** Before and after photos of the item, kept with the piano's photos so its disclosure can use them. */
export function WorkPhotos({ itemId, pianoId, title, task, blocked }: WorkPhotosProps) {
  const { token } = useSession();
  const { photos, reexecute } = usePianoPhotos(pianoId);
  const [phase, setPhase] = useState<WorkPhase>('before');
  const [area, setArea] = useState<PhotoArea>(WORK_TASK_AREAS[task as WorkTask] ?? 'general');
  const [caption, setCaption] = useState('');
  const [progress, setProgress] = useState<number | null>(null);
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const [open, setOpen] = useState<{ photo: PhotoView; text: string } | null>(null);
  const { width, height } = useWindowDimensions();

  const mine = (photos ?? []).map((p) => ({ photo: p, tag: readWorkCaption(p.caption, itemId) })).filter((x) => x.tag);

  const pick = async (source: 'camera' | 'files') => {
    setFeedback(null);
    if (!token) {
      setFeedback({ tone: 'error', text: 'Your session has ended: sign in again.' });
      return;
    }
    let result: ImagePicker.ImagePickerResult;
    try {
      if (source === 'camera' && Platform.OS !== 'web') {
        const permission = await ImagePicker.requestCameraPermissionsAsync();
        if (!permission.granted) {
          setFeedback({ tone: 'error', text: 'Feltwire may not use the camera: allow it in the settings, or choose a photo from files.' });
          return;
        }
      }
      result =
        source === 'camera'
          ? await ImagePicker.launchCameraAsync({ mediaTypes: ['images'], quality: 0.85 })
          : await ImagePicker.launchImageLibraryAsync({ mediaTypes: ['images'], quality: 0.85 });
    } catch {
      setFeedback({ tone: 'error', text: 'That file cannot be used: the photo must be a JPEG, PNG or WebP image.' });
      return;
    }
    const asset = result.canceled ? null : result.assets?.[0];
    if (!asset) return;
    setProgress(0);
    const outcome = await uploadWorkPhoto({
      photo: { uri: asset.uri, file: asset.file ?? null, fileName: asset.fileName, mimeType: asset.mimeType, fileSize: asset.fileSize },
      pianoId,
      area,
      caption: workCaption(phase, itemId, title, caption),
      token,
      onProgress: setProgress,
      workItemId: itemId,
      phase,
    });
    setProgress(null);
    if (outcome.ok) {
      setCaption('');
      setFeedback({ tone: 'success', text: `Photo added ${phase === 'before' ? 'before' : 'after'} the work.` });
      reexecute({ requestPolicy: 'network-only' });
    } else {
      setFeedback({ tone: 'error', text: outcome.message });
    }
  };

  return (
    <Card role="region" accessibilityLabel="Before and after photos">
      <Heading level={2}>Before and after</Heading>
      {WORK_PHASES.map((ph) => {
        const list = mine.filter((x) => x.tag!.phase === ph);
        return (
          <View key={ph} style={styles.group}>
            <Body variant="label" tone="secondary">
              {WORK_PHASE_LABELS[ph]}
            </Body>
            {list.length ? (
              <View role="list" style={styles.grid} testID={`photos-${ph}`}>
                {list.map(({ photo, tag }) => (
                  <View role="listitem" key={photo.id} style={styles.cell}>
                    <Pressable
                      role="button"
                      accessibilityLabel={`Open the photo at full size: ${tag!.text ?? `${WORK_PHASE_LABELS[ph]}, ${PHOTO_AREA_LABELS[photo.area]}`}`}
                      onPress={() => setOpen({ photo, text: `${WORK_PHASE_LABELS[ph]} · ${PHOTO_AREA_LABELS[photo.area]}${tag!.text ? `: ${tag!.text}` : ''}` })}
                    >
                      <Image source={{ uri: photo.url }} style={styles.thumb} />
                    </Pressable>
                    <Body variant="small" tone="secondary" numberOfLines={2}>
                      {tag!.text ?? PHOTO_AREA_LABELS[photo.area]}
                    </Body>
                  </View>
                ))}
              </View>
            ) : (
              <Body variant="small" tone="quiet">
                None yet.
              </Body>
            )}
          </View>
        );
      })}
      <ChoiceGroup label="The photo shows the piano" options={WORK_PHASES} labels={WORK_PHASE_LABELS} value={phase} onChange={setPhase} testID="photo-phase" />
      <ChoiceGroup label="Area" options={PHOTO_AREAS} labels={PHOTO_AREA_LABELS} value={area} onChange={setArea} scroll testID="photo-area" />
      <TextField label="Caption" hint="Optional: what the photo shows." value={caption} onChangeText={setCaption} maxLength={120} testID="photo-caption" />
      <Buttons>
        <Button label="Take a photo" onPress={() => pick('camera')} disabled={!!blocked || progress != null} testID="photo-camera" />
        <Button label="Choose a file" variant="secondary" onPress={() => pick('files')} disabled={!!blocked || progress != null} testID="photo-file" />
      </Buttons>
      {progress != null ? <ProgressBar value={progress} label={`Sending the photo: ${Math.round(progress * 100)} %`} /> : null}
      <Feedback state={feedback} testID="photo-feedback" />
      <Modal visible={open != null} transparent animationType="fade" onRequestClose={() => setOpen(null)}>
        <View style={styles.backdrop} role="dialog" aria-modal aria-label="Photo at full size">
          {open ? (
            <View style={styles.viewer}>
              <Image source={{ uri: open.photo.url }} style={{ width: Math.min(width - 32, 1100), height: Math.min(height - 200, 800) }} resizeMode="contain" />
              <View style={styles.viewerFoot}>
                <Body tone="inverse" variant="bodyStrong" style={styles.viewerText}>
                  {open.text}
                </Body>
                <Button label="Close" variant="secondary" onPress={() => setOpen(null)} testID="photo-close" />
              </View>
            </View>
          ) : null}
        </View>
      </Modal>
    </Card>
  );
}

const styles = StyleSheet.create({
  group: { gap: SPACE.xs },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  cell: { width: 104, gap: SPACE.xxs },
  backdrop: { flex: 1, backgroundColor: 'rgba(22,48,42,0.94)', alignItems: 'center', justifyContent: 'center', padding: SPACE.lg },
  viewer: { gap: SPACE.md, alignItems: 'center' },
  viewerFoot: { flexDirection: 'row', alignItems: 'center', gap: SPACE.lg, flexWrap: 'wrap', justifyContent: 'space-between', alignSelf: 'stretch' },
  viewerText: { flexShrink: 1 },
  thumb: { width: 104, height: 104, borderRadius: RADIUS.sm, backgroundColor: PALETTE.linen, borderWidth: 1, borderColor: PALETTE.linen },
});
