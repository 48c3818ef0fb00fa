import { z } from '@/modules/input/core/zod';

import { lineText, multiLineText } from '@/modules/input/core/text';

import {
  AREAS,
  AREA_LABELS,
  MARK_WORDS,
  areaOfCheck,
  callsForWork,
  checkWords,
  worstMark,
  type Area,
  type AreaMark,
  type Finding,
  type Grade,
  type Mark,
  type MeasureField,
} from '@/modules/assessment/core/grade';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { WORK_TASK_AREAS, WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import { describeSize, describeYear, type CaseCondition, type PianoFacts, type PianoKind } from '@/modules/pianos/core/piano';
import { calendarDayIn } from '@/modules/shop/core/dealer-time';
import { buyerCaption } from '@/modules/shop/core/work-caption';
import type { DisclosureTone } from '@/modules/tone/core/keyboard-report';
import { cents, centsOffset, FROM_STANDARD, roundCents } from '@/modules/tone/core/pitch';

// What a buyer reads: built only from public facts, so nothing internal can leak into it.
export const DISCLOSURE_AREAS = [...AREAS, 'case'] as const;
export type DisclosureArea = (typeof DISCLOSURE_AREAS)[number];
export const DISCLOSURE_AREA_LABELS: Record<DisclosureArea, string> = { ...AREA_LABELS, case: 'Case and finish' };

const CASE_WORDS: Record<CaseCondition, [Mark, string]> = {
  excellent: ['fine', 'The case and finish are in excellent condition.'],
  good: ['fine', 'The case and finish are in good condition, with light signs of use.'],
  worn: ['noted', 'The case and finish show wear: marks and scratches from years of use.'],
  damaged: ['work', 'The case or finish is damaged.'],
};

/** An inspection as the disclosure needs it. */
export interface InspectionFacts {
  measurements: Measurements;
  grade: Grade;
  submittedAt: string;
}

export interface DisclosureInput {
  piano: PianoFacts;
  askingPriceMinor: number | null;
  currency: string;
  /** the inspection the piano came in with (or its latest correction) */
  intake: InspectionFacts;
  /** the newest inspection after workshop work, and every field measured again since the intake */
  after: (InspectionFacts & { remeasured: MeasureField[] }) | null;
  /** work items marked done, with the checks that called for them */
  workDone: { task: string; title: string; because: string[] }[];
  /** the manager chose to sell it without reconditioning */
  soldAsItStands: boolean;
  photos: { id: number; area: string; caption: string | null }[];
  texts: { dealerName: string; warranty: string };
  /** the shop's time zone: the days on the disclosure are the shop's days */
  timeZone: string;
  /** the piano's newest play-test recording, as a disclosure shows it */
  tone: { recordedAt: string; tone: DisclosureTone } | null;
}

export interface DisclosureFinding {
  mark: Mark;
  text: string;
}

export interface DisclosureAreaContent {
  area: DisclosureArea;
  label: string;
  /** how the area stands now, as far as what was measured shows */
  mark: AreaMark;
  condition: string;
  /** what the inspection at intake found */
  found: DisclosureFinding[];
  /** work was done in this area: what was found describes it before the work */
  foundBeforeWork: boolean;
  workDone: string[];
  /** what was measured again after the work */
  measuredAfter: DisclosureFinding[];
  /** checks found at intake in an area worked on and not measured again since */
  notMeasuredAgain: string[];
  /** work the findings call for that was not done */
  notDone: string[];
  photoIds: number[];
}

export interface DisclosurePitch {
  a4Hz: number;
  cents: number;
  text: string;
  measuredOn: string;
  /** at intake; after the work; or at intake in an area worked on since and not measured again */
  when: 'intake' | 'after_work' | 'before_work';
}

/** The play test measured from a recording: the day, the pitch, and cents per key for the chart. */
export interface DisclosureToneContent extends DisclosureTone {
  /** recorded after the work; before it, in an area worked on since; or at intake */
  when: 'intake' | 'after_work' | 'before_work';
}

/** The buyer's disclosure, format 2: found at intake, work done and measured after the work kept apart. */
export interface DisclosureContent {
  format: 2;
  dealerName: string;
  piano: { stockNumber: string; maker: string; model: string | null; serialNumber: string | null; year: string; kind: PianoKind; size: string; finish: string | null };
  askingPrice: { minor: number; currency: string } | null;
  /** YYYY-MM-DD of the intake inspection */
  inspectedOn: string;
  /** YYYY-MM-DD of the newest measurements after the work, if any */
  measuredAfterOn: string | null;
  soldAsItStands: boolean;
  /** every piece of work the findings call for that was not done */
  notDone: string[];
  /** work done that belongs to no one area */
  otherWorkDone: string[];
  pitch: DisclosurePitch | null;
  /** from the newest play-test recording; absent in versions published before recordings were disclosed */
  tone?: DisclosureToneContent | null;
  areas: DisclosureAreaContent[];
  photos: { id: number; area: string; caption: string | null }[];
  warranty: string;
  notices: { title: string; text: string }[];
}

/** The first shape of the content, published before format 2: read back and shown as it was published. */
export interface DisclosureContentV1 {
  format?: undefined;
  dealerName: string;
  piano: DisclosureContent['piano'];
  askingPrice: { minor: number; currency: string } | null;
  assessedOn: string;
  assessedAfterWorkshop: boolean;
  pitch: { a4Hz: number; cents: number; text: string } | null;
  areas: { area: string; label: string; condition: string; severity: V1Severity; findings: { severity: V1Severity; text: string }[]; workDone: string[]; photoIds: number[] }[];
  photos: { id: number; area: string; caption: string | null }[];
  warranty: string;
  notices: { title: string; text: string }[];
}
export type V1Severity = 'sound' | 'watch' | 'needs_work' | 'serious';
/** The words format 1 printed beside a finding, and the mark each reads as today. */
export const V1_SEVERITY_WORDS: Record<V1Severity, string> = { sound: 'In good order', watch: 'Worth knowing', needs_work: 'Needs attention', serious: 'Significant' };
export const V1_MARKS: Record<V1Severity, Mark> = { sound: 'fine', watch: 'noted', needs_work: 'work', serious: 'major' };

export type AnyDisclosureContent = DisclosureContent | DisclosureContentV1;
export const isFormat2 = (c: AnyDisclosureContent): c is DisclosureContent => c.format === 2;

const NOTICES = [
  {
    title: 'Tuning after delivery',
    text: 'A piano settles into a new room over a few weeks. Have it tuned a few weeks after delivery, once it has settled, and keep the room near 40-50 % relative humidity.',
  },
  {
    title: 'Moving a piano',
    text: 'Pianos are heavy and tip easily. Moves are for trained movers with proper equipment; do not move it yourself.',
  },
  {
    title: 'Your own inspection',
    text: 'You may have this instrument inspected by an independent piano technician of your choice before you buy it.',
  },
];

const given = (v: unknown) => v != null && !(Array.isArray(v) && v.length === 0);
/** The fields a finding rests on that the inspection actually gave. */
const givenFields = (f: Finding, m: Measurements) => f.fields.filter((field) => given(m[field]));
const toShown = (f: Finding): DisclosureFinding => ({ mark: f.mark, text: f.finding });
const unique = (xs: string[]) => [...new Set(xs)];

function taskArea(task: string): DisclosureArea | null {
  return (WORK_TASK_AREAS as Record<string, DisclosureArea | undefined>)[task] ?? null;
}

/** The areas a done item worked on: its task's area, and the areas of the checks that called for it. */
function workedAreas(w: DisclosureInput['workDone'][number]): DisclosureArea[] {
  return unique([taskArea(w.task), ...w.because.map(areaOfCheck)].filter((a): a is DisclosureArea => !!a)) as DisclosureArea[];
}

const taskLabel = (task: WorkTask) => WORK_TASK_LABELS[task] ?? task;

/**
 * The buyer-facing content of a disclosure. Pure: the same input always gives the same content.
 * A finding in an area worked on stands only once measured again after the work; until then it is
 * shown as found before the work, and the area says what was not measured again.
 */
export function buildDisclosure(input: DisclosureInput): DisclosureContent {
  const { piano, intake, after } = input;
  // An intake at 23:30 UTC is the next morning in a shop east of it: the day is the shop's.
  const day = (iso: string) => calendarDayIn(iso, input.timeZone);
  const remeasured = new Set<MeasureField>(after?.remeasured ?? []);
  const doneTasks = new Set(input.workDone.map((w) => w.task));
  const areas: DisclosureAreaContent[] = [];
  for (const area of DISCLOSURE_AREAS) {
    const worked = input.workDone.filter((w) => workedAreas(w).includes(area));
    const workDone = worked.map((w) => w.title || taskLabel(w.task as WorkTask));
    const photoIds = input.photos.filter((p) => p.area === area).map((p) => p.id);
    if (area === 'case') {
      const found: DisclosureFinding[] = [];
      if (piano.caseCondition) {
        const [mark, text] = CASE_WORDS[piano.caseCondition];
        found.push({ mark, text: piano.caseNotes ? `${text} ${piano.caseNotes}` : text });
      }
      // The workshop does not grade the case again: after work on it, what was found is history.
      const stale = worked.length > 0 && found.length > 0;
      const mark: AreaMark = found.length && !stale ? found[0].mark : 'unseen';
      areas.push({
        area,
        label: DISCLOSURE_AREA_LABELS.case,
        mark,
        condition: stale ? 'Not looked at again after the work' : MARK_WORDS[mark],
        found,
        foundBeforeWork: worked.length > 0,
        workDone,
        measuredAfter: [],
        notMeasuredAgain: stale ? ['case and finish'] : [],
        notDone: !stale && piano.caseCondition === 'damaged' && !doneTasks.has('cabinet_touch_up') ? [taskLabel('cabinet_touch_up')] : [],
        photoIds,
      });
      continue;
    }
    const a = area as Area;
    const atIntake = intake.grade.findings.filter((f) => f.area === a);
    const measuredAfter = after
      ? after.grade.findings.filter((f) => {
          const fields = givenFields(f, after.measurements);
          return f.area === a && fields.length > 0 && fields.every((x) => remeasured.has(x));
        })
      : [];
    const touched = (f: Finding) => givenFields(f, intake.measurements).some((x) => remeasured.has(x));
    const fullyRemeasured = (f: Finding) => givenFields(f, intake.measurements).every((x) => remeasured.has(x));
    // Still true: found at intake, in an area nobody worked on, not measured again since.
    const standing = atIntake.filter((f) => !worked.length && !touched(f));
    const notMeasuredAgain = worked.length ? unique(atIntake.filter((f) => !fullyRemeasured(f)).map((f) => checkWords(f.check))) : [];
    const now = [...standing, ...measuredAfter];
    const inspected = intake.grade.inspectedAreas.includes(a) || measuredAfter.length > 0;
    const worst = worstMark(now.map((f) => f.mark));
    const mark: AreaMark = worst ?? 'unseen';
    // Only what was measured again speaks for the area after the work; the words say when that is part of it.
    const condition = worst ? (notMeasuredAgain.length ? `${MARK_WORDS[worst]} where measured again` : MARK_WORDS[worst]) : inspected ? 'Not measured after the work' : MARK_WORDS.unseen;
    const notDone = unique(now.flatMap((f) => (callsForWork(f) ? f.work.filter((w) => !w.alternativeTo && !doneTasks.has(w.task)).map((w) => taskLabel(w.task)) : [])));
    areas.push({
      area,
      label: DISCLOSURE_AREA_LABELS[area],
      mark,
      condition,
      found: atIntake.map(toShown),
      foundBeforeWork: worked.length > 0,
      workDone,
      measuredAfter: measuredAfter.map(toShown),
      notMeasuredAgain,
      notDone,
      photoIds,
    });
  }
  const otherWorkDone = input.workDone.filter((w) => !workedAreas(w).length).map((w) => w.title || taskLabel(w.task as WorkTask));
  const pitchFrom = after && remeasured.has('a4Hz') && after.measurements.a4Hz != null ? { hz: after.measurements.a4Hz, on: after.submittedAt, when: 'after_work' as const } : intake.measurements.a4Hz != null ? { hz: intake.measurements.a4Hz, on: intake.submittedAt, when: areas.find((x) => x.area === 'tuning')!.foundBeforeWork ? ('before_work' as const) : ('intake' as const) } : null;
  const pitch: DisclosurePitch | null = pitchFrom
    ? (() => {
        const c = roundCents(cents(pitchFrom.hz));
        return { a4Hz: pitchFrom.hz, cents: c, text: pitchSentence(pitchFrom.hz, c), measuredOn: day(pitchFrom.on), when: pitchFrom.when };
      })()
    : null;
  const tuningWorked = areas.find((x) => x.area === 'tuning')!.foundBeforeWork;
  const tone: DisclosureToneContent | null = input.tone
    ? {
        ...input.tone.tone,
        measuredOn: day(input.tone.recordedAt),
        when: after && Date.parse(input.tone.recordedAt) >= Date.parse(after.submittedAt) ? 'after_work' : tuningWorked ? 'before_work' : 'intake',
      }
    : null;
  return {
    format: 2,
    dealerName: input.texts.dealerName,
    piano: {
      stockNumber: piano.stockNumber,
      maker: piano.maker,
      model: piano.model,
      serialNumber: piano.serialNumber,
      year: describeYear(piano),
      kind: piano.kind,
      size: describeSize(piano.kind, piano.sizeCm),
      finish: piano.finish,
    },
    askingPrice: input.askingPriceMinor != null ? { minor: input.askingPriceMinor, currency: input.currency } : null,
    inspectedOn: day(intake.submittedAt),
    measuredAfterOn: after ? day(after.submittedAt) : null,
    soldAsItStands: input.soldAsItStands,
    notDone: unique(areas.flatMap((x) => x.notDone)),
    otherWorkDone,
    pitch,
    tone,
    areas,
    photos: input.photos.map((p) => ({ id: p.id, area: p.area, caption: buyerCaption(p.caption) })),
    warranty: input.texts.warranty,
    notices: NOTICES,
  };
}

/** "A4 measured at 437.2 Hz, 11.1 cents below standard pitch.", from the numbers a version keeps. */
export function pitchSentence(a4Hz: number, centsFromStandard: number): string {
  return `A4 measured at ${a4Hz.toFixed(1)} Hz, ${centsOffset(centsFromStandard, FROM_STANDARD)}.`;
}

/** Why a disclosure cannot be published from this grade yet; empty when it can. */
export function publishBlockers(grade: Pick<Grade, 'provisional' | 'playTested' | 'inspectedAreas' | 'minInspectedAreas'>): string[] {
  const out: string[] = [];
  if (grade.provisional) {
    out.push(`The grade is provisional: ${grade.inspectedAreas.length} of ${AREAS.length} areas are inspected and the shop asks for ${grade.minInspectedAreas}. Correct the assessment with the missing areas first.`);
  }
  if (!grade.playTested) out.push('The play test is missing, and a disclosure needs it: add it by correcting the assessment, or as a re-measurement in the workshop.');
  return out;
}

/** JSON with keys in a fixed order, so equal content always gives equal bytes (and an equal digest). */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value ?? null);
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

