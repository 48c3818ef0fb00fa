// The intake form's draft: what was typed (as typed), where the user is, and how it becomes the submitted input.
import { ACQUISITIONS, INSPECTION_PLACES, correctionInput, intakeInput } from '@/modules/assessment/core/intake-input';
import {
  inchesToMm,
  measurementsInput,
  mmToInches,
  type BASS_WINDING,
  type FELT_LEFT,
  type FELT_STATES,
  type KEYTOP_DAMAGE,
  type Measurements,
  type STEEL_CORROSION,
  type TUNING_PINS,
} from '@/modules/assessment/core/measurements';
import { FIELD_AREAS, type MeasureField } from '@/modules/assessment/core/grade';
import type { PhotoArea } from '@/modules/photos/core/photo-rules';
import type { CaseCondition, PianoFacts, PianoKind } from '@/modules/pianos/core/piano';
import type { PlayTestFill } from '@/modules/tone/core/keyboard-report';

import { labelForPath } from './measure-labels';

export type Acquisition = (typeof ACQUISITIONS)[number];
export type InspectionPlace = (typeof INSPECTION_PLACES)[number];
type Rating = 1 | 2 | 3 | 4 | 5;

export const STEP_KEYS = ['piano', 'keys', 'hammers', 'strings', 'soundboard', 'play', 'photos', 'review'] as const;
export type StepKey = (typeof STEP_KEYS)[number];
export const STEP_TITLES: Record<StepKey, string> = {
  piano: 'Piano and seller',
  keys: 'Keys',
  hammers: 'Hammers',
  strings: 'Strings',
  soundboard: 'Soundboard',
  play: 'Play and pitch',
  photos: 'Photos',
  review: 'Review',
};

export type DraftMode = 'intake' | 'correction';
/** A correction changes the measurements only: the piano and the seller are on record already. */
export function stepsFor(mode: DraftMode): readonly StepKey[] {
  return mode === 'intake' ? STEP_KEYS : STEP_KEYS.filter((s) => s !== 'piano');
}

/** Lengths are stored metric; the user may type them in inches instead. */
export type UnitSystem = 'metric' | 'inches';

export interface CrackDraft {
  /** a local id so the list keeps its rows apart while cracks are added and removed */
  id: string;
  lengthCm: string;
  widestGapMm: string;
  crossesRib: boolean;
  buzzes: boolean;
  hurtsTuning: boolean;
  note: string;
}

export interface MeasureDraft {
  keySidePlayMm: string;
  keyTouchesNeighbour: boolean | null;
  /** the keys that touch a neighbour, as typed: "23, 24, 61" */
  keysTouchingNeighbour: string;
  keyLevelDeviationMm: string;
  keytopDamage: (typeof KEYTOP_DAMAGE)[number][];
  stickingKeys: string;
  deadKeys: string;
  hammerGrooveDepthMm: string;
  hammerFelt: (typeof FELT_STATES)[number] | null;
  hammerFeltLeft: (typeof FELT_LEFT)[number] | null;
  steelCorrosion: (typeof STEEL_CORROSION)[number] | null;
  bassWinding: (typeof BASS_WINDING)[number] | null;
  brokenStrings: string;
  soundboardCracks: CrackDraft[];
  ribsSeparated: boolean | null;
  a4Hz: string;
  tuningPins: (typeof TUNING_PINS)[number] | null;
  bassEvenness: Rating | null;
  middleEvenness: Rating | null;
  trebleEvenness: Rating | null;
  dynamicRange: Rating | null;
  overallImpression: Rating | null;
  notesStickingOut: string;
}

export interface PianoDraft {
  maker: string;
  model: string;
  serialNumber: string;
  kind: PianoKind | null;
  sizeCm: string;
  yearMode: 'year' | 'range';
  year: string;
  yearIsEstimate: boolean;
  yearFrom: string;
  yearTo: string;
  finish: string;
  caseCondition: CaseCondition | null;
  caseNotes: string;
}

