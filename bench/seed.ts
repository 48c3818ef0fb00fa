// The benchmark's stock: N invented pianos with the histories a dealer of that size has, in set-based batches.

import type { Knex } from 'knex';

import type { Role } from '@/modules/accounts/core/roles';
import { gradeAssessment, type Grade } from '@/modules/assessment/core/grade';
import { defaultRules } from '@/modules/assessment/core/grade-rules';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { buildDisclosure, DEFAULT_WARRANTY } from '@/modules/disclosure/core/disclosure';
import { contentDigest } from '@/modules/disclosure/server/digest';
import { renderDisclosureHtml, type PageDealer } from '@/modules/disclosure/server/disclosure-service';
import { depositAmount, defaultDepositRules } from '@/modules/deposits/core/deposit';
import type { PianoKind, Stage } from '@/modules/pianos/core/piano';
import { readClimate } from '@/modules/shop/core/climate';
import { estimateReconditioning } from '@/modules/shop/core/estimate';
import type { Currency } from '@/modules/shop/core/money';
import { demoRateCard } from '@/modules/shop/core/rate-card';
import { DEMO_USERS } from '@/seeds/demo';

// The bench's invented dealer as its published pages name it.
const BENCH_DEALER: PageDealer = { where: { locale: 'en-GB', timeZone: 'UTC' }, contact: ['1 Bench Row, Millbrook'], checkUrl: 'http://127.0.0.1:8148/check' };

const DAY = 86_400_000;
const HOUR = 3_600_000;

// Stages by age: the newest pianos are still early on their road; most of a dealer's history is delivered.
// Shares chosen so a 10,000-piano dealer has ~58k moves, 17.6k assessments, 8.4k plans, 7.8k disclosures.
const RECENT: [Stage, number][] = [
  ['received', 0.02],
  ['assessed', 0.03],
  ['in_workshop', 0.06],
  ['ready', 0.02],
  ['on_floor', 0.08],
  ['held', 0.01],
  ['sold', 0.05],
];
const SETTLED: [Stage, number][] = [
  ['delivered', 62],
  ['wholesaled', 6],
  ['returned_to_owner', 5],
];

const ROADS: Record<Stage, [string, Stage, Role | 'system'][]> = {
  received: [],
  assessed: [['submit_assessment', 'assessed', 'intake']],
  in_workshop: [['submit_assessment', 'assessed', 'intake'], ['approve_plan', 'in_workshop', 'manager']],
  ready: [['submit_assessment', 'assessed', 'intake'], ['approve_plan', 'in_workshop', 'manager'], ['finish_workshop', 'ready', 'technician']],
  on_floor: [['submit_assessment', 'assessed', 'intake'], ['approve_plan', 'in_workshop', 'manager'], ['finish_workshop', 'ready', 'technician'], ['put_on_floor', 'on_floor', 'floor']],
  held: [['submit_assessment', 'assessed', 'intake'], ['approve_plan', 'in_workshop', 'manager'], ['finish_workshop', 'ready', 'technician'], ['put_on_floor', 'on_floor', 'floor'], ['hold', 'held', 'system']],
  sold: [['submit_assessment', 'assessed', 'intake'], ['approve_plan', 'in_workshop', 'manager'], ['finish_workshop', 'ready', 'technician'], ['put_on_floor', 'on_floor', 'floor'], ['sell', 'sold', 'floor']],
  delivered: [
    ['submit_assessment', 'assessed', 'intake'],
    ['approve_plan', 'in_workshop', 'manager'],
    ['finish_workshop', 'ready', 'technician'],
    ['put_on_floor', 'on_floor', 'floor'],
    ['sell', 'sold', 'floor'],
    ['deliver', 'delivered', 'floor'],
  ],
  wholesaled: [['submit_assessment', 'assessed', 'intake'], ['wholesale', 'wholesaled', 'manager']],
  returned_to_owner: [['submit_assessment', 'assessed', 'intake'], ['decline', 'returned_to_owner', 'manager']],
};
// Days each step of the road usually takes, [least, most].
const STEP_DAYS: Record<string, [number, number]> = {
  submit_assessment: [0.1, 3],
  approve_plan: [1, 10],
  finish_workshop: [5, 40],
  put_on_floor: [1, 6],
  hold: [5, 60],
  sell: [10, 120],
  deliver: [2, 12],
  wholesale: [3, 30],
  decline: [1, 7],
};
const WORKSHOP: Stage[] = ['in_workshop', 'ready', 'on_floor', 'held', 'sold', 'delivered'];
const DISCLOSED: Stage[] = ['on_floor', 'held', 'sold', 'delivered'];
const SOLD: Stage[] = ['held', 'sold', 'delivered'];

