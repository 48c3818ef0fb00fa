import { useEffect, useMemo, useRef, type ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View, useWindowDimensions } from 'react-native';

import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';

import { MarkTag } from '@/modules/theme/ui/mark';

import { money, pianoLine, pianoTitle } from '../disclosure-format';
import { shownDocument } from '../disclosure-view';
import type { PublicDisclosure } from '../public-disclosure';
import { AreaDetails } from './area-details';
import { usePhotoViewer } from './disclosure-document';

/** The steps of a walk through a disclosure: the piano, each area, then warranty and notices. */
export function walkSteps(disclosure: PublicDisclosure): { key: string; label: string }[] {
  return [{ key: 'overview', label: 'The piano' }, ...disclosure.content.areas.map((a) => ({ key: a.area, label: a.label })), { key: 'closing', label: 'Warranty and notices' }];
}

interface AreaWalkthroughProps {
  disclosure: PublicDisclosure;
  step: number;
  onStep: (step: number) => void;
  /** fill the height given (the full-screen mode) with the step scrolling above the controls */
  fill?: boolean;
  /** shown on the last step: the way to read it on one's own phone */
  closingExtra?: ReactNode;
}

/** One area at a time in large type, with big previous and next controls: a tablet handed to a buyer. */
export function AreaWalkthrough({ disclosure, step, onStep, fill, closingExtra }: AreaWalkthroughProps) {
  const c = disclosure.content;
  const shown = useMemo(() => shownDocument(c, disclosure.dealer), [c, disclosure.dealer]);
  const steps = walkSteps(disclosure);
  const at = Math.min(Math.max(step, 0), steps.length - 1);
  const { open, viewer } = usePhotoViewer(c.photos);
  const cardRef = useRef<View>(null);
  // The chosen part's tab scrolls into sight when Next and Previous move past the visible ones.
  const tabScroll = useRef<ScrollView>(null);
  const tabX = useRef<number[]>([]);

  useEffect(() => {
    if (typeof window === 'undefined') return;
    const onKey = (event: KeyboardEvent) => {
      const target = event.target as HTMLElement | null;
      if (target && (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.isContentEditable)) return;
      if (document.querySelector('[aria-modal="true"] [data-testid="disclosure-photo-full"]')) return;
      if (event.key === 'ArrowRight' && at < steps.length - 1) onStep(at + 1);
      if (event.key === 'ArrowLeft' && at > 0) onStep(at - 1);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [at, steps.length, onStep]);

  const stepScroll = useRef<ScrollView>(null);
  useEffect(() => {
    const x = tabX.current[at];
    if (x != null) tabScroll.current?.scrollTo({ x: Math.max(0, x - SPACE.xxl), animated: true });
    // each part starts at its top, whatever was scrolled in the last one
    stepScroll.current?.scrollTo({ y: 0, animated: false });
  }, [at]);

  const key = steps[at].key;
  const area = shown.areas.find((a) => a.area === key);
  let content: ReactNode;
  if (key === 'overview') {
    content = (
      <View style={styles.stepBody}>
        <Text style={styles.eyebrow}>Stock number {c.piano.stockNumber}</Text>
        <Text role="heading" aria-level={2} style={styles.bigTitle} testID="present-step-title">
          {pianoTitle(c.piano)}
        </Text>
        <Text style={styles.lead}>{pianoLine(c.piano)}</Text>
        {c.askingPrice ? <Text style={styles.price}>{money(c.askingPrice.minor, c.askingPrice.currency)}</Text> : null}
        <Text style={styles.large}>{shown.inspected}</Text>
        {shown.notDone ? (
          <View style={styles.notice} testID="present-not-done">
            <Text style={[styles.large, styles.noticeTitle]}>{shown.notDone.title}</Text>
            <Text style={styles.large}>{shown.notDone.text}</Text>
          </View>
        ) : null}
        <View role="list" style={styles.glance}>
          {shown.areas.map((a, i) => (
            <Pressable role="listitem" key={a.area} onPress={() => onStep(i + 1)} style={({ pressed }) => [styles.glanceRow, pressed && styles.glancePressed]} accessibilityLabel={`${a.label}: ${a.condition}. Show this area.`}>
              <Text style={[styles.large, styles.glanceLabel]}>{a.label}</Text>
              <MarkTag mark={a.mark} label={a.condition} large />
            </Pressable>
          ))}
        </View>
        {shown.pitch ? <Text style={styles.large}>{`${shown.pitch.text}${shown.pitch.when ? ` ${shown.pitch.when}` : ''}`}</Text> : null}
      </View>
    );
  } else if (area) {
    const photos = c.photos.filter((p) => area.photoIds.includes(p.id));
    content = (
      <View style={styles.stepBody}>
        <Text style={styles.eyebrow}>
          Area {at} of {c.areas.length}
        </Text>
        <View style={styles.areaHead}>
          <Text role="heading" aria-level={2} style={styles.bigTitle} testID="present-step-title">
            {area.label}
          </Text>
          <MarkTag mark={area.mark} label={area.condition} large testID="present-condition" />
        </View>
        <AreaDetails area={area} photos={photos} onOpenPhoto={(id) => open(id, photos)} large />
      </View>
    );
  } else {
    content = (
      <View style={styles.stepBody}>
        <Text role="heading" aria-level={2} style={styles.bigTitle} testID="present-step-title">
          Warranty and notices
        </Text>
        <Text style={styles.large}>{c.warranty}</Text>
        {c.notices.map((n) => (
          <View key={n.title} style={styles.notice}>
            <Text style={[styles.large, styles.noticeTitle]}>{n.title}</Text>
            <Text style={styles.large}>{n.text}</Text>
          </View>
        ))}
        {closingExtra}
      </View>
    );
  }

  const controls = (
    <View style={styles.controls}>
      <StepButton direction="prev" label={at > 0 ? steps[at - 1].label : null} onPress={() => onStep(at - 1)} testID="present-prev" />
      <View style={styles.position}>
        <Text style={[TYPE_SCALE.subheading, styles.positionText]} testID="present-position">
          {at + 1} / {steps.length}
        </Text>
      </View>
      <StepButton direction="next" label={at < steps.length - 1 ? steps[at + 1].label : null} onPress={() => onStep(at + 1)} testID="present-next" />
    </View>
  );

  const tabs = (
    <ScrollView ref={tabScroll} horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.tabs} style={styles.tabsFrame}>
      <View role="tablist" aria-label="Parts of the disclosure" style={styles.tabRow}>
        {steps.map((s, i) => (
          <Pressable
            key={s.key}
            role="tab"
            aria-selected={i === at}
            onPress={() => onStep(i)}
            onLayout={(e) => {
              tabX.current[i] = e.nativeEvent.layout.x;
            }}
            testID={`present-step-${s.key}`}
            style={[styles.tab, i === at && styles.tabOn]}
          >
            <Text style={[TYPE_SCALE.label, { color: i === at ? PALETTE.ivory : PALETTE.felt }]}>{s.label}</Text>
          </Pressable>
        ))}
      </View>
    </ScrollView>
  );

  if (fill) {
    return (
      <View style={styles.fill}>
        <View style={styles.fillTabs}>{tabs}</View>
        <ScrollView ref={stepScroll} style={styles.fillScroll} contentContainerStyle={styles.fillContent}>
          <View style={styles.fillColumn}>{content}</View>
        </ScrollView>
        <View style={styles.fillControls}>
          <View style={styles.fillColumn}>{controls}</View>
        </View>
        {viewer}
      </View>
    );
  }
  // On the page the controls sit above the step, where they stay put whatever its length; a second
  // Next at the foot of a long step brings the next one up without scrolling back.
  const nextAtFoot =
    at < steps.length - 1 ? (
      <View style={styles.footNext}>
        <Pressable
          role="button"
          onPress={() => {
            onStep(at + 1);
            const node = cardRef.current as unknown as { scrollIntoView?: (o: object) => void } | null;
            node?.scrollIntoView?.({ block: 'start', behavior: 'smooth' });
          }}
          testID="present-next-foot"
          style={({ pressed }) => [styles.footNextButton, pressed && styles.stepPrevPressed]}
        >
          <Text style={[TYPE_SCALE.bodyStrong, { color: PALETTE.felt }]}>Next: {steps[at + 1].label}  →</Text>
        </Pressable>
      </View>
    ) : null;
  return (
    <View ref={cardRef} style={styles.card} testID="present-walkthrough">
      {tabs}
      {controls}
      <View style={styles.inlineContent}>{content}</View>
      {nextAtFoot}
      {viewer}
    </View>
  );
}

function StepButton({ direction, label, onPress, testID }: { direction: 'prev' | 'next'; label: string | null; onPress: () => void; testID: string }) {
  const narrow = useWindowDimensions().width < 600;
  const disabled = label == null;
  const next = direction === 'next';
  // Named by what it shows (the word and the part), so what is heard matches what is read (WCAG 2.5.3).
  const word = next ? 'Next' : narrow ? 'Back' : 'Previous';
  return (
    <Pressable
      role="button"
      aria-disabled={disabled || undefined}
      disabled={disabled}
      onPress={onPress}
      accessibilityLabel={disabled ? `${word}: this is the ${next ? 'last' : 'first'} part` : undefined}
      testID={testID}
      style={({ pressed }) => [styles.stepButton, narrow && styles.stepButtonNarrow, next ? styles.stepNext : styles.stepPrev, pressed && !disabled && (next ? styles.stepNextPressed : styles.stepPrevPressed), disabled && styles.stepDisabled]}
    >
      <Text numberOfLines={1} style={[TYPE_SCALE.subheading, { color: next ? PALETTE.vellum : PALETTE.felt }]}>
        {word}
      </Text>
      {label ? (
        <Text numberOfLines={1} style={[TYPE_SCALE.small, { color: next ? PALETTE.feltLichen : PALETTE.walnut }]}>
          {label}
        </Text>
      ) : null}
    </Pressable>
  );
}

const LARGE = { fontFamily: TYPE_SCALE.body.fontFamily, fontSize: 22, lineHeight: 32, color: PALETTE.ebony };

const styles = StyleSheet.create({
  card: { backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, padding: SPACE.xl, gap: SPACE.lg },
  inlineContent: { minHeight: 240, borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingTop: SPACE.xl },
  footNext: { flexDirection: 'row', justifyContent: 'flex-end', borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingTop: SPACE.md },
  footNextButton: { minHeight: LAYOUT.touchTarget + 8, paddingHorizontal: SPACE.lg, borderRadius: RADIUS.md, borderWidth: 1.5, borderColor: PALETTE.felt, justifyContent: 'center', backgroundColor: PALETTE.vellum },
  stepBody: { gap: SPACE.lg },
  eyebrow: { ...TYPE_SCALE.label, fontSize: 16, color: PALETTE.brassShade, textTransform: 'uppercase', letterSpacing: 1.4 },
  bigTitle: { fontFamily: TYPE_SCALE.display.fontFamily, fontWeight: '600', fontSize: 40, lineHeight: 48, color: PALETTE.ebony, letterSpacing: -0.3 },
  lead: { ...LARGE, color: PALETTE.walnut },
  price: { fontFamily: TYPE_SCALE.display.fontFamily, fontWeight: '600', fontSize: 34, lineHeight: 42, color: PALETTE.ebony },
  large: LARGE,
  areaHead: { gap: SPACE.md, alignItems: 'flex-start' },
  glance: { gap: 0, borderTopWidth: 1, borderTopColor: PALETTE.linen },
  glanceRow: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: SPACE.md, paddingVertical: SPACE.md, borderBottomWidth: 1, borderBottomColor: PALETTE.linen, minHeight: 64 },
  glancePressed: { backgroundColor: PALETTE.feltMist },
  glanceLabel: { flexShrink: 1, fontFamily: TYPE_SCALE.bodyStrong.fontFamily, fontWeight: '600' },
  controls: { flexDirection: 'row', alignItems: 'stretch', gap: SPACE.md },
  position: { justifyContent: 'center', alignItems: 'center', minWidth: 64 },
  positionText: { color: PALETTE.walnut, fontVariant: ['tabular-nums'] },
  stepButton: { flex: 1, minHeight: 76, borderRadius: RADIUS.lg, borderWidth: 2, paddingHorizontal: SPACE.xl, paddingVertical: SPACE.sm, justifyContent: 'center', gap: SPACE.xxs, minWidth: 0 },
  stepButtonNarrow: { paddingHorizontal: SPACE.md, minHeight: 68 },
  stepPrev: { backgroundColor: PALETTE.vellum, borderColor: PALETTE.felt, alignItems: 'flex-start' },
  stepPrevPressed: { backgroundColor: PALETTE.feltMist },
  stepNext: { backgroundColor: PALETTE.felt, borderColor: PALETTE.felt, alignItems: 'flex-end' },
  stepNextPressed: { backgroundColor: PALETTE.feltShade, borderColor: PALETTE.feltShade },
  stepDisabled: { opacity: 0.4 },
  tabsFrame: { flexGrow: 0, marginHorizontal: -SPACE.xs },
  tabs: { padding: SPACE.xs },
  tabRow: { flexDirection: 'row', gap: SPACE.sm },
  tab: { minHeight: LAYOUT.touchTarget, paddingHorizontal: SPACE.md, borderRadius: RADIUS.pill, borderWidth: 1.5, borderColor: PALETTE.felt, justifyContent: 'center', backgroundColor: PALETTE.vellum },
  tabOn: { backgroundColor: PALETTE.felt },
  fill: { flex: 1, backgroundColor: PALETTE.vellum },
  fillTabs: { paddingHorizontal: SPACE.lg, paddingTop: SPACE.md, paddingBottom: SPACE.xs, borderBottomWidth: 1, borderBottomColor: PALETTE.linen },
  notice: { gap: SPACE.xs, paddingLeft: SPACE.lg, paddingVertical: SPACE.sm, borderLeftWidth: 4, borderLeftColor: PALETTE.brass },
  noticeTitle: { fontFamily: TYPE_SCALE.bodyStrong.fontFamily, fontWeight: '600' },
  fillScroll: { flex: 1 },
  fillContent: { paddingHorizontal: SPACE.xl, paddingVertical: SPACE.xl },
  fillColumn: { width: '100%', maxWidth: 920, alignSelf: 'center' },
  fillControls: { borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingHorizontal: SPACE.xl, paddingVertical: SPACE.md, backgroundColor: PALETTE.ivory },
});
