import { hashPassword } from '@/modules/accounts/server/user-service';
import { DEMO_PIANOS, DEMO_USERS, seedDemo } from '@/seeds/demo';

import { createTestDatabase } from '../support/test-db';

const TABLES = ['users', 'pianos', 'intakes', 'assessments', 'stage_moves', 'work_plans', 'work_items', 'time_entries', 'time_entry_corrections', 'climate_readings', 'disclosures', 'disclosure_links', 'trade_in_answers', 'price_changes'];

describe('the demo scenario', () => {
  it('seeds a consistent story, and a second run adds nothing', async () => {
    const db = await createTestDatabase();
    try {
      const first = await seedDemo(db.knex, hashPassword);
      expect(first).toEqual({ users: DEMO_USERS.length, pianos: DEMO_PIANOS.length });
      const counts = async () => Object.fromEntries(await Promise.all(TABLES.map(async (t) => [t, (await db.knex(t).count('* as n').first())!.n])));
      const before = await counts();
      expect(await seedDemo(db.knex, hashPassword)).toEqual({ users: 0, pianos: 0 });
      expect(await counts()).toEqual(before);

      // every piano's last recorded move lands on its stage
      const pianos = await db.knex('pianos').select('id', 'stage');
      for (const p of pianos) {
        const last = await db.knex('stage_moves').where({ piano_id: p.id }).orderBy('at', 'desc').orderBy('id', 'desc').first();
        expect(last.to_stage).toBe(p.stage);
      }
      // pianos on the floor have a published disclosure and a price
      const floor = await db.knex('pianos').where('stage', 'on_floor').leftJoin('disclosures', 'disclosures.piano_id', 'pianos.id').select('pianos.asking_price_minor', 'disclosures.version');
      expect(floor.length).toBeGreaterThan(0);
      for (const f of floor) expect(f).toEqual({ asking_price_minor: expect.any(Number), version: 1 });
      // each case of the grade is in the demo: ready, provisional, sold as it stands with its reason, re-measured after the work
      const grades = await db.knex('assessments').join('pianos', 'pianos.id', 'assessments.piano_id').select('pianos.stock_number', 'assessments.grade', 'assessments.kind', 'assessments.remeasured_fields');
      const of = (stock: string) => grades.filter((g) => g.stock_number === stock);
      expect(of('FW-0003')[0].grade).toMatchObject({ readiness: 'floor', provisional: false });
      expect(of('FW-0004')[0].grade).toMatchObject({ provisional: true, readiness: 'work_first' });
      expect(of('FW-0011')[0].grade).toMatchObject({ notRecommendedForRetail: true, readiness: 'wholesale' });
      expect(of('FW-0010').find((g) => g.kind === 'post_workshop').remeasured_fields).not.toContain('hammerGrooveDepthMm');
      expect(of('FW-0008').find((g) => g.kind === 'post_workshop').remeasured_fields).toContain('hammerGrooveDepthMm');
      const asIs = await db.knex('stage_moves').join('pianos', 'pianos.id', 'stage_moves.piano_id').where({ 'pianos.stock_number': 'FW-0011', action: 'sell_as_is' }).first('why');
      expect(asIs.why.length).toBeGreaterThanOrEqual(10);
      // pianos in the workshop have open work for the technician
      const open = await db.knex('work_items').join('pianos', 'pianos.id', 'work_items.piano_id').where('pianos.stage', 'in_workshop').whereNot('status', 'done').count('* as n').first();
      expect(open!.n).toBeGreaterThan(0);
      // offers were answered (accepted, or countered and then agreed), prices have a history, and some pianos a margin
      const answers = await db.knex('trade_in_answers').join('pianos', 'pianos.id', 'trade_in_answers.piano_id').select('pianos.stock_number', 'answer', 'offer_minor', 'counter_minor', 'allowance_minor');
      expect(new Set(answers.map((a) => a.answer))).toEqual(new Set(['accepted', 'countered', 'agreed']));
      for (const a of answers.filter((x) => x.answer === 'agreed')) expect(a.allowance_minor).toBeGreaterThan(a.offer_minor);
      // consignments and pianos still waiting in Assessed have no answer
      expect(answers.map((a) => a.stock_number)).not.toContain('FW-0003');
      expect(answers.map((a) => a.stock_number)).not.toContain('FW-0004');
      const priced = await db.knex('pianos').whereNotNull('asking_price_minor').count('* as n').first();
      const histories = await db.knex('price_changes').select('piano_id', 'to_minor', 'from_minor', 'reason').orderBy('id');
      expect(new Set(histories.map((h) => h.piano_id)).size).toBe(Number(priced!.n));
      const markedDown = histories.filter((h) => h.from_minor != null);
      expect(markedDown.length).toBeGreaterThan(0);
      for (const m of markedDown) expect(m.to_minor).toBeLessThan(m.from_minor);
      const withMargin = await db.knex('pianos').whereNotNull('asking_price_minor').whereExists(db.knex('trade_in_answers').whereRaw('trade_in_answers.piano_id = pianos.id').whereNotNull('allowance_minor')).count('* as n').first();
      expect(Number(withMargin!.n)).toBeGreaterThan(2);
    } finally {
      await db.drop();
    }
  });
});