// Invented makers, models, finishes and people. Demo data only.
const MAKERS: [string, string[], PianoKind][] = [
  ['Almsbury', ['Parlour 118', 'Parlour 121', 'Studio 126'], 'upright'],
  ['Thornquist & Hale', ['Studio B', 'Concert Parlour', 'Salon 160'], 'grand'],
  ['Corvelle', ['U-125', 'U-131', 'G-172'], 'upright'],
  ['Marrowfield', ['Console 109', 'Spinet 91', 'Studio 118'], 'upright'],
  ['Wendell Kestrel', ['Salon', 'Boudoir', 'Drawing Room'], 'grand'],
  ['Solenne', ['Model 3', 'Model 5', 'Model 7'], 'upright'],
  ['Ostermere', ['Home 112', 'School 124'], 'upright'],
  ['Pennick & Vale', ['Baby 150', 'Parlour 175'], 'grand'],
];
const FINISHES = ['polished ebony', 'satin walnut', 'mahogany', 'cherry', 'satin oak', 'white satin', 'walnut', 'satin black'];
const FIRST = ['Wren', 'Dario', 'Maud', 'Ilse', 'Tobiah', 'Perrin', 'Calla', 'Anselm', 'Odile', 'Bram', 'Nell', 'Soren'];
const LAST = ['Halvorsen', 'Quennell', 'Ostrander', 'Pike', 'Marlowe-Fenn', 'Abernathy-Sloe', 'Rusk', 'Tamberlane', 'Vey', 'Cordwell'];
const EXTRA_STAFF: { email: string; name: string; role: Role }[] = [
  { email: 'intake2@feltwire.test', name: 'Pell Aramburu', role: 'intake' },
  { email: 'intake3@feltwire.test', name: 'Sunniva Okonjo', role: 'intake' },
  { email: 'tech2@feltwire.test', name: 'Idris Vantongeren', role: 'technician' },
  { email: 'tech3@feltwire.test', name: 'Loreto Fairweather', role: 'technician' },
  { email: 'tech4@feltwire.test', name: 'Agathe Nwosu-Brandt', role: 'technician' },
  { email: 'tech5@feltwire.test', name: 'Casimir Oyelaran', role: 'technician' },
  { email: 'tech6@feltwire.test', name: 'Runa Delacroix-Hale', role: 'technician' },
  { email: 'floor2@feltwire.test', name: 'Emeric Stavros', role: 'floor' },
  { email: 'floor3@feltwire.test', name: 'Yolanda Ferreira-Quist', role: 'floor' },
  { email: 'manager2@feltwire.test', name: 'Hollis Achterberg', role: 'manager' },
];

/** A small, fast, seeded generator (mulberry32): the same seed gives the same stock. */
function generator(seed: number) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const between = (lo: number, hi: number) => lo + next() * (hi - lo);
  const int = (lo: number, hi: number) => Math.floor(between(lo, hi + 1));
  const pick = <T>(list: readonly T[]) => list[Math.floor(next() * list.length)];
  const chance = (p: number) => next() < p;
  const round = (v: number, step: number) => Math.round(v / step) * step;
  return { next, between, int, pick, chance, round };
}
type Rng = ReturnType<typeof generator>;

