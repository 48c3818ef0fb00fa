import type { Role } from '@/modules/accounts/core/roles';
import { gradeAssessment } from '@/modules/assessment/core/grade';
import { equilibriumMoistureContent, fahrenheit } from '@/modules/shop/core/climate';
import { estimateReconditioning } from '@/modules/shop/core/estimate';
import { demoRateCard } from '@/modules/shop/core/rate-card';

import { postGql, startTestApi, type TestApi } from '../support/api';
import { buildIntake, buildMeasurements } from '../support/builders';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

type Json = Record<string, any>;

async function call(role: Role, query: string, variables?: Json): Promise<Json> {
  const res = await api.gql(await api.tokenFor(role), query, variables);
  if (res.body.errors) throw Object.assign(new Error(res.body.errors[0].message), { extensions: res.body.errors[0].extensions });
  return res.body.data;
}
async function refused(role: Role, query: string, variables?: Json): Promise<Json> {
  const res = await api.gql(await api.tokenFor(role), query, variables);
  expect(res.body.errors).toBeDefined();
  return res.body.errors[0];
}

async function assessedPiano(): Promise<number> {
  const out = await call('intake', 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake() });
  return out.submitIntake.pianoId;
}
const historyOf = async (pianoId: number) => (await call('manager', `{ stageHistory(pianoId: ${pianoId}) }`)).stageHistory as Json[];
const stageOf = async (pianoId: number) => (await api.knex('pianos').where({ id: pianoId }).first()).stage;

