import type { Knex } from 'knex';
import { UniqueViolationError } from 'objection';

import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { gradeAssessment, inspectedAreas, type Grade, type MeasureField } from '@/modules/assessment/core/grade';
import { completeRules, defaultRules, type GradeRules } from '@/modules/assessment/core/grade-rules';
import { correctionInput, intakeInput, remeasureInput, type SamePiano } from '@/modules/assessment/core/intake-input';
import { diffMeasurements } from '@/modules/assessment/core/measurement-diff';
import type { Measurements } from '@/modules/assessment/core/measurements';
import { gradeRulesInput, withVersion } from '@/modules/assessment/core/rules-input';
import { Photo } from '@/modules/photos/server/photo-model';
import { serialKey } from '@/modules/pianos/core/piano';
import { Piano } from '@/modules/pianos/server/piano-model';
import { movePiano, recordArrival } from '@/modules/pianos/server/stage-service';
import { attachRecordings } from '@/modules/tone/server/tone-attach';
import { nextVersion } from '@/server/db/versions';
import { AppError, badInput, notAllowed, notFound } from '@/server/errors';

import { Assessment, GradeRuleSet, Intake } from './assessment-models';

export async function currentRules(trx?: Knex.Transaction): Promise<GradeRules> {
  const latest = await GradeRuleSet.query(trx).orderBy('id', 'desc').first();
  return latest ? completeRules({ ...latest.rules, version: latest.version }) : defaultRules;
}

/** The rules in force, as a screen reads them. */
export async function gradeRulesInForce(actor: Actor): Promise<GradeRules> {
  if (!can(actor.role, 'readPianos')) throw notAllowed('read the grading rules');
  return currentRules();
}

/** The rules of each version named, as they were saved (completed with defaults for rules added since). */
async function rulesByVersion(trx: Knex.Transaction | undefined, versions: string[]): Promise<Map<string, GradeRules>> {
  const wanted = [...new Set(versions)].filter((v) => v !== defaultRules.version);
  const rows = wanted.length ? await GradeRuleSet.query(trx).whereIn('version', wanted) : [];
  const out = new Map<string, GradeRules>([[defaultRules.version, defaultRules]]);
  for (const r of rows) out.set(r.version, completeRules({ ...r.rules, version: r.version }));
  return out;
}

/**
 * An assessment as Feltwire reads it today. A grade stored in format 2 is the one given on submit;
 * an older one (score and bands) is graded again from its own measurements with the rules of its
 * own version, so nothing is claimed that those measurements do not support.
 */
export type GradedAssessment = Assessment & { grade: Grade };

export async function withCurrentGrades(rows: Assessment[], trx?: Knex.Transaction): Promise<GradedAssessment[]> {
  const old = rows.filter((r) => (r.grade as { format?: number } | null)?.format !== 2);
  const rules = old.length ? await rulesByVersion(trx, old.map((r) => r.rulesVersion)) : new Map<string, GradeRules>();
  for (const r of old) r.grade = gradeAssessment(r.measurements, rules.get(r.rulesVersion) ?? defaultRules);
  return rows as GradedAssessment[];
}

/** Every version of a piano's assessment, oldest first, graded as Feltwire reads them. */
export async function gradedAssessments(pianoId: number, trx?: Knex.Transaction): Promise<GradedAssessment[]> {
  return withCurrentGrades(await Assessment.query(trx).where('piano_id', pianoId).orderBy('version'), trx);
}

export async function latestGradedAssessment(pianoId: number, trx?: Knex.Transaction): Promise<GradedAssessment | null> {
  const row = await Assessment.query(trx).where('piano_id', pianoId).orderBy('version', 'desc').first();
  return row ? (await withCurrentGrades([row], trx))[0] : null;
}

/**
 * The fields a post-workshop version measured again: stored with it, or for rows from before that
 * was kept, the ones whose values changed (an unchanged value may not have been measured again).
 */
export function remeasuredFieldsOf(row: Assessment, before: Assessment | undefined): MeasureField[] {
  if (row.kind !== 'post_workshop') return [];
  if (row.remeasuredFields) return row.remeasuredFields as MeasureField[];
  return before ? (diffMeasurements(before.measurements, row.measurements).map((c) => c.field) as MeasureField[]) : [];
}

