import type { Knex } from 'knex';

import type { Actor } from '@/modules/accounts/server/user-service';
import { badInput } from '@/server/errors';

import { ToneRecording } from './tone-models';

/** Draft recordings the same user made join the piano and the assessment just written (on intake submit or correction). */
export async function attachRecordings(trx: Knex.Transaction, actor: Actor, pianoId: number, assessmentId: number, recordingIds: number[]): Promise<void> {
  if (!recordingIds.length) return;
  const attached = await ToneRecording.query(trx)
    .patch({ pianoId, assessmentId, draftKey: null })
    .whereIn('id', recordingIds)
    .where('recorded_by_id', actor.id)
    .where((q) => q.whereNull('piano_id').orWhere('piano_id', pianoId));
  if (attached !== new Set(recordingIds).size) throw badInput('recordingIds', 'holds a recording that is not one of your recordings for this piano');
}
