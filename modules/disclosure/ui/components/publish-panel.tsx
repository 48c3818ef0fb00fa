import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useAssessmentHistory } from '@/modules/assessment/ui/use-assessment-history';
import { publishBlockers } from '@/modules/disclosure/core/disclosure';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

import { longDay, deviceLocality } from '../disclosure-format';
import { usePublishDisclosure, type DisclosureVersions, type Published } from '../use-disclosures';

// Staff read times in their own device's zone: the shop's own tablets and desks.
const STAFF_TIME = deviceLocality();

interface PublishPanelProps {
  pianoId: number;
  versions: DisclosureVersions;
  onPublished: (published: Published) => void;
}

/** Freezes the piano's record as the disclosure buyers read: a new version only when something changed. */
export function PublishPanel({ pianoId, versions, onPublished }: PublishPanelProps) {
  const publish = usePublishDisclosure();
  const [feedback, setFeedback] = useState<{ tone: 'success' | 'info' | 'error'; text: string } | null>(null);
  const newest = versions.versions[versions.versions.length - 1] ?? null;
  // The same rule the server applies: said here before anyone presses publish.
  const { history } = useAssessmentHistory(pianoId);
  const latest = history?.length ? history[history.length - 1] : null;
  const blockers = latest ? publishBlockers(latest.grade) : [];

  const run = async () => {
    setFeedback(null);
    const outcome = await publish.run({ pianoId });
    if (!outcome.ok) {
      setFeedback({ tone: 'error', text: outcome.problem.message });
      return;
    }
    const p = outcome.data;
    setFeedback(
      p.unchanged
        ? { tone: 'info', text: `Nothing has changed since version ${p.version}: it stays the one buyers read.` }
        : { tone: 'success', text: `Version ${p.version} is published. Buyers who open the link now read it; earlier acknowledgements stay with the version each buyer read.` },
    );
    onPublished(p);
  };

  const button = (
    <Button label="Publish the current disclosure" variant={newest ? 'secondary' : 'primary'} onPress={run} busy={publish.busy} disabled={blockers.length > 0} testID="publish-disclosure" />
  );
  const why = blockers.length ? (
    <Notice tone="caution" title="Not ready to publish" testID="publish-blocked">
      {blockers.join(' ')}
    </Notice>
  ) : null;
  return (
    <View style={styles.wrap}>
      {newest ? (
        <Card>
          <Body testID="present-published">
            Version {newest.version} is the one buyers read, published on {longDay(newest.publishedAt, STAFF_TIME)}.
          </Body>
          <Body variant="small" tone="secondary">
            Publishing again makes a new version only if the piano’s record changed since: a new inspection, finished work, photos or the price.
          </Body>
          {why}
          <View style={styles.buttons}>{button}</View>
        </Card>
      ) : (
        <EmptyState title="Not published yet" testID="present-unpublished">
          Buyers have nothing to read for this piano yet. Publishing freezes its inspection, work and photos as version 1.
        </EmptyState>
      )}
      {newest ? null : why}
      {newest ? null : <View style={styles.buttons}>{button}</View>}
      {feedback ? (
        <Notice tone={feedback.tone} testID="publish-feedback">
          {feedback.text}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
});
