import type { Role } from '@/modules/accounts/core/roles';

import type { Stage } from './piano';

// Every move a piano can make between stages, who may make it, and what must be true first.
export const STAGE_ACTIONS = [
  'submit_assessment',
  'approve_plan',
  'sell_as_is',
  'wholesale',
  'decline',
  'finish_workshop',
  'reopen_workshop',
  'put_on_floor',
  'take_off_floor',
  'hold',
  'release_hold',
  'sell',
  'deliver',
] as const;
export type StageAction = (typeof STAGE_ACTIONS)[number];

/** Who makes a move: a signed-in role, or Feltwire itself (a paid deposit, an expired hold). */
export type Mover = Role | 'system';

interface Move {
  from: readonly Stage[];
  to: Stage;
  by: readonly Mover[];
  label: string;
  /** Facts the move needs, checked after stage and role. */
  needs?: readonly Guard[];
}

export type Guard = 'planApproved' | 'allWorkDone' | 'postWorkshopAssessed';
export type GuardFacts = Partial<Record<Guard, boolean>>;

const GUARD_REASONS: Record<Guard, string> = {
  planApproved: 'the reconditioning plan has no work items yet',
  allWorkDone: 'some work items are not done yet',
  postWorkshopAssessed: 'the post-workshop assessment has not been submitted',
};

export const MOVES: Record<StageAction, Move> = {
  submit_assessment: { from: ['received'], to: 'assessed', by: ['intake', 'manager'], label: 'Submit the assessment' },
  approve_plan: { from: ['assessed'], to: 'in_workshop', by: ['manager'], label: 'Approve the plan and send to the workshop', needs: ['planApproved'] },
  sell_as_is: { from: ['assessed'], to: 'ready', by: ['manager'], label: 'Sell as it stands' },
  wholesale: { from: ['assessed', 'ready', 'on_floor'], to: 'wholesaled', by: ['manager'], label: 'Wholesale' },
  decline: { from: ['received', 'assessed'], to: 'returned_to_owner', by: ['manager'], label: 'Decline and return to the owner' },
  finish_workshop: { from: ['in_workshop'], to: 'ready', by: ['technician', 'manager'], label: 'Finish in the workshop', needs: ['allWorkDone', 'postWorkshopAssessed'] },
  reopen_workshop: { from: ['ready'], to: 'in_workshop', by: ['manager'], label: 'Back to the workshop' },
  put_on_floor: { from: ['ready'], to: 'on_floor', by: ['floor', 'manager'], label: 'Put on the floor' },
  take_off_floor: { from: ['on_floor'], to: 'ready', by: ['floor', 'manager'], label: 'Take off the floor' },
  hold: { from: ['on_floor'], to: 'held', by: ['system', 'manager'], label: 'Hold for a buyer' },
  release_hold: { from: ['held'], to: 'on_floor', by: ['system', 'manager'], label: 'Release the hold' },
  sell: { from: ['on_floor', 'held'], to: 'sold', by: ['floor', 'manager'], label: 'Record the sale' },
  deliver: { from: ['sold'], to: 'delivered', by: ['floor', 'manager'], label: 'Record the delivery' },
};

export type MoveResult = { ok: true; from: Stage; to: Stage; action: StageAction; at: string } | { ok: false; reason: string };

/** Decides one move. Pure: it takes the piano's stage, the action, who asks, the facts and `now`. */
export function decideMove(piano: { stage: Stage }, action: StageAction, by: Mover, now: Date, facts: GuardFacts = {}): MoveResult {
  const move = MOVES[action];
  if (!move) return { ok: false, reason: `There is no move called "${action}".` };
  if (!move.by.includes(by)) return { ok: false, reason: `Not allowed: ${by === 'system' ? 'Feltwire' : `the ${by} role`} cannot ${move.label.toLowerCase()}.` };
  if (!move.from.includes(piano.stage)) {
    return { ok: false, reason: `A piano in stage "${piano.stage}" cannot ${move.label.toLowerCase()}; it must be ${move.from.join(' or ')}.` };
  }
  const missing = (move.needs ?? []).filter((g) => !facts[g]);
  if (missing.length) return { ok: false, reason: `Not yet: ${missing.map((g) => GUARD_REASONS[g]).join('; ')}.` };
  return { ok: true, from: piano.stage, to: move.to, action, at: now.toISOString() };
}

/** The moves this role could make from this stage (facts not checked), for the buttons a screen offers. */
export function movesFrom(stage: Stage, by: Mover): StageAction[] {
  return STAGE_ACTIONS.filter((a) => MOVES[a].from.includes(stage) && MOVES[a].by.includes(by));
}

/** Whole days spent in each stage, from an ordered history of moves, up to `now`. */
export function daysInStages(moves: { toStage: Stage; at: string }[], now: Date): { stage: Stage; days: number }[] {
  return moves.map((m, i) => {
    const end = i + 1 < moves.length ? Date.parse(moves[i + 1].at) : now.getTime();
    return { stage: m.toStage, days: Math.floor((end - Date.parse(m.at)) / 86_400_000) };
  });
}
