import type { Knex } from 'knex';

import type { Role } from '@/modules/accounts/core/roles';
import { gradeAssessment } from '@/modules/assessment/core/grade';
import { defaultRules } from '@/modules/assessment/core/grade-rules';
import type { Measurements } from '@/modules/assessment/core/measurements';
import type { PianoKind, Stage } from '@/modules/pianos/core/piano';
import { readClimate } from '@/modules/shop/core/climate';
import { publishDisclosure } from '@/modules/disclosure/server/disclosure-service';
import { applyPriceEnding } from '@/modules/pricing/core/pricing';
import { demoPricingRules } from '@/modules/pricing/core/pricing-rules';
import { changeAskingPrice, offerFor, recordOfferAnswer, suggestedPrice } from '@/modules/pricing/server/pricing-service';
import { estimateReconditioning } from '@/modules/shop/core/estimate';
import { demoRateCard } from '@/modules/shop/core/rate-card';

// An invented dealer, Larkspur Lane Pianos, with invented staff, makers and stock. Demo data only.
export const DEMO_PASSWORD = 'feltwire-demo';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'intake@feltwire.test', name: 'Ines Okafor-Lind', role: 'intake' },
  { email: 'tech@feltwire.test', name: 'Tomas Reyval', role: 'technician' },
  { email: 'floor@feltwire.test', name: 'Fern Adeyemi-Holt', role: 'floor' },
  { email: 'manager@feltwire.test', name: 'Mara Quillfeather', role: 'manager' },
];

interface DemoPiano {
  maker: string;
  model: string;
  serialNumber: string;
  year: number;
  yearIsEstimate: boolean;
  kind: PianoKind;
  sizeCm: number;
  finish: string;
  stage: Stage;
  /** which invented inspection it came in with, and what happened after the work */
  story?: { inspection: InspectionKey; remeasured?: 'all' | 'not_hammers'; sellAsIsWhy?: string };
}

export const DEMO_PIANOS: DemoPiano[] = [
  { maker: 'Almsbury', model: 'Parlour 118', serialNumber: 'AL-204117', year: 1987, yearIsEstimate: false, kind: 'upright', sizeCm: 118, finish: 'satin walnut', stage: 'received' },
  { maker: 'Thornquist & Hale', model: 'Studio B', serialNumber: 'TH-88213', year: 1972, yearIsEstimate: true, kind: 'upright', sizeCm: 126, finish: 'polished ebony', stage: 'received' },
  { maker: 'Corvelle', model: 'G-172', serialNumber: 'CV-530981', year: 2004, yearIsEstimate: false, kind: 'grand', sizeCm: 172, finish: 'polished ebony', stage: 'assessed', story: { inspection: 'clean' } },
  { maker: 'Marrowfield', model: 'Console 109', serialNumber: 'MF-11902', year: 1995, yearIsEstimate: false, kind: 'upright', sizeCm: 109, finish: 'cherry', stage: 'assessed', story: { inspection: 'partial' } },
  { maker: 'Wendell Kestrel', model: 'Salon', serialNumber: 'WK-7731', year: 1958, yearIsEstimate: true, kind: 'grand', sizeCm: 155, finish: 'mahogany', stage: 'in_workshop', story: { inspection: 'worn' } },
  { maker: 'Almsbury', model: 'Parlour 121', serialNumber: 'AL-310552', year: 2011, yearIsEstimate: false, kind: 'upright', sizeCm: 121, finish: 'white satin', stage: 'in_workshop', story: { inspection: 'fair' } },
  { maker: 'Solenne', model: 'Model 5', serialNumber: 'SO-19044', year: 1999, yearIsEstimate: false, kind: 'upright', sizeCm: 131, finish: 'polished ebony', stage: 'ready', story: { inspection: 'fair', remeasured: 'all' } },
  { maker: 'Corvelle', model: 'U-125', serialNumber: 'CV-402277', year: 2008, yearIsEstimate: false, kind: 'upright', sizeCm: 125, finish: 'satin oak', stage: 'on_floor', story: { inspection: 'worn', remeasured: 'all' } },
  { maker: 'Thornquist & Hale', model: 'Concert Parlour', serialNumber: 'TH-90077', year: 1983, yearIsEstimate: false, kind: 'grand', sizeCm: 188, finish: 'polished ebony', stage: 'on_floor', story: { inspection: 'fair', remeasured: 'all' } },
  { maker: 'Marrowfield', model: 'Spinet 91', serialNumber: 'MF-06650', year: 1979, yearIsEstimate: true, kind: 'upright', sizeCm: 91, finish: 'walnut', stage: 'on_floor', story: { inspection: 'fair', remeasured: 'not_hammers' } },
  { maker: 'Solenne', model: 'Model 3', serialNumber: 'SO-15520', year: 1992, yearIsEstimate: false, kind: 'upright', sizeCm: 121, finish: 'mahogany', stage: 'held', story: { inspection: 'poor_play', sellAsIsWhy: 'The buyer wants it as a project piano to restore himself; told what it needs and priced for it.' } },
  { maker: 'Wendell Kestrel', model: 'Boudoir', serialNumber: 'WK-8102', year: 1964, yearIsEstimate: true, kind: 'grand', sizeCm: 150, finish: 'satin black', stage: 'sold', story: { inspection: 'worn', remeasured: 'all' } },
  // On the floor for the catalogue's journey alone (no other journey changes it).
  { maker: 'Almsbury', model: 'Study 114', serialNumber: 'AL-415903', year: 2015, yearIsEstimate: false, kind: 'upright', sizeCm: 114, finish: 'satin walnut', stage: 'on_floor', story: { inspection: 'fair', remeasured: 'all' } },
];

