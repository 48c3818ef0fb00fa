import { useFocusEffect } from 'expo-router';
import { useCallback, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useSession } from '@/modules/accounts/ui/use-session';
import { STEP_TITLES, draftStorageKey, readDraft, stepsFor, type AssessmentDraft } from '@/modules/assessment/ui/intake-draft';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { Body } from '@/modules/theme/ui/text';

import { formatDayTime } from './piano-format';
import { PianoListSection } from './piano-list-section';

/** Intake's home: start (or carry on with) a trade-in, and the pianos taken in lately. */
export function TradeInsScreen() {
  const { user } = useSession();
  const [draft, setDraft] = useState<AssessmentDraft | null>(null);
  // Read again each time the page shows: the draft changes on the intake page.
  useFocusEffect(
    useCallback(() => {
      setDraft(user ? readDraft(draftStorageKey(user.id, 'intake')) : null);
    }, [user]),
  );
  return (
    <Screen
      title="Trade-ins"
      eyebrow="Intake"
      headingTestID="home-heading"
      actions={<Button label="Start a trade-in" href="/trade-ins/new" testID="start-trade-in" />}
    >
      {draft ? <DraftCard draft={draft} /> : null}
      <Section title="Recent intakes" description="Pianos taken in, newest first.">
        <PianoListSection filter={{ order: 'newest' }} emptyTitle="Nothing taken in yet" emptyText="A piano you take in shows here." pageSize={20} testID="recent-intakes" />
      </Section>
    </Screen>
  );
}

function DraftCard({ draft }: { draft: AssessmentDraft }) {
  const steps = stepsFor('intake');
  const what = [draft.piano.maker.trim(), draft.piano.model.trim()].filter(Boolean).join(' ') || 'A piano not yet named';
  return (
    <Card testID="intake-draft-card">
      <Body variant="subheading">{draft.pendingSubmit ? 'Waiting to be sent' : 'A trade-in in progress'}</Body>
      <Body>
        {what}
        {draft.seller.name.trim() ? `, from ${draft.seller.name.trim()}` : ''}
      </Body>
      <Body variant="small" tone="secondary">
        {draft.pendingSubmit
          ? 'Submitted without a connection: open it to send it now.'
          : `At step ${steps.indexOf(draft.step) + 1} of ${steps.length}, ${STEP_TITLES[draft.step]}.`}{' '}
        Saved on this device {formatDayTime(draft.changedAt)}. One trade-in at a time: “Start a trade-in” opens this draft until it is sent or discarded.
      </Body>
      <View style={styles.left}>
        <Button label="Open the draft" variant="secondary" href="/trade-ins/new" testID="open-intake-draft" />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  left: { alignItems: 'flex-start' },
});