export interface DraftPhoto {
  id: number;
  area: PhotoArea;
  caption: string | null;
  url: string;
  contentType: string;
  bytes: number;
}

export interface AssessmentDraft {
  format: 1;
  mode: DraftMode;
  /** 16-64 letters, digits or dashes: ties draft photos to this draft on the server */
  draftKey: string;
  step: StepKey;
  /** the furthest step reached, by index in the mode's steps: the indicator may jump up to it */
  furthest: number;
  units: UnitSystem;
  seller: { name: string; phone: string; email: string; address: string };
  acquisition: Acquisition | null;
  receivedOn: string;
  inspectedAt: InspectionPlace | null;
  piano: PianoDraft;
  notes: string;
  measurements: MeasureDraft;
  photos: DraftPhoto[];
  /** play-test recordings made for this draft (by its draft key): they join the assessment on submit */
  recordingIds: number[];
  /** which piano: the one corrected, or one logged before its inspection that this intake assesses; null for a new trade-in */
  pianoId: number | null;
  /** correction only: the version the form started from */
  baseVersion: number | null;
  /** an earlier record of the same maker, model and serial, confirmed as the same piano coming back */
  samePianoAs: number | null;
  changeNote: string;
  /** submit was pressed while offline: send as soon as the connection is back */
  pendingSubmit: boolean;
  /** ISO time of the last change, for "saved at" */
  changedAt: string | null;
}

export const EMPTY_MEASUREMENTS: MeasureDraft = {
  keySidePlayMm: '',
  keyTouchesNeighbour: null,
  keysTouchingNeighbour: '',
  keyLevelDeviationMm: '',
  keytopDamage: [],
  stickingKeys: '',
  deadKeys: '',
  hammerGrooveDepthMm: '',
  hammerFelt: null,
  hammerFeltLeft: null,
  steelCorrosion: null,
  bassWinding: null,
  brokenStrings: '',
  soundboardCracks: [],
  ribsSeparated: null,
  a4Hz: '',
  tuningPins: null,
  bassEvenness: null,
  middleEvenness: null,
  trebleEvenness: null,
  dynamicRange: null,
  overallImpression: null,
  notesStickingOut: '',
};

const KEY_CHARS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

/** A random draft key of 32 letters and digits. */
export function newDraftKey(): string {
  const bytes = new Uint8Array(32);
  if (typeof crypto !== 'undefined' && typeof crypto.getRandomValues === 'function') crypto.getRandomValues(bytes);
  else for (let i = 0; i < bytes.length; i++) bytes[i] = Math.floor(Math.random() * 256);
  return Array.from(bytes, (b) => KEY_CHARS[b % KEY_CHARS.length]).join('');
}