// The road each demo piano took to its stage, with the action that made each move.
const ROADS: Record<Stage, [string, Stage][]> = {
  received: [],
  assessed: [['submit_assessment', 'assessed']],
  in_workshop: [['submit_assessment', 'assessed'], ['approve_plan', 'in_workshop']],
  ready: [['submit_assessment', 'assessed'], ['approve_plan', 'in_workshop'], ['finish_workshop', 'ready']],
  on_floor: [['submit_assessment', 'assessed'], ['approve_plan', 'in_workshop'], ['finish_workshop', 'ready'], ['put_on_floor', 'on_floor']],
  held: [['submit_assessment', 'assessed'], ['sell_as_is', 'ready'], ['put_on_floor', 'on_floor'], ['hold', 'held']],
  sold: [['submit_assessment', 'assessed'], ['approve_plan', 'in_workshop'], ['finish_workshop', 'ready'], ['put_on_floor', 'on_floor'], ['sell', 'sold']],
  delivered: [],
  wholesaled: [],
  returned_to_owner: [],
};
const MOVER: Record<string, string> = { submit_assessment: 'intake', approve_plan: 'manager', sell_as_is: 'manager', finish_workshop: 'technician', put_on_floor: 'floor', hold: 'system', sell: 'floor' };

// Invented inspections, each a case the demo shows: a fair piano, a worn one, a clean one, one
// inspected only in part (a provisional grade), and one whose play test says not for retail.
type InspectionKey = 'fair' | 'worn' | 'clean' | 'partial' | 'poor_play';
const DEMO_MEASUREMENTS: Record<InspectionKey, Measurements> = {
  fair: { keySidePlayMm: 1.5, keyLevelDeviationMm: 0.8, hammerGrooveDepthMm: 1.8, hammerFelt: 'firm', hammerFeltLeft: 'ample', steelCorrosion: 'light', bassWinding: 'dull', soundboardCracks: [{ lengthCm: 22, widestGapMm: 0.4, crossesRib: false, buzzes: false, hurtsTuning: false }], ribsSeparated: false, a4Hz: 437.2, tuningPins: 'firm', bassEvenness: 4, middleEvenness: 4, trebleEvenness: 3, dynamicRange: 4, overallImpression: 4 },
  worn: { keySidePlayMm: 2.6, keyTouchesNeighbour: true, keysTouchingNeighbour: [23, 24, 61], keyLevelDeviationMm: 2.4, hammerGrooveDepthMm: 3.2, hammerFelt: 'hard', hammerFeltLeft: 'thin', steelCorrosion: 'moderate', bassWinding: 'dark', brokenStrings: 2, soundboardCracks: [], ribsSeparated: false, a4Hz: 428.4, tuningPins: 'some_loose', bassEvenness: 3, middleEvenness: 3, trebleEvenness: 3, dynamicRange: 3, overallImpression: 3 },
  clean: { keySidePlayMm: 1.2, keyLevelDeviationMm: 0.4, hammerGrooveDepthMm: 0.8, hammerFelt: 'firm', hammerFeltLeft: 'ample', steelCorrosion: 'none', bassWinding: 'bright', soundboardCracks: [], ribsSeparated: false, a4Hz: 439.1, tuningPins: 'firm', bassEvenness: 5, middleEvenness: 5, trebleEvenness: 4, dynamicRange: 5, overallImpression: 5 },
  // Seen in the seller's hall: keys, hammers and pitch only, the rest left for the showroom.
  partial: { keySidePlayMm: 1.8, keyLevelDeviationMm: 1.1, hammerGrooveDepthMm: 1.4, hammerFelt: 'firm', a4Hz: 434.0 },
  poor_play: { keySidePlayMm: 1.9, keyLevelDeviationMm: 1.9, hammerGrooveDepthMm: 2.1, hammerFelt: 'hard', hammerFeltLeft: 'ample', steelCorrosion: 'light', bassWinding: 'dull', brokenStrings: 0, ribsSeparated: false, a4Hz: 436.0, tuningPins: 'firm', bassEvenness: 2, middleEvenness: 3, trebleEvenness: 2, dynamicRange: 3, overallImpression: 2 },
};

