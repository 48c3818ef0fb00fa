import type { Stage } from '@/modules/pianos/core/piano';
import { STAGES } from '@/modules/pianos/core/piano';
import { daysInStages, decideMove, mayMake, MOVERS, MOVES, movesFrom, STAGE_ACTIONS, type Mover } from '@/modules/pianos/core/stage-machine';

const NOW = new Date('2026-12-01T10:00:00Z');
const ALL_FACTS = { planApproved: true, allWorkDone: true, postWorkshopAssessed: true };

describe('decideMove', () => {
  const allowed = STAGE_ACTIONS.flatMap((action) => MOVES[action].from.flatMap((from) => MOVERS.filter((by) => mayMake(action, by)).map((by) => [action, from, by, MOVES[action].to] as const)));

  it.each(allowed)('%s from %s by %s goes to %s', (action, from, by, to) => {
    expect(decideMove({ stage: from }, action, by, NOW, ALL_FACTS)).toEqual({ ok: true, from, to, action, at: '2026-12-01T10:00:00.000Z' });
  });

  it.each([
    ['sell', 'technician', 'on_floor'],
    ['approve_plan', 'intake', 'assessed'],
    ['put_on_floor', 'technician', 'ready'],
    ['hold', 'floor', 'on_floor'],
    ['submit_assessment', 'floor', 'received'],
  ] as [keyof typeof MOVES, Mover, Stage][])('refuses %s by %s', (action, by, stage) => {
    const r = decideMove({ stage }, action, by, NOW, ALL_FACTS);
    expect(r).toMatchObject({ ok: false, kind: 'not_allowed' });
  });

  it('refuses every move from a stage it does not start from', () => {
    for (const action of STAGE_ACTIONS) {
      for (const stage of STAGES.filter((s) => !MOVES[action].from.includes(s))) {
        const r = decideMove({ stage }, action, 'manager', NOW, ALL_FACTS);
        if (mayMake(action, 'manager')) expect(r).toEqual({ ok: false, kind: 'wrong_stage', reason: expect.stringContaining(`A piano in stage "${stage}" cannot`) });
      }
    }
  });

  it('nothing leaves the exits', () => {
    for (const stage of ['wholesaled', 'returned_to_owner', 'delivered'] as Stage[]) {
      for (const by of ['intake', 'technician', 'floor', 'manager', 'system'] as Mover[]) expect(movesFrom(stage, by)).toEqual([]);
    }
  });

  it('finishing in the workshop needs every item done and the post-workshop assessment', () => {
    expect(decideMove({ stage: 'in_workshop' }, 'finish_workshop', 'technician', NOW, { allWorkDone: true })).toEqual({
      ok: false,
      kind: 'not_yet',
      reason: 'Not yet: the post-workshop assessment has not been submitted.',
    });
    expect(decideMove({ stage: 'in_workshop' }, 'finish_workshop', 'technician', NOW, {})).toEqual({
      ok: false,
      kind: 'not_yet',
      reason: 'Not yet: some work items are not done yet; the post-workshop assessment has not been submitted.',
    });
  });

  it('lists the moves a role can offer from a stage', () => {
    expect(movesFrom('assessed', 'manager')).toEqual(['approve_plan', 'sell_as_is', 'wholesale', 'decline']);
    expect(movesFrom('on_floor', 'floor')).toEqual(['take_off_floor', 'sell']);
    expect(movesFrom('in_workshop', 'technician')).toEqual(['finish_workshop']);
  });
});

describe('daysInStages', () => {
  it('counts whole days in each stage up to now', () => {
    expect(
      daysInStages(
        [
          { toStage: 'received', at: '2026-11-01T09:00:00Z' },
          { toStage: 'assessed', at: '2026-11-03T12:00:00Z' },
          { toStage: 'in_workshop', at: '2026-11-10T08:00:00Z' },
        ],
        NOW,
      ),
    ).toEqual([
      { stage: 'received', days: 2 },
      { stage: 'assessed', days: 6 },
      { stage: 'in_workshop', days: 21 },
    ]);
  });
});