/** Records with the same maker, model and serial number: the same piano, taken in before. */
export async function samePianos(trx: Knex.Transaction | undefined, p: { maker: string; model?: string | null; serialNumber?: string | null }, exceptId?: number | null): Promise<SamePiano[]> {
  const serial = serialKey(p.serialNumber ?? '');
  if (!serial || !p.maker.trim()) return [];
  const q = Piano.query(trx)
    .whereRaw('lower(trim(maker)) = ?', [p.maker.trim().toLowerCase()])
    .whereRaw("lower(trim(coalesce(model, ''))) = ?", [(p.model ?? '').trim().toLowerCase()])
    .whereRaw("regexp_replace(lower(serial_number), '[^a-z0-9]', '', 'g') = ?", [serial])
    .orderBy('id');
  if (exceptId != null) q.whereNot('id', exceptId);
  const rows = await q;
  return rows.map((r) => ({ id: r.id, stockNumber: r.stockNumber, stage: r.stage, maker: r.maker, model: r.model, serialNumber: r.serialNumber, createdAt: r.createdAt }));
}

export async function findSamePianos(actor: Actor, raw: { maker?: unknown; model?: unknown; serialNumber?: unknown; exceptPianoId?: unknown }): Promise<SamePiano[]> {
  if (!can(actor.role, 'assess')) throw notAllowed('look up earlier intakes');
  const text = (v: unknown, field: string, max: number) => {
    if (v == null) return null;
    if (typeof v !== 'string' || v.length > max) throw badInput(field, `must be text of at most ${max} characters`);
    return v;
  };
  const except = raw.exceptPianoId == null ? null : Number(raw.exceptPianoId);
  return samePianos(undefined, { maker: text(raw.maker, 'maker', 80) ?? '', model: text(raw.model, 'model', 80), serialNumber: text(raw.serialNumber, 'serialNumber', 40) }, except);
}

export async function setGradeRules(actor: Actor, raw: unknown): Promise<GradeRules> {
  if (!can(actor.role, 'setGradeRules')) throw notAllowed('change the grading rules');
  const input = gradeRulesInput.parse(raw);
  return GradeRuleSet.transaction(async (trx) => {
    const rules = withVersion(input, await nextVersion(trx, GradeRuleSet.tableName, 'shop'));
    await GradeRuleSet.query(trx).insert({ version: rules.version, rules, createdById: actor.id });
    return rules;
  });
}

// Draft photos the same user uploaded become the piano's.
async function attachPhotos(trx: Knex.Transaction, actor: Actor, pianoId: number, photoIds: number[]): Promise<void> {
  if (!photoIds.length) return;
  const attached = await Photo.query(trx)
    .patch({ pianoId, draftKey: null })
    .whereIn('id', photoIds)
    .where('uploaded_by_id', actor.id)
    .where((q) => q.whereNull('piano_id').orWhere('piano_id', pianoId));
  if (attached !== new Set(photoIds).size) throw badInput('photoIds', 'holds a photo that is not one of your uploads for this piano');
}

export interface SubmittedIntake {
  pianoId: number;
  stockNumber: string;
  assessmentId: number;
  version: number;
  grade: ReturnType<typeof gradeAssessment>;
}