// The workshop's re-measurements of what it worked on: only these fields are measured again.
const AFTER_WORK: Measurements = {
  keyTouchesNeighbour: false,
  keysTouchingNeighbour: null,
  keySidePlayMm: 1.3,
  keyLevelDeviationMm: 0.3,
  hammerGrooveDepthMm: 0.6,
  // new or reshaped and voiced hammers
  hammerFelt: 'firm',
  hammerFeltLeft: 'ample',
  brokenStrings: 0,
  a4Hz: 440,
  bassEvenness: 4,
  middleEvenness: 4,
  trebleEvenness: 4,
  dynamicRange: 4,
  overallImpression: 4,
};
const HAMMER_FIELDS = ['hammerGrooveDepthMm', 'hammerFelt', 'hammerFeltLeft'];

const DAY = 86_400_000;

/** Adds the demo users and pianos that are not there yet; running it twice changes nothing. */
export async function seedDemo(knex: Knex, hash: (password: string) => Promise<string>): Promise<{ users: number; pianos: number }> {
  const passwordHash = await hash(DEMO_PASSWORD);
  const users = await knex('users')
    .insert(DEMO_USERS.map((u) => ({ ...u, password_hash: passwordHash })))
    .onConflict('email')
    .ignore()
    .returning('id');
  const staff = Object.fromEntries(
    (await knex('users').whereIn('email', DEMO_USERS.map((u) => u.email)).select('id', 'role')).map((u: { id: number; role: string }) => [u.role, u.id]),
  ) as Record<string, number>;
  const intake = { id: staff.intake };
  let pianos = 0;
  const now = Date.now();
  for (const [index, p] of DEMO_PIANOS.entries()) {
    const exists = await knex('pianos').where({ serial_number: p.serialNumber, maker: p.maker }).first('id');
    if (exists) continue;
    // Older stock arrived earlier: a piano further along its road came in further back.
    const road = ROADS[p.stage];
    const arrived = now - (8 + road.length * 9 + index) * DAY;
    const [{ id }] = await knex('pianos').insert({
      maker: p.maker,
      model: p.model,
      serial_number: p.serialNumber,
      year: p.year,
      year_is_estimate: p.yearIsEstimate,
      kind: p.kind,
      size_cm: p.sizeCm,
      finish: p.finish,
      stage: p.stage,
      created_by_id: intake?.id ?? null,
      created_at: new Date(arrived).toISOString(),
      stage_changed_at: new Date(arrived + road.length * 9 * DAY).toISOString(),
    }).returning('id');
    await seedStory(knex, staff, id, index, p, arrived);
    pianos += 1;
  }
  await seedOffers(knex, staff);
  await seedPrices(knex, staff);
  const showing = await knex('pianos')
    .whereIn('stage', ['on_floor', 'held'])
    .whereNotExists(knex('disclosures').whereRaw('disclosures.piano_id = pianos.id'))
    .whereExists(knex('assessments').whereRaw('assessments.piano_id = pianos.id'))
    .select('id');
  for (const p of showing) {
    await publishDisclosure({ photos: undefined as never, publicUrl: '' }, { id: staff.manager, role: 'manager' }, p.id);
  }
  if (!(await knex('climate_readings').first('id'))) {
    for (const [daysAgo, tempC, rh] of [[6, 20.5, 44], [4, 21, 47], [2, 19.5, 38], [0, 20, 45]]) {
      const { emcPct } = readClimate(tempC, rh);
      await knex('climate_readings').insert({ temp_c: tempC, relative_humidity: rh, emc_pct: Math.round(emcPct * 100) / 100, logged_by_id: staff.technician, at: new Date(now - daysAgo * DAY).toISOString() });
    }
  }
  return { users: users.length, pianos };
}

