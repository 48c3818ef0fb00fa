import { useRouter } from 'expo-router';
import { useCallback, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { can } from '@/modules/accounts/core/roles';
import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { READINESS_WORDS } from '@/modules/assessment/core/grade';
import { setPianoFlash } from '@/modules/pianos/ui/piano-flash';
import { usePiano } from '@/modules/pianos/ui/use-piano';
import type { PianoRecord } from '@/modules/pianos/ui/use-pianos';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';

import { AssessmentWizard } from './components/assessment-wizard';
import { DraftConfirm } from './components/draft-confirm';
import { draftStorageKey, newIntakeDraft, newPianoIntakeDraft, readDraft, writeDraft, type AssessmentDraft } from './intake-draft';
import { useAssessmentDraft } from './use-assessment-draft';
import { useAssessmentHistory } from './use-assessment-history';
import { useGradeRules } from './use-grade-rules';
import type { SubmittedAssessment } from './use-submit-assessment';

/**
 * Logging a trade-in on a phone: the piano and seller, each measurement, photos, then the grade.
 * With `pianoId`, the intake assesses a piano logged before its inspection instead of adding one.
 */
export function IntakeScreen({ pianoId = null }: { pianoId?: number | null }) {
  const { user } = useSession();
  if (!user) return null;
  if (!can(user.role, 'assess')) {
    return (
      <Screen title="Start a trade-in" eyebrow="Intake">
        <EmptyState title="Intake is for intake staff and managers">Your role can see pianos but not log them in.</EmptyState>
      </Screen>
    );
  }
  if (pianoId != null) return <PianoIntake key={`${user.id}-${pianoId}`} userId={user.id} pianoId={pianoId} />;
  return <IntakeForm key={user.id} userId={user.id} piano={null} />;
}

/** The piano must still wait for its inspection, and a draft for anything else is not overwritten unasked. */
function PianoIntake({ userId, pianoId }: { userId: number; pianoId: number }) {
  const { piano, loaded, error } = usePiano(pianoId);
  const { history, error: historyError } = useAssessmentHistory(pianoId);
  const storageKey = draftStorageKey(userId, 'intake');
  const [other, setOther] = useState<AssessmentDraft | null>(() => {
    const stored = readDraft(storageKey);
    return stored && stored.pianoId !== pianoId ? stored : null;
  });
  const problem = graphProblem(error ?? historyError);
  const back = `/pianos/${pianoId}`;

  if (loaded && !piano) {
    return (
      <Screen title="Assess a piano" eyebrow="Intake">
        <EmptyState title="This piano is not in stock">The link may be mistyped, or the record is not one you can see.</EmptyState>
        <View style={styles.left}>
          <Button label="All pianos" variant="secondary" href="/pianos" />
        </View>
      </Screen>
    );
  }
  if (!piano || !history) {
    return (
      <Screen title="Assess a piano" eyebrow="Intake">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the piano…" />}
      </Screen>
    );
  }
  if (piano.stage !== 'received' || history.length > 0) {
    const assessed = history.length > 0;
    return (
      <Screen title={`Assess ${piano.stockNumber}`} eyebrow="Intake">
        <EmptyState title={assessed ? `${piano.stockNumber} has had its inspection` : `${piano.stockNumber} is not waiting for an inspection`} testID="assess-not-needed">
          {assessed
            ? 'Its intake is on record. A change to its condition is a correction of the assessment, made from the piano’s page.'
            : 'Only a piano in stage Received, not yet assessed, gets its intake here.'}
        </EmptyState>
        <View style={styles.left}>
          <Button label="Back to the piano" variant="secondary" href={back} />
        </View>
      </Screen>
    );
  }
  if (other) {
    return (
      <Screen title={`Assess ${piano.stockNumber}`} eyebrow="Intake" width="form">
        <OtherDraft
          draft={other}
          stockNumber={piano.stockNumber}
          back={back}
          onDiscard={() => {
            writeDraft(storageKey, null);
            setOther(null);
          }}
        />
      </Screen>
    );
  }
  return <IntakeForm userId={userId} piano={piano} />;
}

/** One intake draft at a time on a device: the one there already is either thrown away or kept by going back. */
function OtherDraft({ draft, stockNumber, back, onDiscard }: { draft: AssessmentDraft; stockNumber: string; back: string; onDiscard: () => void }) {
  const { piano: itsPiano } = usePiano(draft.pianoId);
  const named = [draft.piano.maker.trim(), draft.piano.model.trim()].filter(Boolean).join(' ');
  const what =
    draft.pianoId != null
      ? `the assessment of ${itsPiano?.stockNumber ?? 'another piano'}${named ? ` (${named})` : ''}`
      : `a new trade-in${named ? ` (${named})` : ''}${draft.seller.name.trim() ? ` from ${draft.seller.name.trim()}` : ''}`;
  const openHref = draft.pianoId != null ? `/trade-ins/new?pianoId=${draft.pianoId}` : '/trade-ins/new';
  return (
    <DraftConfirm
      title="Another intake is in progress"
      testID="other-draft"
      commands={
        <>
          <Button label={`Discard it and assess ${stockNumber}`} variant="danger" onPress={onDiscard} testID="confirm-discard" />
          <Button label="Go back" variant="secondary" href={back} testID="keep-other-draft" />
          <Button label="Open that draft" variant="quiet" href={openHref} testID="open-other-draft" />
        </>
      }
    >
      {`This device holds an unsent draft for ${what}, and one intake is kept at a time. Discarding it removes everything entered for it from this device; photos already sent stay on the server unattached.`}
    </DraftConfirm>
  );
}

function IntakeForm({ userId, piano }: { userId: number; piano: PianoRecord | null }) {
  const router = useRouter();
  const rules = useGradeRules();
  const start = useCallback(() => (piano ? newPianoIntakeDraft(new Date(), piano) : newIntakeDraft(new Date())), [piano]);
  const { draft, update, refresh, forget, restored } = useAssessmentDraft(draftStorageKey(userId, 'intake'), start);
  // A draft opened from the trade-ins page may be tied to a piano too: its header names that piano.
  const { piano: assessed } = usePiano(piano ? null : draft.pianoId);
  const tiedTo = piano ?? assessed;
  const [banner, setBanner] = useState<string | null>(null);
  const tied = draft.pianoId != null;

  const onSubmitted = useCallback(
    (result: SubmittedAssessment) => {
      forget();
      const recorded = tied ? `Intake recorded for ${result.stockNumber}` : `Intake recorded as ${result.stockNumber}`;
      setPianoFlash(result.pianoId, `${recorded}, ${READINESS_WORDS[result.grade.readiness].toLowerCase()}${result.grade.provisional ? ' (provisional)' : ''}.`);
      router.replace(`/pianos/${result.pianoId}`);
    },
    [forget, router, tied],
  );

  const eyebrow = !tied ? 'New trade-in' : `Assessing ${tiedTo?.stockNumber ?? `piano ${draft.pianoId}`}`;
  return (
    <AssessmentWizard
      draft={draft}
      update={update}
      refresh={refresh}
      restored={restored}
      rules={rules}
      eyebrow={eyebrow}
      base={null}
      banner={banner}
      onSubmitted={onSubmitted}
      // Someone else assessed the piano meanwhile: say so and keep the draft until it is discarded.
      onConflict={tied ? setBanner : undefined}
      onDiscard={() => {
        setBanner(null);
        forget(start());
      }}
    />
  );
}

const styles = StyleSheet.create({
  left: { alignItems: 'flex-start' },
});
