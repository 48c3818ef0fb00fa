import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { can } from '@/modules/accounts/core/roles';
import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { AssessmentHistory, IntakeFacts, LatestAssessment } from '@/modules/assessment/ui/components/assessment-record';
import { DepositsPanel } from '@/modules/deposits/ui/deposits-panel';
import { money } from '@/modules/disclosure/ui/disclosure-format';
import { CASE_CONDITION_LABELS } from '@/modules/assessment/ui/measure-labels';
import { useAssessmentHistory } from '@/modules/assessment/ui/use-assessment-history';
import { useIntakeRecord } from '@/modules/assessment/ui/use-intake-record';
import { PhotoGallery } from '@/modules/photos/ui/components/photo-gallery';
import { PlayTestRecordings } from '@/modules/tone/ui/components/play-test-recordings';
import { OfferPanel } from '@/modules/pricing/ui/components/offer-panel';
import { PricePanel } from '@/modules/pricing/ui/components/price-panel';
import { usePianoPhotos } from '@/modules/photos/ui/use-photos';
import { StageActions } from '@/modules/shop/ui/stage-actions';
import { StageTimeline } from '@/modules/shop/ui/stage-timeline';
import { WorkshopSummary } from '@/modules/shop/ui/workshop-summary';
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
import { useWide } from '@/modules/theme/ui/use-wide';

import { formatDay, formatDayTime, formatKindAndSize, formatYear, makerAndModel } from './piano-format';
import { takePianoFlash } from './piano-flash';
import { usePiano, type PianoPage } from './use-piano';

/** One piano's page: what it is, its condition and photos, where it came from, and every change to its assessment. */
export function PianoScreen({ id }: { id: number | null }) {
  const { piano, loaded, error } = usePiano(id);
  const { user } = useSession();
  const [flash] = useState(() => takePianoFlash(id));
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
  const onFloorSide = !!user && can(user.role, 'showToBuyers');
  return (
    <Screen
      title={piano.stockNumber}
      eyebrow="Piano"
      headingTestID="piano-heading"
      actions={
        <View style={styles.actions}>
          {onFloorSide ? <Button label="Show to a buyer" href={`/present/${piano.id}`} testID="show-to-buyer" /> : null}
          <Button label="All pianos" variant="secondary" href="/pianos" />
        </View>
      }
    >
      {flash ? (
        <Notice tone="success" testID="piano-flash">
          {flash}
        </Notice>
      ) : null}
      <PianoSummary piano={piano} />
      <StageActions pianoId={piano.id} stage={piano.stage} />
      <PianoRecordParts piano={piano} />
    </Screen>
  );
}

