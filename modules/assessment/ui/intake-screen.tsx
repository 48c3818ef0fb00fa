import { useRouter } from 'expo-router';
import { useCallback } from 'react';

import { can } from '@/modules/accounts/core/roles';
import { useSession } from '@/modules/accounts/ui/use-session';
import { setPianoFlash } from '@/modules/pianos/ui/piano-flash';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Screen } from '@/modules/theme/ui/screen';

import { AssessmentWizard } from './components/assessment-wizard';
import { draftStorageKey, newIntakeDraft } from './intake-draft';
import { useAssessmentDraft } from './use-assessment-draft';
import { useGradeRules } from './use-grade-rules';
import type { SubmittedAssessment } from './use-submit-assessment';

/** Logging a trade-in on a phone: the piano and seller, each measurement, photos, then the grade. */
export function IntakeScreen() {
  const { user } = useSession();
  if (!user) return null;
  if (!can(user.role, 'assess')) {
    return (
      <Screen title="Start a trade-in" eyebrow="Intake">
        <EmptyState title="Intake is for intake staff and managers">Your role can see pianos but not log them in.</EmptyState>
      </Screen>
    );
  }
  return <IntakeForm key={user.id} userId={user.id} />;
}

function IntakeForm({ userId }: { userId: number }) {
  const router = useRouter();
  const rules = useGradeRules();
  const { draft, update, refresh, forget, restored } = useAssessmentDraft(draftStorageKey(userId, 'intake'), () => newIntakeDraft(new Date()));

  const onSubmitted = useCallback(
    (result: SubmittedAssessment) => {
      forget();
      setPianoFlash(result.pianoId, `Intake recorded as ${result.stockNumber}, graded ${result.grade.score} of 100.`);
      router.replace(`/pianos/${result.pianoId}`);
    },
    [forget, router],
  );

  return (
    <AssessmentWizard
      draft={draft}
      update={update}
      refresh={refresh}
      restored={restored}
      rules={rules}
      eyebrow="New trade-in"
      base={null}
      onSubmitted={onSubmitted}
      onDiscard={() => forget(newIntakeDraft(new Date()))}
    />
  );
}
