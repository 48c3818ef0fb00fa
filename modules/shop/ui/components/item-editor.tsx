import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { can, ROLE_LABELS } from '@/modules/accounts/core/roles';
import { WORK_TASKS, WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import { toMinor, type Currency } from '@/modules/shop/core/money';
import type { RateCard } from '@/modules/shop/core/rate-card';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Body } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import type { Assignee } from '../use-assignees';
import type { ItemInput, ItemPatch } from '../use-work-plan';
import type { WorkItemView } from '../use-work-queue';
import { addDaysIso, minorToText, parseAmount, parseNumber, PRIORITIES, PRIORITY_LABELS, todayIso, type PriorityKey } from '../work-format';
import { Feedback, type FeedbackState } from './feedback';
import { Buttons, FieldRow } from './field-row';

const TASK_CHOICES = [...WORK_TASKS, 'custom'] as const;
type TaskChoice = (typeof TASK_CHOICES)[number];
const TASK_CHOICE_LABELS = { ...WORK_TASK_LABELS, custom: 'Other (describe it)' } as Record<TaskChoice, string>;

interface Draft {
  task: TaskChoice | null;
  title: string;
  hours: string;
  parts: string;
  quantity: string;
  assignee: string;
  priority: PriorityKey;
  dueOn: string;
}

const UNASSIGNED = 'none';

function draftFrom(item: WorkItemView | null, currency: Currency, hourlyRateMinor: number): Draft {
  if (!item) return { task: null, title: '', hours: '', parts: '', quantity: '1', assignee: UNASSIGNED, priority: '2', dueOn: '' };
  const labour = Math.round(item.estimatedHours * hourlyRateMinor);
  return {
    task: item.task as TaskChoice,
    title: item.title,
    hours: String(item.estimatedHours),
    parts: minorToText(Math.max(0, item.estimatedCostMinor - labour), currency),
    quantity: String(item.quantity),
    assignee: item.assignedToId != null ? String(item.assignedToId) : UNASSIGNED,
    priority: String(item.priority) as PriorityKey,
    dueOn: item.dueOn ?? '',
  };
}

interface ItemEditorProps {
  /** the item to change, or null to add one */
  item: WorkItemView | null;
  currency: Currency;
  hourlyRateMinor: number;
  assignees: readonly Assignee[] | null;
  card: RateCard | null;
  busy: boolean;
  onSave: (input: { kind: 'add'; item: ItemInput } | { kind: 'update'; patch: ItemPatch }) => Promise<FeedbackState>;
  onCancel: () => void;
  testID: string;
}

