import { z } from '@/modules/input/core/zod';

import { lineText, multiLineText } from '@/modules/input/core/text';

import { intakePianoInput } from '@/modules/pianos/core/piano';

import { measurementsInput } from './measurements';

export const ACQUISITIONS = ['trade_in', 'purchase', 'consignment'] as const;
export const ACQUISITION_LABELS: Record<(typeof ACQUISITIONS)[number], string> = {
  trade_in: 'Trade-in toward a purchase',
  purchase: 'Outright purchase',
  consignment: 'Consignment',
};
export const INSPECTION_PLACES = ['customer_home', 'showroom', 'workshop'] as const;
export const INSPECTION_PLACE_LABELS: Record<(typeof INSPECTION_PLACES)[number], string> = {
  customer_home: "Customer's home",
  showroom: 'Showroom',
  workshop: 'Workshop',
};

export const sellerInput = z.object({
  name: lineText().trim().min(1, 'is required').max(120),
  phone: z.string().trim().max(40).regex(/^[+()0-9 .-]*$/, 'may hold only digits, spaces and + ( ) . -').nullish(),
  email: lineText().trim().toLowerCase().max(254).pipe(z.email({ message: 'must be an e-mail address' })).nullish().or(z.literal('').transform(() => null)),
  address: multiLineText().trim().max(300).nullish(),
});

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'must be a date, YYYY-MM-DD').refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)), 'must be a real date');

/** A whole intake as submitted from the phone: who, how, where, the piano, its measurements and photos. */
export const intakeInput = z
  .object({
    seller: sellerInput,
    acquisition: z.enum(ACQUISITIONS, { message: `must be one of ${ACQUISITIONS.join(', ')}` }),
    receivedOn: isoDate,
    inspectedAt: z.enum(INSPECTION_PLACES, { message: `must be one of ${INSPECTION_PLACES.join(', ')}` }),
    piano: intakePianoInput,
    notes: multiLineText().trim().max(2000).nullish(),
    measurements: measurementsInput,
    photoIds: z.array(z.number().int().positive()).max(60).default([]),
    /** Play-test recordings made during the intake: they join the assessment on submit. */
    recordingIds: z.array(z.number().int().positive()).max(20).default([]),
    /** A piano already in stock in stage received (logged before its inspection): assess it instead of adding one. */
    pianoId: z.number().int().positive().optional(),
    /** The earlier record with the same maker, model and serial: intake staff say it is the same piano coming back. */
    samePianoAs: z.number().int().positive().optional(),
  })
  .strict();
export type IntakeInput = z.infer<typeof intakeInput>;

export const correctionInput = z
  .object({
    pianoId: z.number().int().positive(),
    measurements: measurementsInput,
    changeNote: multiLineText().trim().min(1, 'is required: say why the assessment changes').max(500),
    photoIds: z.array(z.number().int().positive()).max(60).default([]),
    recordingIds: z.array(z.number().int().positive()).max(20).default([]),
    /** The version the correction was made from: a newer one saved meanwhile is not overwritten unseen. */
    baseVersion: z.number().int().positive().optional(),
  })
  .strict();

/** Re-measurements after workshop work: only the fields measured again; the rest carry over. */
export const remeasureInput = z
  .object({
    pianoId: z.number().int().positive(),
    measurements: measurementsInput,
    changeNote: multiLineText().trim().max(500).nullish(),
  })
  .strict();

/** A piano already on record with the same maker, model and serial number: what the server answers, the screen shows. */
export interface SamePiano {
  id: number;
  stockNumber: string;
  stage: string;
  maker: string;
  model: string | null;
  serialNumber: string | null;
  createdAt: string;
}
