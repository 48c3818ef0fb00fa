import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { roundMinor, type Currency } from '@/modules/shop/core/money';
import type { RateCard } from '@/modules/shop/core/rate-card';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Section } from '@/modules/theme/ui/section';
import { Body } from '@/modules/theme/ui/text';

import type { MutationOutcome } from '../use-shop-mutation';
import type { Assignee } from '../use-assignees';
import type { ItemInput, ItemPatch, WorkPlanView } from '../use-work-plan';
import type { WorkItemView } from '../use-work-queue';
import { asCurrency, dueWords, formatDate, formatHours, money, STATUS_LABELS, taskLabel } from '../work-format';
import { CostTable, type CostRow } from './cost-table';
import { Feedback, type FeedbackState } from './feedback';
import { Buttons } from './field-row';
import { ItemEditor } from './item-editor';
import { PriorityTag } from './priority-tag';
import { VarianceTag } from './variance-tag';

export interface PlanEditing {
  assignees: readonly Assignee[] | null;
  card: RateCard | null;
  busy: boolean;
  add: (item: ItemInput) => Promise<MutationOutcome<unknown>>;
  update: (itemId: number, patch: ItemPatch) => Promise<MutationOutcome<unknown>>;
  remove: (itemId: number) => Promise<MutationOutcome<unknown>>;
}

interface PlanPanelProps {
  plan: WorkPlanView;
  /** present for a manager: the plan can be changed */
  editing: PlanEditing | null;
  /** bench roles may open an item */
  canOpenItems: boolean;
}

const hoursOf = (minutes: number) => Math.round((minutes / 60) * 100) / 100;

/** The plan: its rate, each item's estimate against what it has cost, the sums by kind of task, and the manager's changes. */
export function PlanPanel({ plan, editing, canOpenItems }: PlanPanelProps) {
  const currency = asCurrency(plan.currency);
  const [open, setOpen] = useState<number | 'new' | null>(null);
  const [dropping, setDropping] = useState<number | null>(null);
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const done = plan.items.filter((i) => i.status === 'done').length;
  const over = plan.items.filter((i) => i.actualCostMinor > i.estimatedCostMinor);
  const overrun = over.reduce((s, i) => s + i.actualCostMinor - i.estimatedCostMinor, 0);

  const settle = (outcome: MutationOutcome<unknown>, success: string): FeedbackState => {
    if (!outcome.ok) return { tone: 'error', text: outcome.problem.message };
    setOpen(null);
    setDropping(null);
    setFeedback({ tone: 'success', text: success });
    return null;
  };

  const rows: CostRow[] = plan.items.map((item) => ({
    key: String(item.id),
    testID: `plan-item-${item.id}`,
    label: <Body variant="bodyStrong">{item.title}</Body>,
    sub: <ItemFacts item={item} currency={currency} hourlyRateMinor={plan.hourlyRateMinor} />,
    estimatedHours: item.estimatedHours,
    loggedHours: hoursOf(item.loggedMinutes),
    estimatedCostMinor: item.estimatedCostMinor,
    actualCostMinor: item.actualCostMinor,
    varianceMinor: item.actualCostMinor - item.estimatedCostMinor,
    inProgress: item.status !== 'done',
    actions:
      canOpenItems || editing ? (
        <Buttons>
          {canOpenItems ? <Button label="Open" variant="quiet" href={`/workshop/items/${item.id}`} accessibilityLabel={`Open ${item.title}`} testID={`plan-open-${item.id}`} /> : null}
          {editing ? (
            <Button label={open === item.id ? 'Close' : 'Change'} variant="quiet" onPress={() => setOpen(open === item.id ? null : item.id)} accessibilityLabel={`Change ${item.title}`} testID={`plan-edit-${item.id}`} />
          ) : null}
          {editing && item.status === 'planned' && item.loggedMinutes === 0 && item.partsMinor === 0 ? (
            dropping === item.id ? (
              <>
                <Body variant="small" tone="danger">
                  Drop {item.title} from the plan?
                </Body>
                <Button
                  label="Drop it"
                  variant="danger"
                  busy={editing.busy}
                  onPress={async () => {
                    const f = settle(await editing.remove(item.id), `${item.title} dropped from the plan.`);
                    if (f) setFeedback(f);
                  }}
                  testID={`plan-drop-confirm-${item.id}`}
                />
                <Button label="Keep it" variant="quiet" onPress={() => setDropping(null)} />
              </>
            ) : (
              <Button label="Drop" variant="quiet" onPress={() => setDropping(item.id)} accessibilityLabel={`Drop ${item.title}`} testID={`plan-drop-${item.id}`} />
            )
          ) : null}
        </Buttons>
      ) : undefined,
    below:
      editing && open === item.id ? (
        <ItemEditor
          key={`edit-${item.id}`}
          item={item}
          currency={currency}
          hourlyRateMinor={plan.hourlyRateMinor}
          assignees={editing.assignees}
          card={editing.card}
          busy={editing.busy}
          onSave={async (change) => (change.kind === 'update' ? settle(await editing.update(item.id, change.patch), `${item.title} changed.`) : null)}
          onCancel={() => setOpen(null)}
          testID={`plan-editor-${item.id}`}
        />
      ) : undefined,
  }));

  const total: CostRow = {
    key: 'total',
    testID: 'plan-total',
    label: 'All items',
    sub: (
      <Body variant="small" tone="secondary">
        {done} of {plan.items.length} done
      </Body>
    ),
    ...plan.totals,
    inProgress: done < plan.items.length,
  };

  return (
    <View style={styles.wrap}>
      {plan.items.length ? (
        <View style={styles.stats} testID="plan-summary">
          <Stat label="Estimate" value={money(plan.totals.estimatedCostMinor, currency)} sub={`${formatHours(plan.totals.estimatedHours)} of work`} />
          <Stat label="Cost so far" value={money(plan.totals.actualCostMinor, currency)} sub={`${formatHours(plan.totals.loggedHours)} logged`} />
          <Stat
            label="Over the estimate"
            value={over.length ? <VarianceTag varianceMinor={overrun} currency={currency} /> : 'Nothing over'}
            sub={over.length ? `on ${over.length === 1 ? '1 item' : `${over.length} items`}` : 'no item has cost more than its estimate'}
          />
          <Stat label="Items done" value={`${done} of ${plan.items.length}`} sub={plan.approvedAt ? `approved ${formatDate(plan.approvedAt)}` : 'a draft, not yet approved'} />
        </View>
      ) : null}
      <Body variant="small" tone="secondary">
        Rate card {plan.rateCardVersion}: {money(plan.hourlyRateMinor, currency)} an hour.
      </Body>
      <Feedback state={feedback} testID="plan-feedback" />
      <Section title="Estimate against actual, by item" description="Labour at the plan’s hourly rate plus parts. An item that has cost more than its estimate is marked “over”; open work shows what is left.">
        {plan.items.length ? (
          <CostTable rows={rows} total={total} firstColumn="Item" currency={currency} testID="plan-items" />
        ) : (
          <EmptyState title="No work items yet">{editing ? 'Add the work this piano needs below.' : 'A manager adds the work this piano needs.'}</EmptyState>
        )}
      </Section>
      {editing ? (
        open === 'new' ? (
          <ItemEditor
            item={null}
            currency={currency}
            hourlyRateMinor={plan.hourlyRateMinor}
            assignees={editing.assignees}
            card={editing.card}
            busy={editing.busy}
            onSave={async (change) => (change.kind === 'add' ? settle(await editing.add(change.item), 'Item added to the plan.') : null)}
            onCancel={() => setOpen(null)}
            testID="plan-add"
          />
        ) : (
          <View style={styles.start}>
            <Button label="Add a work item" variant="secondary" onPress={() => setOpen('new')} testID="plan-add-open" />
          </View>
        )
      ) : null}
      {plan.byTask.length ? (
        <Section title="By kind of task" description="The same sums, gathered by the kind of work: where the rate card’s hours run long or short.">
          <CostTable
            rows={plan.byTask.map((t) => ({
              key: t.task,
              label: taskLabel(t.task),
              ...t,
              inProgress: plan.items.some((i) => i.task === t.task && i.status !== 'done'),
              testID: `plan-task-${t.task}`,
            }))}
            firstColumn="Kind of task"
            currency={currency}
            testID="plan-by-task"
          />
        </Section>
      ) : null}
    </View>
  );
}