describe('the decision and the plan', () => {
  it('recondition drafts a plan from the assessment’s estimate; approving sends the piano to the workshop', async () => {
    const pianoId = await assessedPiano();
    const decided = await call('manager', `mutation { decidePiano(pianoId: ${pianoId}, decision: "recondition") }`);
    expect(decided.decidePiano.stage).toBe('assessed');

    const plan = (await call('manager', `{ workPlan(pianoId: ${pianoId}) }`)).workPlan;
    const expected = estimateReconditioning(gradeAssessment(buildMeasurements()).findings, demoRateCard);
    expect(plan.items.map((i: Json) => [i.task, i.estimatedHours])).toEqual(expected.lines.map((l) => [l.task, l.hours]));
    expect(plan.totals.estimatedCostMinor).toBe(expected.totalMinor);
    expect(plan.currency).toBe('USD');

    const added = await call('manager', `mutation($item: WorkItemInput!) { addWorkItem(pianoId: ${pianoId}, item: $item) }`, { item: { task: 'cabinet_touch_up', estimatedHours: 2, estimatedPartsMinor: 1000, priority: 3 } });
    expect(added.addWorkItem.title).toBe('Cabinet touch-up');
    const dropped = await call('manager', `mutation { removeWorkItem(itemId: ${added.addWorkItem.id}) }`);
    expect(dropped.removeWorkItem).toBe(true);

    await call('manager', `mutation { approvePlan(pianoId: ${pianoId}, why: "Worth reconditioning for the floor") { stage } }`);
    expect(await stageOf(pianoId)).toBe('in_workshop');
    const history = await historyOf(pianoId);
    expect(history.map((h) => [h.action, h.fromStage, h.toStage])).toEqual([
      ['receive', null, 'received'],
      ['submit_assessment', 'received', 'assessed'],
      ['approve_plan', 'assessed', 'in_workshop'],
    ]);
    expect(history[2]).toMatchObject({ by: 'Mara Quillfeather', byRole: 'manager', why: 'Worth reconditioning for the floor' });
  });

  it('selling as it stands a piano not recommended for retail needs a manager’s reason, kept in the stage history', async () => {
    const out = await call('intake', 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', { input: buildIntake({ measurements: buildMeasurements({ overallImpression: 2 }) }) });
    const pianoId = out.submitIntake.pianoId;
    expect(out.submitIntake.grade).toMatchObject({ notRecommendedForRetail: true, readiness: 'wholesale' });
    for (const why of [null, '', '   ', 'cheap']) {
      const res = await api.gql(await api.tokenFor('manager'), 'mutation($why: String) { decidePiano(pianoId: ' + pianoId + ', decision: "sell_as_is", why: $why) }', { why });
      expect(res.body.errors[0]).toMatchObject({ extensions: { code: 'CONFLICT', field: 'why' } });
      expect(res.body.errors[0].message).toBe('This piano is not recommended for retail as it stands (its play test). Selling it as it stands needs your reason, of at least 10 characters: it is kept in the stage history.');
    }
    expect(await stageOf(pianoId)).toBe('assessed');
    const why = 'Sold to a restorer who was told what it needs.';
    await call('manager', 'mutation($why: String) { decidePiano(pianoId: ' + pianoId + ', decision: "sell_as_is", why: $why) }', { why });
    expect(await stageOf(pianoId)).toBe('ready');
    expect((await historyOf(pianoId)).at(-1)).toMatchObject({ action: 'sell_as_is', why, by: 'Mara Quillfeather' });
  });

  it.each([
    ['sell_as_is', 'ready'],
    ['wholesale', 'wholesaled'],
    ['decline', 'returned_to_owner'],
  ])('%s moves an assessed piano to %s', async (decision, stage) => {
    const pianoId = await assessedPiano();
    await call('manager', `mutation { decidePiano(pianoId: ${pianoId}, decision: "${decision}", why: "test") }`);
    expect(await stageOf(pianoId)).toBe(stage);
  });

  it('refuses a decision by anyone but a manager, and changes nothing', async () => {
    const pianoId = await assessedPiano();
    for (const role of ['intake', 'technician', 'floor'] as Role[]) {
      const err = await refused(role, `mutation { decidePiano(pianoId: ${pianoId}, decision: "wholesale") }`);
      expect(err.extensions.code).toBe('NOT_ALLOWED');
    }
    expect(await stageOf(pianoId)).toBe('assessed');
    expect(await historyOf(pianoId)).toHaveLength(2);
  });
});

describe('moves through the stages', () => {
  it('refuses a technician selling and floor staff correcting an assessment, with the reason', async () => {
    const pianoId = await assessedPiano();
    await call('manager', `mutation { decidePiano(pianoId: ${pianoId}, decision: "sell_as_is") }`);
    await call('floor', `mutation { movePiano(pianoId: ${pianoId}, action: "put_on_floor") { stage } }`);
    const sell = await refused('technician', `mutation { movePiano(pianoId: ${pianoId}, action: "sell") { stage } }`);
    expect(sell).toMatchObject({ message: 'Not allowed: the technician role cannot record the sale.', extensions: { code: 'NOT_ALLOWED' } });
    const edit = await refused('floor', 'mutation($input: CorrectionInput!) { correctAssessment(input: $input) }', { input: { pianoId, measurements: buildMeasurements(), changeNote: 'x' } });
    expect(edit.extensions.code).toBe('NOT_ALLOWED');
    const wrongStage = await refused('floor', `mutation { movePiano(pianoId: ${pianoId}, action: "deliver") { stage } }`);
    expect(wrongStage.message).toBe('A piano in stage "on_floor" cannot record the delivery; it must be sold.');
    expect(await stageOf(pianoId)).toBe('on_floor');
    await call('floor', `mutation { movePiano(pianoId: ${pianoId}, action: "sell") { stage } }`);
    await call('floor', `mutation { movePiano(pianoId: ${pianoId}, action: "deliver") { stage } }`);
    expect((await historyOf(pianoId)).map((h) => h.toStage)).toEqual(['received', 'assessed', 'ready', 'on_floor', 'sold', 'delivered']);
  });

  it('two moves of one piano at the same moment: one wins, the other is refused, one history row', async () => {
    const pianoId = await assessedPiano();
    await call('manager', `mutation { decidePiano(pianoId: ${pianoId}, decision: "sell_as_is") }`);
    const before = (await historyOf(pianoId)).length;
    const token = await api.tokenFor('floor');
    const q = `mutation { movePiano(pianoId: ${pianoId}, action: "put_on_floor") { stage } }`;
    const [a, b] = await Promise.all([api.gql(token, q), api.gql(token, q)]);
    const results = [a.body, b.body];
    expect(results.filter((r) => !r.errors)).toHaveLength(1);
    const loser = results.find((r) => r.errors)!;
    expect(loser.errors[0]).toMatchObject({ extensions: { code: 'CONFLICT' } });
    expect(loser.errors[0].message).toMatch(/stage "on_floor" cannot put on the floor/);
    const history = await historyOf(pianoId);
    expect(history).toHaveLength(before + 1);
    expect(history.filter((h) => h.action === 'put_on_floor')).toHaveLength(1);
  });

  it('keeps the history append-only in the database itself', async () => {
    const pianoId = await assessedPiano();
    await expect(api.knex('stage_moves').where({ piano_id: pianoId }).update({ why: 'rewritten' })).rejects.toThrow(/append-only/);
    await expect(api.knex('stage_moves').where({ piano_id: pianoId }).delete()).rejects.toThrow(/append-only/);
  });
});

describe('the bench', () => {
  let pianoId: number;
  let items: Json[];
  beforeAll(async () => {
    pianoId = await assessedPiano();
    await call('manager', `mutation { decidePiano(pianoId: ${pianoId}, decision: "recondition") }`);
    items = (await call('manager', `{ workPlan(pianoId: ${pianoId}) }`)).workPlan.items;
    const techId = (await api.knex('users').where({ email: 'tech@feltwire.test' }).first()).id;
    await call('manager', `mutation($p: WorkItemPatch!) { updateWorkItem(itemId: ${items[0].id}, patch: $p) }`, { p: { assignedToId: techId, priority: 1, dueOn: '2026-12-10' } });
    await call('manager', `mutation { approvePlan(pianoId: ${pianoId}) { stage } }`);
  });

  it('shows a technician their items and the unassigned ones, most urgent first, with cautions', async () => {
    const mine = (await call('technician', '{ workQueue }')).workQueue;
    expect(mine.scope).toBe('mine');
    const waiting = (await call('technician', '{ workQueue(scope: "unassigned", limit: 200) }')).workQueue;
    expect(mine.items.filter((i: Json) => i.pianoId === pianoId).map((i: Json) => i.id)).toEqual([items[0].id]);
    expect(waiting.items.filter((i: Json) => i.pianoId === pianoId).map((i: Json) => i.id)).toEqual(items.slice(1).map((i) => i.id));
    const queue = [...mine.items, ...waiting.items].filter((i: Json) => i.pianoId === pianoId);
    expect(queue[0]).toMatchObject({ priority: 1, dueOn: '2026-12-10', assignedTo: 'Tomas Reyval' });
    const pitch = queue.find((i: Json) => i.task === 'fine_tuning' || i.task === 'pitch_raise');
    expect(pitch).toBeDefined();
    const voicing = queue.find((i: Json) => i.task === 'reshape_voice_hammers');
    expect(voicing.cautions.map((c: Json) => c.kind)).toEqual(['chemicals']);
  });

  it('logs time, parts and notes; estimate against actual follows', async () => {
    const item = items.find((i) => i.task === 'reshape_voice_hammers')!;
    await call('technician', `mutation { startTimer(itemId: ${item.id}) }`);
    const second = await refused('technician', `mutation { startTimer(itemId: ${items[0].id}) }`);
    expect(second.message).toMatch(/already running/);
    await call('technician', `mutation { stopTimer(itemId: ${item.id}) }`);
    await call('technician', 'mutation($e: TimeEntryInput!) { logTime(entry: $e) }', { e: { workItemId: item.id, minutes: 330, note: 'Filed and needled the treble' } });
    await call('technician', 'mutation($p: PartUseInput!) { addPart(part: $p) }', { p: { workItemId: item.id, description: 'Sandpaper strips', quantity: 4, costMinor: 250 } });
    await call('technician', `mutation { addWorkNote(itemId: ${item.id}, body: "Bass hammers better than expected") }`);

    const detail = (await call('technician', `{ workItemDetail(itemId: ${item.id}) }`)).workItemDetail;
    expect(detail.loggedMinutes).toBe(330);
    expect(detail.partsMinor).toBe(1000);
    expect(detail.notes.map((n: Json) => n.body)).toEqual(['Bass hammers better than expected']);
    // 5.5 h at 9500 + 1000 parts, against 4 h at 9500 + 1500 estimated parts
    expect(detail.actualCostMinor).toBe(5.5 * 9500 + 1000);
    expect(detail.estimatedCostMinor).toBe(4 * 9500 + 1500);

    const plan = (await call('manager', `{ workPlan(pianoId: ${pianoId}) }`)).workPlan;
    const voicing = plan.byTask.find((t: Json) => t.task === 'reshape_voice_hammers');
    expect(voicing).toEqual({ task: 'reshape_voice_hammers', estimatedHours: 4, loggedHours: 5.5, estimatedCostMinor: 39500, actualCostMinor: 53250, varianceMinor: 13750 });
    const over = (await call('manager', '{ workshopOverruns }')).workshopOverruns.overruns;
    // the voicing item alone is over; items not started yet do not hide it
    expect(over.find((o: Json) => o.pianoId === pianoId)).toMatchObject({ overrunMinor: 13750, itemsOver: ['Reshape and voice hammers'] });
  });

  it('refuses bad bench input and other roles, storing nothing', async () => {
    const before = await api.knex('time_entries').count('* as n').first();
    const zero = await refused('technician', 'mutation($e: TimeEntryInput!) { logTime(entry: $e) }', { e: { workItemId: items[0].id, minutes: 0 } });
    expect(zero.extensions).toMatchObject({ code: 'BAD_INPUT', field: 'minutes' });
    const floor = await refused('floor', 'mutation($e: TimeEntryInput!) { logTime(entry: $e) }', { e: { workItemId: items[0].id, minutes: 10 } });
    expect(floor.extensions.code).toBe('NOT_ALLOWED');
    const negPart = await refused('technician', 'mutation($p: PartUseInput!) { addPart(part: $p) }', { p: { workItemId: items[0].id, description: 'x', costMinor: -5 } });
    expect(negPart.extensions.field).toBe('costMinor');
    expect(await api.knex('time_entries').count('* as n').first()).toEqual(before);
  });

  it('becomes ready only when every item is done and the post-workshop assessment is in', async () => {
    const early = await refused('technician', `mutation { finishWorkshop(pianoId: ${pianoId}) { stage } }`);
    expect(early.message).toBe('Not yet: some work items are not done yet; the post-workshop assessment has not been submitted.');
    for (const item of items) await call('technician', `mutation { setWorkItemDone(itemId: ${item.id}, done: true, reason: "Done with the voicing, on the same timer") }`);
    const noAssessment = await refused('technician', `mutation { finishWorkshop(pianoId: ${pianoId}) { stage } }`);
    expect(noAssessment.message).toBe('Not yet: the post-workshop assessment has not been submitted.');

    const re = await call('technician', 'mutation($i: RemeasureInput!) { submitRemeasurement(input: $i) }', { i: { pianoId, measurements: { hammerGrooveDepthMm: 0.5, keyLevelDeviationMm: 0.3, a4Hz: 440 }, changeNote: 'After voicing and regulation' } });
    expect(re.submitRemeasurement.grade.findings.find((f: Json) => f.check === 'hammers.wear').mark).toBe('fine');
    const history = (await call('technician', `{ assessmentHistory(pianoId: ${pianoId}) }`)).assessmentHistory;
    expect(history.at(-1)).toMatchObject({ kind: 'post_workshop', changeNote: 'After voicing and regulation', remeasured: ['a4Hz', 'hammerGrooveDepthMm', 'keyLevelDeviationMm'] });
    expect(history.at(-1).measurements.keySidePlayMm).toBe(buildMeasurements().keySidePlayMm);

    await call('technician', `mutation { finishWorkshop(pianoId: ${pianoId}) { stage } }`);
    expect(await stageOf(pianoId)).toBe('ready');
    await call('floor', `mutation { movePiano(pianoId: ${pianoId}, action: "put_on_floor") { stage } }`);
    expect(await stageOf(pianoId)).toBe('on_floor');
  });
});

describe('done, and time that needs correcting', () => {
  let items: Json[];
  let techId: number;
  beforeAll(async () => {
    const pianoId = await assessedPiano();
    await call('manager', `mutation { decidePiano(pianoId: ${pianoId}, decision: "recondition") }`);
    items = (await call('manager', `{ workPlan(pianoId: ${pianoId}) }`)).workPlan.items;
    await call('manager', `mutation { approvePlan(pianoId: ${pianoId}) { stage } }`);
    techId = (await api.knex('users').where({ email: 'tech@feltwire.test' }).first()).id;
  });
  const done = (itemId: number, reason?: string) => `mutation { setWorkItemDone(itemId: ${itemId}, done: true${reason != null ? `, reason: ${JSON.stringify(reason)}` : ''}) }`;

  it('refuses done with no time logged unless a reason is given, and keeps the reason for staff', async () => {
    const item = items[0];
    for (const reason of [undefined, '', '  ']) {
      const err = await refused('technician', done(item.id, reason));
      expect(err).toMatchObject({ message: `No time is logged on “${item.title}”: log the time it took, or give the reason it took none.`, extensions: { code: 'CONFLICT', field: 'reason' } });
    }
    expect((await api.knex('work_items').where({ id: item.id }).first()).status).not.toBe('done');
    await call('technician', done(item.id, 'Done by the visiting tuner, on his own invoice'));
    const detail = (await call('manager', `{ workItemDetail(itemId: ${item.id}) }`)).workItemDetail;
    expect(detail).toMatchObject({ status: 'done', doneReason: 'Done by the visiting tuner, on his own invoice' });
    expect(detail.notes.map((n: Json) => n.body)).toEqual(['Marked done with no time logged: Done by the visiting tuner, on his own invoice']);
    const plan = (await call('manager', `{ workPlan(pianoId: ${item.pianoId}) }`)).workPlan;
    expect(plan.items.find((i: Json) => i.id === item.id).doneReason).toBe('Done by the visiting tuner, on his own invoice');
    // Reopened, the reason no longer stands on the item; the note keeps it.
    await call('technician', `mutation { setWorkItemDone(itemId: ${item.id}, done: false) }`);
    expect((await call('manager', `{ workItemDetail(itemId: ${item.id}) }`)).workItemDetail.doneReason).toBeNull();
  });

  it('takes done without a reason once time is logged', async () => {
    const item = items[1];
    await call('technician', 'mutation($e: TimeEntryInput!) { logTime(entry: $e) }', { e: { workItemId: item.id, minutes: 45 } });
    await call('technician', done(item.id));
    expect((await call('manager', `{ workItemDetail(itemId: ${item.id}) }`)).workItemDetail).toMatchObject({ status: 'done', doneReason: null, loggedMinutes: 45 });
  });

  it('refuses negative minutes with a message, and stores nothing', async () => {
    const before = await api.knex('time_entries').count('* as n').first();
    const err = await refused('technician', 'mutation($e: TimeEntryInput!) { logTime(entry: $e) }', { e: { workItemId: items[2].id, minutes: -30 } });
    expect(err).toMatchObject({ message: 'minutes: cannot be negative: give the minutes worked; an entry logged by mistake is corrected instead', extensions: { code: 'BAD_INPUT', field: 'minutes' } });
    expect(await api.knex('time_entries').count('* as n').first()).toEqual(before);
  });

  it('lets the technician who logged an entry, or a manager, correct it, with the history of who, when, old, new and why', async () => {
    const item = items[2];
    const entry = (await call('technician', 'mutation($e: TimeEntryInput!) { logTime(entry: $e) }', { e: { workItemId: item.id, minutes: 120, note: 'Pitch raise' } })).logTime;
    const send = async (role: Role, c: Json) => api.gql(await api.tokenFor(role), 'mutation($c: TimeCorrectionInput!) { correctTimeEntry(correction: $c) }', { c });
    const first = await send('technician', { timeEntryId: entry.id, minutes: 90, why: 'Left the timer in my head over lunch' });
    expect(first.body.errors).toBeUndefined();
    expect(first.body.data.correctTimeEntry.minutes).toBe(90);
    const second = await send('manager', { timeEntryId: entry.id, minutes: 95, why: 'Checked against the job sheet' });
    expect(second.body.errors).toBeUndefined();

    // Refused: no reason, negative, the same value, another technician, and floor staff.
    const noWhy = await send('technician', { timeEntryId: entry.id, minutes: 80, why: ' ' });
    expect(noWhy.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'why' });
    const negative = await send('technician', { timeEntryId: entry.id, minutes: -5, why: 'x' });
    expect(negative.body.errors[0]).toMatchObject({ message: 'minutes: cannot be negative: 0 stands for an entry logged by mistake', extensions: { field: 'minutes' } });
    const same = await send('technician', { timeEntryId: entry.id, minutes: 95, why: 'again' });
    expect(same.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'minutes' });
    await call('manager', 'mutation { createUser(email: "tech2@feltwire.test", name: "Odo Pellmark", role: "technician", password: "a-long-password") { id } }');
    const login = await api.http.post('/auth/login').send({ email: 'tech2@feltwire.test', password: 'a-long-password' });
    const other = await api.gql(login.body.token, 'mutation($c: TimeCorrectionInput!) { correctTimeEntry(correction: $c) }', { c: { timeEntryId: entry.id, minutes: 10, why: 'mine now' } });
    expect(other.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    const floor = await send('floor', { timeEntryId: entry.id, minutes: 10, why: 'x' });
    expect(floor.body.errors[0].extensions.code).toBe('NOT_ALLOWED');

    const detail = (await call('technician', `{ workItemDetail(itemId: ${item.id}) }`)).workItemDetail;
    const shown = detail.entries.find((e: Json) => e.id === entry.id);
    expect(shown.minutes).toBe(95);
    expect(shown.corrections).toEqual([
      { by: 'Tomas Reyval', byId: techId, at: expect.any(String), oldMinutes: 120, newMinutes: 90, why: 'Left the timer in my head over lunch' },
      { by: 'Mara Quillfeather', byId: expect.any(Number), at: expect.any(String), oldMinutes: 90, newMinutes: 95, why: 'Checked against the job sheet' },
    ]);
    expect(detail.loggedMinutes).toBe(95);
    await expect(api.knex('time_entry_corrections').where({ time_entry_id: entry.id }).update({ why: 'rewritten' })).rejects.toThrow(/append-only/);
  });

  it('refuses to correct a running timer, or to leave a done item with no time and no reason', async () => {
    const item = items[3];
    const timer = (await call('technician', `mutation { startTimer(itemId: ${item.id}) }`)).startTimer;
    const send = async (c: Json) => api.gql(await api.tokenFor('technician'), 'mutation($c: TimeCorrectionInput!) { correctTimeEntry(correction: $c) }', { c });
    const running = await send({ timeEntryId: timer.id, minutes: 30, why: 'x' });
    expect(running.body.errors[0].extensions.code).toBe('CONFLICT');
    await call('technician', `mutation { stopTimer(itemId: ${item.id}) }`);
    const entry = (await call('technician', 'mutation($e: TimeEntryInput!) { logTime(entry: $e) }', { e: { workItemId: item.id, minutes: 20 } })).logTime;
    await call('technician', `mutation { setWorkItemDone(itemId: ${item.id}, done: true) }`);
    // the stopped timer counts 0 minutes; the manual entry holds the only time
    const empty = await send({ timeEntryId: entry.id, minutes: 0, why: 'Logged on the wrong item' });
    expect(empty.body.errors[0]).toMatchObject({ extensions: { code: 'CONFLICT', field: 'minutes' } });
    expect((await api.knex('time_entries').where({ id: entry.id }).first()).minutes).toBe(20);
  });
});

