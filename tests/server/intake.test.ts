import { gradeAssessment } from '@/modules/assessment/core/grade';
import { defaultRules } from '@/modules/assessment/core/grade-rules';
import type { Role } from '@/modules/accounts/core/roles';

import { diffMeasurements } from '@/modules/assessment/core/measurement-diff';

import { startTestApi, type TestApi } from '../support/api';
import { buildIntake, buildMeasurements } from '../support/builders';
import { withoutNulls } from '../support/whole-answers';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

const SUBMIT = 'mutation($input: IntakeInput!) { submitIntake(input: $input) }';
const CORRECT = 'mutation($input: CorrectionInput!) { correctAssessment(input: $input) }';

async function counts() {
  const [p, i, a] = await Promise.all(['pianos', 'intakes', 'assessments'].map((t) => api.knex(t).count('* as n').first()));
  return { pianos: p!.n, intakes: i!.n, assessments: a!.n };
}

describe('submitIntake', () => {
  it('records the piano, the intake and the graded assessment, and moves the piano to assessed', async () => {
    const res = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake() });
    expect(res.body.errors).toBeUndefined();
    const out = res.body.data.submitIntake;
    const expected = gradeAssessment(buildMeasurements(), defaultRules);
    expect(withoutNulls(out.grade)).toEqual(withoutNulls({ ...expected, format: undefined }));
    expect(out.version).toBe(1);

    const piano = await api.knex('pianos').where({ id: out.pianoId }).first();
    expect(piano).toMatchObject({ stage: 'assessed', year: 1981, year_is_estimate: true, year_from: 1978, year_to: 1984, case_condition: 'good' });
    expect(piano.stock_number).toBe(out.stockNumber);
    const stored = await api.knex('assessments').where({ piano_id: out.pianoId }).first();
    expect(stored.grade).toEqual(expected);
    expect(stored).toMatchObject({ version: 1, rules_version: defaultRules.version, refer_to_technician: false, not_recommended_for_retail: false });
    expect(stored).not.toHaveProperty('score');
    expect(stored).not.toHaveProperty('band');
    // the stored grade names both the cosmetic crack and the worn hammers, and says how ready the piano is
    const checks = stored.grade.findings.map((f: { check: string; mark: string }) => `${f.check}:${f.mark}`);
    expect(checks).toEqual(expect.arrayContaining(['soundboard.crack.1:noted', 'hammers.wear:work']));
    expect(stored.grade).toMatchObject({ format: 2, readiness: 'work_first', provisional: false, playTested: true });

    const read = await api.gql(await api.tokenFor('technician'), `{ assessments(pianoIdEq: ${out.pianoId}) { version rulesVersion referToTechnician } }`);
    expect(read.body.data.assessments).toEqual([{ version: 1, rulesVersion: defaultRules.version, referToTechnician: false }]);
  });

  it.each([
    [{ measurements: buildMeasurements({ keySidePlayMm: 12 }) }, 'measurements.keySidePlayMm'],
    [{ measurements: buildMeasurements({ hammerGrooveDepthMm: -1 }) }, 'measurements.hammerGrooveDepthMm'],
    [{ measurements: buildMeasurements({ stickingKeys: [90] }) }, 'measurements.stickingKeys.0'],
    [{ measurements: buildMeasurements({ keyTouchesNeighbour: true }) }, 'measurements.keysTouchingNeighbour'],
    [{ measurements: buildMeasurements({ keyTouchesNeighbour: true, keysTouchingNeighbour: [0, 40] }) }, 'measurements.keysTouchingNeighbour.0'],
    [{ measurements: {} }, 'measurements'],
    [{ measurements: { keytopDamage: [], soundboardCracks: [] } }, 'measurements'],
    [{ seller: { name: '' } }, 'seller.name'],
    [{ acquisition: 'gift' }, 'acquisition'],
    [{ receivedOn: '28/11/2026' }, 'receivedOn'],
    [{ piano: { maker: 'X', kind: 'upright', yearFrom: 1990, yearTo: 1980 } }, 'piano.yearTo'],
    [{ piano: { maker: 'X', kind: 'upright', sizeCm: 900 } }, 'piano.sizeCm'],
  ])('refuses %j naming %s and stores nothing', async (over, field) => {
    const before = await counts();
    const res = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake(over) });
    expect(res.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field });
    expect(res.body.errors[0].message.startsWith(`${field}: `)).toBe(true);
    expect(await counts()).toEqual(before);
  });

  it('refuses a measurement of the wrong type before it runs, naming it, and stores nothing', async () => {
    const before = await counts();
    const res = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ measurements: buildMeasurements({ a4Hz: 'flat' as never }) }) });
    expect(res.status).toBe(400);
    expect(res.body.errors[0].extensions.code).toBe('BAD_INPUT');
    expect(res.body.errors[0].message).toMatch(/a4Hz.*"flat".*Float/);
    expect(await counts()).toEqual(before);
  });

  it('refuses an intake with nothing measured, in words', async () => {
    const res = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ measurements: {} }) });
    expect(res.body.errors[0].message).toBe('measurements: has nothing measured yet: measure at least one area before submitting');
  });

  it('takes a provisional intake, and says it is provisional with no verdict of quality', async () => {
    const res = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ piano: { maker: 'Hollowmere', kind: 'upright' }, measurements: { keySidePlayMm: 1.2, a4Hz: 440 } }) });
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data.submitIntake.grade).toMatchObject({ inspectedAreas: ['keys', 'tuning'], provisional: true, playTested: false, readiness: 'unjudged' });
  });

  it('names the keys that touch a neighbour in the finding', async () => {
    const res = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ piano: { maker: 'Hollowmere', kind: 'upright' }, measurements: buildMeasurements({ keyTouchesNeighbour: true, keysTouchingNeighbour: [61, 23] }) }) });
    const finding = res.body.data.submitIntake.grade.findings.find((f: { check: string }) => f.check === 'keys.sidePlay');
    expect(finding.finding).toBe('Keys 23, 61 can be pushed sideways until they touch their neighbours: the key bushings are worn.');
  });

  it.each(['technician', 'floor'] as Role[])('refuses %s and stores nothing', async (role) => {
    const before = await counts();
    const res = await api.gql(await api.tokenFor(role), SUBMIT, { input: buildIntake() });
    expect(res.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    expect(await counts()).toEqual(before);
  });
});