export function localDate(now: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

export function newIntakeDraft(now: Date): AssessmentDraft {
  return {
    format: 1,
    mode: 'intake',
    draftKey: newDraftKey(),
    step: 'piano',
    furthest: 0,
    units: 'metric',
    seller: { name: '', phone: '', email: '', address: '' },
    acquisition: null,
    receivedOn: localDate(now),
    inspectedAt: null,
    piano: {
      maker: '',
      model: '',
      serialNumber: '',
      kind: null,
      sizeCm: '',
      yearMode: 'year',
      year: '',
      yearIsEstimate: false,
      yearFrom: '',
      yearTo: '',
      finish: '',
      caseCondition: null,
      caseNotes: '',
    },
    notes: '',
    measurements: EMPTY_MEASUREMENTS,
    photos: [],
    recordingIds: [],
    pianoId: null,
    baseVersion: null,
    samePianoAs: null,
    changeNote: '',
    pendingSubmit: false,
    changedAt: null,
  };
}

/** A piano as the stock record holds it: what an intake of a piano already in stock starts from. */
export interface PianoOnRecord extends Omit<PianoFacts, 'stockNumber'> {
  id: number;
  createdAt: string;
}

/** The piano fields filled from the record: the inspection checks them rather than typing them again. */
export function pianoDraftFrom(p: PianoOnRecord): PianoDraft {
  const range = p.yearFrom != null && p.yearTo != null;
  return {
    maker: p.maker,
    model: p.model ?? '',
    serialNumber: p.serialNumber ?? '',
    kind: p.kind,
    sizeCm: p.sizeCm == null ? '' : String(p.sizeCm),
    yearMode: range ? 'range' : 'year',
    year: range || p.year == null ? '' : String(p.year),
    yearIsEstimate: !range && p.yearIsEstimate,
    yearFrom: range ? String(p.yearFrom) : '',
    yearTo: range ? String(p.yearTo) : '',
    finish: p.finish ?? '',
    caseCondition: p.caseCondition,
    caseNotes: p.caseNotes ?? '',
  };
}

/** An intake of a piano logged before its inspection: tied to it, its details filled in, received the day it was logged. */
export function newPianoIntakeDraft(now: Date, piano: PianoOnRecord): AssessmentDraft {
  return { ...newIntakeDraft(now), pianoId: piano.id, piano: pianoDraftFrom(piano), receivedOn: localDate(new Date(piano.createdAt)) };
}

let crackSeq = 0;
export function newCrack(): CrackDraft {
  crackSeq += 1;
  return { id: `c${Date.now().toString(36)}${crackSeq}`, lengthCm: '', widestGapMm: '', crossesRib: false, buzzes: false, hurtsTuning: false, note: '' };
}

const numText = (n: number | null | undefined) => (n == null ? '' : String(n));
const keysText = (keys: number[] | null | undefined) => (keys?.length ? keys.join(', ') : '');

/** The form for a correction: the measurements of the latest version, as text the fields can edit. */
export function measureDraftFrom(m: Measurements): MeasureDraft {
  return {
    keySidePlayMm: numText(m.keySidePlayMm),
    keyTouchesNeighbour: m.keyTouchesNeighbour ?? null,
    keysTouchingNeighbour: keysText(m.keysTouchingNeighbour),
    keyLevelDeviationMm: numText(m.keyLevelDeviationMm),
    keytopDamage: m.keytopDamage ?? [],
    stickingKeys: keysText(m.stickingKeys),
    deadKeys: keysText(m.deadKeys),
    hammerGrooveDepthMm: numText(m.hammerGrooveDepthMm),
    hammerFelt: m.hammerFelt ?? null,
    hammerFeltLeft: m.hammerFeltLeft ?? null,
    steelCorrosion: m.steelCorrosion ?? null,
    bassWinding: m.bassWinding ?? null,
    brokenStrings: numText(m.brokenStrings),
    soundboardCracks: (m.soundboardCracks ?? []).map((c) => ({
      ...newCrack(),
      lengthCm: numText(c.lengthCm),
      widestGapMm: numText(c.widestGapMm),
      crossesRib: c.crossesRib,
      buzzes: c.buzzes,
      hurtsTuning: c.hurtsTuning,
      note: c.note ?? '',
    })),
    ribsSeparated: m.ribsSeparated ?? null,
    a4Hz: numText(m.a4Hz),
    tuningPins: m.tuningPins ?? null,
    bassEvenness: (m.bassEvenness as Rating | null | undefined) ?? null,
    middleEvenness: (m.middleEvenness as Rating | null | undefined) ?? null,
    trebleEvenness: (m.trebleEvenness as Rating | null | undefined) ?? null,
    dynamicRange: (m.dynamicRange as Rating | null | undefined) ?? null,
    overallImpression: (m.overallImpression as Rating | null | undefined) ?? null,
    notesStickingOut: keysText(m.notesStickingOut),
  };
}

export function newCorrectionDraft(pianoId: number, baseVersion: number, m: Measurements): AssessmentDraft {
  return { ...newIntakeDraft(new Date(0)), mode: 'correction', step: 'keys', pianoId, baseVersion, measurements: measureDraftFrom(m) };
}

/** The play-test fields as measured from a recording (after the user confirms): only what it measured is replaced. */
export function fillFromRecording(m: MeasureDraft, fill: PlayTestFill): MeasureDraft {
  const rating = (r: number | null, was: Rating | null) => (r != null ? (r as Rating) : was);
  return {
    ...m,
    a4Hz: fill.a4Hz != null ? fill.a4Hz.toFixed(1) : m.a4Hz,
    bassEvenness: rating(fill.bassEvenness, m.bassEvenness),
    middleEvenness: rating(fill.middleEvenness, m.middleEvenness),
    trebleEvenness: rating(fill.trebleEvenness, m.trebleEvenness),
    notesStickingOut: fill.notesStickingOut.join(', '),
  };
}

// ---- numbers as typed ----

const BAD = Symbol('bad');
type Parsed = number | null | typeof BAD;

/** A decimal as typed on a phone: "2.4" or "2,4"; empty is null. */
export function parseDecimal(text: string): Parsed {
  const t = text.trim().replace(',', '.');
  if (!t) return null;
  if (!/^-?(\d+(\.\d*)?|\.\d+)$/.test(t)) return BAD;
  return Number(t);
}

function parseWhole(text: string): Parsed {
  const t = text.trim();
  if (!t) return null;
  return /^\d+$/.test(t) ? Number(t) : BAD;
}

/** Key numbers typed as "12, 40, 41": commas, spaces or dots between them (a phone's number pad may have only a dot). */
export function parseKeyList(text: string): number[] | null | typeof BAD {
  const parts = text.split(/[\s,;.]+/).filter(Boolean);
  if (!parts.length) return null;
  if (!parts.every((p) => /^\d+$/.test(p))) return BAD;
  return parts.map(Number);
}

const round = (n: number, digits: number) => Number(n.toFixed(digits));

/** Metric text to the inches shown while typing in inches. */
export function metricToInchesText(metric: string, unit: 'mm' | 'cm'): string {
  const v = parseDecimal(metric);
  if (v === null) return '';
  if (v === BAD) return metric;
  return String(round(mmToInches(unit === 'cm' ? v * 10 : v), 3));
}

/** Inches as typed back to the stored metric text; text that is not a number is kept as typed so it is flagged. */
export function inchesTextToMetric(inches: string, unit: 'mm' | 'cm'): string {
  const v = parseDecimal(inches);
  if (v === null) return '';
  if (v === BAD) return inches;
  const mm = inchesToMm(v);
  return String(unit === 'cm' ? round(mm / 10, 1) : round(mm, 2));
}

// ---- from the draft to the input ----

/** Problems by input path (`seller.name`, `measurements.keySidePlayMm`, `measurements.soundboardCracks.0.widestGapMm`). */
export type FieldErrors = Record<string, string>;

const NOT_A_NUMBER = 'must be a number, such as 2.5';
const NOT_WHOLE = 'must be a whole number';
const NOT_KEYS = 'must list key numbers from 1 to 88, separated by commas';
const NOTHING_MEASURED = 'has nothing measured yet: measure at least one area before submitting';

function put(raw: Record<string, unknown>, errors: FieldErrors, path: string, key: string, value: Parsed | number[] | typeof BAD, bad: string) {
  if (value === BAD) errors[path] = bad;
  else if (value !== null) raw[key] = value;
}

/** The measurements as the server takes them, with the fields that do not parse named. */
export function measurementsFromDraft(m: MeasureDraft): { raw: Record<string, unknown>; errors: FieldErrors } {
  const raw: Record<string, unknown> = {};
  const errors: FieldErrors = {};
  const p = (field: keyof MeasureDraft) => `measurements.${field}`;
  put(raw, errors, p('keySidePlayMm'), 'keySidePlayMm', parseDecimal(m.keySidePlayMm), NOT_A_NUMBER);
  if (m.keyTouchesNeighbour != null) raw.keyTouchesNeighbour = m.keyTouchesNeighbour;
  // The keys go with a yes only: answering no afterwards leaves them typed but not sent.
  if (m.keyTouchesNeighbour) put(raw, errors, p('keysTouchingNeighbour'), 'keysTouchingNeighbour', parseKeyList(m.keysTouchingNeighbour), NOT_KEYS);
  put(raw, errors, p('keyLevelDeviationMm'), 'keyLevelDeviationMm', parseDecimal(m.keyLevelDeviationMm), NOT_A_NUMBER);
  if (m.keytopDamage.length) raw.keytopDamage = m.keytopDamage;
  put(raw, errors, p('stickingKeys'), 'stickingKeys', parseKeyList(m.stickingKeys), NOT_KEYS);
  put(raw, errors, p('deadKeys'), 'deadKeys', parseKeyList(m.deadKeys), NOT_KEYS);
  put(raw, errors, p('hammerGrooveDepthMm'), 'hammerGrooveDepthMm', parseDecimal(m.hammerGrooveDepthMm), NOT_A_NUMBER);
  if (m.hammerFelt) raw.hammerFelt = m.hammerFelt;
  if (m.hammerFeltLeft) raw.hammerFeltLeft = m.hammerFeltLeft;
  if (m.steelCorrosion) raw.steelCorrosion = m.steelCorrosion;
  if (m.bassWinding) raw.bassWinding = m.bassWinding;
  put(raw, errors, p('brokenStrings'), 'brokenStrings', parseWhole(m.brokenStrings), NOT_WHOLE);
  if (m.soundboardCracks.length) {
    raw.soundboardCracks = m.soundboardCracks.map((c, i) => {
      const crack: Record<string, unknown> = { crossesRib: c.crossesRib, buzzes: c.buzzes, hurtsTuning: c.hurtsTuning };
      const length = parseDecimal(c.lengthCm);
      const gap = parseDecimal(c.widestGapMm);
      const at = `measurements.soundboardCracks.${i}`;
      if (length === null) errors[`${at}.lengthCm`] = 'is needed for each crack';
      put(crack, errors, `${at}.lengthCm`, 'lengthCm', length, NOT_A_NUMBER);
      if (gap === null) errors[`${at}.widestGapMm`] = 'is needed for each crack';
      put(crack, errors, `${at}.widestGapMm`, 'widestGapMm', gap, NOT_A_NUMBER);
      if (c.note.trim()) crack.note = c.note.trim();
      return crack;
    });
  }
  if (m.ribsSeparated != null) raw.ribsSeparated = m.ribsSeparated;
  put(raw, errors, p('a4Hz'), 'a4Hz', parseDecimal(m.a4Hz), NOT_A_NUMBER);
  if (m.tuningPins) raw.tuningPins = m.tuningPins;
  for (const r of ['bassEvenness', 'middleEvenness', 'trebleEvenness', 'dynamicRange', 'overallImpression'] as const) {
    if (m[r] != null) raw[r] = m[r];
  }
  put(raw, errors, p('notesStickingOut'), 'notesStickingOut', parseKeyList(m.notesStickingOut), NOT_KEYS);
  return { raw, errors };
}

const text = (t: string) => (t.trim() ? t.trim() : undefined);

/** A date typed on a number pad: "20261130" or "2026 11 30" becomes "2026-11-30"; anything else stays as typed. */
export function normalizeDate(typed: string): string {
  const t = typed.trim();
  const digits = t.replace(/\D/g, '');
  if (digits.length === 8 && /^[\d\s./-]+$/.test(t)) return `${digits.slice(0, 4)}-${digits.slice(4, 6)}-${digits.slice(6)}`;
  return t;
}

function pianoFromDraft(d: PianoDraft, errors: FieldErrors): Record<string, unknown> {
  const raw: Record<string, unknown> = { maker: d.maker, kind: d.kind ?? undefined };
  const set = (key: string, value: unknown) => {
    if (value !== undefined && value !== null) raw[key] = value;
  };
  set('model', text(d.model));
  set('serialNumber', text(d.serialNumber));
  const size = parseDecimal(d.sizeCm);
  if (size === BAD) errors['piano.sizeCm'] = NOT_A_NUMBER;
  else set('sizeCm', size === null ? null : Math.round(size));
  if (d.yearMode === 'year') {
    const year = parseWhole(d.year);
    if (year === BAD) errors['piano.year'] = 'must be a whole year, such as 1986';
    else set('year', year);
    if (year !== null && year !== BAD) raw.yearIsEstimate = d.yearIsEstimate;
  } else {
    const from = parseWhole(d.yearFrom);
    const to = parseWhole(d.yearTo);
    if (from === BAD) errors['piano.yearFrom'] = 'must be a whole year, such as 1978';
    else set('yearFrom', from);
    if (to === BAD) errors['piano.yearTo'] = 'must be a whole year, such as 1984';
    else set('yearTo', to);
    if ((from === null) !== (to === null)) errors[from === null ? 'piano.yearFrom' : 'piano.yearTo'] = 'is needed for a range: give both years';
    if (from !== null || to !== null) raw.yearIsEstimate = true;
  }
  set('finish', text(d.finish));
  set('caseCondition', d.caseCondition);
  set('caseNotes', text(d.caseNotes));
  return raw;
}

interface ZodIssueLike {
  path: PropertyKey[];
  message: string;
}

/** The input path an issue belongs to; items of a key list belong to the list. */
function issuePath(path: PropertyKey[]): string {
  const parts = path.map(String);
  if (parts[0] === 'measurements' && parts[1] !== 'soundboardCracks') return parts.slice(0, 2).join('.');
  if (parts[0] === 'photoIds') return 'photoIds';
  return parts.join('.');
}

function addIssues(errors: FieldErrors, issues: readonly ZodIssueLike[]) {
  for (const issue of issues) {
    const path = issuePath(issue.path);
    errors[path] ??= issue.message;
  }
}

/** "Key side play must be at most 10 mm": a field's problem in a sentence. */
export function sentence(path: string, problem: string): string {
  return `${labelForPath(path)} ${problem}`;
}

export type BuildResult = { ok: true; input: Record<string, unknown> } | { ok: false; errors: FieldErrors };

/** The whole intake as submitIntake takes it, checked with the same schema the server uses. */
export function buildIntakeInput(d: AssessmentDraft): BuildResult {
  const errors: FieldErrors = {};
  const measurements = measurementsFromDraft(d.measurements);
  Object.assign(errors, measurements.errors);
  const seller: Record<string, unknown> = { name: d.seller.name };
  if (text(d.seller.phone)) seller.phone = text(d.seller.phone);
  if (text(d.seller.email)) seller.email = text(d.seller.email);
  if (text(d.seller.address)) seller.address = text(d.seller.address);
  const input: Record<string, unknown> = {
    seller,
    acquisition: d.acquisition ?? undefined,
    receivedOn: normalizeDate(d.receivedOn),
    inspectedAt: d.inspectedAt ?? undefined,
    piano: pianoFromDraft(d.piano, errors),
    measurements: measurements.raw,
    photoIds: d.photos.map((p) => p.id),
    recordingIds: d.recordingIds,
  };
  if (text(d.notes)) input.notes = text(d.notes);
  if (d.pianoId != null) input.pianoId = d.pianoId;
  if (d.samePianoAs != null) input.samePianoAs = d.samePianoAs;
  const parsed = intakeInput.safeParse(input);
  if (!parsed.success) addIssues(errors, parsed.error.issues);
  if (!Object.keys(measurements.raw).length && !Object.keys(measurements.errors).length) errors.measurements = NOTHING_MEASURED;
  // A question left unanswered reads better than the schema's list of allowed values.
  if (!d.acquisition) errors.acquisition = 'is needed: pick one';
  if (!d.inspectedAt) errors.inspectedAt = 'is needed: pick one';
  if (!d.piano.kind) errors['piano.kind'] = 'is needed: upright or grand';
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, input };
}

