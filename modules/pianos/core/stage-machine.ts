import { can, ROLES, type Ability, type Role } from '@/modules/accounts/core/roles';

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
  /** the roles that may make it, by the one rights table */
  ability: Ability;
  /** Feltwire makes it too (a paid deposit holds, an expired hold releases) */
  bySystem?: true;
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
  submit_assessment: { from: ['received'], to: 'assessed', ability: 'assess', label: 'Submit the assessment' },
  approve_plan: { from: ['assessed'], to: 'in_workshop', ability: 'decidePianos', label: 'Approve the plan and send to the workshop', needs: ['planApproved'] },
  sell_as_is: { from: ['assessed'], to: 'ready', ability: 'decidePianos', label: 'Sell as it stands' },
  wholesale: { from: ['assessed', 'ready', 'on_floor'], to: 'wholesaled', ability: 'decidePianos', label: 'Wholesale' },
  decline: { from: ['received', 'assessed'], to: 'returned_to_owner', ability: 'decidePianos', label: 'Decline and return to the owner' },
  finish_workshop: { from: ['in_workshop'], to: 'ready', ability: 'workAtBench', label: 'Finish in the workshop', needs: ['allWorkDone', 'postWorkshopAssessed'] },
  reopen_workshop: { from: ['ready'], to: 'in_workshop', ability: 'decidePianos', label: 'Back to the workshop' },
  put_on_floor: { from: ['ready'], to: 'on_floor', ability: 'sellPianos', label: 'Put on the floor' },
  take_off_floor: { from: ['on_floor'], to: 'ready', ability: 'sellPianos', label: 'Take off the floor' },
  hold: { from: ['on_floor'], to: 'held', ability: 'manageDeposits', bySystem: true, label: 'Hold for a buyer' },
  release_hold: { from: ['held'], to: 'on_floor', ability: 'manageDeposits', bySystem: true, label: 'Release the hold' },
  sell: { from: ['on_floor', 'held'], to: 'sold', ability: 'sellPianos', label: 'Record the sale' },
  deliver: { from: ['sold'], to: 'delivered', ability: 'sellPianos', label: 'Record the delivery' },
};

/** Why a move was refused: no such move, not this mover's, not from this stage, or a fact not yet true. */
export type MoveRefusal = 'unknown_move' | 'not_allowed' | 'wrong_stage' | 'not_yet';

export type MoveResult = { ok: true; from: Stage; to: Stage; action: StageAction; at: string } | { ok: false; kind: MoveRefusal; reason: string };

/** Whether a mover may make a move at all, whatever the stage. */
export function mayMake(action: StageAction, by: Mover): boolean {
  const move = MOVES[action];
  return by === 'system' ? move.bySystem === true : can(by, move.ability);
}

/** Every signed-in role and Feltwire itself. */
export const MOVERS: readonly Mover[] = [...ROLES, 'system'];

/** Decides one move. Pure: it takes the piano's stage, the action, who asks, the facts and `now`. */
export function decideMove(piano: { stage: Stage }, action: StageAction, by: Mover, now: Date, facts: GuardFacts = {}): MoveResult {
  const move = MOVES[action];
  if (!move) return { ok: false, kind: 'unknown_move', reason: `There is no move called "${action}".` };
  if (!mayMake(action, by)) return { ok: false, kind: 'not_allowed', reason: `Not allowed: ${by === 'system' ? 'Feltwire' : `the ${by} role`} cannot ${move.label.toLowerCase()}.` };
  if (!move.from.includes(piano.stage)) {
    return { ok: false, kind: 'wrong_stage', reason: `A piano in stage "${piano.stage}" cannot ${move.label.toLowerCase()}; it must be ${move.from.join(' or ')}.` };
  }
  const missing = (move.needs ?? []).filter((g) => !facts[g]);
  if (missing.length) return { ok: false, kind: 'not_yet', reason: `Not yet: ${missing.map((g) => GUARD_REASONS[g]).join('; ')}.` };
  return { ok: true, from: piano.stage, to: move.to, action, at: now.toISOString() };
}

/** The moves this role could make from this stage (facts not checked), for the buttons a screen offers. */
export function movesFrom(stage: Stage, by: Mover): StageAction[] {
  return STAGE_ACTIONS.filter((a) => MOVES[a].from.includes(stage) && mayMake(a, by));
}

/** Whole days spent in each stage, from an ordered history of moves, up to `now`. */
export function daysInStages(moves: { toStage: Stage; at: string }[], now: Date): { stage: Stage; days: number }[] {
  return moves.map((m, i) => {
    const end = i + 1 < moves.length ? Date.parse(moves[i + 1].at) : now.getTime();
    return { stage: m.toStage, days: Math.floor((end - Date.parse(m.at)) / 86_400_000) };
  });
}
