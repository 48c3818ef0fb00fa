import type { Href } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { ACQUISITION_LABELS, INSPECTION_PLACE_LABELS } from '@/modules/assessment/core/intake-input';
import type { AssessmentVersion } from '@/modules/assessment/ui/use-assessment-history';
import type { IntakeRecord } from '@/modules/assessment/ui/use-intake-record';
import { MEASURE_LABELS, formatMeasure, type MeasureField } from '@/modules/assessment/ui/measure-labels';
import { READINESS_MARKS, READINESS_WORDS } from '@/modules/assessment/core/grade';
import { useRateCard } from '@/modules/shop/ui/use-rate-card';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { MarkTag } from '@/modules/theme/ui/mark';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { FactList } from '@/modules/theme/ui/fact-list';
import { Body } from '@/modules/theme/ui/text';

import { ConditionSummary } from './condition-summary';

const DAY_TIME = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
const DAY = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const when = (iso: string) => {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : DAY_TIME.format(d);
};
const day = (isoDate: string) => {
  const d = new Date(`${isoDate.slice(0, 10)}T12:00:00`);
  return Number.isNaN(d.getTime()) ? isoDate : DAY.format(d);
};

function versionKind(v: AssessmentVersion): string {
  if (v.kind === 'post_workshop') return 'After the workshop';
  return v.version === 1 ? 'Intake assessment' : 'Correction';
}

/** The assessment in force: read-only, with the way to correct it for those who may. */
export function LatestAssessment({ latest, correctHref }: { latest: AssessmentVersion; correctHref: Href | null }) {
  const { card } = useRateCard();
  return (
    <Card testID="latest-assessment">
      <View style={styles.head}>
        <Body variant="small" tone="secondary">
          Version {latest.version} · {versionKind(latest)} by {latest.submittedBy}, {when(latest.submittedAt)}. Submitted assessments are read-only.
        </Body>
        {correctHref ? <Button label="Correct this assessment" variant="secondary" href={correctHref} testID="correct-assessment" /> : null}
      </View>
      <ConditionSummary grade={latest.grade} card={card} testID="assessment-condition" />
    </Card>
  );
}

/** Who changed what and when, newest first. */
export function AssessmentHistory({ history }: { history: readonly AssessmentVersion[] }) {
  return (
    <View role="list" style={styles.history} testID="assessment-history">
      {[...history].reverse().map((v) => (
        <View role="listitem" key={v.id} style={styles.version} testID={`history-version-${v.version}`}>
          <View style={styles.versionHead}>
            <Body variant="bodyStrong">
              Version {v.version}: {versionKind(v)}
            </Body>
            <MarkTag mark={READINESS_MARKS[v.grade.readiness]} label={`${READINESS_WORDS[v.grade.readiness]}${v.grade.provisional ? ' (provisional)' : ''}`} />
          </View>
          <Body variant="small" tone="secondary">
            By {v.submittedBy}, {when(v.submittedAt)} · rules “{v.rulesVersion}”
          </Body>
          {v.changeNote ? <Body>Reason: “{v.changeNote}”</Body> : null}
          {v.kind === 'post_workshop' && v.remeasured?.length ? (
            <Body variant="small" tone="secondary" testID={`history-remeasured-${v.version}`}>
              Measured again: {v.remeasured.map((f) => MEASURE_LABELS[f as MeasureField]?.toLowerCase() ?? f).join(', ')}.
            </Body>
          ) : null}
          {v.changes.length ? (
            <View style={styles.changes}>
              {v.changes.map((c) => (
                <Body key={c.field} variant="small" testID={`history-change-${v.version}-${c.field}`}>
                  {MEASURE_LABELS[c.field as MeasureField] ?? c.field}: {formatMeasure(c.field, c.from)} → {formatMeasure(c.field, c.to)}
                </Body>
              ))}
            </View>
          ) : v.version > 1 ? (
            <Body variant="small" tone="quiet">
              No measurement changed.
            </Body>
          ) : null}
        </View>
      ))}
    </View>
  );
}

/** Where the piano came from; the seller block shows only when the server sent it (intake staff and managers). */
export function IntakeFacts({ intake }: { intake: IntakeRecord }) {
  const facts = [
    { label: 'Acquisition', value: ACQUISITION_LABELS[intake.acquisition] ?? intake.acquisition },
    { label: 'Received', value: day(intake.receivedOn) },
    { label: 'Inspected at', value: INSPECTION_PLACE_LABELS[intake.inspectedAt] ?? intake.inspectedAt },
    { label: 'Logged', value: when(intake.createdAt) },
    ...(intake.samePianoAs ? [{ label: 'Taken in before as', value: intake.samePianoAs.stockNumber }] : []),
  ];
  return (
    <Card testID="intake-record">
      <FactList facts={facts} dense />
      {intake.samePianoAs ? (
        <View style={styles.start}>
          <Button label={`Open ${intake.samePianoAs.stockNumber}, the earlier record`} variant="quiet" href={`/pianos/${intake.samePianoAs.id}`} testID="intake-same-piano" />
        </View>
      ) : null}
      {intake.seller ? (
        <View style={styles.seller} testID="intake-seller">
          <Body variant="label" tone="secondary">
            Seller · personal data, shown to intake staff and managers only
          </Body>
          <Body variant="bodyStrong">{intake.seller.name}</Body>
          {intake.seller.phone ? <Body>{intake.seller.phone}</Body> : null}
          {intake.seller.email ? <Body>{intake.seller.email}</Body> : null}
          {intake.seller.address ? <Body>{intake.seller.address}</Body> : null}
        </View>
      ) : null}
      {intake.notes ? (
        <View style={styles.seller}>
          <Body variant="label" tone="secondary">
            Internal notes
          </Body>
          <Body>{intake.notes}</Body>
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { gap: SPACE.md, alignItems: 'flex-start' },
  start: { alignItems: 'flex-start' },
  history: { gap: SPACE.md },
  version: { gap: SPACE.xs, backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.md, padding: SPACE.lg, borderLeftWidth: 4, borderLeftColor: PALETTE.brass },
  versionHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: SPACE.sm, flexWrap: 'wrap' },
  changes: { gap: SPACE.xxs, paddingLeft: SPACE.md, borderLeftWidth: 2, borderLeftColor: PALETTE.linen },
  seller: { gap: SPACE.xxs, paddingTop: SPACE.sm, borderTopWidth: 1, borderTopColor: PALETTE.linen },
});