/** Records a whole intake in one transaction: the piano, where it came from, its graded inspection, its photos. */
export async function submitIntake(actor: Actor, raw: unknown): Promise<SubmittedIntake> {
  if (!can(actor.role, 'assess')) throw notAllowed('log intakes');
  const input = intakeInput.parse(raw);
  // An intake that measured nothing would move the piano on as if it had been inspected.
  if (!inspectedAreas(input.measurements).length) throw badInput('measurements', 'has nothing measured yet: measure at least one area before submitting');
  return Piano.transaction(async (trx) => {
    const same = await samePianos(trx, input.piano, input.pianoId);
    if (same.length && !same.some((s) => s.id === input.samePianoAs)) {
      const names = same.map((s) => s.stockNumber).join(', ');
      throw new AppError(
        'CONFLICT',
        `${names} ${same.length === 1 ? 'has' : 'have'} the same maker, model and serial number. If this is the same piano coming back, say so and submit again; otherwise check the serial number.`,
        'samePianoAs',
      );
    }
    if (input.samePianoAs != null && !same.some((s) => s.id === input.samePianoAs)) throw badInput('samePianoAs', 'is not a piano with the same maker, model and serial number');
    const rules = await currentRules(trx);
    const grade = gradeAssessment(input.measurements, rules);
    const p = input.piano;
    const details = {
      maker: p.maker,
      model: p.model ?? null,
      serialNumber: p.serialNumber ?? null,
      year: p.year ?? null,
      yearIsEstimate: p.yearIsEstimate,
      yearFrom: p.yearFrom ?? null,
      yearTo: p.yearTo ?? null,
      kind: p.kind,
      sizeCm: p.sizeCm ?? null,
      finish: p.finish ?? null,
      caseCondition: p.caseCondition ?? null,
      caseNotes: p.caseNotes ?? null,
    };
    let piano: Piano;
    let waiting: Intake | null = null;
    if (input.pianoId != null) {
      // A piano logged before its inspection: the intake completes its record.
      const existing = await Piano.query(trx).findById(input.pianoId).forUpdate();
      if (!existing) throw notFound(`piano ${input.pianoId}`);
      // A piano taken in trade at a sale has its intake waiting, uninspected: the inspection completes it.
      waiting = (await Intake.query(trx).findOne({ piano_id: existing.id })) ?? null;
      const assessed = waiting ? await Assessment.query(trx).where('piano_id', existing.id).resultSize() : 0;
      if (existing.stage !== 'received' || assessed) {
        throw new AppError('CONFLICT', `${existing.stockNumber} already has its intake: correct its assessment instead.`, 'pianoId');
      }
      piano = await existing.$query(trx).patchAndFetch(details);
    } else {
      piano = await Piano.query(trx).insertAndFetch({ ...details, createdById: actor.id });
      await recordArrival(trx, piano, actor.id, actor.role);
    }
    const intake = {
      sellerName: input.seller.name,
      sellerPhone: input.seller.phone ?? null,
      sellerEmail: input.seller.email ?? null,
      sellerAddress: input.seller.address ?? null,
      acquisition: input.acquisition,
      receivedOn: input.receivedOn,
      inspectedAt: input.inspectedAt,
      notes: input.notes ?? null,
      samePianoAsId: input.samePianoAs ?? null,
    };
    if (waiting) await waiting.$query(trx).patch(intake);
    else await Intake.query(trx).insert({ ...intake, pianoId: piano.id, createdById: actor.id });
    const assessment = await insertAssessment(trx, actor, piano.id, 1, input.measurements, grade, null);
    // The inspection is in: the piano moves on from received.
    await movePiano({ pianoId: piano.id, action: 'submit_assessment', by: actor.role, userId: actor.id }, trx);
    await attachPhotos(trx, actor, piano.id, input.photoIds);
    await attachRecordings(trx, actor, piano.id, assessment.id, input.recordingIds);
    return { pianoId: piano.id, stockNumber: piano.stockNumber, assessmentId: assessment.id, version: 1, grade };
  });
}

function insertAssessment(
  trx: Knex.Transaction,
  actor: Actor,
  pianoId: number,
  version: number,
  measurements: Measurements,
  grade: SubmittedIntake['grade'],
  changeNote: string | null,
  kind: Assessment['kind'] = 'intake',
  remeasuredFields: string[] | null = null,
) {
  return Assessment.query(trx).insertAndFetch({
    pianoId,
    version,
    kind,
    measurements,
    grade,
    remeasuredFields,
    referToTechnician: grade.referToTechnician,
    notRecommendedForRetail: grade.notRecommendedForRetail,
    rulesVersion: grade.rulesVersion,
    changeNote,
    submittedById: actor.id,
  });
}

/** A correction never edits a submitted assessment: it adds the next version, with the reason. */
export async function correctAssessment(actor: Actor, raw: unknown): Promise<SubmittedIntake> {
  if (!can(actor.role, 'assess')) throw notAllowed('correct assessments');
  const input = correctionInput.parse(raw);
  if (!inspectedAreas(input.measurements).length) throw badInput('measurements', 'has nothing measured: a correction keeps at least one measured area');
  try {
    return await Piano.transaction(async (trx) => {
      const piano = await Piano.query(trx).findById(input.pianoId);
      if (!piano) throw notFound(`piano ${input.pianoId}`);
      const latest = await Assessment.query(trx).where('piano_id', piano.id).orderBy('version', 'desc').first();
      if (!latest) throw notFound(`an assessment of piano ${piano.stockNumber}`);
      if (input.baseVersion != null && input.baseVersion !== latest.version) {
        throw new AppError('CONFLICT', `Version ${latest.version} was saved after the version ${input.baseVersion} you corrected: reload it and correct again.`, 'baseVersion');
      }
      const grade = gradeAssessment(input.measurements, await currentRules(trx));
      const version = latest.version + 1;
      const assessment = await insertAssessment(trx, actor, piano.id, version, input.measurements, grade, input.changeNote);
      await attachPhotos(trx, actor, piano.id, input.photoIds);
      await attachRecordings(trx, actor, piano.id, assessment.id, input.recordingIds);
      return { pianoId: piano.id, stockNumber: piano.stockNumber, assessmentId: assessment.id, version, grade };
    });
  } catch (err) {
    if (err instanceof UniqueViolationError) throw new AppError('CONFLICT', 'Someone else corrected this assessment at the same moment: reload and try again.');
    throw err;
  }
}

