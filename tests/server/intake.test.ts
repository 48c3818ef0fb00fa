import { gradeAssessment } from '@/modules/assessment/core/grade';
import { defaultRules } from '@/modules/assessment/core/grade-rules';
import type { Role } from '@/modules/accounts/core/roles';

import { startTestApi, type TestApi } from '../support/api';
import { buildIntake, buildMeasurements } from '../support/builders';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

const SUBMIT = 'mutation($input: JSON!) { submitIntake(input: $input) }';
const CORRECT = 'mutation($input: JSON!) { correctAssessment(input: $input) }';

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
    expect(out.grade).toEqual(expected);
    expect(out.version).toBe(1);

    const piano = await api.knex('pianos').where({ id: out.pianoId }).first();
    expect(piano).toMatchObject({ stage: 'assessed', year: 1981, year_is_estimate: true, year_from: 1978, year_to: 1984, case_condition: 'good' });
    expect(piano.stock_number).toBe(out.stockNumber);
    const stored = await api.knex('assessments').where({ piano_id: out.pianoId }).first();
    expect(stored.grade).toEqual(expected);
    expect(stored).toMatchObject({ version: 1, score: expected.score, band: expected.band, rules_version: defaultRules.version });
    // the stored grade names both the cosmetic crack and the worn hammers
    const checks = stored.grade.findings.map((f: { check: string; severity: string }) => `${f.check}:${f.severity}`);
    expect(checks).toEqual(expect.arrayContaining(['soundboard.crack.1:watch', 'hammers.wear:needs_work']));

    const read = await api.gql(await api.tokenFor('technician'), `{ assessments(pianoIdEq: ${out.pianoId}) { version score band rulesVersion } }`);
    expect(read.body.data.assessments).toEqual([{ version: 1, score: expected.score, band: expected.band, rulesVersion: defaultRules.version }]);
  });

  it.each([
    [{ measurements: buildMeasurements({ keySidePlayMm: 12 }) }, 'measurements.keySidePlayMm'],
    [{ measurements: buildMeasurements({ hammerGrooveDepthMm: -1 }) }, 'measurements.hammerGrooveDepthMm'],
    [{ measurements: buildMeasurements({ a4Hz: 'flat' as never }) }, 'measurements.a4Hz'],
    [{ measurements: buildMeasurements({ stickingKeys: [90] }) }, 'measurements.stickingKeys.0'],
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
      `{ intake(pianoId: ${pianoId}) piano(idEq: ${pianoId}) { stockNumber maker } assessmentHistory(pianoId: ${pianoId}) assessments(pianoIdEq: ${pianoId}) { score } }`,
    );
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data.intake).toEqual({ pianoId, acquisition: 'trade_in', receivedOn: '2026-11-28', inspectedAt: 'customer_home', createdAt: expect.any(String) });
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
    expect(history[1]).toMatchObject({ changeNote: 'Re-measured the hammer grooves in daylight.', submittedBy: 'Mara Quillfeather', changes: [{ field: 'hammerGrooveDepthMm', from: 2.2, to: 3.4 }] });
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

describe('grading rules', () => {
  it('a manager’s change makes a new version that the next intake is graded with', async () => {
    const manager = await api.tokenFor('manager');
    const strict = { ...defaultRules, keySidePlayNormalMm: 1.5 } as Record<string, unknown>;
    delete strict.version;
    const res = await api.gql(manager, 'mutation($r: JSON!) { setGradeRules(rules: $r) }', { r: strict });
    expect(res.body.errors).toBeUndefined();
    const version = res.body.data.setGradeRules.version;
    expect(version).toMatch(/^shop-\d+$/);

    const out = (await api.gql(await api.tokenFor('intake'), SUBMIT, { input: buildIntake() })).body.data.submitIntake;
    expect(out.grade.rulesVersion).toBe(version);
    expect(out.grade.findings.find((f: { check: string }) => f.check === 'keys.sidePlay').severity).toBe('watch');
  });

  it('refuses rules out of order and rules from a non-manager', async () => {
    const bad = { ...defaultRules, hammerGrooveNormalMm: 4 } as Record<string, unknown>;
    delete bad.version;
    const res = await api.gql(await api.tokenFor('manager'), 'mutation($r: JSON!) { setGradeRules(rules: $r) }', { r: bad });
    expect(res.body.errors[0].extensions).toMatchObject({ code: 'BAD_INPUT', field: 'hammerGrooveReplaceMm' });
    const intake = await api.gql(await api.tokenFor('intake'), 'mutation($r: JSON!) { setGradeRules(rules: $r) }', { r: bad });
    expect(intake.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
  });
});
