import type { Knex } from 'knex';

// Every foreign key a screen reads by or a cascade follows, and every column a list sorts by, seen in
// EXPLAIN as full scans at 10,000 pianos. Keys pointing at users are left out: users are deactivated,
// never deleted, and no screen reads by who made a row. Built concurrently, so a shop with data keeps
// writing while they build; a concurrent build cannot run inside a transaction.
export const config = { transaction: false };

const INDEXES: [name: string, table: string, columns: string, where?: string][] = [
  ['pianos_created_at_index', 'pianos', 'created_at'],
  ['pianos_stage_stage_changed_at_index', 'pianos', 'stage, stage_changed_at'],
  ['work_items_plan_id_index', 'work_items', 'plan_id'],
  ['work_items_piano_id_index', 'work_items', 'piano_id'],
  ['time_entries_work_item_id_index', 'time_entries', 'work_item_id'],
  ['part_uses_work_item_id_index', 'part_uses', 'work_item_id'],
  ['work_notes_work_item_id_index', 'work_notes', 'work_item_id'],
  ['photos_work_item_id_index', 'photos', 'work_item_id'],
  ['acknowledgements_disclosure_id_index', 'acknowledgements', 'disclosure_id'],
  ['deposits_piano_id_index', 'deposits', 'piano_id'],
  ['deposits_disclosure_id_index', 'deposits', 'disclosure_id'],
  ['deposits_acknowledgement_id_index', 'deposits', 'acknowledgement_id'],
  ['deposits_payment_intent_id_index', 'deposits', 'payment_intent_id'],
  // The sweep that frees pianos whose hold ran out, once a minute.
  ['deposits_holding_expiry_index', 'deposits', 'hold_expires_at', `status = 'holding'`],
  ['climate_readings_at_index', 'climate_readings', 'at'],
];

export async function up(knex: Knex): Promise<void> {
  for (const [name, table, columns, where] of INDEXES) {
    // A retry after a failed run finds the invalid index that build left, and builds it again.
    await knex.raw('drop index concurrently if exists ??', [name]);
    await knex.raw(`create index concurrently ?? on ?? (${columns})${where ? ` where ${where}` : ''}`, [name, table]);
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const [name] of INDEXES) await knex.raw('drop index concurrently if exists ??', [name]);
}