// Written to the buyer; the advice to the dealer (a template to adapt to local law) is on the manager's editing screen.
export const DEFAULT_WARRANTY =
  'Parts and labour warranty: for one year from delivery, the dealer will repair at no charge any fault in the work listed on this disclosure. ' +
  'Tuning, voicing and regulation drift with use and climate and are not faults. Damage from moving by others, liquids, or extremes of humidity or heat is not covered.';

/** What the manager reads beside the texts they edit: advice to the dealer, never printed for a buyer. */
export const DEALER_TEMPLATE_ADVICE =
  'The warranty, the disclosure’s notices and the deposit terms are Feltwire’s templates: adapt them to your local consumer-protection and sales law before you use them. They are not legal advice.';

/** A buyer's acknowledgement of the version they read. */
export const acknowledgeInput = z
  .object({
    fullName: lineText().trim().min(2, 'type your full name').max(120),
    email: lineText().trim().toLowerCase().max(254).pipe(z.email({ message: 'must be an e-mail address' })),
    read: z.literal(true, { message: 'tick the box to say you have read the disclosure' }),
    digest: z.string().regex(/^[0-9a-f]{64}$/, 'must be the digest shown on the disclosure'),
  })
  .strict();

export const priceInput = z
  .object({
    pianoId: z.number().int().positive(),
    askingPriceMinor: z.number().int('must be whole minor units').min(0).max(1_000_000_000),
    currency: z.enum(['USD', 'CAD', 'EUR', 'GBP', 'JPY'], { message: 'must be USD, CAD, EUR, GBP or JPY' }),
    reason: lineText().trim().min(3, 'says why, in at least 3 characters').max(200).optional(),
  })
  .strict();