/** Hours, parts allowance, assignee, priority and due date of one item; a new item also picks its task. */
export function ItemEditor({ item, currency, hourlyRateMinor, assignees, card, busy, onSave, onCancel, testID }: ItemEditorProps) {
  const initial = useMemo(() => draftFrom(item, currency, hourlyRateMinor), [item, currency, hourlyRateMinor]);
  const [d, setD] = useState<Draft>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const set = (change: Partial<Draft>) => setD((prev) => ({ ...prev, ...change }));

  const people = assignees ?? [];
  // Someone assigned earlier who is no longer active still shows, so the choice is not silently lost.
  const assigneeOptions = [UNASSIGNED, ...people.map((p) => String(p.id)), ...(item?.assignedToId != null && !people.some((p) => p.id === item.assignedToId) ? [String(item.assignedToId)] : [])];
  const assigneeLabels: Record<string, string> = { [UNASSIGNED]: 'Unassigned', ...Object.fromEntries(people.map((p) => [String(p.id), can(p.role, 'planWork') ? `${p.name} (${ROLE_LABELS[p.role].toLowerCase()})` : p.name])) };
  if (item?.assignedToId != null && !assigneeLabels[String(item.assignedToId)]) assigneeLabels[String(item.assignedToId)] = item.assignedTo ?? `User ${item.assignedToId}`;

  const pickTask = (task: TaskChoice) => {
    const rate = task !== 'custom' ? card?.tasks[task as WorkTask] : undefined;
    const qty = Math.max(1, Number(d.quantity) || 1);
    set({
      task,
      ...(rate ? { hours: String(rate.hours * (rate.perUnit ? qty : 1)), parts: minorToText(rate.partsMinor * (rate.perUnit ? qty : 1), currency) } : {}),
    });
  };

  const save = async () => {
    setFeedback(null);
    const next: Record<string, string> = {};
    const hours = parseNumber(d.hours);
    const parts = d.parts.trim() ? parseAmount(d.parts) : 0;
    const qty = Number(d.quantity);
    if (!item && !d.task) next.task = 'Pick the kind of work.';
    if (d.task === 'custom' && !d.title.trim()) next.title = 'Describe the work in a few words.';
    if (hours == null || Number.isNaN(hours) || hours < 0 || hours > 200) next.hours = 'Hours from 0 to 200, e.g. 2.5.';
    if (parts == null) next.parts = `An amount in ${currency}, e.g. 65.00.`;
    if (!Number.isInteger(qty) || qty < 1 || qty > 250) next.quantity = 'From 1 to 250.';
    if (d.dueOn.trim() && !/^\d{4}-\d{2}-\d{2}$/.test(d.dueOn.trim())) next.dueOn = 'A date as YYYY-MM-DD, or leave it empty.';
    setErrors(next);
    if (Object.keys(next).length) return;
    const values = {
      title: d.title.trim(),
      estimatedHours: hours!,
      estimatedPartsMinor: toMinor(parts!, currency),
      quantity: qty,
      assignedToId: d.assignee === UNASSIGNED ? null : Number(d.assignee),
      priority: Number(d.priority),
      dueOn: d.dueOn.trim() || null,
    };
    let outcome: FeedbackState;
    if (!item) {
      const { title, ...rest } = values;
      outcome = await onSave({ kind: 'add', item: { task: d.task!, ...(title ? { title } : {}), ...rest } });
    } else {
      // Only what changed goes to the server.
      const before = draftFrom(item, currency, hourlyRateMinor);
      const patch: ItemPatch = {};
      if (d.title.trim() !== before.title && values.title) patch.title = values.title;
      if (d.hours !== before.hours) patch.estimatedHours = values.estimatedHours;
      if (d.parts !== before.parts) patch.estimatedPartsMinor = values.estimatedPartsMinor;
      if (d.quantity !== before.quantity) patch.quantity = values.quantity;
      if (d.assignee !== before.assignee) patch.assignedToId = values.assignedToId;
      if (d.priority !== before.priority) patch.priority = values.priority;
      if (d.dueOn.trim() !== before.dueOn) patch.dueOn = values.dueOn;
      if (!Object.keys(patch).length) {
        onCancel();
        return;
      }
      outcome = await onSave({ kind: 'update', patch });
    }
    setFeedback(outcome);
  };

  const today = todayIso();
  return (
    <View style={styles.editor} testID={testID} role="form" aria-label={item ? `Change ${item.title}` : 'Add a work item'}>
      {!item ? (
        <ChoiceGroup label="Kind of work" options={TASK_CHOICES} labels={TASK_CHOICE_LABELS} value={d.task} onChange={pickTask} error={errors.task} hint="The rate card fills in the usual hours and parts." testID={`${testID}-task`} />
      ) : null}
      {item || d.task === 'custom' || d.task ? (
        <TextField
          label="Title"
          hint={d.task === 'custom' ? 'What the work is.' : 'Optional: the task’s name is used when left empty.'}
          value={d.title}
          onChangeText={(t) => set({ title: t })}
          maxLength={120}
          error={errors.title}
          testID={`${testID}-title`}
        />
      ) : null}
      <FieldRow>
        <TextField label="Hours" value={d.hours} onChangeText={(t) => set({ hours: t })} unit="h" inputMode="decimal" keyboardType="decimal-pad" error={errors.hours} testID={`${testID}-hours`} />
        <TextField label="Parts allowance" value={d.parts} onChangeText={(t) => set({ parts: t })} unit={currency} inputMode="decimal" keyboardType="decimal-pad" error={errors.parts} testID={`${testID}-parts`} />
        <TextField label="Quantity" value={d.quantity} onChangeText={(t) => set({ quantity: t.replace(/[^0-9]/g, '') })} short inputMode="numeric" error={errors.quantity} testID={`${testID}-quantity`} />
      </FieldRow>
      {assignees ? (
        <ChoiceGroup label="Assigned to" options={assigneeOptions} labels={assigneeLabels} value={d.assignee} onChange={(v) => set({ assignee: v })} testID={`${testID}-assignee`} />
      ) : (
        <Body variant="small" tone="quiet">
          Loading the team…
        </Body>
      )}
      <ChoiceGroup label="Priority" options={PRIORITIES} labels={PRIORITY_LABELS} value={d.priority} onChange={(v) => set({ priority: v })} testID={`${testID}-priority`} />
      <View style={styles.due}>
        <TextField label="Due" hint="YYYY-MM-DD, or leave it empty." value={d.dueOn} onChangeText={(t) => set({ dueOn: t })} short inputMode="numeric" error={errors.dueOn} testID={`${testID}-due`} />
        <Buttons>
          <Button label="Today" variant="quiet" onPress={() => set({ dueOn: today })} />
          <Button label="In 3 days" variant="quiet" onPress={() => set({ dueOn: addDaysIso(today, 3) })} />
          <Button label="In a week" variant="quiet" onPress={() => set({ dueOn: addDaysIso(today, 7) })} />
          {d.dueOn ? <Button label="No date" variant="quiet" onPress={() => set({ dueOn: '' })} /> : null}
        </Buttons>
      </View>
      <Buttons>
        <Button label={item ? 'Save the changes' : 'Add to the plan'} onPress={save} busy={busy} testID={`${testID}-save`} />
        <Button label="Cancel" variant="quiet" onPress={onCancel} testID={`${testID}-cancel`} />
      </Buttons>
      <Feedback state={feedback} />
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: SPACE.md, padding: SPACE.lg, borderRadius: RADIUS.md, borderWidth: 1.5, borderColor: PALETTE.felt, backgroundColor: PALETTE.ivory },
  due: { gap: SPACE.xs },
});