// A demo piano's past: its stage moves, and once assessed, its intake, assessment and workshop plan.
async function seedStory(knex: Knex, staff: Record<string, number>, pianoId: number, index: number, piano: DemoPiano, arrived: number): Promise<void> {
  const { stage, story } = piano;
  const at = (step: number) => new Date(arrived + step * 9 * DAY).toISOString();
  await knex('stage_moves').insert({ piano_id: pianoId, action: 'receive', from_stage: null, to_stage: 'received', by_user_id: staff.intake, by_role: 'intake', at: at(0) });
  let from: Stage = 'received';
  for (const [step, [action, to]] of ROADS[stage].entries()) {
    const role = MOVER[action];
    await knex('stage_moves').insert({ piano_id: pianoId, action, from_stage: from, to_stage: to, by_user_id: role === 'system' ? null : staff[role], by_role: role, at: at(step + 1), why: action === 'hold' ? 'Deposit paid (demo)' : action === 'sell_as_is' ? (story?.sellAsIsWhy ?? null) : null });
    from = to;
  }
  if (stage === 'received' || !story) return;
  await knex('intakes').insert({
    piano_id: pianoId,
    seller_name: ['Wren Halvorsen', 'Dario Quennell', 'Maud Ostrander-Pike'][index % 3],
    seller_phone: `+1 555 01${String(10 + index)}`,
    seller_email: `seller${index + 1}@example.test`,
    seller_address: `${10 + index} Linden Close, Millbrook`,
    acquisition: ['trade_in', 'purchase', 'consignment'][index % 3],
    received_on: at(0).slice(0, 10),
    inspected_at: ['customer_home', 'showroom', 'workshop'][index % 3],
    created_by_id: staff.intake,
    created_at: at(0),
  });
  const measurements = DEMO_MEASUREMENTS[story.inspection];
  const grade = gradeAssessment(measurements, defaultRules);
  const [{ id: assessmentId }] = await knex('assessments').insert({
    piano_id: pianoId, version: 1, kind: 'intake', measurements: JSON.stringify(measurements), grade: JSON.stringify(grade),
    refer_to_technician: grade.referToTechnician, not_recommended_for_retail: grade.notRecommendedForRetail, rules_version: grade.rulesVersion, submitted_by_id: staff.intake, submitted_at: at(1),
  }).returning('id');
  if (!['in_workshop', 'ready', 'on_floor', 'sold'].includes(stage)) return;
  const estimate = estimateReconditioning(grade.findings, demoRateCard);
  const [{ id: planId }] = await knex('work_plans').insert({
    piano_id: pianoId, assessment_id: assessmentId, rate_card_version: demoRateCard.version, currency: demoRateCard.currency, hourly_rate_minor: demoRateCard.hourlyRateMinor,
    created_by_id: staff.manager, created_at: at(1), approved_by_id: staff.manager, approved_at: at(2),
  }).returning('id');
  const done = stage !== 'in_workshop';
  for (const [i, line] of estimate.lines.entries()) {
    const [{ id: itemId }] = await knex('work_items').insert({
      plan_id: planId, piano_id: pianoId, task: line.task, title: line.label, estimated_hours: line.hours, estimated_parts_minor: line.partsMinor, quantity: line.quantity,
      because: line.because, assigned_to_id: i % 2 === 0 ? staff.technician : null, priority: 1 + (i % 3), status: done ? 'done' : i === 0 ? 'in_progress' : 'planned',
      done_at: done ? at(3) : null,
    }).returning('id');
    if (done || i === 0) {
      // Logged hours run a little over or under the estimate, as real work does.
      const minutes = Math.round(line.hours * 60 * (i % 2 === 0 ? 1.15 : 0.9));
      if (minutes > 0) {
        const logged = Math.min(minutes, 1440);
        const [{ id: entryId }] = await knex('time_entries').insert({ work_item_id: itemId, technician_id: staff.technician, started_at: at(2), minutes: logged, note: 'Demo entry' }).returning('id');
        // On a piano still in the workshop, the first entry was put right once, as happens.
        if (!done) {
          const fixed = logged - 15;
          await knex('time_entry_corrections').insert({ time_entry_id: entryId, corrected_by_id: staff.technician, corrected_at: at(2), old_minutes: logged, new_minutes: fixed, why: 'The timer ran on over the tea break.' });
          await knex('time_entries').where({ id: entryId }).update({ minutes: fixed });
        }
      }
    }
  }
  if (!done || !story.remeasured) return;
  // The workshop measures again what it worked on; on one piano nobody measured the hammers again.
  const remeasured = Object.fromEntries(Object.entries(AFTER_WORK).filter(([f]) => story.remeasured === 'all' || !HAMMER_FIELDS.includes(f))) as Measurements;
  const after: Measurements = { ...measurements, ...remeasured };
  const regrade = gradeAssessment(after, defaultRules);
  await knex('assessments').insert({
    piano_id: pianoId, version: 2, kind: 'post_workshop', measurements: JSON.stringify(after), grade: JSON.stringify(regrade), remeasured_fields: Object.keys(remeasured).sort(),
    refer_to_technician: regrade.referToTechnician, not_recommended_for_retail: regrade.notRecommendedForRetail, rules_version: regrade.rulesVersion,
    change_note: 'Re-measured after workshop work.', submitted_by_id: staff.technician, submitted_at: at(3),
  });
}

