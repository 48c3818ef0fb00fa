import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { Platform, ScrollView, StyleSheet, View } from 'react-native';

import { graphProblem, problemWithoutField } from '@/modules/accounts/ui/graph-error';
import { AREAS, READINESS_MARKS, READINESS_WORDS, gradeAssessment, type Area } from '@/modules/assessment/core/grade';
import type { GradeRules } from '@/modules/assessment/core/grade-rules';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { PhotoCapture, type HeldPhoto } from '@/modules/photos/ui/components/photo-capture';
import { useDraftPhotos } from '@/modules/photos/ui/use-photos';
import { useRateCard } from '@/modules/shop/ui/use-rate-card';
import { LAYOUT, PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { MarkTag } from '@/modules/theme/ui/mark';
import { Notice } from '@/modules/theme/ui/notice';
import { Body, Eyebrow, Heading } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { DraftConfirm } from './draft-confirm';
import { ConditionSummary } from './condition-summary';
import { HammersStep, KeysStep, PlayStep, SoundboardStep, StringsStep } from './measure-steps';
import { PianoStep } from './piano-step';
import { ReviewStep } from './review-step';
import { StepIndicator } from './step-indicator';
import type { DraftUpdate, StepProps } from './step-props';
import {
  STEP_TITLES,
  buildInput,
  errorsOfStep,
  liveMeasurements,
  sentence,
  stepOfPath,
  stepsFor,
  type AssessmentDraft,
  type FieldErrors,
  type StepKey,
} from '@/modules/assessment/ui/intake-draft';
import { useSubmitAssessment, type SubmittedAssessment } from '@/modules/assessment/ui/use-submit-assessment';

interface AssessmentWizardProps {
  draft: AssessmentDraft;
  update: DraftUpdate;
  refresh: DraftUpdate;
  restored: boolean;
  rules: GradeRules;
  /** what the page is: "New trade-in", "Correcting FW-0012" */
  eyebrow: string;
  /** correction only: the measurements of the version being corrected */
  base: Measurements | null;
  onSubmitted: (result: SubmittedAssessment) => void;
  /** the draft is thrown away: the caller starts afresh or leaves */
  onDiscard: () => void;
  /** a correction met another at the same moment */
  onConflict?: (message: string) => void;
  /** a message from the caller shown above the step (a conflict, say) */
  banner?: string | null;
}

interface ServerError {
  problem: string;
  /** the value the server refused: the message goes once the user changes it */
  snapshot: string;
}

/** The value at an input path inside the draft, to tell whether the user has changed it since. */
function valueAtPath(draft: AssessmentDraft, path: string): unknown {
  if (path === 'photoIds') return draft.photos.map((p) => p.id);
  let value: unknown = draft;
  for (const part of path.split('.')) {
    if (value == null || typeof value !== 'object') return undefined;
    value = (value as Record<string, unknown>)[part];
  }
  return value;
}

// The findings of the step on screen come first in the live panel.
const STEP_AREAS: Record<StepKey, readonly Area[]> = {
  piano: [],
  keys: ['keys'],
  hammers: ['hammers'],
  strings: ['strings'],
  soundboard: ['soundboard'],
  play: ['tuning', 'play'],
  photos: [],
  review: [],
};

const TIME = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });
const timeOf = (iso: string | null) => (iso ? TIME.format(new Date(iso)) : '');