describe('a piano logged before its inspection', () => {
  it('gets its intake and assessment on the same record, once', async () => {
    const created = (await api.gql(await api.tokenFor('intake'), 'mutation { createPiano(maker: "Almsbury", kind: "upright") { id stockNumber } }')).body.data.createPiano;
    const res = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ pianoId: created.id }) });
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data.submitIntake).toMatchObject({ pianoId: created.id, stockNumber: created.stockNumber, version: 1 });
    const piano = await api.knex('pianos').where({ id: created.id }).first();
    expect(piano).toMatchObject({ stage: 'assessed', model: 'Parlour 118', size_cm: 118 });
    const moves = await api.knex('stage_moves').where({ piano_id: created.id }).orderBy('id');
    expect(moves.map((m) => m.action)).toEqual(['receive', 'submit_assessment']);
    const before = await counts();
    const again = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ pianoId: created.id }) });
    expect(again.body.errors[0].extensions).toMatchObject({ code: 'CONFLICT', field: 'pianoId' });
    expect(await counts()).toEqual(before);
  });
});

describe('seller details', () => {
  let pianoId: number;
  beforeAll(async () => {
    const res = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ piano: { maker: 'Corvelle', kind: 'grand', sizeCm: 170 } }) });
    pianoId = res.body.data.submitIntake.pianoId;
  });

  it.each(['intake', 'manager'] as Role[])('are readable by %s', async (role) => {
    const res = await api.gql(await api.tokenFor(role), `{ intake(pianoId: ${pianoId}) }`);
    expect(res.body.data.intake.seller).toEqual({ name: 'Rosalind Vantongeren', phone: '+1 555 0100', email: 'rosalind@example.test', address: '12 Quince Row, Millbrook' });
  });

  it.each(['technician', 'floor'] as Role[])('are absent from everything %s can read', async (role) => {
    const token = await api.tokenFor(role);
    const res = await api.gql(
      token,
      `{ intake(pianoId: ${pianoId}) piano(idEq: ${pianoId}) { stockNumber maker } assessmentHistory(pianoId: ${pianoId}) assessments(pianoIdEq: ${pianoId}) { version } }`,
    );
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data.intake).toEqual({ pianoId, acquisition: 'trade_in', receivedOn: '2026-11-28', inspectedAt: 'customer_home', createdAt: expect.any(String), samePianoAs: null, seller: null, notes: null });
    const text = JSON.stringify(res.body);
    for (const secret of ['Rosalind', 'Vantongeren', '555 0100', 'rosalind@example.test', 'Quince Row', 'before the holidays']) expect(text).not.toContain(secret);
  });
});