/** A correction as correctAssessment takes it. */
export function buildCorrectionInput(d: AssessmentDraft): BuildResult {
  const errors: FieldErrors = {};
  const measurements = measurementsFromDraft(d.measurements);
  Object.assign(errors, measurements.errors);
  const input = {
    pianoId: d.pianoId,
    measurements: measurements.raw,
    changeNote: d.changeNote.trim(),
    photoIds: d.photos.map((p) => p.id),
    recordingIds: d.recordingIds,
    ...(d.baseVersion != null ? { baseVersion: d.baseVersion } : {}),
  };
  const parsed = correctionInput.safeParse(input);
  if (!parsed.success) addIssues(errors, parsed.error.issues);
  if (!Object.keys(measurements.raw).length && !Object.keys(measurements.errors).length) errors.measurements = NOTHING_MEASURED;
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, input };
}

export function buildInput(d: AssessmentDraft): BuildResult {
  return d.mode === 'intake' ? buildIntakeInput(d) : buildCorrectionInput(d);
}

/** The measurements that are valid so far, for the live grade: a field with a problem is left out until it is fixed. */
export function liveMeasurements(m: MeasureDraft): Measurements {
  const { raw } = measurementsFromDraft(m);
  for (let attempt = 0; attempt < 30; attempt++) {
    const parsed = measurementsInput.safeParse(raw);
    if (parsed.success) return parsed.data;
    for (const issue of parsed.error.issues) {
      const [field, index] = issue.path;
      // Keys that touch a neighbour and the yes they go with stand or fall together.
      if (field === 'keysTouchingNeighbour') delete raw.keyTouchesNeighbour;
      if (field === 'soundboardCracks' && typeof index === 'number') {
        const cracks = raw.soundboardCracks as unknown[];
        cracks.splice(index, 1);
        if (!cracks.length) delete raw.soundboardCracks;
        break;
      }
      delete raw[String(field)];
    }
  }
  return {};
}