const at = (iso: string | Date) => ({ clock: { now: () => new Date(iso) } });
const FIRST_PRICE = 'First price once ready for the floor';
const MARKED_DOWN = 'No serious interest in its first weeks on the floor';

/**
 * What each seller said to the offer, recorded the day the inspection went in: accepted, or a
 * counter-offer and the figure agreed after it. Pianos still waiting in Assessed keep their offer open.
 */
async function seedOffers(knex: Knex, staff: Record<string, number>): Promise<void> {
  const rows = await knex('pianos')
    .join('intakes', 'intakes.piano_id', 'pianos.id')
    .join('assessments', (j) => j.on('assessments.piano_id', 'pianos.id').andOnVal('assessments.version', 1))
    .whereIn('pianos.serial_number', DEMO_PIANOS.map((p) => p.serialNumber))
    .whereNot('intakes.acquisition', 'consignment')
    .whereNot('pianos.stage', 'assessed')
    .whereNotExists(knex('trade_in_answers').whereRaw('trade_in_answers.piano_id = pianos.id'))
    .orderBy('pianos.id')
    .select('pianos.id', 'assessments.submitted_at');
  const intake = { id: staff.intake, role: 'intake' as const };
  for (const [n, p] of rows.entries()) {
    const when = at(p.submitted_at);
    const offer = (await offerFor(when, intake, p.id)).offer;
    if (!offer) continue;
    const step = demoPricingRules.offerStepMinor;
    const up = (share: number) => Math.round((offer.offerMinor * (1 + share)) / step) * step;
    if (n % 2 === 0 || offer.offerMinor === 0) {
      await recordOfferAnswer(when, intake, { pianoId: p.id, answer: 'accepted', offeredMinor: offer.offerMinor });
    } else {
      await recordOfferAnswer(when, intake, { pianoId: p.id, answer: 'countered', offeredMinor: offer.offerMinor, counterMinor: up(0.2), note: 'Seller had seen a higher figure for a similar piano' });
      await recordOfferAnswer(at(new Date(Date.parse(p.submitted_at) + 3_600_000)), { id: staff.manager, role: 'manager' }, { pianoId: p.id, answer: 'agreed', offeredMinor: offer.offerMinor, agreedMinor: up(0.08), note: 'Met partway' });
    }
  }
}

