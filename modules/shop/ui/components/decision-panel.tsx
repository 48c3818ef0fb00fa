import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AREAS, READINESS_WORDS, type GradeView } from '@/modules/assessment/core/grade';
import { estimateReconditioning } from '@/modules/shop/core/estimate';
import type { RateCard } from '@/modules/shop/core/rate-card';
import { DECISIONS, SELL_AS_IS_REASON_MIN, type Decision } from '@/modules/shop/core/work-input';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { checkLabel, formatHours, money } from '../work-format';
import { Feedback, type FeedbackState } from './feedback';

export const DECISION_LABELS: Record<Decision, string> = {
  recondition: 'Recondition',
  sell_as_is: 'Sell as it stands',
  wholesale: 'Wholesale',
  decline: 'Decline: back to the owner',
};

const DECISION_HINTS: Record<Decision, string> = {
  recondition: 'Drafts a work plan from the estimate below. You can change it before approving it.',
  sell_as_is: 'The piano goes straight to ready, with its findings on the disclosure.',
  wholesale: 'The piano leaves retail stock for the trade.',
  decline: 'The piano goes back to its owner.',
};

interface DecisionPanelProps {
  grade: GradeView | null;
  card: RateCard | null;
  busy: boolean;
  onDecide: (decision: Decision, why: string | null) => Promise<FeedbackState>;
}

/** An assessed piano without a plan: what reconditioning would cost, and the manager's choice. */
export function DecisionPanel({ grade, card, busy, onDecide }: DecisionPanelProps) {
  const [decision, setDecision] = useState<Decision | null>(null);
  const [why, setWhy] = useState('');
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const estimate = grade && card ? estimateReconditioning(grade.findings, card) : null;
  // Selling as it stands a piano the play test found unfit for retail is a choice made on purpose, with the reason on record.
  const unfit = decision === 'sell_as_is' && !!grade?.notRecommendedForRetail;
  const reasonShort = unfit && why.trim().length < SELL_AS_IS_REASON_MIN;

  return (
    <View style={styles.wrap}>
      <Card role="region" accessibilityLabel="Reconditioning estimate">
        <Heading level={2}>What reconditioning would cost</Heading>
        {grade ? (
          <Body tone="secondary">
            Assessed: {READINESS_WORDS[grade.readiness].toLowerCase()}
            {grade.provisional ? `, provisional (${grade.inspectedAreas.length} of ${AREAS.length} areas inspected)` : ''}.
            {grade.referToTechnician ? ' Refer to a technician.' : ''}
            {grade.notRecommendedForRetail ? ' Not recommended for retail as it stands.' : ''}
          </Body>
        ) : null}
        {!estimate ? (
          <Body tone="secondary">{grade ? 'Loading the rate card…' : 'Loading the assessment…'}</Body>
        ) : estimate.lines.length ? (
          <View role="list" testID="decision-estimate">
            {estimate.lines.map((l) => (
              <View role="listitem" key={l.task} style={styles.line}>
                <View style={styles.grow}>
                  <Body variant="bodyStrong">
                    {l.label}
                    {l.quantity > 1 ? ` × ${l.quantity}` : ''}
                  </Body>
                  <Body variant="small" tone="secondary">
                    {formatHours(l.hours)} · labour {money(l.labourMinor, estimate.currency)} + parts {money(l.partsMinor, estimate.currency)} · for {l.because.map(checkLabel).join(', ')}
                  </Body>
                </View>
                <Body variant="bodyStrong">{money(l.totalMinor, estimate.currency)}</Body>
              </View>
            ))}
            <View style={[styles.line, styles.total]}>
              <Body variant="bodyStrong">
                In all, {formatHours(estimate.totalHours)}
              </Body>
              <Body variant="subheading" testID="decision-total">
                {money(estimate.totalMinor, estimate.currency)}
              </Body>
            </View>
            {estimate.options.map((o) => (
              <Body key={o.task} variant="small" tone="secondary">
                A cheaper partial fix, not counted: {o.label}, {formatHours(o.hours)}, {money(o.totalMinor, estimate.currency)}.
              </Body>
            ))}
            <Body variant="small" tone="quiet">
              Rate card {estimate.rateCardVersion}, {money(estimate.hourlyRateMinor, estimate.currency)} an hour.
            </Body>
          </View>
        ) : (
          <Body tone="secondary">The assessment calls for no work: the piano could be sold as it stands.</Body>
        )}
      </Card>
      <Card role="form" accessibilityLabel="Decide">
        <Heading level={2}>Decide</Heading>
        <ChoiceGroup label="What happens to this piano" options={DECISIONS} labels={DECISION_LABELS} value={decision} onChange={setDecision} testID="decision" />
        {decision ? <Body tone="secondary">{DECISION_HINTS[decision]}</Body> : null}
        {decision === 'decline' ? <Notice tone="caution">Declining cannot be undone here: the owner collects the piano.</Notice> : null}
        {unfit ? (
          <Notice tone="caution" title="Not recommended for retail as it stands" testID="decision-unfit">
            {`The play test found it plays poorly. Selling it as it stands puts it on the floor without the work; the buyer’s disclosure says plainly what was not done. Confirm with your reason (at least ${SELL_AS_IS_REASON_MIN} characters), kept in its stage history.`}
          </Notice>
        ) : null}
        <TextField
          label={unfit ? 'Your reason (required)' : 'Reason'}
          hint={unfit ? 'Kept in the piano’s stage history with your name.' : 'Optional: kept in the piano’s history.'}
          value={why}
          onChangeText={setWhy}
          multiline
          maxLength={500}
          testID="decision-why"
        />
        <View style={styles.start}>
          <Button
            label={decision ? (decision === 'recondition' ? 'Draft the plan' : unfit ? 'Confirm: sell as it stands' : DECISION_LABELS[decision]) : 'Choose first'}
            variant={decision === 'decline' ? 'danger' : 'primary'}
            disabled={!decision || reasonShort}
            busy={busy}
            onPress={async () => decision && setFeedback(await onDecide(decision, why.trim() || null))}
            testID="decision-submit"
          />
        </View>
        {reasonShort ? (
          <Body variant="small" tone="secondary" testID="decision-needs-reason">
            Give your reason above to confirm.
          </Body>
        ) : null}
        <Feedback state={feedback} testID="decision-feedback" />
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.lg },
  start: { alignItems: 'flex-start' },
  grow: { flex: 1, minWidth: 0 },
  line: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md, paddingVertical: SPACE.sm, borderBottomWidth: 1, borderBottomColor: PALETTE.linen },
  total: { justifyContent: 'space-between', borderBottomWidth: 0, borderTopWidth: 2, borderTopColor: PALETTE.felt, marginTop: -1 },
});