export const textsInput = z
  .object({
    dealerName: lineText().trim().min(1).max(120),
    warranty: multiLineText().trim().min(1).max(4000),
  })
  .strict();
/** One part of an area as a reader meets it: what was found, what was done, what was measured after. */
export interface AreaSection {
  kind: 'found' | 'work' | 'after' | 'unmeasured' | 'not_done';
  title: string;
  items: { mark: AreaMark | 'done' | null; text: string }[];
}

const capital = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);

/**
 * The sections of one area, in the order they happened, for the web page, the printable page and
 * the signed copy alike. `day` writes a YYYY-MM-DD day for the reader.
 */
export function areaSections(a: DisclosureAreaContent, c: DisclosureContent, day: (isoDay: string) => string): AreaSection[] {
  const out: AreaSection[] = [];
  const intakeDay = day(c.inspectedOn);
  if (a.found.length) {
    out.push({ kind: 'found', title: a.foundBeforeWork ? `Found at intake on ${intakeDay}, before the work` : `Found at intake on ${intakeDay}`, items: a.found.map((f) => ({ mark: f.mark, text: f.text })) });
  } else if (!a.measuredAfter.length) {
    out.push({ kind: 'found', title: `At intake on ${intakeDay}`, items: [{ mark: 'unseen', text: 'Nothing in this area was measured or looked at.' }] });
  }
  if (a.workDone.length) out.push({ kind: 'work', title: 'Work done in our workshop', items: a.workDone.map((w) => ({ mark: 'done', text: w })) });
  if (a.measuredAfter.length && c.measuredAfterOn) {
    out.push({ kind: 'after', title: `Measured after the work on ${day(c.measuredAfterOn)}`, items: a.measuredAfter.map((f) => ({ mark: f.mark, text: f.text })) });
  }
  // Measured at intake, so not "not inspected": the section's title says what is missing.
  if (a.notMeasuredAgain.length) out.push({ kind: 'unmeasured', title: 'Not measured again after the work', items: a.notMeasuredAgain.map((t) => ({ mark: null, text: capital(t) })) });
  if (a.notDone.length) out.push({ kind: 'not_done', title: 'Recommended and not done', items: a.notDone.map((t) => ({ mark: null, text: t })) });
  return out;
}