function Stat({ label, value, sub }: { label: string; value: ReactNode; sub: string }) {
  return (
    <View style={styles.stat}>
      <Body variant="label" tone="secondary">
        {label}
      </Body>
      {typeof value === 'string' ? <Body variant="subheading">{value}</Body> : value}
      <Body variant="small" tone="quiet">
        {sub}
      </Body>
    </View>
  );
}

function ItemFacts({ item, currency, hourlyRateMinor }: { item: WorkItemView; currency: Currency; hourlyRateMinor: number }) {
  const labour = roundMinor(item.estimatedHours * hourlyRateMinor);
  const due = dueWords(item.dueOn);
  return (
    <View style={styles.facts}>
      <View style={styles.factLine}>
        <PriorityTag priority={item.priority} />
        <Body variant="small" tone="secondary">
          <Body variant="small" tone={item.status === 'done' ? 'success' : 'secondary'}>
            {STATUS_LABELS[item.status] ?? item.status}
          </Body>
          {` · ${item.assignedTo ?? 'unassigned'}`}
        </Body>
        {due ? (
          <Body variant={due.overdue && item.status !== 'done' ? 'label' : 'small'} tone={due.overdue && item.status !== 'done' ? 'danger' : 'secondary'}>
            {due.text}
          </Body>
        ) : null}
      </View>
      <Body variant="small" tone="quiet">
        Labour {money(labour, currency)} + parts {money(Math.max(0, item.estimatedCostMinor - labour), currency)}
        {item.quantity > 1 ? ` · quantity ${item.quantity}` : ''}
        {item.partsMinor ? ` · parts used ${money(item.partsMinor, currency)}` : ''}
      </Body>
      {item.doneReason ? (
        <Body variant="small" tone="secondary" testID={`plan-item-done-reason-${item.id}`}>
          Done with no time logged: {item.doneReason}
        </Body>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.lg },
  stats: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  // four across a wide screen, two across a phone
  stat: { flexGrow: 1, flexBasis: 160, gap: SPACE.xxs, padding: SPACE.md, backgroundColor: PALETTE.vellum, borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.md },
  start: { alignItems: 'flex-start' },
  facts: { gap: SPACE.xxs },
  factLine: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: SPACE.sm, rowGap: SPACE.xxs },
});