/** An invented inspection, from a piano in good order to one that needs much; used pianos lean worn. */
function inspection(r: Rng): Measurements {
  // Skewed toward lighter wear: about 3.7 work items per plan, as at a real dealer.
  const wear = r.next() ** 2.2;
  const m: Measurements = {
    keySidePlayMm: r.round(r.between(0.8, 1.6 + wear * 1.8), 0.1),
    keyTouchesNeighbour: wear > 0.85 && r.chance(0.5),
    keyLevelDeviationMm: r.round(r.between(0.2, 0.8 + wear * 2.6), 0.1),
    hammerGrooveDepthMm: r.round(r.between(0.3, 0.8 + wear * 2.8), 0.1),
    hammerFelt: wear > 0.8 ? r.pick(['hard', 'hard', 'chemically_hardened'] as const) : r.pick(['firm', 'firm', 'soft'] as const),
    hammerFeltLeft: wear > 0.75 ? r.pick(['thin', 'none'] as const) : 'ample',
    steelCorrosion: wear > 0.7 ? r.pick(['light', 'moderate', 'heavy'] as const) : r.pick(['none', 'light'] as const),
    bassWinding: wear > 0.7 ? r.pick(['dull', 'dark'] as const) : r.pick(['bright', 'dull'] as const),
    brokenStrings: wear > 0.75 ? r.int(0, 3) : 0,
    soundboardCracks: wear > 0.6 && r.chance(0.4) ? [{ lengthCm: r.int(8, 45), widestGapMm: r.round(r.between(0.1, 1.2), 0.1), crossesRib: r.chance(0.2), buzzes: r.chance(0.2), hurtsTuning: false }] : [],
    ribsSeparated: wear > 0.9 && r.chance(0.3),
    a4Hz: r.round(r.between(431, 441), 0.1),
    tuningPins: wear > 0.85 ? r.pick(['some_loose', 'loose'] as const) : 'firm',
    bassEvenness: r.int(wear > 0.6 ? 2 : 3, 5),
    middleEvenness: r.int(wear > 0.6 ? 2 : 3, 5),
    trebleEvenness: r.int(wear > 0.6 ? 2 : 3, 5),
    dynamicRange: r.int(wear > 0.6 ? 2 : 3, 5),
    overallImpression: r.int(wear > 0.6 ? 2 : 3, 5),
  };
  if (wear > 0.5 && r.chance(0.3)) m.stickingKeys = [r.int(1, 88)];
  if (wear > 0.6 && r.chance(0.3)) m.keytopDamage = [r.pick(['chipped', 'yellowed', 'stained'] as const)];
  return m;
}

/** The workshop's re-measurement after the work: what it fixed reads as fixed. */
function afterWork(m: Measurements, r: Rng): Measurements {
  return {
    ...m,
    keyTouchesNeighbour: false,
    keySidePlayMm: r.round(r.between(0.9, 1.5), 0.1),
    keyLevelDeviationMm: r.round(r.between(0.2, 0.5), 0.1),
    hammerGrooveDepthMm: Math.min(m.hammerGrooveDepthMm ?? 0.6, 0.7),
    hammerFelt: 'firm',
    hammerFeltLeft: 'ample',
    brokenStrings: 0,
    a4Hz: 440,
    tuningPins: m.tuningPins === 'loose' ? 'firm' : m.tuningPins,
    stickingKeys: [],
    bassEvenness: Math.max(4, m.bassEvenness ?? 4),
    middleEvenness: Math.max(4, m.middleEvenness ?? 4),
    trebleEvenness: Math.max(4, m.trebleEvenness ?? 4),
    overallImpression: Math.max(4, m.overallImpression ?? 4),
  };
}

const iso = (ms: number) => new Date(ms).toISOString();
const token = (r: Rng) => Array.from({ length: 32 }, () => 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_'[Math.floor(r.next() * 64)]).join('');

type Row = Record<string, unknown>;

/** Inserts rows in set-based batches: one statement per few thousand rows, columns named by the first row. */
async function insertAll(knex: Knex, table: string, rows: Row[], batch = 2000): Promise<void> {
  if (!rows.length) return;
  const columns = Object.keys(rows[0]);
  const list = columns.map((c) => `"${c}"`).join(', ');
  for (let i = 0; i < rows.length; i += batch) {
    const chunk = rows.slice(i, i + batch);
    await knex.raw(`insert into "${table}" (${list}) select ${list} from json_populate_recordset(null::"${table}", ?::json)`, [JSON.stringify(chunk)]);
  }
}

async function nextIds(knex: Knex, tables: string[]): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const t of tables) out[t] = Number((await knex(t).max('id as max').first())?.max ?? 0);
  return out;
}

export interface BenchCounts {
  pianos: number;
  stageMoves: number;
  assessments: number;
  plans: number;
  workItems: number;
  timeEntries: number;
  partUses: number;
  workNotes: number;
  disclosures: number;
  acknowledgements: number;
  deposits: number;
}