/** Pianos ready for sale carry an asking price from the suggestion, and some on the floor were marked down since. */
async function seedPrices(knex: Knex, staff: Record<string, number>): Promise<void> {
  const manager = { id: staff.manager, role: 'manager' as const };
  const forSale = await knex('pianos').whereIn('stage', ['ready', 'on_floor', 'held', 'sold']).whereNull('asking_price_minor').orderBy('id').select('id', 'kind', 'size_cm', 'stage_changed_at');
  for (const p of forSale) {
    const ready = (await knex('stage_moves').where({ piano_id: p.id }).whereIn('to_stage', ['ready']).min('at as at').first())?.at ?? p.stage_changed_at;
    const when = at(ready);
    const suggestion = await suggestedPrice(when, manager, p.id).catch(() => null);
    const price = suggestion && suggestion.basis === 'retail' && suggestion.priceMinor > 0 ? suggestion.priceMinor : p.kind === 'grand' ? 1_250_000 + p.size_cm * 4_000 : 240_000 + p.size_cm * 1_500;
    await changeAskingPrice(when, manager, { pianoId: p.id, askingPriceMinor: price, currency: 'USD', reason: FIRST_PRICE });
  }
  const floor = await knex('pianos').where('stage', 'on_floor').orderBy('id').select('id', 'asking_price_minor', 'stage_changed_at');
  for (const [n, p] of floor.entries()) {
    const history = await knex('price_changes').where({ piano_id: p.id }).select('reason');
    if (n % 2 === 1 || history.length !== 1 || history[0].reason !== FIRST_PRICE) continue;
    const lower = applyPriceEnding(Math.round(p.asking_price_minor * 0.95), demoPricingRules.priceEnding);
    await changeAskingPrice(at(new Date(Date.parse(p.stage_changed_at) + 3 * DAY)), manager, { pianoId: p.id, askingPriceMinor: lower, currency: 'USD', reason: MARKED_DOWN });
  }
}