function PianoRecordParts({ piano }: { piano: PianoPage }) {
  const wide = useWide();
  const { user } = useSession();
  const { history, error: historyError } = useAssessmentHistory(piano.id);
  const { intake } = useIntakeRecord(piano.id);
  const { photos } = usePianoPhotos(piano.id);
  const latest = history?.length ? history[history.length - 1] : null;
  // Intake staff and managers correct an assessment, or make the first one of a piano logged before its inspection.
  const mayCorrect = !!user && can(user.role, 'assess');
  const historyProblem = graphProblem(historyError);

  const condition = (
    <Section title="Condition">
      {latest ? (
        <LatestAssessment latest={latest} correctHref={mayCorrect ? `/pianos/${piano.id}/correct` : null} />
      ) : history && piano.stage === 'received' ? (
        <View style={styles.awaiting}>
          <EmptyState title="Not assessed yet">Logged before its inspection: the grade shows here once the intake is submitted.</EmptyState>
          {mayCorrect ? (
            <View style={styles.back}>
              <Button label="Assess this piano" href={`/trade-ins/new?pianoId=${piano.id}`} testID="assess-piano" />
            </View>
          ) : null}
        </View>
      ) : history ? (
        <EmptyState title="Not assessed yet">The grade from the inspection shows here once it is submitted.</EmptyState>
      ) : historyProblem ? (
        <Notice tone="error">{historyProblem.message}</Notice>
      ) : (
        <Loading label="Loading the assessment…" />
      )}
    </Section>
  );
  const photoSection = (
    <Section title="Photos">
      {photos == null ? <Loading label="Loading photos…" /> : photos.length ? <PhotoGallery photos={photos} /> : <Body tone="secondary">No photos yet.</Body>}
    </Section>
  );
  const playTest =
    user && can(user.role, 'readToneResults') ? (
      <Section title="Play test recordings" description="Pitch and level of each note, measured from a recording of the piano.">
        <PlayTestRecordings pianoId={piano.id} />
      </Section>
    ) : null;
  const onFloorSide = !!user && can(user.role, 'sellPianos');
  // Money sections for the roles that may see them; the server checks each field again.
  const offer =
    user && can(user.role, 'readOffers') ? (
      <Section title="Trade-in offer" description="Worked back from the expected asking price, line by line, so it can be explained to the seller.">
        <OfferPanel pianoId={piano.id} />
      </Section>
    ) : null;
  const pricing =
    user && can(user.role, 'setPrices') ? (
      <Section title="Price and margin" description="The asking price, how the suggestion is worked out, every change with who and why, and what the piano has cost.">
        <PricePanel pianoId={piano.id} />
      </Section>
    ) : null;
  const workshop = <WorkshopSummary pianoId={piano.id} />;
  const sale = onFloorSide ? (
    <Section title="Deposit and sale">
      <PriceCard piano={piano} />
      <DepositsPanel pianoId={piano.id} />
    </Section>
  ) : null;
  const stages = (
    <Section title="Stage history" description="Every move between stages: who, when, from where to where, and why; and the days spent in each.">
      <StageTimeline pianoId={piano.id} />
    </Section>
  );
  const historySection =
    history && history.length ? (
      <Section title="History" description="Every version of the assessment, newest first: who changed what, when and why.">
        <AssessmentHistory history={history} />
      </Section>
    ) : null;
  const details = (
    <Section title="Details">
      <Card>
        <FactList
          dense
          facts={[
            { label: 'Maker', value: piano.maker },
            { label: 'Model', value: piano.model || 'Not known' },
            { label: 'Serial number', value: piano.serialNumber || 'Not known' },
            { label: 'Year', value: formatYear(piano) },
            { label: 'Kind and size', value: formatKindAndSize(piano.kind, piano.sizeCm) },
            { label: 'Finish', value: piano.finish || 'Not noted' },
            { label: 'Case condition', value: piano.caseCondition ? CASE_CONDITION_LABELS[piano.caseCondition] : 'Not noted' },
            { label: 'Case notes', value: piano.caseNotes || 'None' },
          ]}
        />
      </Card>
    </Section>
  );
  const intakeSection = intake ? (
    <Section title="Intake">
      <IntakeFacts intake={intake} />
    </Section>
  ) : null;
  const dates = (
    <Section title="Dates">
      <Card>
        <FactList
          dense
          facts={[
            { label: 'Taken in', value: formatDayTime(piano.createdAt) },
            { label: 'In this stage since', value: formatDayTime(piano.stageChangedAt) },
            { label: 'Record last changed', value: formatDayTime(piano.updatedAt ?? piano.createdAt) },
          ]}
        />
      </Card>
    </Section>
  );

  if (!wide) {
    return (
      <Column>
        {condition}
        {offer}
        {pricing}
        {sale}
        {workshop}
        {playTest}
        {photoSection}
        {details}
        {intakeSection}
        {historySection}
        {stages}
        {dates}
      </Column>
    );
  }
  return (
    <View style={styles.columns}>
      <View style={styles.main}>
        {condition}
        {offer}
        {sale}
        {workshop}
        {playTest}
        {photoSection}
      </View>
      <View style={styles.aside}>
        {pricing}
        {details}
        {intakeSection}
        {historySection}
        {stages}
        {dates}
      </View>
    </View>
  );
}

/** The asking price beside the deposits; a manager sets it in "Price and margin", and it shows here at once. */
function PriceCard({ piano }: { piano: PianoPage }) {
  return (
    <Card testID="piano-price-card">
      <Body variant="label" tone="secondary">
        Asking price
      </Body>
      <Body variant="title" testID="piano-price">
        {piano.askingPriceMinor != null && piano.priceCurrency ? money(piano.askingPriceMinor, piano.priceCurrency) : 'No asking price yet'}
      </Body>
    </Card>
  );
}

function Column({ children }: { children: ReactNode }) {
  return <View style={styles.column}>{children}</View>;
}

function PianoSummary({ piano }: { piano: PianoPage }) {
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
  awaiting: { gap: SPACE.md },
  actions: { flexDirection: 'row', gap: SPACE.sm, flexWrap: 'wrap' },
  summary: { gap: SPACE.sm },
  stageLine: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm, flexWrap: 'wrap' },
  column: { gap: SPACE.xl },
  columns: { flexDirection: 'row', gap: SPACE.xxl, alignItems: 'flex-start' },
  main: { flex: 3, minWidth: 0, gap: SPACE.xl },
  aside: { flex: 2, minWidth: 0, gap: SPACE.xl },
});