/**
 * Adds `pianos` invented pianos with their whole histories to a migrated database (with or without
 * the demo scenario), plus the demo staff and a workshop team. Grades and estimates come from the
 * product's own cores, so plans and disclosures read as the app would have written them.
 */
export async function seedBench(knex: Knex, opts: { pianos: number; seed?: number; now?: number; passwordHash: string }): Promise<BenchCounts> {
  const r = generator(opts.seed ?? 20261203);
  const now = opts.now ?? Date.now();
  await knex('users').insert([...DEMO_USERS, ...EXTRA_STAFF].map((u) => ({ ...u, password_hash: opts.passwordHash }))).onConflict('email').ignore();
  const users = (await knex('users').select('id', 'role', 'email')) as { id: number; role: Role; email: string }[];
  const byRole = (role: Role) => users.filter((u) => u.role === role).map((u) => u.id);
  const staff = { intake: byRole('intake'), technician: byRole('technician'), floor: byRole('floor'), manager: byRole('manager') };
  const one = (role: Role | 'system') => (role === 'system' ? null : r.pick(staff[role]));

  const base = await nextIds(knex, ['pianos', 'stage_moves', 'intakes', 'assessments', 'work_plans', 'work_items', 'time_entries', 'part_uses', 'work_notes', 'disclosures', 'acknowledgements', 'deposits', 'climate_readings']);
  const stockBase = Number((await knex.raw(`select last_value, is_called from piano_stock_seq`)).rows.map((x: { last_value: number; is_called: boolean }) => (x.is_called ? x.last_value : x.last_value - 1))[0]);
  const ids = { ...base };
  const id = (t: keyof typeof base) => ++ids[t];

  const n = opts.pianos;
  // A dealer takes in about 1,250 pianos a year: the stock's age follows its size (half a year at least).
  const spanMs = Math.min(8 * 365, Math.max(182, (n / 1250) * 365)) * DAY;
  const stages: Stage[] = [];
  let left = n;
  for (const [stage, share] of RECENT) {
    const k = Math.min(left, Math.round(n * share));
    for (let i = 0; i < k; i += 1) stages.push(stage);
    left -= k;
  }
  const settledTotal = SETTLED.reduce((s, [, w]) => s + w, 0);
  for (let i = 0; i < left; i += 1) {
    let x = r.next() * settledTotal;
    const found = SETTLED.find(([, w]) => (x -= w) < 0) ?? SETTLED[0];
    stages.push(found[0]);
  }
  // stages[0] is the newest piano; the loop takes them oldest first, so ids and stock numbers follow arrival.

  const rows: Record<string, Row[]> = { pianos: [], stage_moves: [], intakes: [], assessments: [], work_plans: [], work_items: [], time_entries: [], part_uses: [], work_notes: [], disclosures: [], disclosure_links: [], acknowledgements: [], deposits: [] };
  const runningTimer = new Set<number>();
  const texts = { dealerName: 'Larkspur Lane Pianos', warranty: DEFAULT_WARRANTY };

  for (let k = n - 1; k >= 0; k -= 1) {
    const stage = stages[k];
    const road = ROADS[stage];
    const pianoId = id('pianos');
    const [maker, models, usualKind] = r.pick(MAKERS);
    const kind: PianoKind = r.chance(0.85) ? usualKind : usualKind === 'grand' ? 'upright' : 'grand';
    const sizeCm = kind === 'grand' ? r.int(140, 230) : r.int(90, 135);
    const year = r.int(1950, 2022);
    // Steps along the road; a recent piano's road is squeezed to end before now.
    const arrivedAgo = (k / n) * spanMs + r.between(0, DAY);
    let at = now - arrivedAgo;
    const times = [at];
    for (const [action] of road) {
      const [lo, hi] = STEP_DAYS[action];
      at += r.between(lo, hi) * DAY;
      times.push(at);
    }
    const end = times[times.length - 1];
    if (end > now - HOUR) {
      const squeeze = (now - HOUR - times[0]) / Math.max(1, end - times[0]);
      for (let i = 1; i < times.length; i += 1) times[i] = times[0] + (times[i] - times[0]) * squeeze;
    }
    const arrived = times[0];
    const stockNumber = `FW-${String(stockBase + n - k).padStart(4, '0')}`;
    const price = WORKSHOP.slice(1).includes(stage) ? (kind === 'grand' ? 1_250_000 + sizeCm * 4_000 : 240_000 + sizeCm * 1_500) : null;
    const piano = {
      id: pianoId,
      stock_number: stockNumber,
      maker,
      model: r.pick(models),
      serial_number: `${maker.slice(0, 2).toUpperCase()}-${r.int(10000, 999999)}`,
      year,
      year_is_estimate: r.chance(0.3),
      year_from: null,
      year_to: null,
      kind,
      size_cm: sizeCm,
      finish: r.pick(FINISHES),
      case_condition: r.pick(['excellent', 'good', 'good', 'worn', 'damaged'] as const),
      case_notes: null,
      stage,
      asking_price_minor: price,
      price_currency: price != null ? 'USD' : null,
      created_by_id: r.pick(staff.intake),
      stage_changed_at: iso(times[times.length - 1]),
      created_at: iso(arrived),
      updated_at: iso(times[times.length - 1]),
    };
    rows.pianos.push(piano);

    rows.stage_moves.push({ id: id('stage_moves'), piano_id: pianoId, action: 'receive', from_stage: null, to_stage: 'received', why: null, by_user_id: piano.created_by_id, by_role: 'intake', at: iso(arrived) });
    let from: Stage = 'received';
    road.forEach(([action, to, role], i) => {
      rows.stage_moves.push({ id: id('stage_moves'), piano_id: pianoId, action, from_stage: from, to_stage: to, why: action === 'hold' ? 'Deposit paid' : null, by_user_id: one(role), by_role: role, at: iso(times[i + 1]) });
      from = to;
    });
    if (stage === 'received') continue;

    rows.intakes.push({
      id: id('intakes'),
      piano_id: pianoId,
      seller_name: `${r.pick(FIRST)} ${r.pick(LAST)}`,
      seller_phone: `+1 555 01${r.int(10, 99)}`,
      seller_email: `seller${pianoId}@example.test`,
      seller_address: `${r.int(1, 200)} Linden Close, Millbrook`,
      acquisition: r.pick(['trade_in', 'purchase', 'consignment']),
      received_on: iso(arrived).slice(0, 10),
      inspected_at: r.pick(['customer_home', 'showroom', 'workshop']),
      notes: null,
      created_by_id: piano.created_by_id,
      created_at: iso(arrived),
      updated_at: iso(arrived),
    });
    const measurements = inspection(r);
    const grade = gradeAssessment(measurements, defaultRules);
    const assessedAt = times[1];
    const assessmentId = id('assessments');
    const assessmentRow = (aid: number, version: number, kindOf: string, m: Measurements, g: Grade, by: number, atMs: number, note: string | null) => ({
      id: aid,
      piano_id: pianoId,
      version,
      kind: kindOf,
      measurements: m,
      grade: g,
      remeasured_fields: kindOf === 'post_workshop' ? Object.keys(m) : null,
      refer_to_technician: g.referToTechnician,
      not_recommended_for_retail: g.notRecommendedForRetail,
      rules_version: g.rulesVersion,
      change_note: note,
      submitted_by_id: by,
      submitted_at: iso(atMs),
    });
    rows.assessments.push(assessmentRow(assessmentId, 1, 'intake', measurements, grade, r.pick(staff.intake), assessedAt, null));
    if (!WORKSHOP.includes(stage)) continue;

    // The plan, drafted from the estimate of the intake grade, approved when the piano went to the workshop.
    const estimate = estimateReconditioning(grade.findings, demoRateCard);
    const planId = id('work_plans');
    const approvedAt = times[2];
    const finishedAt = stage === 'in_workshop' ? null : times[3];
    rows.work_plans.push({
      id: planId,
      piano_id: pianoId,
      assessment_id: assessmentId,
      rate_card_version: demoRateCard.version,
      currency: demoRateCard.currency,
      hourly_rate_minor: demoRateCard.hourlyRateMinor,
      created_by_id: r.pick(staff.manager),
      created_at: iso(assessedAt + (approvedAt - assessedAt) / 2),
      approved_by_id: r.pick(staff.manager),
      approved_at: iso(approvedAt),
    });
    // In the workshop, the work has got some way along; every item of a finished piano is done.
    const progress = finishedAt == null ? r.next() : 1;
    const doneCount = Math.floor(estimate.lines.length * progress);
    const workEnd = finishedAt ?? now - HOUR;
    const workDone: { task: string; title: string; because: string[] }[] = [];
    estimate.lines.forEach((line, i) => {
      const itemId = id('work_items');
      const status = i < doneCount ? 'done' : i === doneCount && finishedAt == null && r.chance(0.6) ? 'in_progress' : 'planned';
      const tech = status === 'planned' && r.chance(0.4) ? null : r.pick(staff.technician);
      const doneAt = status === 'done' ? approvedAt + ((i + 1) / estimate.lines.length) * (workEnd - approvedAt) : null;
      rows.work_items.push({
        id: itemId,
        plan_id: planId,
        piano_id: pianoId,
        task: line.task,
        title: line.label,
        estimated_hours: line.hours,
        estimated_parts_minor: line.partsMinor,
        quantity: line.quantity,
        because: line.because,
        assigned_to_id: tech,
        priority: 1 + ((i + pianoId) % 3),
        due_on: finishedAt == null && r.chance(0.5) ? iso(now + r.int(-3, 20) * DAY).slice(0, 10) : null,
        status,
        done_at: doneAt != null ? iso(doneAt) : null,
        created_at: iso(approvedAt),
        updated_at: iso(doneAt ?? approvedAt),
      });
      if (status === 'done') workDone.push({ task: line.task, title: line.label, because: line.because });
      if (status === 'planned' || tech == null) return;
      // Logged hours run over or under the estimate as real work does; a long job is logged over several days.
      const share = status === 'done' ? 1 : r.between(0.2, 0.8);
      let minutes = Math.max(5, Math.round(line.hours * 60 * r.between(0.7, 1.45) * share));
      let start = approvedAt + (i / estimate.lines.length) * (workEnd - approvedAt);
      while (minutes > 0) {
        const part = Math.min(minutes, r.int(330, 720));
        rows.time_entries.push({ id: id('time_entries'), work_item_id: itemId, technician_id: tech, started_at: iso(start), ended_at: null, minutes: part, note: r.chance(0.2) ? 'Logged at the end of the day' : null, created_at: iso(start) });
        minutes -= part;
        start += DAY;
      }
      if (status === 'in_progress' && !runningTimer.has(tech) && r.chance(0.02)) {
        runningTimer.add(tech);
        rows.time_entries.push({ id: id('time_entries'), work_item_id: itemId, technician_id: tech, started_at: iso(now - r.int(10, 90) * 60_000), ended_at: null, minutes: null, note: null, created_at: iso(now - HOUR) });
      }
      if (r.chance(0.25)) rows.part_uses.push({ id: id('part_uses'), work_item_id: itemId, description: r.pick(['Key bushing cloth', 'Hammer felt', 'Bass string', 'Centre pins', 'Regulating punchings']), quantity: r.int(1, 4), cost_minor: r.int(300, 6000), logged_by_id: tech, created_at: iso(start) });
      if (r.chance(0.1)) rows.work_notes.push({ id: id('work_notes'), work_item_id: itemId, author_id: tech, body: 'Checked against the estimate; nothing unexpected.', created_at: iso(start) });
    });
    if (finishedAt == null) continue;

    const after = afterWork(measurements, r);
    const regrade = gradeAssessment(after, defaultRules);
    rows.assessments.push(assessmentRow(id('assessments'), 2, 'post_workshop', after, regrade, r.pick(staff.technician), finishedAt - HOUR, 'Re-measured after workshop work.'));
    if (!DISCLOSED.includes(stage)) continue;

    // Published when it went on the floor; now and then a second version after a price change.
    const tokenText = token(r);
    rows.disclosure_links.push({ piano_id: pianoId, token: tokenText, created_at: iso(times[4]) });
    const versions = r.chance(0.026) ? 2 : 1;
    let disclosureId = 0;
    let digest = '';
    for (let v = 1; v <= versions; v += 1) {
      const askingPriceMinor = v === 1 ? price : Math.round((price ?? 0) * 0.95);
      const publishedAt = times[4] + (v - 1) * 7 * DAY;
      const content = buildDisclosure({
        piano: { stockNumber, maker, model: piano.model, serialNumber: piano.serial_number, year, yearIsEstimate: piano.year_is_estimate, yearFrom: null, yearTo: null, kind, sizeCm, finish: piano.finish, caseCondition: piano.case_condition, caseNotes: null },
        askingPriceMinor,
        currency: 'USD',
        intake: { measurements, grade, submittedAt: iso(assessedAt) },
        after: { measurements: after, grade: regrade, submittedAt: iso(finishedAt - HOUR), remeasured: Object.keys(after) as (keyof Measurements)[] },
        workDone,
        soldAsItStands: false,
        timeZone: 'UTC',
        tone: null,
        photos: [],
        texts,
      });
      digest = contentDigest(content);
      disclosureId = id('disclosures');
      const html = renderDisclosureHtml(content, v, digest, iso(publishedAt), BENCH_DEALER);
      rows.disclosures.push({ id: disclosureId, piano_id: pianoId, version: v, content, html, digest, published_by_id: r.pick(staff.floor), published_at: iso(publishedAt) });
    }
    if (!SOLD.includes(stage)) continue;

    const buyer = `${r.pick(FIRST)} ${r.pick(LAST)}`;
    const ackAt = times[5] - 2 * DAY;
    const ackId = id('acknowledgements');
    rows.acknowledgements.push({ id: ackId, disclosure_id: disclosureId, buyer_name: buyer, buyer_email: `buyer${pianoId}@example.test`, digest, acknowledged_at: iso(ackAt), receipt_token: token(r), countersigned_by_id: r.pick(staff.floor), countersigned_at: iso(ackAt + HOUR), pdf_key: null });
    if (stage !== 'held' && r.chance(0.2)) continue;
    const amount = depositAmount(price ?? 0, 'USD' as Currency, defaultDepositRules);
    rows.deposits.push({
      id: id('deposits'),
      piano_id: pianoId,
      disclosure_id: disclosureId,
      acknowledgement_id: ackId,
      disclosure_digest: digest,
      buyer_name: buyer,
      buyer_email: `buyer${pianoId}@example.test`,
      amount_minor: amount,
      currency: 'USD',
      checkout_session_id: `cs_bench_${pianoId}`,
      payment_intent_id: `pi_bench_${pianoId}`,
      status: stage === 'held' ? 'holding' : 'applied',
      created_at: iso(ackAt + HOUR),
      paid_at: iso(ackAt + 2 * HOUR),
      hold_expires_at: iso(ackAt + defaultDepositRules.holdDays * DAY),
      closed_at: stage === 'held' ? null : iso(times[5]),
      refund_id: null,
      refunded_minor: 0,
      close_reason: stage === 'held' ? null : 'sold',
    });
  }

  // Twice a day in the workshop, over the whole span.
  const climate: Row[] = [];
  for (let t = now - spanMs; t < now; t += DAY / 2) {
    const tempC = r.round(r.between(18, 23), 0.5);
    const rh = r.int(35, 55);
    climate.push({ id: id('climate_readings'), temp_c: tempC, relative_humidity: rh, emc_pct: Math.round(readClimate(tempC, rh).emcPct * 100) / 100, logged_by_id: r.pick(staff.technician), at: iso(t) });
  }
  rows.climate_readings = climate;

  await knex.transaction(async (trx) => {
    for (const table of ['pianos', 'stage_moves', 'intakes', 'assessments', 'work_plans', 'work_items', 'time_entries', 'part_uses', 'work_notes', 'disclosure_links', 'disclosures', 'acknowledgements', 'deposits', 'climate_readings']) {
      await insertAll(trx, table, rows[table]);
    }
    for (const table of Object.keys(base)) await trx.raw(`select setval(pg_get_serial_sequence(?, 'id'), greatest((select max(id) from ??), 1))`, [table, table]);
    await trx.raw(`select setval('piano_stock_seq', ?)`, [stockBase + n]);
  });
  return {
    pianos: n,
    stageMoves: rows.stage_moves.length,
    assessments: rows.assessments.length,
    plans: rows.work_plans.length,
    workItems: rows.work_items.length,
    timeEntries: rows.time_entries.length,
    partUses: rows.part_uses.length,
    workNotes: rows.work_notes.length,
    disclosures: rows.disclosures.length,
    acknowledgements: rows.acknowledgements.length,
    deposits: rows.deposits.length,
  };
}
