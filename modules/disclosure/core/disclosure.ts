import { z } from '@/modules/input/core/zod';

import { lineText, multiLineText } from '@/modules/input/core/text';

import { AREAS, AREA_LABELS, type Area, type Finding, type Grade, type Severity } from '@/modules/assessment/core/grade';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { WORK_TASK_AREAS, WORK_TASK_LABELS, type WorkTask } from '@/modules/assessment/core/work-tasks';
import { describeSize, describeYear, type CaseCondition, type PianoFacts, type PianoKind } from '@/modules/pianos/core/piano';
import { cents } from '@/modules/tone/core/pitch';

// What a buyer reads: built only from public facts, so nothing internal can leak into it.
export const DISCLOSURE_AREAS = [...AREAS, 'case'] as const;
export type DisclosureArea = (typeof DISCLOSURE_AREAS)[number];
export const DISCLOSURE_AREA_LABELS: Record<DisclosureArea, string> = { ...AREA_LABELS, case: 'Case and finish' };

/** A buyer's words for how an area stands. */
export const CONDITION_WORDS: Record<Severity, string> = {
  sound: 'In good order',
  watch: 'Worth knowing',
  needs_work: 'Needs attention',
  serious: 'Significant',
};
const RANK: Record<Severity, number> = { sound: 0, watch: 1, needs_work: 2, serious: 3 };


const CASE_WORDS: Record<CaseCondition, [Severity, string]> = {
  excellent: ['sound', 'The case and finish are in excellent condition.'],
  good: ['sound', 'The case and finish are in good condition, with light signs of use.'],
  worn: ['watch', 'The case and finish show wear: marks and scratches from years of use.'],
  damaged: ['needs_work', 'The case or finish is damaged.'],
};

export interface DisclosureInput {
  piano: PianoFacts;
  askingPriceMinor: number | null;
  currency: string;
  assessment: { kind: 'intake' | 'post_workshop'; measurements: Measurements; grade: Grade; submittedAt: string };
  workDone: { task: string; title: string }[];
  photos: { id: number; area: string; caption: string | null }[];
  texts: { dealerName: string; warranty: string };
}

export interface DisclosureAreaContent {
  area: DisclosureArea;
  label: string;
  condition: string;
  severity: Severity;
  findings: { severity: Severity; text: string }[];
  workDone: string[];
  photoIds: number[];
}

export interface DisclosureContent {
  dealerName: string;
  piano: { stockNumber: string; maker: string; model: string | null; serialNumber: string | null; year: string; kind: PianoKind; size: string; finish: string | null };
  askingPrice: { minor: number; currency: string } | null;
  assessedOn: string;
  assessedAfterWorkshop: boolean;
  pitch: { a4Hz: number; cents: number; text: string } | null;
  areas: DisclosureAreaContent[];
  photos: { id: number; area: string; caption: string | null }[];
  warranty: string;
  notices: { title: string; text: string }[];
}

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
  {
    title: 'About this document',
    text: 'This disclosure and its warranty text are the dealer’s template, adapted to local consumer-protection and sales law; it is not legal advice.',
  },
];

function worst(findings: { severity: Severity }[]): Severity {
  return findings.reduce<Severity>((w, f) => (RANK[f.severity] > RANK[w] ? f.severity : w), 'sound');
}

/** The buyer-facing content of a disclosure. Pure: the same input always gives the same content. */
export function buildDisclosure(input: DisclosureInput): DisclosureContent {
  const { piano, assessment } = input;
  const byArea = new Map<DisclosureArea, Finding[]>();
  // Every finding the grade marks for disclosure appears; sound findings appear as good news.
  for (const f of assessment.grade.findings) byArea.set(f.area, [...(byArea.get(f.area) ?? []), f]);
  const areas: DisclosureAreaContent[] = [];
  for (const area of DISCLOSURE_AREAS) {
    const findings: { severity: Severity; text: string }[] = (byArea.get(area as Area) ?? []).map((f) => ({ severity: f.severity, text: f.finding }));
    if (area === 'case' && piano.caseCondition) {
      const [severity, text] = CASE_WORDS[piano.caseCondition];
      findings.push({ severity, text: piano.caseNotes ? `${text} ${piano.caseNotes}` : text });
    }
    const workDone = input.workDone.filter((w) => WORK_TASK_AREAS[w.task as WorkTask] === area).map((w) => w.title || WORK_TASK_LABELS[w.task as WorkTask]);
    const photoIds = input.photos.filter((p) => p.area === area).map((p) => p.id);
    if (!findings.length && !workDone.length && !photoIds.length) continue;
    const severity = worst(findings);
    areas.push({ area, label: DISCLOSURE_AREA_LABELS[area], condition: findings.length ? CONDITION_WORDS[severity] : 'Not inspected', severity, findings, workDone, photoIds });
  }
  const a4 = assessment.measurements.a4Hz;
  const day = assessment.submittedAt.slice(0, 10);
  const pitch =
    a4 != null
      ? (() => {
          const c = cents(a4);
          const rounded = Math.round(Math.abs(c));
          const where = rounded === 0 ? 'at standard pitch' : `${rounded} cents ${c < 0 ? 'below' : 'above'} standard pitch`;
          return { a4Hz: a4, cents: Math.round(c * 10) / 10, text: `A4 measured at ${a4.toFixed(1)} Hz, ${where}, on ${day}.` };
        })()
      : null;
  return {
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
    assessedOn: day,
    assessedAfterWorkshop: assessment.kind === 'post_workshop',
    pitch,
    areas,
    photos: input.photos.map((p) => ({ id: p.id, area: p.area, caption: p.caption })),
    warranty: input.texts.warranty,
    notices: NOTICES,
  };
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

export const DEFAULT_WARRANTY =
  'Parts and labour warranty: for one year from delivery, the dealer will repair at no charge any fault in the work listed on this disclosure. ' +
  'Tuning, voicing and regulation drift with use and climate and are not faults. Damage from moving by others, liquids, or extremes of humidity or heat is not covered. ' +
  'This text is a template for the dealer to adapt to local law.';

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
  })
  .strict();

export const textsInput = z
  .object({
    dealerName: lineText().trim().min(1).max(120),
    warranty: multiLineText().trim().min(1).max(4000),
  })
  .strict();