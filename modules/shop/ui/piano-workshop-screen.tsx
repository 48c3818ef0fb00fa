import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useCan } from '@/modules/accounts/ui/use-can';
import { useGradeRules } from '@/modules/assessment/ui/use-grade-rules';
import { useAssessmentHistory } from '@/modules/assessment/ui/use-assessment-history';
import { STAGE_LABELS, type Stage } from '@/modules/pianos/core/piano';
import type { Decision } from '@/modules/shop/core/work-input';
import { makerAndModel } from '@/modules/pianos/ui/piano-format';
import { usePiano } from '@/modules/pianos/ui/use-piano';
import type { PianoRecord } from '@/modules/pianos/ui/use-pianos';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { DecisionPanel, DECISION_LABELS } from './components/decision-panel';
import { Feedback, type FeedbackState } from './components/feedback';
import { FinishPanel } from './components/finish-panel';
import { PlanPanel } from './components/plan-panel';
import { RemeasurePanel } from './components/remeasure-panel';
import { AbilityGate } from '@/modules/accounts/ui/ability-gate';
import { StageActions } from './stage-actions';
import { StageTimeline } from './stage-timeline';
import { useAssignees } from './use-assignees';
import { useRateCard } from './use-rate-card';
import { usePlanCommands, useWorkPlan, type WorkPlanView } from './use-work-plan';

/** A piano's workshop page: the manager's decision and plan, estimate against actual, re-measuring and finishing. */
export function PianoWorkshopScreen({ id }: { id: number | null }) {
  return (
    <AbilityGate ability="workAtBench" title="Workshop">
      <PianoWorkshop id={id} />
    </AbilityGate>
  );
}

function PianoWorkshop({ id }: { id: number | null }) {
  const { piano, loaded, error } = usePiano(id);
  const problem = graphProblem(error);
  if (id == null || (loaded && !piano)) {
    return (
      <Screen title="No such piano" eyebrow="Workshop">
        <EmptyState title="This piano is not in stock">The link may be mistyped, or the record is not one you can see.</EmptyState>
      </Screen>
    );
  }
  if (!piano) {
    return (
      <Screen title="Workshop" eyebrow="Workshop">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the piano…" />}
      </Screen>
    );
  }
  return <WorkshopPage piano={piano} />;
}