/** The step-by-step form for an intake or a correction: one step at a time on a phone, with the live grade beside it on a wide screen. */
export function AssessmentWizard({ draft, update, refresh, restored, rules, eyebrow, base, onSubmitted, onDiscard, onConflict, banner }: AssessmentWizardProps) {
  const wide = useWide();
  const steps = stepsFor(draft.mode);
  const here = Math.max(0, steps.indexOf(draft.step));
  const step = steps[here];
  const scroller = useRef<ScrollView>(null);
  const [attempted, setAttempted] = useState<ReadonlySet<StepKey>>(new Set());
  const [serverErrors, setServerErrors] = useState<Record<string, ServerError>>({});
  const [formProblem, setFormProblem] = useState<string | null>(null);
  const [confirmDiscard, setConfirmDiscard] = useState(false);
  const [sendingPhotos, setSendingPhotos] = useState(0);
  const { submit, submitting } = useSubmitAssessment(draft.mode);
  const inFlight = useRef(false);

  const built = useMemo(() => buildInput(draft), [draft]);
  const clientErrors = useMemo<FieldErrors>(() => (built.ok ? {} : built.errors), [built]);
  const measurements = useMemo(() => liveMeasurements(draft.measurements), [draft.measurements]);
  const grade = useMemo(() => gradeAssessment(measurements, rules), [measurements, rules]);
  const { card } = useRateCard();

  // Photo links last ten minutes: a restored draft asks for fresh ones.
  const fresh = useDraftPhotos(draft.draftKey, draft.photos.length === 0);
  useEffect(() => {
    if (!fresh?.length) return;
    const urls = new Map(fresh.map((p) => [p.id, p.url]));
    refresh((d) => (d.photos.some((p) => urls.has(p.id) && urls.get(p.id) !== p.url) ? { ...d, photos: d.photos.map((p) => ({ ...p, url: urls.get(p.id) ?? p.url })) } : d));
  }, [fresh, refresh]);

  useEffect(() => {
    scroller.current?.scrollTo({ y: 0, animated: false });
    if (Platform.OS === 'web' && typeof document !== 'undefined') document.title = `${STEP_TITLES[step]} · ${eyebrow} · Feltwire`;
  }, [step, eyebrow]);

  const errorAt = useCallback(
    (path: string): string | undefined => {
      const server = serverErrors[path];
      if (server && server.snapshot === JSON.stringify(valueAtPath(draft, path) ?? null)) return sentence(path, server.problem);
      const client = clientErrors[path];
      if (client && attempted.has(stepOfPath(path))) return sentence(path, client);
      return undefined;
    },
    [attempted, clientErrors, draft, serverErrors],
  );

  const stepProblems = (s: StepKey) => Object.keys(errorsOfStep(clientErrors, s)).length > 0 || Object.keys(serverErrors).some((p) => stepOfPath(p) === s && errorAt(p));
  const withProblems = new Set(steps.filter((s) => attempted.has(s) && stepProblems(s)));

  const goTo = (target: StepKey) => {
    const to = steps.indexOf(target);
    if (to > here && Object.keys(errorsOfStep(clientErrors, step)).length) {
      setAttempted((a) => new Set([...a, step]));
      scroller.current?.scrollTo({ y: 0, animated: true });
      return;
    }
    setFormProblem(null);
    update((d) => ({ ...d, step: target, furthest: Math.max(d.furthest, to) }));
  };
  const next = () => goTo(steps[Math.min(here + 1, steps.length - 1)]);
  const back = () => goTo(steps[Math.max(here - 1, 0)]);

  const noun = draft.mode === 'intake' ? 'intake' : 'correction';
  const send = async () => {
    setFormProblem(null);
    const checked = buildInput(draft);
    if (!checked.ok) {
      setAttempted(new Set(steps));
      const first = steps.find((s) => Object.keys(errorsOfStep(checked.errors, s)).length);
      if (draft.pendingSubmit) update((d) => ({ ...d, pendingSubmit: false }));
      if (first && first !== step) update((d) => ({ ...d, step: first }));
      return;
    }
    if (sendingPhotos > 0) {
      setFormProblem(`Wait a moment: ${sendingPhotos === 1 ? 'a photo is' : `${sendingPhotos} photos are`} still being sent.`);
      return;
    }
    if (typeof navigator !== 'undefined' && navigator.onLine === false) {
      update((d) => ({ ...d, pendingSubmit: true }));
      return;
    }
    // The "online" event, the timer and a tap may all ask at once: one request at a time.
    if (inFlight.current) return;
    inFlight.current = true;
    let outcome: Awaited<ReturnType<typeof submit>>;
    try {
      outcome = await submit(checked.input);
    } finally {
      inFlight.current = false;
    }
    if (outcome.ok) {
      onSubmitted(outcome.result);
      return;
    }
    const problem = graphProblem(outcome.error);
    if (!outcome.error || outcome.error.networkError || !problem) {
      update((d) => ({ ...d, pendingSubmit: true }));
      return;
    }
    if (draft.pendingSubmit) update((d) => ({ ...d, pendingSubmit: false }));
    if (problem.code === 'CONFLICT' && onConflict) {
      onConflict(problem.message);
      return;
    }
    if (problem.field) {
      const field = problem.field;
      setServerErrors((e) => ({ ...e, [field]: { problem: problemWithoutField(problem), snapshot: JSON.stringify(valueAtPath(draft, field) ?? null) } }));
      const target = stepOfPath(field);
      setAttempted((a) => new Set([...a, target]));
      // The field's own step shows the problem beside it; a field with no step here gets a notice.
      if (!steps.includes(target)) setFormProblem(`The server refused the ${noun}: ${sentence(field, problemWithoutField(problem))}.`);
      else if (target !== step) update((d) => ({ ...d, step: target }));
      return;
    }
    setFormProblem(problem.message);
  };

  // Kept while offline: sent by itself when the connection is back.
  const sendRef = useRef(send);
  useEffect(() => {
    sendRef.current = send;
  });
  const pending = draft.pendingSubmit;
  useEffect(() => {
    if (!pending || typeof window === 'undefined') return;
    const onOnline = () => void sendRef.current();
    window.addEventListener('online', onOnline);
    if (typeof navigator !== 'undefined' && navigator.onLine) onOnline();
    // "Online" can be true while the server is out of reach: try again every half minute as well.
    const timer = setInterval(() => {
      if (typeof navigator === 'undefined' || navigator.onLine) onOnline();
    }, 30000);
    return () => {
      window.removeEventListener('online', onOnline);
      clearInterval(timer);
    };
  }, [pending]);

  const stepErrors = attempted.has(step) ? Object.entries(errorsOfStep(clientErrors, step)) : [];
  const stepServerErrors = Object.keys(serverErrors).filter((p) => stepOfPath(p) === step && errorAt(p) && !(p in clientErrors));
  const props: StepProps = { draft, update, errorAt, rules };

  const onPhotoAdded = useCallback((photo: HeldPhoto) => update((d) => ({ ...d, photos: d.photos.some((p) => p.id === photo.id) ? d.photos : [...d.photos, photo] })), [update]);
  const onPhotoRemoved = useCallback((id: number) => update((d) => ({ ...d, photos: d.photos.filter((p) => p.id !== id) })), [update]);

  const gradePanel = (
    <View style={[styles.panel, wide && styles.panelWide]} testID="live-grade" role="region" aria-label="Live grade">
      <View style={styles.panelHead}>
        <Eyebrow>{step === 'review' ? 'The grade' : 'Live grade'}</Eyebrow>
        <Body variant="small" tone="quiet">
          Recomputed as you type; the server grades again on submit.
        </Body>
      </View>
      <ConditionSummary grade={grade} card={card} focus={STEP_AREAS[step]} testID="live-condition" areaLevel={2} />
    </View>
  );

  const header = (
    <View style={styles.header}>
      <View style={styles.titleRow}>
        <View style={styles.titles}>
          <Eyebrow>
            {eyebrow} · step {here + 1} of {steps.length}
          </Eyebrow>
          <Heading level={1} testID="step-title">
            {STEP_TITLES[step]}
          </Heading>
        </View>
        {!wide ? (
          <View style={styles.chip} testID="grade-chip" accessibilityLabel={`So far: ${READINESS_WORDS[grade.readiness]}, ${grade.inspectedAreas.length} of ${AREAS.length} areas inspected`}>
            <MarkTag mark={READINESS_MARKS[grade.readiness]} label={READINESS_WORDS[grade.readiness]} />
            <Body variant="small" tone="secondary">
              {grade.inspectedAreas.length} of {AREAS.length} areas
            </Body>
          </View>
        ) : null}
      </View>
      <StepIndicator steps={steps} current={step} furthest={draft.furthest} withProblems={withProblems} onJump={goTo} showNames={wide} />
    </View>
  );

  const notices = (
    <>
      {banner ? <Notice tone="error">{banner}</Notice> : null}
      {restored && !pending ? (
        <Notice tone="info" testID="draft-restored">
          Carrying on with the draft saved on this device at {timeOf(draft.changedAt)}.
        </Notice>
      ) : null}
      {pending ? (
        <Notice
          tone="info"
          title="Kept on this device"
          testID="offline-kept"
          actions={<Button label="Send now" variant="secondary" busy={submitting} onPress={() => void send()} testID="retry-submit" />}
        >
          There is no connection to the server. The {noun} is saved here and will be sent by itself as soon as the connection is back: keep this page open, or send it yourself.
        </Notice>
      ) : null}
      {formProblem ? <Notice tone="error">{formProblem}</Notice> : null}
      {stepErrors.length || stepServerErrors.length ? (
        <Notice
          tone="error"
          title={
            stepServerErrors.length && !stepErrors.length
              ? `The server refused the ${noun}`
              : stepErrors.length + stepServerErrors.length === 1
                ? 'One answer needs a look'
                : `${stepErrors.length + stepServerErrors.length} answers need a look`
          }
          testID="step-errors"
        >
          {[...stepErrors.map(([path, problem]) => sentence(path, problem)), ...stepServerErrors.map((p) => errorAt(p))].map((line) => `• ${line}`).join('\n')}
        </Notice>
      ) : null}
    </>
  );

  const body = (
    <>
      {step === 'piano' ? <PianoStep {...props} /> : null}
      {step === 'keys' ? <KeysStep {...props} /> : null}
      {step === 'hammers' ? <HammersStep {...props} /> : null}
      {step === 'strings' ? <StringsStep {...props} /> : null}
      {step === 'soundboard' ? <SoundboardStep {...props} /> : null}
      {step === 'play' ? <PlayStep {...props} /> : null}
      {/* Kept mounted so uploads carry on and keep their progress when the user moves to another step. */}
      <View style={step === 'photos' ? null : styles.hidden}>
        <PhotoCapture draftKey={draft.draftKey} photos={draft.photos} onAdded={onPhotoAdded} onRemoved={onPhotoRemoved} onBusyChange={setSendingPhotos} />
      </View>
      {step === 'review' ? <ReviewStep {...props} goTo={goTo} measurements={measurements} base={base} /> : null}
      {step === 'review' && !wide ? gradePanel : null}
    </>
  );

  const draftLine = (
    <View style={styles.draftLine}>
      <Body variant="small" tone="quiet">
        {draft.changedAt ? `Draft saved on this device at ${timeOf(draft.changedAt)}.` : 'Nothing entered yet.'}
      </Body>
      <Button label="Discard draft" variant="quiet" onPress={() => setConfirmDiscard(true)} testID="discard-draft" />
    </View>
  );
  const discardPanel = confirmDiscard ? (
    <DraftConfirm
      title="Discard this draft?"
      commands={
        <>
          <Button
            label="Discard"
            variant="danger"
            onPress={() => {
              setConfirmDiscard(false);
              setAttempted(new Set());
              setServerErrors({});
              setFormProblem(null);
              onDiscard();
            }}
            testID="confirm-discard"
          />
          <Button label="Keep the draft" variant="quiet" onPress={() => setConfirmDiscard(false)} />
        </>
      }
    >
      {draft.mode === 'intake'
        ? 'Everything entered for this trade-in is removed from this device. Photos already sent stay on the server unattached.'
        : 'The correction is dropped; the assessment stays as it is.'}
    </DraftConfirm>
  ) : null;

  const last = here === steps.length - 1;
  const footer = (
    <View style={[styles.footer, wide && styles.footerWide]}>
      <View style={[styles.footerInner, wide && styles.formInnerWide]}>
        {here > 0 ? <Button label="Back" variant="secondary" onPress={back} testID="step-back" /> : null}
        <View style={styles.footerMain}>
          {last ? (
            <Button
              label={draft.mode === 'intake' ? 'Submit the intake' : 'Submit the correction'}
              onPress={() => void send()}
              busy={submitting}
              stretch
              testID={draft.mode === 'intake' ? 'submit-intake' : 'submit-correction'}
            />
          ) : (
            <Button label={`Next: ${STEP_TITLES[steps[here + 1]]}`} onPress={next} stretch testID="step-next" />
          )}
        </View>
      </View>
    </View>
  );

  const form = (
    <View style={[styles.formInner, wide && styles.formInnerWide]} testID="intake-form" role="form" aria-label={`${eyebrow}: ${STEP_TITLES[step]}`}>
      {header}
      {notices}
      {body}
      {draftLine}
      {discardPanel}
    </View>
  );

  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <View style={styles.formColumn}>
          <ScrollView ref={scroller} style={styles.scroll} contentContainerStyle={styles.scrollContentWide}>
            {form}
          </ScrollView>
          {footer}
        </View>
        {/* Keyboard users can scroll the condition beside the steps too. */}
        <ScrollView style={styles.panelScroll} contentContainerStyle={styles.panelScrollContent} focusable tabIndex={0} role="region" aria-label="The condition so far">
          {gradePanel}
        </ScrollView>
      </View>
    );
  }
  return (
    <View style={styles.phoneRoot}>
      <ScrollView ref={scroller} style={styles.scroll} contentContainerStyle={styles.scrollContent} keyboardShouldPersistTaps="handled">
        {form}
      </ScrollView>
      {footer}
    </View>
  );
}