/** What the buyer is told up front about work not done; null when all the work called for was done. */
export function notDoneSummary(c: DisclosureContent): { title: string; text: string } | null {
  const list = c.notDone.join('; ');
  if (c.soldAsItStands) {
    return {
      title: 'Sold as it stands',
      text: c.notDone.length
        ? `This piano has not been reconditioned in our workshop. Our inspection called for this work, which was not done: ${list}.`
        : 'This piano has not been reconditioned in our workshop; our inspection called for no work.',
    };
  }
  return c.notDone.length ? { title: 'Work not done', text: `Our inspection called for this work, which was not done: ${list}.` } : null;
}

/** What the play-test recording says, in the buyer's words: when, how far off pitch, and whether it needs a raise. */
export function toneWords(t: DisclosureToneContent, day: (isoDay: string) => string): { when: string; lines: string[] } {
  const keys = t.keys.length === 1 ? '1 key' : `${t.keys.length} keys`;
  const when =
    t.when === 'after_work'
      ? `Recorded after the work on ${day(t.measuredOn)}: ${keys} played one at a time.`
      : t.when === 'before_work'
        ? `Recorded on ${day(t.measuredOn)}, before the tuning work; not recorded again since: ${keys} played one at a time.`
        : `Recorded on ${day(t.measuredOn)}: ${keys} played one at a time.`;
  const lines: string[] = [];
  if (t.overallCents != null) lines.push(`Overall the keys heard are ${centsOffset(t.overallCents, FROM_STANDARD)} (the median of the keys).`);
  if (t.a4Hz != null) lines.push(`A4 from the recording: ${t.a4Hz.toFixed(1)} Hz.`);
  if (t.pitchRaiseNeeded) lines.push('That is flat enough to need a pitch raise before a fine tuning.');
  return { when, lines };
}

/** When the pitch on the disclosure was measured, in words. */
export function pitchWhen(p: DisclosurePitch, day: (isoDay: string) => string): string {
  if (p.when === 'after_work') return `Measured after the work on ${day(p.measuredOn)}.`;
  if (p.when === 'before_work') return `Measured at intake on ${day(p.measuredOn)}, before the tuning work; not measured again since.`;
  return `Measured at intake on ${day(p.measuredOn)}.`;
}

/** What a buyer's acknowledgement answers, on the server and on the buyer's page. */
export interface AcknowledgementAnswer {
  acknowledgementId: number;
  receiptToken: string;
  version: number;
  digest: string;
  acknowledgedAt: string;
  buyerName: string;
  buyerEmail: string;
  /** the buyer had acknowledged this version before: this is that acknowledgement, unchanged */
  already: boolean;
}
