import { useRouter } from 'expo-router';
import { useCallback, useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { can } from '@/modules/accounts/core/roles';
import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { READINESS_WORDS } from '@/modules/assessment/core/grade';
import { setPianoFlash } from '@/modules/pianos/ui/piano-flash';
import { usePiano } from '@/modules/pianos/ui/use-piano';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';

import { AssessmentWizard } from './components/assessment-wizard';
import { draftStorageKey, newCorrectionDraft } from './intake-draft';
import { useAssessmentDraft } from './use-assessment-draft';
import { useAssessmentHistory, type AssessmentVersion } from './use-assessment-history';
import { useGradeRules } from './use-grade-rules';
import type { SubmittedAssessment } from './use-submit-assessment';

const CONFLICT_WORDS = 'Someone else corrected this assessment at the same moment. The form now holds their version: make your change again if it is still needed.';

/** Correcting a submitted assessment: the measurement steps, filled with the latest version, and a reason. */
export function CorrectionScreen({ pianoId }: { pianoId: number | null }) {
  const { user } = useSession();
  const { history, error, reexecute } = useAssessmentHistory(pianoId);
  const { piano } = usePiano(pianoId);
  const [banner, setBanner] = useState<string | null>(null);
  const problem = graphProblem(error);
  const back = pianoId != null ? `/pianos/${pianoId}` : '/pianos';

  if (!user) return null;
  if (!can(user.role, 'assess')) {
    return (
      <Screen title="Correct an assessment" eyebrow="Assessment">
        <EmptyState title="Corrections are for intake staff and managers">Your role can read assessments but not change them.</EmptyState>
        <View style={styles.left}>
          <Button label="Back to the piano" variant="secondary" href={back} />
        </View>
      </Screen>
    );
  }
  if (!history) {
    return <Screen title="Correct an assessment" eyebrow="Assessment">{problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the assessment…" />}</Screen>;
  }
  const latest = history[history.length - 1];
  if (!latest || pianoId == null) {
    return (
      <Screen title="Correct an assessment" eyebrow="Assessment">
        <EmptyState title="Nothing to correct">This piano has no submitted assessment yet.</EmptyState>
        <View style={styles.left}>
          <Button label="Back to the piano" variant="secondary" href={back} />
        </View>
      </Screen>
    );
  }
  return (
    <CorrectionForm
      key={`${user.id}-${latest.version}`}
      userId={user.id}
      pianoId={pianoId}
      latest={latest}
      stockNumber={piano?.stockNumber ?? `piano ${pianoId}`}
      banner={banner}
      onConflict={() => {
        setBanner(CONFLICT_WORDS);
        reexecute({ requestPolicy: 'network-only' });
      }}
    />
  );
}

interface CorrectionFormProps {
  userId: number;
  pianoId: number;
  latest: AssessmentVersion;
  stockNumber: string;
  banner: string | null;
  onConflict: () => void;
}

function CorrectionForm({ userId, pianoId, latest, stockNumber, banner, onConflict }: CorrectionFormProps) {
  const router = useRouter();
  const rules = useGradeRules();
  const start = () => newCorrectionDraft(pianoId, latest.version, latest.measurements);
  const { draft, update, refresh, forget, restored } = useAssessmentDraft(draftStorageKey(userId, 'correction', pianoId), start);

  // A draft begun on an older version would undo what came since: start again from the latest.
  const stale = draft.baseVersion !== latest.version;
  useEffect(() => {
    if (stale) forget(newCorrectionDraft(pianoId, latest.version, latest.measurements));
  }, [stale, forget, pianoId, latest]);

  const onSubmitted = useCallback(
    (result: SubmittedAssessment) => {
      forget();
      setPianoFlash(result.pianoId, `Correction saved as version ${result.version}, ${READINESS_WORDS[result.grade.readiness].toLowerCase()}${result.grade.provisional ? ' (provisional)' : ''}.`);
      router.replace(`/pianos/${result.pianoId}`);
    },
    [forget, router],
  );

  const conflict = useCallback(() => {
    forget();
    onConflict();
  }, [forget, onConflict]);

  if (stale) return null;
  return (
    <AssessmentWizard
      draft={draft}
      update={update}
      refresh={refresh}
      restored={restored}
      rules={rules}
      eyebrow={`Correcting ${stockNumber}`}
      base={latest.measurements}
      banner={banner}
      onSubmitted={onSubmitted}
      onConflict={conflict}
      onDiscard={() => {
        forget();
        router.replace(`/pianos/${pianoId}`);
      }}
    />
  );
}

const styles = StyleSheet.create({
  left: { alignItems: 'flex-start' },
});
