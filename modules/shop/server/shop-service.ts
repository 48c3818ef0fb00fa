import type { Knex } from 'knex';
import { UniqueViolationError } from 'objection';

import { can, rolesThatCan, type Ability } from '@/modules/accounts/core/roles';
import { User } from '@/modules/accounts/server/user-model';
import type { Actor } from '@/modules/accounts/server/user-service';
import { WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import { Assessment } from '@/modules/assessment/server/assessment-models';
import { latestGradedAssessment } from '@/modules/assessment/server/assessment-service';
import { pianoName } from '@/modules/pianos/core/piano';
import { Piano } from '@/modules/pianos/server/piano-model';
import { movePiano } from '@/modules/pianos/server/stage-service';
import { cautionsFor } from '@/modules/shop/core/cautions';
import { readClimate } from '@/modules/shop/core/climate';
import { estimateReconditioning } from '@/modules/shop/core/estimate';
import { roundMinor } from '@/modules/shop/core/money';
import { QUEUE_PAGE, QUEUE_SCOPES, type QueuePage, type QueueScope, type WorkItemView } from '@/modules/shop/core/work-views';
import { demoRateCard, rateCardInput, type RateCard } from '@/modules/shop/core/rate-card';
import { climateInput, DECISIONS, doneInput, SELL_AS_IS_REASON_MIN, partUseInput, timeCorrectionInput, timeEntryInput, workItemInput, workItemPatch, type Decision } from '@/modules/shop/core/work-input';
import { nextVersion } from '@/server/db/versions';
import { DEFAULT_PAGE_SIZE, MAX_PAGE_SIZE } from '@/server/graphql/limits';
import { AppError, badInput, notAllowed, notFound } from '@/server/errors';

import { ClimateReadingRow, PartUse, RateCardSet, TimeEntry, TimeEntryCorrection, WorkItem, WorkNote, WorkPlan } from './shop-models';

// Asked first, before the input is read: a caller without the right learns nothing from it.
function requireAbility(actor: Actor, ability: Ability, what: string): void {
  if (!can(actor.role, ability)) throw notAllowed(what);
}

// ---- rate card ----

export async function currentRateCard(trx?: Knex.Transaction): Promise<RateCard> {
  const latest = await RateCardSet.query(trx).orderBy('id', 'desc').first();
  return latest ? latest.card : demoRateCard;
}

/** The rate card as a screen reads it: what work costs is for those who price it. */
export async function rateCardFor(actor: Actor): Promise<RateCard> {
  requireAbility(actor, 'readWorkCosts', 'see the rate card');
  return currentRateCard();
}

export async function setRateCard(actor: Actor, raw: unknown): Promise<RateCard> {
  requireAbility(actor, 'setRates', 'change the rate card');
  const input = rateCardInput.parse(raw);
  return RateCardSet.transaction(async (trx) => {
    const card: RateCard = { ...input, version: await nextVersion(trx, RateCardSet.tableName, 'rates') };
    await RateCardSet.query(trx).insert({ version: card.version, card, createdById: actor.id });
    return card;
  });
}

// ---- decision and plan ----

/** The manager's choice for an assessed piano. Recondition drafts a plan; the others move the piano. */
export async function decide(actor: Actor, raw: { pianoId: number; decision: string; why?: string | null }): Promise<{ stage: string; planId: number | null }> {
  requireAbility(actor, 'decidePianos', 'decide what happens to a piano');
  if (!DECISIONS.includes(raw.decision as Decision)) throw badInput('decision', `must be one of ${DECISIONS.join(', ')}`);
  const decision = raw.decision as Decision;
  if (decision === 'sell_as_is') {
    // A piano the play test found unfit for retail goes to the floor unreconditioned only on purpose, with the reason on record.
    const latest = await latestGradedAssessment(raw.pianoId);
    if (latest?.grade.notRecommendedForRetail && (raw.why ?? '').trim().length < SELL_AS_IS_REASON_MIN) {
      throw new AppError(
        'CONFLICT',
        `This piano is not recommended for retail as it stands (its play test). Selling it as it stands needs your reason, of at least ${SELL_AS_IS_REASON_MIN} characters: it is kept in the stage history.`,
        'why',
      );
    }
  }
  if (decision !== 'recondition') {
    const piano = await movePiano({ pianoId: raw.pianoId, action: decision, by: actor.role, userId: actor.id, why: raw.why });
    return { stage: piano.stage, planId: null };
  }
  return Piano.transaction(async (trx) => {
    const piano = await Piano.query(trx).findById(raw.pianoId).forUpdate();
    if (!piano) throw notFound(`piano ${raw.pianoId}`);
    if (piano.stage !== 'assessed') throw new AppError('CONFLICT', `A piano in stage "${piano.stage}" cannot get a reconditioning plan; it must be assessed.`);
    const existing = await WorkPlan.query(trx).findOne({ piano_id: piano.id });
    if (existing) return { stage: piano.stage, planId: existing.id };
    const assessment = await latestGradedAssessment(piano.id, trx);
    if (!assessment) throw notFound(`an assessment of ${piano.stockNumber}`);
    const card = await currentRateCard(trx);
    const estimate = estimateReconditioning(assessment.grade.findings, card);
    const plan = await WorkPlan.query(trx).insertAndFetch({
      pianoId: piano.id,
      assessmentId: assessment.id,
      rateCardVersion: card.version,
      currency: card.currency,
      hourlyRateMinor: card.hourlyRateMinor,
      createdById: actor.id,
    });
    for (const line of estimate.lines) {
      await WorkItem.query(trx).insert({
        planId: plan.id,
        pianoId: piano.id,
        task: line.task,
        title: line.label,
        estimatedHours: line.hours,
        estimatedPartsMinor: line.partsMinor,
        quantity: line.quantity,
        because: line.because,
        priority: 2,
      });
    }
    return { stage: piano.stage, planId: plan.id };
  });
}

async function planFor(trx: Knex.Transaction | undefined, pianoId: number): Promise<WorkPlan> {
  const plan = await WorkPlan.query(trx).findOne({ piano_id: pianoId });
  if (!plan) throw notFound(`a reconditioning plan for piano ${pianoId}`);
  return plan;
}

async function checkAssignee(id: number | null | undefined): Promise<void> {
  if (id == null) return;
  const user = await User.query().findById(id);
  if (!user || !user.active || !rolesThatCan('workAtBench').includes(user.role)) throw badInput('assignedToId', 'must be an active member of staff who works at the bench');
}

export async function addWorkItem(actor: Actor, pianoId: number, raw: unknown): Promise<WorkItem> {
  requireAbility(actor, 'planWork', 'plan workshop work');
  const input = workItemInput.parse(raw);
  if (input.task === 'custom' && !input.title) throw badInput('title', 'is required for a custom item');
  await checkAssignee(input.assignedToId);
  const plan = await planFor(undefined, pianoId);
  return WorkItem.query().insertAndFetch({
    planId: plan.id,
    pianoId,
    task: input.task as WorkTask | 'custom',
    title: input.title ?? WORK_TASK_LABELS[input.task as WorkTask],
    estimatedHours: input.estimatedHours,
    estimatedPartsMinor: input.estimatedPartsMinor,
    quantity: input.quantity,
    because: [],
    assignedToId: input.assignedToId ?? null,
    priority: input.priority,
    dueOn: input.dueOn ?? null,
  });
}

async function loadItem(trx: Knex.Transaction | undefined, itemId: number, lock = false): Promise<WorkItem> {
  const q = WorkItem.query(trx).findById(itemId);
  const item = await (lock ? q.forUpdate() : q);
  if (!item) throw notFound(`work item ${itemId}`);
  return item;
}

export async function updateWorkItem(actor: Actor, itemId: number, raw: unknown): Promise<WorkItem> {
  requireAbility(actor, 'planWork', 'change workshop work');
  const patch = workItemPatch.parse(raw);
  await checkAssignee(patch.assignedToId);
  const item = await loadItem(undefined, itemId);
  return item.$query().patchAndFetch(patch as Partial<WorkItem>);
}

export async function removeWorkItem(actor: Actor, itemId: number): Promise<boolean> {
  requireAbility(actor, 'planWork', 'drop workshop work');
  return WorkItem.transaction(async (trx) => {
    // Locked, so a timer cannot start on the item while it is being dropped.
    const item = await loadItem(trx, itemId, true);
    const logged = await TimeEntry.query(trx).where('work_item_id', itemId).resultSize();
    const parts = await PartUse.query(trx).where('work_item_id', itemId).resultSize();
    if (logged || parts || item.status !== 'planned') throw new AppError('CONFLICT', 'This item has work logged against it: mark it done instead of dropping it.');
    await item.$query(trx).delete();
    return true;
  });
}

export async function approvePlan(actor: Actor, pianoId: number, why?: string | null): Promise<Piano> {
  requireAbility(actor, 'decidePianos', 'approve plans');
  return Piano.transaction(async (trx) => {
    const plan = await planFor(trx, pianoId);
    const piano = await movePiano(
      {
        pianoId,
        action: 'approve_plan',
        by: actor.role,
        userId: actor.id,
        why,
        facts: async () => ({ planApproved: (await WorkItem.query(trx).where('plan_id', plan.id).resultSize()) > 0 }),
      },
      trx,
    );
    await plan.$query(trx).patch({ approvedById: actor.id, approvedAt: new Date().toISOString() });
    return piano;
  });
}

// ---- the bench ----

async function benchItem(trx: Knex.Transaction | undefined, actor: Actor, itemId: number, lock = false): Promise<WorkItem> {
  requireAbility(actor, 'workAtBench', 'log workshop work');
  const item = await loadItem(trx, itemId, lock);
  if (!can(actor.role, 'workOnAnyItem') && item.assignedToId != null && item.assignedToId !== actor.id) {
    // Taking an unassigned item is first come; the one who came second is told who has it.
    if (lock) throw new AppError('CONFLICT', `${(await User.query(trx).findById(item.assignedToId))?.name ?? 'Someone else'} has taken this item: ask a manager to assign it to you.`);
    throw notAllowed('log work on an item assigned to someone else');
  }
  const piano = await Piano.query(trx).findById(item.pianoId);
  if (piano?.stage !== 'in_workshop') throw new AppError('CONFLICT', 'Work is logged only while the piano is in the workshop.');
  return item;
}

export async function startTimer(actor: Actor, itemId: number): Promise<TimeEntry> {
  try {
    return await WorkItem.transaction(async (trx) => {
      // The item's row lock makes two starts take turns: the second sees who took it.
      const item = await benchItem(trx, actor, itemId, true);
      if (item.status === 'done') throw new AppError('CONFLICT', 'This item is done: reopen it before logging more time.');
      // Starting work on an unassigned item takes it.
      await item.$query(trx).patch({ status: 'in_progress', ...(item.assignedToId == null ? { assignedToId: actor.id } : {}) });
      return TimeEntry.query(trx).insertAndFetch({ workItemId: itemId, technicianId: actor.id, startedAt: new Date().toISOString() });
    });
  } catch (err) {
    if (err instanceof UniqueViolationError) throw new AppError('CONFLICT', 'Your timer is already running on another item: stop it first.');
    throw err;
  }
}

export async function stopTimer(actor: Actor, itemId: number): Promise<TimeEntry> {
  await benchItem(undefined, actor, itemId);
  // One statement finds and stops the timer, so two stops at once end it once.
  const [stopped] = (await TimeEntry.query()
    .patch({ endedAt: new Date().toISOString() })
    .where({ work_item_id: itemId, technician_id: actor.id })
    .whereNull('ended_at')
    .whereNull('minutes')
    .returning('*')) as unknown as TimeEntry[];
  if (!stopped) throw new AppError('CONFLICT', 'No timer of yours is running on this item.');
  return stopped;
}

export async function logTime(actor: Actor, raw: unknown): Promise<TimeEntry> {
  requireAbility(actor, 'workAtBench', 'log workshop work');
  const input = timeEntryInput.parse(raw);
  await benchItem(undefined, actor, input.workItemId);
  return TimeEntry.query().insertAndFetch({ workItemId: input.workItemId, technicianId: actor.id, startedAt: new Date().toISOString(), minutes: input.minutes, note: input.note ?? null });
}

export async function addPart(actor: Actor, raw: unknown): Promise<PartUse> {
  requireAbility(actor, 'workAtBench', 'log workshop work');
  const input = partUseInput.parse(raw);
  await benchItem(undefined, actor, input.workItemId);
  return PartUse.query().insertAndFetch({ ...input, loggedById: actor.id });
}

export async function addNote(actor: Actor, itemId: number, body: string): Promise<WorkNote> {
  requireAbility(actor, 'workAtBench', 'log workshop work');
  const text = (body ?? '').trim();
  if (!text || text.length > 2000) throw badInput('body', 'must be 1 to 2000 characters');
  await benchItem(undefined, actor, itemId);
  return WorkNote.query().insertAndFetch({ workItemId: itemId, authorId: actor.id, body: text });
}

/**
 * Done needs time logged on the item, or the reason it took none (done by an outside tuner, say):
 * the reason is kept on the item and in its notes.
 */
export async function setWorkItemDone(actor: Actor, raw: unknown): Promise<WorkItem> {
  requireAbility(actor, 'workAtBench', 'log workshop work');
  const input = doneInput.parse(raw);
  return WorkItem.transaction(async (trx) => {
    const item = await benchItem(trx, actor, input.itemId);
    const now = new Date().toISOString();
    await TimeEntry.query(trx).patch({ endedAt: now }).where({ work_item_id: item.id }).whereNull('ended_at').whereNull('minutes');
    if (!input.done) return item.$query(trx).patchAndFetch({ status: 'in_progress', doneAt: null, doneReason: null });
    const logged = minutesOf(await TimeEntry.query(trx).where('work_item_id', item.id), Date.parse(now));
    const reason = input.reason?.trim() || null;
    if (logged === 0 && !reason) {
      throw new AppError('CONFLICT', `No time is logged on “${item.title}”: log the time it took, or give the reason it took none.`, 'reason');
    }
    if (logged === 0) await WorkNote.query(trx).insert({ workItemId: item.id, authorId: actor.id, body: `Marked done with no time logged: ${reason}` });
    return item.$query(trx).patchAndFetch({ status: 'done', doneAt: now, doneReason: logged === 0 ? reason : null });
  });
}

/** A time entry corrected by the technician who logged it or a manager; each correction is kept. */
export async function correctTimeEntry(actor: Actor, raw: unknown): Promise<TimeEntry> {
  requireAbility(actor, 'correctOwnTime', 'correct logged time');
  const input = timeCorrectionInput.parse(raw);
  return TimeEntry.transaction(async (trx) => {
    const entry = await TimeEntry.query(trx).findById(input.timeEntryId).forUpdate();
    if (!entry) throw notFound(`time entry ${input.timeEntryId}`);
    if (entry.technicianId !== actor.id && !can(actor.role, 'correctAnyTime')) throw notAllowed('correct time someone else logged');
    if (entry.minutes == null && !entry.endedAt) throw new AppError('CONFLICT', 'This timer is still running: stop it before correcting its time.');
    const old = minutesOf([entry], Date.now());
    if (old === input.minutes) throw badInput('minutes', `is what the entry already says (${old} min): nothing to correct`);
    const item = await loadItem(trx, entry.workItemId);
    if (item.status === 'done' && !item.doneReason) {
      const others = minutesOf(await TimeEntry.query(trx).where('work_item_id', item.id).whereNot('id', entry.id), Date.now());
      if (others + input.minutes === 0) throw new AppError('CONFLICT', `“${item.title}” is done: with this correction it would have no time logged. Reopen it first, or mark it done again with the reason.`, 'minutes');
    }
    await TimeEntryCorrection.query(trx).insert({ timeEntryId: entry.id, correctedById: actor.id, oldMinutes: old, newMinutes: input.minutes, why: input.why });
    return entry.$query(trx).patchAndFetch({ minutes: input.minutes });
  });
}

/** Every item done, and a post-workshop assessment since the plan was approved: the piano is ready. */
export async function finishWorkshop(actor: Actor, pianoId: number): Promise<Piano> {
  requireAbility(actor, 'workAtBench', 'finish workshop work');
  return Piano.transaction(async (trx) => {
    const plan = await planFor(trx, pianoId);
    return movePiano(
      {
        pianoId,
        action: 'finish_workshop',
        by: actor.role,
        userId: actor.id,
        facts: async () => {
          const items = await WorkItem.query(trx).where('plan_id', plan.id);
          const post = await Assessment.query(trx).where({ piano_id: pianoId, kind: 'post_workshop' }).where('submitted_at', '>=', plan.approvedAt ?? plan.createdAt).resultSize();
          return { allWorkDone: items.length > 0 && items.every((i) => i.status === 'done'), postWorkshopAssessed: post > 0 };
        },
      },
      trx,
    );
  });
}

// ---- reading the work ----

function minutesOf(entries: TimeEntry[], now: number): number {
  return entries.reduce((sum, e) => sum + (e.minutes ?? Math.round(((e.endedAt ? Date.parse(e.endedAt) : now) - Date.parse(e.startedAt)) / 60000)), 0);
}

export type ItemView = WorkItemView;

async function itemViews(items: WorkItem[], hourlyRateMinor: (pianoId: number, itemId: number) => number): Promise<ItemView[]> {
  if (!items.length) return [];
  const ids = items.map((i) => i.id);
  const [entries, parts, users] = await Promise.all([
    TimeEntry.query().whereIn('work_item_id', ids),
    PartUse.query().whereIn('work_item_id', ids),
    WorkItem.knex()('users').whereIn('id', [...new Set(items.map((i) => i.assignedToId).filter((x): x is number => x != null))]).select('id', 'name'),
  ]);
  const names = new Map((users as { id: number; name: string }[]).map((u) => [u.id, u.name]));
  const now = Date.now();
  return items.map((i) => {
    const mine = entries.filter((e) => e.workItemId === i.id);
    const loggedMinutes = minutesOf(mine, now);
    const partsMinor = parts.filter((p) => p.workItemId === i.id).reduce((s, p) => s + p.costMinor * p.quantity, 0);
    const rate = hourlyRateMinor(i.pianoId, i.id);
    return {
      id: i.id,
      pianoId: i.pianoId,
      task: i.task,
      title: i.title,
      status: i.status,
      doneReason: i.doneReason ?? null,
      priority: i.priority,
      dueOn: i.dueOn,
      assignedToId: i.assignedToId,
      assignedTo: i.assignedToId != null ? (names.get(i.assignedToId) ?? null) : null,
      because: i.because,
      quantity: i.quantity,
      estimatedHours: i.estimatedHours,
      estimatedCostMinor: roundMinor(i.estimatedHours * rate) + i.estimatedPartsMinor,
      loggedMinutes,
      partsMinor,
      actualCostMinor: roundMinor((loggedMinutes / 60) * rate) + partsMinor,
      timerRunningFor: mine.filter((e) => !e.endedAt && e.minutes == null).map((e) => e.technicianId),
      cautions: cautionsFor(i.task),
    };
  });
}

/**
 * One page of the bench, by priority and due date: the reader's own items, the unassigned ones, or
 * (for managers) every open item on pianos in the workshop. A fixed number of statements per page.
 */
export async function workQueue(actor: Actor, raw: { scope?: string | null; limit?: number | null; offset?: number | null } = {}): Promise<QueuePage> {
  requireAbility(actor, 'workAtBench', 'see the work queue');
  const manager = can(actor.role, 'planWork');
  const scope = (raw.scope ?? (manager ? 'all' : 'mine')) as QueueScope;
  if (!QUEUE_SCOPES.includes(scope)) throw badInput('scope', `must be one of ${QUEUE_SCOPES.join(', ')}`);
  if (scope === 'all' && !manager) throw notAllowed('see every open item in the workshop');
  const limit = raw.limit ?? QUEUE_PAGE;
  const offset = raw.offset ?? 0;
  if (!Number.isInteger(limit) || limit < 1 || limit > MAX_PAGE_SIZE) throw badInput('limit', `must be between 1 and ${MAX_PAGE_SIZE}`);
  if (!Number.isInteger(offset) || offset < 0) throw badInput('offset', 'must be 0 or more');

  const knex = WorkItem.knex();
  const counted = (await knex('work_items')
    .join('pianos', 'pianos.id', 'work_items.piano_id')
    .where('pianos.stage', 'in_workshop')
    .whereNot('work_items.status', 'done')
    .select(
      knex.raw('count(*) filter (where work_items.assigned_to_id = ?) as mine', [actor.id]),
      knex.raw('count(*) filter (where work_items.assigned_to_id is null) as unassigned'),
      knex.raw('count(*) as "all"'),
    )
    .first()) as Record<QueueScope, number>;
  const counts = { mine: Number(counted.mine), unassigned: Number(counted.unassigned), all: Number(counted.all) };

  const q = WorkItem.query()
    .join('pianos', 'pianos.id', 'work_items.piano_id')
    .join('work_plans', 'work_plans.id', 'work_items.plan_id')
    .where('pianos.stage', 'in_workshop')
    .whereNot('work_items.status', 'done')
    .orderBy([{ column: 'work_items.priority' }, { column: 'work_items.due_on', nulls: 'last' }, { column: 'work_items.id' }])
    .limit(limit)
    .offset(offset)
    .select('work_items.*', 'pianos.stock_number', 'pianos.maker', 'pianos.model', 'work_plans.hourly_rate_minor');
  if (scope === 'mine') q.where('work_items.assigned_to_id', actor.id);
  if (scope === 'unassigned') q.whereNull('work_items.assigned_to_id');
  const items = (await q) as (WorkItem & { stockNumber: string; maker: string; model: string | null; hourlyRateMinor: number })[];
  const rates = new Map(items.map((i) => [i.id, i.hourlyRateMinor]));
  const views = await itemViews(items, (_pianoId, itemId) => rates.get(itemId) ?? 0);
  const running = (await TimeEntry.query()
    .join('work_items', 'work_items.id', 'time_entries.work_item_id')
    .join('pianos', 'pianos.id', 'work_items.piano_id')
    .where('time_entries.technician_id', actor.id)
    .whereNull('time_entries.ended_at')
    .whereNull('time_entries.minutes')
    .select('work_items.id', 'work_items.title', 'pianos.stock_number')
    .first()) as unknown as { id: number; title: string; stockNumber: string } | undefined;
  return {
    scope,
    total: counts[scope],
    counts,
    items: views.map((v, n) => ({ ...v, stockNumber: items[n].stockNumber, piano: pianoName(items[n]) })),
    running: running ? { id: running.id, title: running.title, stockNumber: running.stockNumber } : null,
  };
}

export interface PlanView {
  planId: number;
  pianoId: number;
  currency: string;
  hourlyRateMinor: number;
  rateCardVersion: string;
  approvedAt: string | null;
  items: ItemView[];
  totals: { estimatedHours: number; loggedHours: number; estimatedCostMinor: number; actualCostMinor: number; varianceMinor: number };
  byTask: { task: string; estimatedHours: number; loggedHours: number; estimatedCostMinor: number; actualCostMinor: number; varianceMinor: number }[];
}

const hoursOf = (minutes: number) => Math.round((minutes / 60) * 100) / 100;

export async function planView(actor: Actor, pianoId: number): Promise<PlanView | null> {
  requireAbility(actor, 'readWorkCosts', 'see workshop plans');
  const plan = await WorkPlan.query().findOne({ piano_id: pianoId });
  if (!plan) return null;
  const items = await itemViews(await WorkItem.query().where('plan_id', plan.id).orderBy([{ column: 'priority' }, { column: 'id' }]), () => plan.hourlyRateMinor);
  const byTaskMap = new Map<string, PlanView['byTask'][number]>();
  for (const i of items) {
    const t = byTaskMap.get(i.task) ?? { task: i.task, estimatedHours: 0, loggedHours: 0, estimatedCostMinor: 0, actualCostMinor: 0, varianceMinor: 0 };
    t.estimatedHours += i.estimatedHours;
    t.loggedHours = hoursOf(t.loggedHours * 60 + i.loggedMinutes);
    t.estimatedCostMinor += i.estimatedCostMinor;
    t.actualCostMinor += i.actualCostMinor;
    t.varianceMinor = t.actualCostMinor - t.estimatedCostMinor;
    byTaskMap.set(i.task, t);
  }
  const estimatedCostMinor = items.reduce((s, i) => s + i.estimatedCostMinor, 0);
  const actualCostMinor = items.reduce((s, i) => s + i.actualCostMinor, 0);
  return {
    planId: plan.id,
    pianoId,
    currency: plan.currency,
    hourlyRateMinor: plan.hourlyRateMinor,
    rateCardVersion: plan.rateCardVersion,
    approvedAt: plan.approvedAt,
    items,
    totals: {
      estimatedHours: items.reduce((s, i) => s + i.estimatedHours, 0),
      loggedHours: hoursOf(items.reduce((s, i) => s + i.loggedMinutes, 0)),
      estimatedCostMinor,
      actualCostMinor,
      varianceMinor: actualCostMinor - estimatedCostMinor,
    },
    byTask: [...byTaskMap.values()],
  };
}

export interface Overrun {
  pianoId: number;
  stockNumber: string;
  stage: string;
  overrunMinor: number;
  itemsOver: string[];
  estimatedHours: number;
  loggedHours: number;
  estimatedCostMinor: number;
  actualCostMinor: number;
  varianceMinor: number;
  currency: string;
}

// Each item's estimate and cost so far, priced as itemViews prices them (half away from zero per item),
// then each piano's totals and overrun: the sums first, so only one page of pianos gathers item titles.
const PIANO_OVERRUNS = `
  with logged as (
    select work_item_id, sum(coalesce(minutes, round(extract(epoch from (coalesce(ended_at, now()) - started_at)) / 60)::int)) as minutes
    from time_entries group by work_item_id
  ), parts as (
    select work_item_id, sum(cost_minor * quantity) as minor from part_uses group by work_item_id
  ), costed as (
    select wi.id, wi.piano_id, wi.title, wi.priority, wi.estimated_hours, wp.currency,
      coalesce(l.minutes, 0) as logged_minutes,
      round(wi.estimated_hours * wp.hourly_rate_minor) + wi.estimated_parts_minor as estimated_cost,
      round(coalesce(l.minutes, 0) * wp.hourly_rate_minor / 60.0) + coalesce(pt.minor, 0) as actual_cost
    from work_plans wp
    join work_items wi on wi.plan_id = wp.id
    left join logged l on l.work_item_id = wi.id
    left join parts pt on pt.work_item_id = wi.id
    where wp.approved_at is not null
  ), per_piano as (
    select piano_id, min(currency) as currency, sum(greatest(actual_cost - estimated_cost, 0)) as overrun_minor,
      sum(estimated_hours) as estimated_hours, sum(logged_minutes) as logged_minutes,
      sum(estimated_cost) as estimated_cost, sum(actual_cost) as actual_cost
    from costed group by piano_id
  )`;

interface OverrunRow {
  piano_id: number;
  stock_number: string;
  stage: string;
  currency: string;
  overrun_minor: number;
  items_over: string[];
  estimated_hours: number;
  logged_minutes: number;
  estimated_cost: number;
  actual_cost: number;
  total: number;
}

/**
 * The manager's list of pianos whose workshop work runs over, worst first, a page at a time. While work
 * goes on, the overrun is what items already cost beyond their own estimates; items not started do not
 * offset it. One statement, whatever the number of plans (two past the last page, to count them).
 */
export async function overruns(actor: Actor, page: { limit?: number | null; offset?: number | null } = {}): Promise<{ total: number; overruns: Overrun[] }> {
  requireAbility(actor, 'planWork', 'see workshop overruns');
  const limit = page.limit ?? DEFAULT_PAGE_SIZE;
  const offset = page.offset ?? 0;
  if (!Number.isInteger(limit) || limit < 1 || limit > MAX_PAGE_SIZE) throw badInput('limit', `must be between 1 and ${MAX_PAGE_SIZE}`);
  if (!Number.isInteger(offset) || offset < 0) throw badInput('offset', 'must be 0 or more');
  const knex = WorkPlan.knex();
  const { rows } = await knex.raw(
    `${PIANO_OVERRUNS}, page as (
      select *, count(*) over () as total from per_piano where overrun_minor > 0
      order by overrun_minor desc, piano_id limit ? offset ?
    ), over_items as (
      select piano_id, array_agg(title order by priority, id) as items_over from costed
      where actual_cost > estimated_cost and piano_id in (select piano_id from page) group by piano_id
    )
    select page.*, p.stock_number, p.stage, o.items_over
    from page join pianos p on p.id = page.piano_id join over_items o on o.piano_id = page.piano_id
    order by page.overrun_minor desc, page.piano_id`,
    [limit, offset],
  );
  const list = rows as OverrunRow[];
  const total = list.length ? list[0].total : offset === 0 ? 0 : Number((await knex.raw(`${PIANO_OVERRUNS} select count(*) as n from per_piano where overrun_minor > 0`)).rows[0].n);
  return {
    total,
    overruns: list.map((r) => ({
      pianoId: r.piano_id,
      stockNumber: r.stock_number,
      stage: r.stage,
      overrunMinor: r.overrun_minor,
      itemsOver: r.items_over,
      estimatedHours: r.estimated_hours,
      loggedHours: hoursOf(r.logged_minutes),
      estimatedCostMinor: r.estimated_cost,
      actualCostMinor: r.actual_cost,
      varianceMinor: r.actual_cost - r.estimated_cost,
      currency: r.currency,
    })),
  };
}

export async function itemDetail(actor: Actor, itemId: number) {
  requireAbility(actor, 'workAtBench', 'open workshop items');
  const item = await loadItem(undefined, itemId);
  const plan = (await WorkPlan.query().findById(item.planId))!;
  const [view] = await itemViews([item], () => plan.hourlyRateMinor);
  const [entries, parts, notes] = await Promise.all([
    TimeEntry.query().where('work_item_id', itemId).orderBy('id'),
    PartUse.query().where('work_item_id', itemId).orderBy('id'),
    WorkNote.query().where('work_item_id', itemId).orderBy('id'),
  ]);
  const corrections = entries.length
    ? ((await TimeEntryCorrection.query()
        .join('users', 'users.id', 'time_entry_corrections.corrected_by_id')
        .whereIn('time_entry_id', entries.map((e) => e.id))
        .orderBy('time_entry_corrections.id')
        .select('time_entry_corrections.*', 'users.name as corrected_by')) as (TimeEntryCorrection & { correctedBy: string })[])
    : [];
  const withHistory = entries.map((e) => ({
    ...e.$toJson(),
    corrections: corrections.filter((c) => c.timeEntryId === e.id).map((c) => ({ by: c.correctedBy, byId: c.correctedById, at: c.correctedAt, oldMinutes: c.oldMinutes, newMinutes: c.newMinutes, why: c.why })),
  }));
  return { ...view, currency: plan.currency, entries: withHistory, parts, notes };
}

// ---- climate ----

export async function logClimate(actor: Actor, raw: unknown) {
  requireAbility(actor, 'workAtBench', 'log the workshop climate');
  const input = climateInput.parse(raw);
  const reading = readClimate(input.tempC, input.relativeHumidity);
  const row = await ClimateReadingRow.query().insertAndFetch({ tempC: input.tempC, relativeHumidity: input.relativeHumidity, emcPct: Math.round(reading.emcPct * 100) / 100, loggedById: actor.id });
  return { ...row, warning: reading.warning };
}

export async function recentClimate(actor: Actor, limit = 20) {
  requireAbility(actor, 'workAtBench', 'read the workshop climate');
  const rows = await ClimateReadingRow.query().orderBy('at', 'desc').limit(limit);
  return rows.map((r) => ({ ...r, warning: readClimate(r.tempC, r.relativeHumidity).warning }));
}