/** After workshop work: the areas measured again, over the latest assessment, graded as a post-workshop version. */
export async function submitRemeasurement(actor: Actor, raw: unknown): Promise<SubmittedIntake> {
  if (!can(actor.role, 'remeasure')) throw notAllowed('submit re-measurements');
  const input = remeasureInput.parse(raw);
  if (!Object.keys(input.measurements).length) throw badInput('measurements', 'give at least one re-measured value');
  try {
    return await Piano.transaction(async (trx) => {
      const piano = await Piano.query(trx).findById(input.pianoId).forUpdate();
      if (!piano) throw notFound(`piano ${input.pianoId}`);
      if (piano.stage !== 'in_workshop') throw new AppError('CONFLICT', 'Re-measurements are taken while the piano is in the workshop.');
      const latest = await Assessment.query(trx).where('piano_id', piano.id).orderBy('version', 'desc').first();
      if (!latest) throw notFound(`an assessment of piano ${piano.stockNumber}`);
      const measurements = { ...latest.measurements, ...input.measurements };
      const grade = gradeAssessment(measurements, await currentRules(trx));
      const version = latest.version + 1;
      const note = input.changeNote || 'Re-measured after workshop work.';
      const assessment = await insertAssessment(trx, actor, piano.id, version, measurements, grade, note, 'post_workshop', Object.keys(input.measurements).sort());
      return { pianoId: piano.id, stockNumber: piano.stockNumber, assessmentId: assessment.id, version, grade };
    });
  } catch (err) {
    if (err instanceof UniqueViolationError) throw new AppError('CONFLICT', 'Another assessment was saved at the same moment: reload and try again.');
    throw err;
  }
}

export interface AssessmentVersion {
  id: number;
  version: number;
  kind: string;
  measurements: Measurements;
  grade: SubmittedIntake['grade'];
  rulesVersion: string;
  changeNote: string | null;
  submittedBy: string;
  submittedAt: string;
  /** A re-measurement: the fields measured again after the work. */
  remeasured: string[];
}

export async function assessmentHistory(actor: Actor, pianoId: number): Promise<AssessmentVersion[]> {
  if (!can(actor.role, 'readPianos')) throw notAllowed('read assessments');
  const rows = await withCurrentGrades(await Assessment.query().where('piano_id', pianoId).withGraphFetched('submittedBy').orderBy('version'));
  return rows.map((a, i) => ({
    id: a.id,
    version: a.version,
    kind: a.kind,
    measurements: a.measurements,
    grade: a.grade,
    rulesVersion: a.rulesVersion,
    changeNote: a.changeNote,
    submittedBy: a.submittedBy?.name ?? 'unknown',
    submittedAt: a.submittedAt,
    remeasured: remeasuredFieldsOf(a, rows[i - 1]),
  }));
}

/** Where the piano came from; the seller's details only for roles that may read personal data. */
export async function intakeRecord(actor: Actor, pianoId: number): Promise<Record<string, unknown> | null> {
  if (!can(actor.role, 'readPianos')) throw notAllowed('read intakes');
  const intake = await Intake.query().findOne({ piano_id: pianoId });
  if (!intake) return null;
  const earlier = intake.samePianoAsId != null ? await Piano.query().findById(intake.samePianoAsId) : null;
  const base = {
    pianoId,
    acquisition: intake.acquisition,
    receivedOn: intake.receivedOn,
    inspectedAt: intake.inspectedAt,
    createdAt: intake.createdAt,
    samePianoAs: earlier ? { id: earlier.id, stockNumber: earlier.stockNumber } : null,
  };
  if (!can(actor.role, 'readSellerDetails')) return base;
  return {
    ...base,
    seller: { name: intake.sellerName, phone: intake.sellerPhone, email: intake.sellerEmail, address: intake.sellerAddress },
    notes: intake.notes,
  };
}
