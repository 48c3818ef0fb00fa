import { hashPassword } from '@/modules/accounts/server/user-service';
import { DEMO_PIANOS, DEMO_USERS, seedDemo } from '@/seeds/demo';

import { createTestDatabase } from '../support/test-db';

const TABLES = ['users', 'pianos', 'intakes', 'assessments', 'stage_moves', 'work_plans', 'work_items', 'time_entries', 'climate_readings', 'disclosures', 'disclosure_links'];

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
      // pianos in the workshop have open work for the technician
      const open = await db.knex('work_items').join('pianos', 'pianos.id', 'work_items.piano_id').where('pianos.stage', 'in_workshop').whereNot('status', 'done').count('* as n').first();
      expect(open!.n).toBeGreaterThan(0);
    } finally {
      await db.drop();
    }
  });
});