function WorkshopPage({ piano }: { piano: PianoRecord }) {
  // Deciding, planning and approving go together (decidePianos, planWork): the manager's part of the page.
  const manager = useCan()('planWork');
  const wide = useWide();
  const { plan, loaded: planLoaded, error: planError, refresh: refreshPlan } = useWorkPlan(piano.id);
  const { history, latest, refresh: refreshHistory } = useAssessmentHistory(piano.id);
  const assignees = useAssignees(!manager);
  const { card } = useRateCard(!manager);
  const rules = useGradeRules();
  const cmd = usePlanCommands();
  const [stageNote, setStageNote] = useState<FeedbackState>(null);
  const planProblem = graphProblem(planError);

  const stage = piano.stage;
  const remeasured =
    !!plan?.approvedAt && !!history?.some((a) => a.kind === 'post_workshop' && Date.parse(a.submittedAt) >= Date.parse(plan.approvedAt!));
  const itemsOpen = plan ? plan.items.filter((i) => i.status !== 'done').length : 0;

  const decide = async (decision: Decision, why: string | null): Promise<FeedbackState> => {
    const outcome = await cmd.decide.run({ pianoId: piano.id, decision, why });
    if (!outcome.ok) return { tone: 'error', text: outcome.problem.message };
    refreshPlan();
    setStageNote({
      tone: 'success',
      text: decision === 'recondition' ? 'Plan drafted from the estimate: check the items, then approve it.' : `${DECISION_LABELS[decision]}: the piano is now ${STAGE_LABELS[outcome.data.stage as Stage]?.toLowerCase() ?? outcome.data.stage}.`,
    });
    return null;
  };

  const planSection = plan ? (
    <Section title="Work plan" testID="workshop-plan">
      <PlanPanel
        plan={plan}
        canOpenItems={stage === 'in_workshop'}
        editing={
          manager
            ? {
                assignees,
                card,
                busy: cmd.addItem.busy || cmd.updateItem.busy || cmd.removeItem.busy,
                add: async (item) => after(await cmd.addItem.run({ pianoId: piano.id, item }), refreshPlan),
                update: async (itemId, p) => after(await cmd.updateItem.run({ itemId, p }), refreshPlan),
                remove: async (itemId) => after(await cmd.removeItem.run({ itemId }), refreshPlan),
              }
            : null
        }
      />
      {manager && !plan.approvedAt && stage === 'assessed' ? <ApproveCard plan={plan} busy={cmd.approve.busy} onApprove={async (why) => {
        const outcome = await cmd.approve.run({ pianoId: piano.id, why });
        if (!outcome.ok) return { tone: 'error', text: outcome.problem.message };
        refreshPlan();
        setStageNote({ tone: 'success', text: 'Plan approved: the piano is in the workshop and its items are on the bench.' });
        return null;
      }} /> : null}
    </Section>
  ) : null;

  const benchWork =
    stage === 'in_workshop' && plan ? (
      <View style={[styles.columns, !wide && styles.stack]}>
        <View style={wide ? styles.main : undefined}>
          <RemeasurePanel
            tasks={plan.items.map((i) => i.task)}
            latest={latest}
            rules={rules}
            busy={cmd.remeasure.busy}
            onSubmit={async (measurements, changeNote) => {
              const outcome = await cmd.remeasure.run({ i: { pianoId: piano.id, measurements, changeNote } });
              if (!outcome.ok) return { ok: false, message: outcome.problem.message };
              refreshHistory();
              return { ok: true, version: outcome.data.version, grade: outcome.data.grade };
            }}
          />
        </View>
        <View style={wide ? styles.side : undefined}>
          <FinishPanel
            itemsOpen={itemsOpen}
            itemsTotal={plan.items.length}
            remeasured={remeasured}
            busy={cmd.finish.busy}
            onFinish={async () => {
              const outcome = await cmd.finish.run({ pianoId: piano.id });
              if (!outcome.ok) return { tone: 'error', text: outcome.problem.message };
              setStageNote({ tone: 'success', text: 'Finished in the workshop: the piano is ready for the floor.' });
              return null;
            }}
          />
        </View>
      </View>
    ) : null;

  return (
    <Screen
      title={piano.stockNumber}
      eyebrow="Workshop"
      headingTestID="workshop-heading"
      actions={
        <>
          <Button label="Piano record" variant="secondary" href={`/pianos/${piano.id}`} />
          <Button label="Bench" variant="secondary" href="/bench" />
        </>
      }
    >
      <View style={styles.summary}>
        <Body variant="subheading">{makerAndModel(piano.maker, piano.model)}</Body>
        <StageBadge stage={stage} testID="workshop-stage" />
      </View>
      <Feedback state={stageNote} testID="workshop-feedback" />
      {planProblem ? <Notice tone="error">{planProblem.message}</Notice> : null}

      {!planLoaded ? <Loading label="Loading the plan…" /> : null}
      {planLoaded && !plan && stage === 'assessed' ? (
        manager ? (
          <Section title="Decide what happens" testID="workshop-decide">
            <DecisionPanel grade={latest?.grade ?? null} card={card} busy={cmd.decide.busy} onDecide={decide} />
          </Section>
        ) : (
          <EmptyState title="Waiting for a manager’s decision">This piano is assessed. A manager decides whether it is reconditioned, sold as it stands, wholesaled or returned.</EmptyState>
        )
      ) : null}
      {planLoaded && !plan && stage !== 'assessed' ? (
        <EmptyState title="No workshop plan">
          {stage === 'received' ? 'The piano is not assessed yet: its plan comes after the assessment.' : `This piano is ${STAGE_LABELS[stage].toLowerCase()} and has no reconditioning plan.`}
        </EmptyState>
      ) : null}

      {planSection}
      {benchWork ? <Section title="After the work">{benchWork}</Section> : null}

      <Section title="Stage history" description="Every move, who made it and why, with the whole days spent in each stage.">
        <Card>
          <StageTimeline pianoId={piano.id} />
          {manager && !(stage === 'assessed' && !plan) ? (
            <View style={styles.moves}>
              <Heading level={2}>Other moves</Heading>
              <StageActions pianoId={piano.id} stage={stage} onMoved={() => refreshPlan()} showElsewhere={false} />
            </View>
          ) : null}
        </Card>
      </Section>
    </Screen>
  );
}

function after<T>(outcome: T, refresh: () => void): T {
  if ((outcome as { ok: boolean }).ok) refresh();
  return outcome;
}

function ApproveCard({ plan, busy, onApprove }: { plan: WorkPlanView; busy: boolean; onApprove: (why: string | null) => Promise<FeedbackState> }) {
  const [why, setWhy] = useState('');
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  return (
    <Card role="form" accessibilityLabel="Approve the plan">
      <Heading level={2}>Approve the plan</Heading>
      <Body tone="secondary">
        {plan.items.length
          ? `Approving sends the piano to the workshop with these ${plan.items.length} items. Items can still be changed afterwards.`
          : 'Add at least one work item before approving.'}
      </Body>
      <TextField label="Reason" hint="Optional: kept in the piano’s history." value={why} onChangeText={setWhy} maxLength={500} testID="approve-why" />
      <View style={styles.start}>
        <Button label="Approve and send to the workshop" onPress={async () => setFeedback(await onApprove(why.trim() || null))} busy={busy} disabled={!plan.items.length} testID="approve-plan" />
      </View>
      <Feedback state={feedback} testID="approve-feedback" />
    </Card>
  );
}

const styles = StyleSheet.create({
  summary: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.md },
  columns: { flexDirection: 'row', gap: SPACE.xl, alignItems: 'flex-start' },
  stack: { flexDirection: 'column', alignItems: 'stretch', gap: SPACE.lg },
  main: { flex: 2, minWidth: 0 },
  side: { flex: 1, minWidth: 0 },
  start: { alignItems: 'flex-start' },
  moves: { gap: SPACE.md, borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingTop: SPACE.lg },
});