describe('the rate card', () => {
  it('a manager’s edit makes a new version that the next plan is priced with; others are refused', async () => {
    const { version: _v, ...card } = demoRateCard;
    const saved = (await call('manager', 'mutation($c: JSON!) { setRateCard(card: $c) }', { c: { ...card, hourlyRateMinor: 11000 } })).setRateCard;
    expect(saved.version).toMatch(/^rates-\d+$/);
    expect((await call('technician', '{ rateCard }')).rateCard).toMatchObject({ version: saved.version, hourlyRateMinor: 11000 });
    const pianoId = await assessedPiano();
    await call('manager', `mutation { decidePiano(pianoId: ${pianoId}, decision: "recondition") }`);
    const plan = (await call('manager', `{ workPlan(pianoId: ${pianoId}) }`)).workPlan;
    expect(plan).toMatchObject({ rateCardVersion: saved.version, hourlyRateMinor: 11000 });
    const tech = await refused('technician', 'mutation($c: JSON!) { setRateCard(card: $c) }', { c: card });
    expect(tech.extensions.code).toBe('NOT_ALLOWED');
    const bad = await refused('manager', 'mutation($c: JSON!) { setRateCard(card: $c) }', { c: { ...card, hourlyRateMinor: 95.5 } });
    expect(bad.extensions).toMatchObject({ code: 'BAD_INPUT', field: 'hourlyRateMinor' });
  });
});

