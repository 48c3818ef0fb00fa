import { z } from '@/modules/input/core/zod';

import { lineText, multiLineText } from '@/modules/input/core/text';

export const PIANO_KINDS = ['upright', 'grand'] as const;
export type PianoKind = (typeof PIANO_KINDS)[number];

// Every stage a piano passes through, in order, then the two exits.
export const STAGES = [
  'received',
  'assessed',
  'in_workshop',
  'ready',
  'on_floor',
  'held',
  'sold',
  'delivered',
  'wholesaled',
  'returned_to_owner',
] as const;
export type Stage = (typeof STAGES)[number];

export const STAGE_LABELS: Record<Stage, string> = {
  received: 'Received',
  assessed: 'Assessed',
  in_workshop: 'In workshop',
  ready: 'Ready',
  on_floor: 'On the floor',
  held: 'Held',
  sold: 'Sold',
  delivered: 'Delivered',
  wholesaled: 'Wholesaled',
  returned_to_owner: 'Returned to owner',
};

export function stockNumber(sequence: number): string {
  return `FW-${String(sequence).padStart(4, '0')}`;
}

export const pianoInput = z.object({
  maker: lineText().trim().min(1, 'is required').max(80),
  model: lineText().trim().max(80).nullish(),
  serialNumber: lineText().trim().max(40).nullish(),
  year: z.number().int().min(1700, 'must be 1700 or later').max(2100, 'must be 2100 or earlier').nullish(),
  yearIsEstimate: z.boolean().default(false),
  kind: z.enum(PIANO_KINDS, { message: 'must be upright or grand' }),
  // Height of an upright or length of a grand; the smallest spinets are about 90 cm, concert grands about 310 cm.
  sizeCm: z.number().int().min(50, 'must be at least 50 cm').max(400, 'must be at most 400 cm').nullish(),
  finish: lineText().trim().max(80).nullish(),
});
export type PianoInput = z.infer<typeof pianoInput>;

export const CASE_CONDITIONS = ['excellent', 'good', 'worn', 'damaged'] as const;
export type CaseCondition = (typeof CASE_CONDITIONS)[number];

const yearField = z.number().int('must be a whole year').min(1700, 'must be 1700 or later').max(2100, 'must be 2100 or earlier');

/** The piano as intake staff describe it: a year or an estimated range, and the case's condition. */
export const intakePianoInput = pianoInput
  .extend({
    yearFrom: yearField.nullish(),
    yearTo: yearField.nullish(),
    caseCondition: z.enum(CASE_CONDITIONS, { message: `must be one of ${CASE_CONDITIONS.join(', ')}` }).nullish(),
    caseNotes: multiLineText().trim().max(500).nullish(),
  })
  .superRefine((p, ctx) => {
    if (p.yearFrom != null && p.yearTo != null && p.yearFrom > p.yearTo) {
      ctx.addIssue({ code: 'custom', path: ['yearTo'], message: 'must not be before the start of the range' });
    }
  })
  .transform((p) => {
    // A range is an estimate; without a year, its middle stands for the year.
    if (p.yearFrom != null && p.yearTo != null) {
      return { ...p, yearIsEstimate: true, year: p.year ?? Math.round((p.yearFrom + p.yearTo) / 2) };
    }
    return p;
  });
export type IntakePianoInput = z.infer<typeof intakePianoInput>;

/** What the stock record says a piano is: shared by the screens, the intake and the disclosure. */
export interface PianoFacts {
  stockNumber: string;
  maker: string;
  model: string | null;
  serialNumber: string | null;
  year: number | null;
  yearIsEstimate: boolean;
  yearFrom: number | null;
  yearTo: number | null;
  kind: PianoKind;
  sizeCm: number | null;
  finish: string | null;
  caseCondition: CaseCondition | null;
  caseNotes: string | null;
}

export function describeYear(p: { year?: number | null; yearIsEstimate?: boolean; yearFrom?: number | null; yearTo?: number | null }): string {
  if (p.yearFrom != null && p.yearTo != null) return `about ${p.yearFrom}-${p.yearTo}`;
  if (p.year == null) return 'year unknown';
  return p.yearIsEstimate ? `about ${p.year}` : String(p.year);
}

export function describeSize(kind: PianoKind, sizeCm: number | null | undefined): string {
  if (sizeCm == null) return kind === 'grand' ? 'grand' : 'upright';
  return kind === 'grand' ? `grand, ${sizeCm} cm long` : `upright, ${sizeCm} cm tall`;
}

/** A piano as people name it: its maker and model ("Halvorsen Model 112"), the maker alone when no model is known. */
export function pianoName(p: { maker: string; model?: string | null }): string {
  const maker = p.maker.trim();
  const model = p.model?.trim();
  return model ? `${maker} ${model}` : maker;
}

/** A serial number as compared between records: case, spaces and punctuation do not make another piano. */
export function serialKey(serial: string): string {
  return serial.toLowerCase().replace(/[^a-z0-9]/g, '');
}
