import type { Knex } from 'knex';

import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { decideMove, STAGE_ACTIONS, type GuardFacts, type MoveRefusal, type Mover, type StageAction } from '@/modules/pianos/core/stage-machine';
import type { Stage } from '@/modules/pianos/core/piano';
import { AppError, badInput, notAllowed, notFound, type ErrorCode } from '@/server/errors';

import { Piano } from './piano-model';
import { StageMove } from './stage-move-model';

export interface MoveRequest {
  pianoId: number;
  action: StageAction;
  by: Mover;
  userId: number | null;
  why?: string | null;
  /** Facts the move's guards need, read inside the same transaction. */
  facts?: (trx: Knex.Transaction, piano: Piano) => Promise<GuardFacts>;
}

/** Records a piano's first stage when it is created. */
export async function recordArrival(trx: Knex.Transaction, piano: Piano, userId: number, role: string): Promise<void> {
  await StageMove.query(trx).insert({ pianoId: piano.id, action: 'receive', fromStage: null, toStage: 'received', byUserId: userId, byRole: role });
}

const REFUSAL_CODES: Record<MoveRefusal, ErrorCode> = { unknown_move: 'BAD_INPUT', not_allowed: 'NOT_ALLOWED', wrong_stage: 'CONFLICT', not_yet: 'CONFLICT' };

async function moveIn(trx: Knex.Transaction, req: MoveRequest): Promise<Piano> {
  // The row lock makes two moves of one piano take turns: the second sees the first one's stage.
  const piano = await Piano.query(trx).findById(req.pianoId).forUpdate();
  if (!piano) throw notFound(`piano ${req.pianoId}`);
  const facts = req.facts ? await req.facts(trx, piano) : {};
  const decided = decideMove(piano, req.action, req.by, new Date(), facts);
  if (!decided.ok) throw new AppError(REFUSAL_CODES[decided.kind], decided.reason);
  await StageMove.query(trx).insert({
    pianoId: piano.id,
    action: req.action,
    fromStage: decided.from,
    toStage: decided.to,
    why: req.why?.trim() || null,
    byUserId: req.userId,
    byRole: req.by,
    at: decided.at,
  });
  return piano.$query(trx).patchAndFetch({ stage: decided.to, stageChangedAt: decided.at });
}

/** Moves a piano one step through its stages, checked by the stage machine, with a history row. */
export function movePiano(req: MoveRequest, trx?: Knex.Transaction): Promise<Piano> {
  if (!STAGE_ACTIONS.includes(req.action)) throw badInput('action', `must be one of ${STAGE_ACTIONS.join(', ')}`);
  if (req.why && req.why.length > 500) throw badInput('why', 'must be at most 500 characters');
  return trx ? moveIn(trx, req) : Piano.transaction((t) => moveIn(t, req));
}

export interface StageHistoryEntry {
  action: string;
  fromStage: Stage | null;
  toStage: Stage;
  why: string | null;
  by: string;
  byRole: string;
  at: string;
}

export async function stageHistory(actor: Actor, pianoId: number): Promise<StageHistoryEntry[]> {
  if (!can(actor.role, 'readPianos')) throw notAllowed('read stage history');
  const rows = (await StageMove.query()
    .leftJoin('users', 'users.id', 'stage_moves.by_user_id')
    .where('stage_moves.piano_id', pianoId)
    .orderBy([{ column: 'stage_moves.at' }, { column: 'stage_moves.id' }])
    .select('stage_moves.*', 'users.name as by_name')) as unknown as (StageMove & { byName: string | null })[];
  // Every piano has its arrival in the history: none at all means no such piano.
  if (!rows.length && !(await Piano.query().findById(pianoId))) throw notFound(`piano ${pianoId}`);
  return rows.map((r) => ({ action: r.action, fromStage: r.fromStage, toStage: r.toStage, why: r.why, by: r.byName ?? 'Feltwire', byRole: r.byRole, at: r.at }));
}
