import { can } from '@/modules/accounts/core/roles';
import type { Knex } from 'knex';

import { pianoInput, STAGES, type PianoInput, type Stage } from '@/modules/pianos/core/piano';
import type { Actor } from '@/modules/accounts/server/user-service';
import { notAllowed } from '@/server/errors';

import { Piano } from './piano-model';
import { recordArrival } from './stage-service';

/** A new piano record in stage `received`, in the caller's transaction; its stock number comes from the database sequence. */
export async function insertArrivedPiano(trx: Knex.Transaction, actor: Actor, input: PianoInput): Promise<Piano> {
  const piano = await Piano.query(trx).insertAndFetch({
    maker: input.maker,
    model: input.model ?? null,
    serialNumber: input.serialNumber ?? null,
    year: input.year ?? null,
    yearIsEstimate: input.yearIsEstimate,
    kind: input.kind,
    sizeCm: input.sizeCm ?? null,
    finish: input.finish ?? null,
    createdById: actor.id,
  });
  await recordArrival(trx, piano, actor.id, actor.role);
  return piano;
}

/** A new piano record in stage `received`. */
export async function createPiano(actor: Actor, raw: unknown): Promise<Piano> {
  if (!can(actor.role, 'createPianos')) throw notAllowed('create pianos');
  const input = pianoInput.parse(raw);
  return Piano.transaction(async (trx) => (await insertArrivedPiano(trx, actor, input)).$fetchGraph('createdBy', { transaction: trx }));
}

/** How many pianos stand in each stage, every stage listed (zero where none). */
export async function stageCounts(actor: Actor): Promise<{ stage: Stage; count: number }[]> {
  if (!can(actor.role, 'readPianos')) throw notAllowed('read pianos');
  const rows = (await Piano.query().select('stage').count('* as count').groupBy('stage')) as unknown as { stage: Stage; count: number }[];
  const byStage = new Map(rows.map((r) => [r.stage, Number(r.count)]));
  return STAGES.map((stage) => ({ stage, count: byStage.get(stage) ?? 0 }));
}