describe('corrections', () => {
  it('adds a new version with the reason and what changed, and keeps the old one as it was', async () => {
    const token = await api.tokenFor('intake');
    const first = (await api.gql(token, SUBMIT, { input: buildIntake() })).body.data.submitIntake;
    const before = await api.knex('assessments').where({ piano_id: first.pianoId, version: 1 }).first();

    const fixed = buildMeasurements({ hammerGrooveDepthMm: 3.4 });
    const res = await api.gql(await api.tokenFor('manager'), CORRECT, { input: { pianoId: first.pianoId, measurements: fixed, changeNote: 'Re-measured the hammer grooves in daylight.' } });
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data.correctAssessment.version).toBe(2);
    expect(res.body.data.correctAssessment.grade.referToTechnician).toBe(true);

    const history = (await api.gql(token, `{ assessmentHistory(pianoId: ${first.pianoId}) }`)).body.data.assessmentHistory;
    expect(history.map((h: { version: number }) => h.version)).toEqual([1, 2]);
    expect(history[1]).toMatchObject({ changeNote: 'Re-measured the hammer grooves in daylight.', submittedBy: 'Mara Quillfeather' });
    expect(diffMeasurements(history[0].measurements, history[1].measurements)).toEqual([{ field: 'hammerGrooveDepthMm', from: 2.2, to: 3.4 }]);
    expect(history[0].submittedBy).toBe('Ines Okafor-Lind');
    expect(await api.knex('assessments').where({ piano_id: first.pianoId, version: 1 }).first()).toEqual(before);
  });

  it('refuses a correction made from a version that is no longer the newest', async () => {
    const first = (await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake() })).body.data.submitIntake;
    const ok = await api.gql(await api.tokenFor('intake'), CORRECT, { input: { pianoId: first.pianoId, measurements: buildMeasurements({ keySidePlayMm: 2.5 }), changeNote: 'a', baseVersion: 1 } });
    expect(ok.body.data.correctAssessment.version).toBe(2);
    const stale = await api.gql(await api.tokenFor('manager'), CORRECT, { input: { pianoId: first.pianoId, measurements: buildMeasurements({ keySidePlayMm: 1 }), changeNote: 'b', baseVersion: 1 } });
    expect(stale.body.errors[0].extensions).toMatchObject({ code: 'CONFLICT', field: 'baseVersion' });
    expect(await api.knex('assessments').where({ piano_id: first.pianoId }).count('* as n').first()).toEqual({ n: 2 });
  });

  it('refuses a correction without a reason, and one by floor staff', async () => {
    const first = (await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake() })).body.data.submitIntake;
    const noReason = await api.gql(await api.tokenFor('intake'), CORRECT, { input: { pianoId: first.pianoId, measurements: buildMeasurements(), changeNote: ' ' } });
    expect(noReason.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'changeNote' });
    const floor = await api.gql(await api.tokenFor('floor'), CORRECT, { input: { pianoId: first.pianoId, measurements: buildMeasurements(), changeNote: 'x' } });
    expect(floor.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    expect(await api.knex('assessments').where({ piano_id: first.pianoId }).count('* as n').first()).toEqual({ n: 1 });
  });
});