const styles = StyleSheet.create({
  phoneRoot: { flex: 1, backgroundColor: PALETTE.ivory },
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: PALETTE.ivory },
  formColumn: { flex: 1, minWidth: 0 },
  scroll: { flex: 1 },
  scrollContent: { paddingHorizontal: SPACE.lg, paddingTop: SPACE.lg, paddingBottom: SPACE.xxl },
  scrollContentWide: { paddingHorizontal: SPACE.xl, paddingTop: SPACE.xl, paddingBottom: SPACE.xxxl },
  formInner: { gap: SPACE.lg, width: '100%' },
  formInnerWide: { maxWidth: 680, alignSelf: 'center' },
  header: { gap: SPACE.md, paddingBottom: SPACE.md, borderBottomWidth: 2, borderBottomColor: PALETTE.brass },
  titleRow: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between', gap: SPACE.md },
  titles: { gap: SPACE.xs, flexShrink: 1 },
  chip: { alignItems: 'flex-end', gap: SPACE.xxs, flexShrink: 0 },
  hidden: { display: 'none' },
  panel: { gap: SPACE.lg, backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, padding: SPACE.lg },
  panelWide: { borderRadius: 0, borderWidth: 0, padding: 0, backgroundColor: 'transparent' },
  panelHead: { gap: SPACE.xxs },
  panelScroll: { width: 360, flexGrow: 0, flexShrink: 0, backgroundColor: PALETTE.vellum, borderLeftWidth: 1, borderLeftColor: PALETTE.linen },
  panelScrollContent: { padding: SPACE.xl },
  draftLine: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: SPACE.sm, paddingTop: SPACE.md, borderTopWidth: 1, borderTopColor: PALETTE.linen },
  footer: { backgroundColor: PALETTE.vellum, borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingHorizontal: SPACE.lg, paddingVertical: SPACE.sm },
  footerWide: { paddingHorizontal: SPACE.xl },
  footerInner: { flexDirection: 'row', gap: SPACE.sm, width: '100%', minHeight: LAYOUT.touchTarget + 4 },
  footerMain: { flex: 1 },
});