describe('workshop climate', () => {
  it('computes the moisture content and warns outside 40-50 % RH', async () => {
    const seeded = (await api.knex('climate_readings').count('* as n').first())!.n as number;
    // Hailwood-Horrobin (Wood Handbook, ch. 4), checked against its published value in the core tests
    const damp = (await call('technician', 'mutation($r: JSON!) { logClimate(reading: $r) }', { r: { tempC: 21, relativeHumidity: 55 } })).logClimate;
    expect(damp.emcPct).toBeCloseTo(equilibriumMoistureContent(fahrenheit(21), 55), 2);
    expect(damp.emcPct).toBeGreaterThan(9);
    expect(damp.warning).toMatch(/^Damp air/);
    const dry = (await call('technician', 'mutation($r: JSON!) { logClimate(reading: $r) }', { r: { tempC: 21, relativeHumidity: 32 } })).logClimate;
    expect(dry.warning).toMatch(/^Dry air/);
    const list = (await call('manager', '{ climateReadings }')).climateReadings;
    expect(list).toHaveLength(seeded + 2);
    expect(list[0]).toMatchObject({ tempC: 21, relativeHumidity: 32, emcPct: dry.emcPct });
    const bad = await refused('technician', 'mutation($r: JSON!) { logClimate(reading: $r) }', { r: { tempC: 21, relativeHumidity: 120 } });
    expect(bad.extensions.field).toBe('relativeHumidity');
    const hot = await refused('technician', 'mutation($r: JSON!) { logClimate(reading: $r) }', { r: { tempC: 60, relativeHumidity: 55 } });
    expect(hot.extensions.field).toBe('tempC');
    expect((await call('manager', '{ climateReadings }')).climateReadings).toHaveLength(seeded + 2);
  });
});