describe('the same piano taken in twice', () => {
  const SAME = 'query($m: String!, $mo: String, $s: String!, $x: Int) { samePianos(maker: $m, model: $mo, serialNumber: $s, exceptPianoId: $x) }';
  const again = { maker: 'Almsbury', model: 'Parlour 118', serialNumber: 'AL-204117', kind: 'upright' };

  it('tells the client before submit which record has the same maker, model and serial', async () => {
    const token = await api.tokenFor('intake');
    // FW-0001 in the demo: case, spaces and dashes do not make another serial
    const res = await api.gql(token, SAME, { m: 'almsbury ', mo: 'PARLOUR 118', s: 'al 204117' });
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data.samePianos).toEqual([{ id: expect.any(Number), stockNumber: 'FW-0001', stage: 'received', maker: 'Almsbury', model: 'Parlour 118', serialNumber: 'AL-204117', createdAt: expect.any(String) }]);
    const otherModel = await api.gql(token, SAME, { m: 'Almsbury', mo: 'Parlour 121', s: 'AL-204117' });
    expect(otherModel.body.data.samePianos).toEqual([]);
    const itself = await api.gql(token, SAME, { m: 'Almsbury', mo: 'Parlour 118', s: 'AL-204117', x: res.body.data.samePianos[0].id });
    expect(itself.body.data.samePianos).toEqual([]);
    const floor = await api.gql(await api.tokenFor('floor'), SAME, { m: 'Almsbury', s: 'AL-204117' });
    expect(floor.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
  });

  it('refuses the second intake until intake staff say it is the same piano coming back, then records the link', async () => {
    const before = await counts();
    const first = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ piano: again }) });
    expect(first.body.errors[0]).toMatchObject({ extensions: { code: 'CONFLICT', field: 'samePianoAs' } });
    expect(first.body.errors[0].message).toBe('FW-0001 has the same maker, model and serial number. If this is the same piano coming back, say so and submit again; otherwise check the serial number.');
    expect(await counts()).toEqual(before);
    const fw1 = (await api.knex('pianos').where({ stock_number: 'FW-0001' }).first()).id;
    const wrong = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ piano: again, samePianoAs: fw1 + 1000 }) });
    expect(wrong.body.errors[0].extensions.field).toBe('samePianoAs');
    const ok = await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ piano: again, samePianoAs: fw1 }) });
    expect(ok.body.errors).toBeUndefined();
    const record = await api.gql(await api.tokenFor('intake'), `{ intake(pianoId: ${ok.body.data.submitIntake.pianoId}) }`);
    expect(record.body.data.intake.samePianoAs).toEqual({ id: fw1, stockNumber: 'FW-0001' });
  });
});

describe('assessments stored before the grade had marks', () => {
  it('are read from their own measurements with the rules of their own version, the stored document left as it was', async () => {
    const out = (await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake({ piano: { maker: 'Quillby', kind: 'upright' } }) })).body.data.submitIntake;
    // A grade document as the first format stored it: a score and a band, severities, no areas.
    const oldGrade = { rulesVersion: defaultRules.version, findings: [{ area: 'keys', check: 'keys.level', severity: 'watch', finding: 'old words', work: [], mustDisclose: true }], score: 97, band: 'excellent', referToTechnician: false, notRecommendedForRetail: false, centsFromStandard: null };
    await api.knex('assessments').where({ piano_id: out.pianoId }).update({ grade: JSON.stringify(oldGrade) });
    const history = (await api.gql(await api.tokenFor('technician'), `{ assessmentHistory(pianoId: ${out.pianoId}) }`)).body.data.assessmentHistory;
    expect(withoutNulls(history[0].grade)).toEqual(withoutNulls({ ...gradeAssessment(buildMeasurements(), defaultRules), format: undefined }));
    expect(JSON.stringify(history[0].grade)).not.toContain('score');
    expect((await api.knex('assessments').where({ piano_id: out.pianoId }).first()).grade).toEqual(oldGrade);
  });
});

describe('grading rules', () => {
  it('a manager’s change makes a new version that the next intake is graded with', async () => {
    const manager = await api.tokenFor('manager');
    const strict = { ...defaultRules, keySidePlayNormalMm: 1.5 } as Record<string, unknown>;
    delete strict.version;
    const res = await api.gql(manager, 'mutation($r: GradeRulesInput!) { setGradeRules(rules: $r) }', { r: strict });
    expect(res.body.errors).toBeUndefined();
    const version = res.body.data.setGradeRules.version;
    expect(version).toMatch(/^shop-\d+$/);

    const out = (await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake() })).body.data.submitIntake;
    expect(out.grade.rulesVersion).toBe(version);
    expect(out.grade.findings.find((f: { check: string }) => f.check === 'keys.sidePlay').mark).toBe('noted');
  });

  it('refuses rules out of order and rules from a non-manager', async () => {
    const bad = { ...defaultRules, hammerGrooveNormalMm: 4 } as Record<string, unknown>;
    delete bad.version;
    const res = await api.gql(await api.tokenFor('manager'), 'mutation($r: GradeRulesInput!) { setGradeRules(rules: $r) }', { r: bad });
    expect(res.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'hammerGrooveReplaceMm' });
    const intake = await api.gql(await api.tokenFor('intake'), 'mutation($r: GradeRulesInput!) { setGradeRules(rules: $r) }', { r: bad });
    expect(intake.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
  });
});
