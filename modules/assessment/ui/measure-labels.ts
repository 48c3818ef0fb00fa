// Words for every measurement: field labels, answer labels and how a stored value reads back.
import type { CaseCondition, PianoKind } from '@/modules/pianos/core/piano';
import { CRACK_FIELDS, MEASURE_BY_KEY, MEASURES, type BASS_WINDING, type FELT_LEFT, type FELT_STATES, type KEYTOP_DAMAGE, type Measurements, type STEEL_CORROSION, type TUNING_PINS } from '@/modules/assessment/core/measurements';

export const KIND_LABELS: Record<PianoKind, string> = { upright: 'Upright', grand: 'Grand' };
export const CASE_CONDITION_LABELS: Record<CaseCondition, string> = { excellent: 'Excellent', good: 'Good', worn: 'Worn', damaged: 'Damaged' };

// The answers' words come from the measurement's own description in core.
const optionWords = <K extends 'keytopDamage' | 'hammerFelt' | 'hammerFeltLeft' | 'steelCorrosion' | 'bassWinding' | 'tuningPins'>(key: K) =>
  Object.fromEntries(MEASURE_BY_KEY[key].options.map((o) => [o.value, o.label]));
export const KEYTOP_DAMAGE_LABELS = optionWords('keytopDamage') as Record<(typeof KEYTOP_DAMAGE)[number], string>;
export const FELT_STATE_LABELS = optionWords('hammerFelt') as Record<(typeof FELT_STATES)[number], string>;
export const FELT_LEFT_LABELS = optionWords('hammerFeltLeft') as Record<(typeof FELT_LEFT)[number], string>;
export const STEEL_CORROSION_LABELS = optionWords('steelCorrosion') as Record<(typeof STEEL_CORROSION)[number], string>;
export const BASS_WINDING_LABELS = optionWords('bassWinding') as Record<(typeof BASS_WINDING)[number], string>;
export const TUNING_PIN_LABELS = optionWords('tuningPins') as Record<(typeof TUNING_PINS)[number], string>;
export const YES_NO = ['yes', 'no'] as const;
export const YES_NO_LABELS: Record<(typeof YES_NO)[number], string> = { yes: 'Yes', no: 'No' };
export const RATINGS = ['1', '2', '3', '4', '5'] as const;
export const RATING_LABELS: Record<(typeof RATINGS)[number], string> = { 1: '1', 2: '2', 3: '3', 4: '4', 5: '5' };

export type MeasureField = keyof Measurements;

/** What each measurement is called on screen, in the history and in error messages. */
export const MEASURE_LABELS = Object.fromEntries(MEASURES.map((m) => [m.key, m.label])) as Record<MeasureField, string>;

const CRACK_LABELS: Record<string, string> = Object.fromEntries(Object.entries(CRACK_FIELDS).map(([k, f]) => [k, f.label]));

const INPUT_LABELS: Record<string, string> = {
  'seller.name': 'Seller name',
  'seller.phone': 'Phone',
  'seller.email': 'E-mail',
  'seller.address': 'Address',
  acquisition: 'Acquisition',
  receivedOn: 'Date received',
  inspectedAt: 'Where inspected',
  'piano.maker': 'Maker',
  'piano.model': 'Model',
  'piano.serialNumber': 'Serial number',
  'piano.year': 'Year',
  'piano.yearIsEstimate': 'Year is an estimate',
  'piano.yearFrom': 'Year from',
  'piano.yearTo': 'Year to',
  'piano.kind': 'Kind',
  'piano.sizeCm': 'Size',
  'piano.finish': 'Finish',
  'piano.caseCondition': 'Case condition',
  'piano.caseNotes': 'Case notes',
  notes: 'Internal notes',
  photoIds: 'Photos',
  changeNote: 'Reason for the correction',
  samePianoAs: 'The same piano taken in before',
  measurements: 'The inspection',
};

/** The words for an input path such as `measurements.keySidePlayMm` or `measurements.soundboardCracks.0.widestGapMm`. */
export function labelForPath(path: string): string {
  const parts = path.split('.');
  if (parts[0] === 'measurements' && parts.length > 1) {
    if (parts[1] === 'soundboardCracks' && parts.length >= 4) return `Crack ${Number(parts[2]) + 1}: ${CRACK_LABELS[parts[3]] ?? parts[3]}`;
    return MEASURE_LABELS[parts[1] as MeasureField] ?? parts[1];
  }
  return INPUT_LABELS[path] ?? path;
}

const MM_FIELDS = new Set<string>(['keySidePlayMm', 'keyLevelDeviationMm', 'hammerGrooveDepthMm']);
const RATING_FIELDS = new Set<string>(['bassEvenness', 'middleEvenness', 'trebleEvenness', 'dynamicRange', 'overallImpression']);
const ENUM_LABELS: Partial<Record<MeasureField, Record<string, string>>> = {
  hammerFelt: FELT_STATE_LABELS,
  hammerFeltLeft: FELT_LEFT_LABELS,
  steelCorrosion: STEEL_CORROSION_LABELS,
  bassWinding: BASS_WINDING_LABELS,
  tuningPins: TUNING_PIN_LABELS,
};

const num = (n: number, digits = 2) => String(Number(n.toFixed(digits)));

interface CrackLike {
  lengthCm?: number;
  widestGapMm?: number;
  crossesRib?: boolean;
  buzzes?: boolean;
  hurtsTuning?: boolean;
  note?: string | null;
}

export function describeCrack(c: CrackLike): string {
  const effects = [c.crossesRib ? 'crosses a rib' : '', c.buzzes ? 'buzzes' : '', c.hurtsTuning ? 'affects tuning' : ''].filter(Boolean);
  const size = `${c.lengthCm != null ? num(c.lengthCm, 1) : '?'} cm long, ${c.widestGapMm != null ? num(c.widestGapMm) : '?'} mm wide`;
  return [size, effects.length ? effects.join(', ') : 'no rib, buzz or tuning effect', c.note ? `“${c.note}”` : ''].filter(Boolean).join('; ');
}

/** A stored measurement as a person reads it, with its unit: "2.4 mm", "4 of 5", "keys 12, 40". */
export function formatMeasure(field: string, value: unknown): string {
  if (value == null || (Array.isArray(value) && value.length === 0)) return field === 'soundboardCracks' ? 'none' : 'not noted';
  if (MM_FIELDS.has(field) && typeof value === 'number') return `${num(value)} mm`;
  if (field === 'a4Hz' && typeof value === 'number') return `${num(value, 1)} Hz`;
  if (RATING_FIELDS.has(field) && typeof value === 'number') return `${value} of 5`;
  if (field === 'brokenStrings' && typeof value === 'number') return value === 1 ? '1 string' : `${value} strings`;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (field === 'keytopDamage' && Array.isArray(value)) return value.map((v) => KEYTOP_DAMAGE_LABELS[v as keyof typeof KEYTOP_DAMAGE_LABELS]?.toLowerCase() ?? String(v)).join(', ');
  if (field === 'soundboardCracks' && Array.isArray(value)) return value.map((c, i) => `crack ${i + 1}: ${describeCrack(c as CrackLike)}`).join(' · ');
  if (Array.isArray(value)) return `keys ${value.join(', ')}`;
  const labels = ENUM_LABELS[field as MeasureField];
  if (labels && typeof value === 'string') return labels[value]?.toLowerCase() ?? value;
  return String(value);
}