describe('two technicians at one unassigned item', () => {
  it('start their timers at the same moment: one takes the item, the other is told who did, and no timer is left behind', async () => {
    const base = await api.listen();
    const pianoId = await assessedPiano();
    await call('manager', `mutation { decidePiano(pianoId: ${pianoId}, decision: "recondition") }`);
    await call('manager', `mutation { approvePlan(pianoId: ${pianoId}) { stage } }`);
    const item = (await call('manager', `{ workPlan(pianoId: ${pianoId}) }`)).workPlan.items.find((i: Json) => i.assignedToId == null);
    await call('manager', 'mutation { createUser(email: "wren@feltwire.test", name: "Wren Tallowmere", role: "technician", password: "a-long-password") { id } }');
    const wren = (await api.http.post('/auth/login').send({ email: 'wren@feltwire.test', password: 'a-long-password' })).body.token as string;
    const tomas = await api.tokenFor('technician');
    const ids = Object.fromEntries((await api.knex('users').whereIn('email', ['tech@feltwire.test', 'wren@feltwire.test'])).map((u) => [u.id, u.name]));

    const start = `mutation { startTimer(itemId: ${item.id}) }`;
    const answers = await Promise.all([postGql(base, tomas, start), postGql(base, wren, start)]);
    expect(answers.filter((a) => !a.errors)).toHaveLength(1);
    const loser = answers.find((a) => a.errors)!;
    const entries = await api.knex('time_entries').where({ work_item_id: item.id });
    expect(entries).toHaveLength(1);
    const winnerId = entries[0].technician_id as number;
    const winnerName = ids[winnerId];
    expect((await api.knex('work_items').where({ id: item.id }).first()).assigned_to_id).toBe(winnerId);
    expect(loser.errors![0].extensions.code).toBe('CONFLICT');
    expect(loser.errors![0].message).toBe(`${winnerName} has taken this item: ask a manager to assign it to you.`);

    // The winner stops their timer; the loser's bench is free: no timer of theirs runs anywhere.
    const winnerToken = winnerName === 'Tomas Reyval' ? tomas : wren;
    const loserId = Number(Object.keys(ids).find((id) => Number(id) !== winnerId));
    const stopped = await postGql(base, winnerToken, `mutation { stopTimer(itemId: ${item.id}) }`);
    expect(stopped.errors).toBeUndefined();
    expect(await api.knex('time_entries').where({ technician_id: loserId }).whereNull('ended_at').whereNull('minutes')).toEqual([]);
  });
});
