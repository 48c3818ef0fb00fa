import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { FactList } from '@/modules/theme/ui/fact-list';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body } from '@/modules/theme/ui/text';

import { formatDay, formatDayTime, formatKindAndSize, formatYear, makerAndModel } from './piano-format';
import { usePiano } from './use-piano';
import type { PianoRecord } from './use-pianos';

/** One piano's page; `created` greets a piano that was just taken in. */
export function PianoScreen({ id, created }: { id: number | null; created?: boolean }) {
  const { piano, loaded, error } = usePiano(id);
  const problem = graphProblem(error);

  if (id == null || (loaded && !piano)) {
    return (
      <Screen title="No such piano" eyebrow="Piano">
        <EmptyState title="This piano is not in stock">The link may be mistyped, or the record is not one you can see.</EmptyState>
        <View style={styles.back}>
          <Button label="All pianos" variant="secondary" href="/pianos" />
        </View>
      </Screen>
    );
  }
  if (!piano) {
    return (
      <Screen title="Piano" eyebrow="Piano">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the piano…" />}
      </Screen>
    );
  }
  return (
    <Screen title={piano.stockNumber} eyebrow="Piano" headingTestID="piano-heading" actions={<Button label="All pianos" variant="secondary" href="/pianos" />}>
      {created ? <Notice tone="success">Trade-in recorded as {piano.stockNumber}.</Notice> : null}
      <PianoSummary piano={piano} />
      <Section title="Details">
        <Card>
          <FactList
            facts={[
              { label: 'Maker', value: piano.maker },
              { label: 'Model', value: piano.model || 'Not known' },
              { label: 'Serial number', value: piano.serialNumber || 'Not known' },
              { label: 'Year', value: formatYear(piano.year, piano.yearIsEstimate) },
              { label: 'Kind and size', value: formatKindAndSize(piano.kind, piano.sizeCm) },
              { label: 'Finish', value: piano.finish || 'Not noted' },
            ]}
          />
        </Card>
      </Section>
      <Section title="Dates">
        <Card>
          <FactList
            facts={[
              { label: 'Taken in', value: formatDayTime(piano.createdAt) },
              { label: 'In this stage since', value: formatDayTime(piano.stageChangedAt) },
              { label: 'Record last changed', value: formatDayTime(piano.updatedAt ?? piano.createdAt) },
            ]}
          />
        </Card>
      </Section>
    </Screen>
  );
}

function PianoSummary({ piano }: { piano: PianoRecord }) {
  return (
    <View style={styles.summary}>
      <Body variant="subheading" testID="piano-title">
        {makerAndModel(piano.maker, piano.model)}
      </Body>
      <View style={styles.stageLine}>
        <StageBadge stage={piano.stage} testID="piano-stage" />
        <Body variant="small" tone="quiet">
          since {formatDay(piano.stageChangedAt)}
        </Body>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  back: { alignItems: 'flex-start' },
  summary: { gap: SPACE.sm },
  stageLine: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm, flexWrap: 'wrap' },
});
