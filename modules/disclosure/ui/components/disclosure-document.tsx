import { useCallback, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { DISCLOSURE_AREA_LABELS, type DisclosureArea } from '@/modules/disclosure/core/disclosure';
import { PHOTO_AREA_LABELS } from '@/modules/photos/ui/photo-labels';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Card } from '@/modules/theme/ui/card';
import { Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { money, pianoLine, pianoTitle } from '../disclosure-format';
import type { ShownDocument } from '../disclosure-view';
import type { DisclosurePhoto, PublicDisclosure } from '../public-disclosure';
import { AreaDetails, PhotoStrip } from './area-details';
import { MARK_MEANINGS } from '@/modules/assessment/core/grade';
import { MarkTag } from '@/modules/theme/ui/mark';
import { centsOffset } from '@/modules/tone/core/pitch';
import { KeyboardChart } from '@/modules/tone/ui/components/keyboard-chart';

import { shownDocument } from '../disclosure-view';
import { PhotoViewer } from './photo-viewer';

/** The name of a photo's area, whether a disclosure area or one of the photo-only ones ("General"). */
export function photoAreaLabel(area: string): string {
  return (DISCLOSURE_AREA_LABELS as Record<string, string>)[area] ?? (PHOTO_AREA_LABELS as Record<string, string>)[area] ?? 'Photo';
}

/** The photo viewer's state for one disclosure: which set is open and where in it. */
export function usePhotoViewer(photos: readonly DisclosurePhoto[]) {
  const [view, setView] = useState<{ set: DisclosurePhoto[]; index: number } | null>(null);
  const open = useCallback(
    (photoId: number, set?: readonly DisclosurePhoto[]) => {
      const within = set && set.some((p) => p.id === photoId) ? [...set] : [...photos];
      setView({ set: within, index: Math.max(0, within.findIndex((p) => p.id === photoId)) });
    },
    [photos],
  );
  const onIndex = useCallback((index: number | null) => setView((v) => (v && index != null ? { ...v, index } : null)), []);
  const viewer = <PhotoViewer photos={view?.set ?? []} index={view?.index ?? null} onIndex={onIndex} areaLabel={photoAreaLabel} />;
  return { open, viewer };
}

/** What the buyer reads: the piano, its price, each area's condition and work, pitch, photos, warranty and notices. */
export function DisclosureDocument({ disclosure }: { disclosure: PublicDisclosure }) {
  const c = disclosure.content;
  const shown = useMemo(() => shownDocument(c, disclosure.dealer), [c, disclosure.dealer]);
  const { open, viewer } = usePhotoViewer(c.photos);
  const areaPhotos = useCallback((ids: readonly number[]) => c.photos.filter((p) => ids.includes(p.id)), [c.photos]);
  const shownInAreas = useMemo(() => new Set(shown.areas.flatMap((a) => a.photoIds)), [shown.areas]);
  const otherPhotos = c.photos.filter((p) => !shownInAreas.has(p.id));

  return (
    <View style={styles.doc}>
      <PianoHeading disclosure={disclosure} />
      {shown.notDone ? (
        <Notice tone="caution" title={shown.notDone.title} testID="disclosure-not-done">
          {shown.notDone.text}
        </Notice>
      ) : null}
      <AtAGlance disclosure={disclosure} shown={shown} />

      <View role="region" aria-label="Area by area" style={styles.section}>
        <Heading level={2}>Area by area</Heading>
        {shown.areas.map((a) => {
          const photos = areaPhotos(a.photoIds);
          return (
            <Card key={a.area} testID={`disclosure-area-${a.area}`}>
              <View style={styles.areaHead}>
                <Heading level={3}>{a.label}</Heading>
                <MarkTag mark={a.mark} label={a.condition} testID={`disclosure-mark-${a.area}`} />
              </View>
              <AreaDetails area={a} photos={photos} onOpenPhoto={(id) => open(id, photos)} />
            </Card>
          );
        })}
        {shown.otherWorkDone.length ? (
          <Card testID="disclosure-other-work">
            <Heading level={3}>Other work done in our workshop</Heading>
            {shown.otherWorkDone.map((w) => (
              <Body key={w}>{w}</Body>
            ))}
          </Card>
        ) : null}
      </View>

      {shown.pitch || shown.tone ? <PitchCard pitch={shown.pitch} tone={shown.tone} /> : null}

      {otherPhotos.length ? (
        <View role="region" aria-label="More photos" style={styles.section}>
          <Heading level={2}>More photos</Heading>
          <PhotoStrip photos={otherPhotos} onOpen={(id) => open(id, otherPhotos)} />
        </View>
      ) : null}

      <View role="region" aria-label="Warranty" style={styles.section}>
        <Heading level={2}>Warranty</Heading>
        <Card>
          <Body testID="disclosure-warranty">{c.warranty}</Body>
        </Card>
      </View>

      <View role="region" aria-label="Before you buy" style={styles.section}>
        <Heading level={2}>Before you buy</Heading>
        {c.notices.map((n) => (
          <Notice key={n.title} tone="caution" title={n.title}>
            {n.text}
          </Notice>
        ))}
      </View>
      {viewer}
    </View>
  );
}

function PianoHeading({ disclosure }: { disclosure: PublicDisclosure }) {
  const c = disclosure.content;
  const wide = useWide();
  return (
    <View style={[styles.heading, wide && styles.headingWide]}>
      <View style={styles.titles}>
        <Body variant="label" tone="accent" style={styles.eyebrow}>
          Stock number {c.piano.stockNumber}
        </Body>
        <Heading level={1} testID="disclosure-title">
          {pianoTitle(c.piano)}
        </Heading>
        <Body tone="secondary">{pianoLine(c.piano)}</Body>
        {c.piano.serialNumber ? (
          <Body variant="small" tone="quiet">
            Serial number {c.piano.serialNumber}
          </Body>
        ) : null}
      </View>
      <View style={[styles.priceBox, wide && styles.priceBoxWide]}>
        <Body variant="label" tone="secondary">
          Asking price
        </Body>
        <Body variant="title" testID="disclosure-price">
          {c.askingPrice ? money(c.askingPrice.minor, c.askingPrice.currency) : 'Ask the dealer'}
        </Body>
        <View style={styles.availability}>
          <View aria-hidden style={[styles.availabilityMark, disclosure.available ? styles.availableMark : styles.unavailableMark]} />
          <Body variant="label" tone={disclosure.available ? 'success' : 'secondary'} testID="disclosure-availability">
            {disclosure.available ? 'Available on the floor' : 'Not available: held for a buyer or sold'}
          </Body>
        </View>
      </View>
    </View>
  );
}

function AtAGlance({ shown }: { disclosure: PublicDisclosure; shown: ShownDocument }) {
  const wide = useWide();
  return (
    <Card accessibilityLabel="At a glance" role="region">
      <Heading level={2}>At a glance</Heading>
      <Body tone="secondary" testID="disclosure-inspected">
        {shown.inspected}
      </Body>
      <View role="list" style={[styles.glance, wide && styles.glanceWide]}>
        {shown.areas.map((a) => (
          <View role="listitem" key={a.area} style={[styles.glanceRow, wide && styles.glanceRowWide]}>
            <Body variant="bodyStrong" style={styles.glanceLabel}>
              {DISCLOSURE_AREA_LABELS[a.area as DisclosureArea] ?? a.label}
            </Body>
            <MarkTag mark={a.mark} label={a.condition} />
          </View>
        ))}
      </View>
      {/* the key is in today's words: a version published in the first format keeps its own */}
      {shown.format === 2 ? <MarkKey /> : null}
    </Card>
  );
}

/** What the marks mean, once, in the buyer's words. */
export function MarkKey() {
  return (
    <View style={styles.key} testID="mark-key" role="list" aria-label="What the marks mean">
      {(Object.keys(MARK_MEANINGS) as (keyof typeof MARK_MEANINGS)[]).map((m) => (
        <View role="listitem" key={m} style={styles.keyRow}>
          <MarkTag mark={m} />
          <Body variant="small" tone="secondary" style={styles.keyText}>
            {MARK_MEANINGS[m]}
          </Body>
        </View>
      ))}
    </View>
  );
}

const PITCH_WORDS = { above: 'sharp', below: 'flat', at: 'at standard pitch' };

function PitchCard({ pitch, tone }: { pitch: ShownDocument['pitch']; tone: ShownDocument['tone'] }) {
  return (
    <View role="region" aria-label="Measured pitch" style={styles.section}>
      <Heading level={2}>Measured pitch</Heading>
      <Card>
        {pitch ? (
          <>
            <View style={styles.pitchRow}>
              <Body variant="title" testID="disclosure-pitch">
                A4 = {pitch.a4Hz.toFixed(1)} Hz
              </Body>
              <Body variant="bodyStrong" tone="secondary" testID="disclosure-pitch-offset">
                {centsOffset(pitch.cents, PITCH_WORDS)}
              </Body>
            </View>
            <Body testID="disclosure-pitch-text">{pitch.text}</Body>
            {pitch.when ? <Body tone="secondary">{pitch.when}</Body> : null}
          </>
        ) : null}
        {tone ? (
          <View style={styles.tone} testID="disclosure-tone">
            <Heading level={3}>Pitch by key, from the play test</Heading>
            <Body testID="disclosure-tone-when">{tone.when}</Body>
            {tone.lines.map((line) => (
              <Body key={line}>{line}</Body>
            ))}
            <KeyboardChart keys={tone.keys} title="Pitch by key" testID="disclosure-chart" />
          </View>
        ) : null}
        <Body variant="small" tone="quiet">
          Standard concert pitch is A4 = 440 Hz (ISO 16). A hundred cents make one semitone; a few cents either way is normal between tunings.
        </Body>
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  doc: { gap: SPACE.xl },
  section: { gap: SPACE.md },
  heading: { gap: SPACE.lg },
  headingWide: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between' },
  titles: { gap: SPACE.xs, flexShrink: 1 },
  eyebrow: { textTransform: 'uppercase', letterSpacing: 1.2 },
  priceBox: { gap: SPACE.xxs, padding: SPACE.lg, borderRadius: RADIUS.lg, backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderLeftWidth: 4, borderLeftColor: PALETTE.brass },
  priceBoxWide: { minWidth: 260 },
  availability: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm, paddingTop: SPACE.xs },
  availabilityMark: { width: 10, height: 10 },
  availableMark: { backgroundColor: PALETTE.moss, borderRadius: RADIUS.pill },
  // an open ring: apart from the condition marks, which the key explains
  unavailableMark: { borderWidth: 2, borderColor: PALETTE.walnut, borderRadius: RADIUS.pill },
  areaHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: SPACE.sm },
  glance: { gap: 0 },
  glanceWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: SPACE.xl },
  glanceRow: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: SPACE.md, paddingVertical: SPACE.sm, borderBottomWidth: 1, borderBottomColor: PALETTE.linen },
  glanceRowWide: { width: '47%' },
  glanceLabel: { flexShrink: 1 },
  key: { paddingTop: SPACE.md, gap: SPACE.xs },
  keyRow: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm },
  keyText: { flex: 1, minWidth: 0 },
  pitchRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: SPACE.md },
  tone: { gap: SPACE.sm, paddingTop: SPACE.sm },
});