/** Which step shows the field at an input path. */
export function stepOfPath(path: string): StepKey {
  const [head, field] = path.split('.');
  if (head === 'photoIds') return 'photos';
  if (head === 'changeNote') return 'review';
  if (head !== 'measurements') return 'piano';
  if (!field) return 'review';
  const area = FIELD_AREAS[field as MeasureField];
  return area === 'tuning' || area === 'play' || !area ? 'play' : area;
}

export function errorsOfStep(errors: FieldErrors, step: StepKey): FieldErrors {
  return Object.fromEntries(Object.entries(errors).filter(([path]) => stepOfPath(path) === step));
}

// ---- keeping the draft on the device ----

export function draftStorageKey(userId: number, mode: DraftMode, pianoId?: number | null): string {
  return mode === 'intake' ? `feltwire.intake-draft.${userId}` : `feltwire.correction-draft.${userId}.${pianoId}`;
}

function storage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

/** A stored draft, or null when there is none or it is not one this version of the form can read. */
export function readDraft(key: string): AssessmentDraft | null {
  const raw = storage()?.getItem(key);
  if (!raw) return null;
  try {
    const d = JSON.parse(raw) as AssessmentDraft;
    if (d?.format !== 1 || typeof d.draftKey !== 'string' || !/^[A-Za-z0-9-]{16,64}$/.test(d.draftKey) || !STEP_KEYS.includes(d.step)) return null;
    // Fields added to the form later start empty in an older draft.
    return { ...newIntakeDraft(new Date()), ...d, measurements: { ...EMPTY_MEASUREMENTS, ...d.measurements } };
  } catch {
    return null;
  }
}

export function writeDraft(key: string, draft: AssessmentDraft | null): void {
  const store = storage();
  if (!store) return;
  try {
    if (draft) store.setItem(key, JSON.stringify(draft));
    else store.removeItem(key);
  } catch {
    // A full storage keeps the draft in memory only; the page says nothing it cannot keep.
  }
}
