import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // One acknowledgement per buyer (e-mail, any case) and version: of two at once, the database lets one in.
  await knex.raw('create unique index acknowledgements_one_per_buyer on acknowledgements (disclosure_id, lower(buyer_email)) where repeats_id is null');
  // The check page finds a version by the leading digits of its digest.
  await knex.raw('create index disclosures_digest_prefix on disclosures (digest text_pattern_ops)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop index disclosures_digest_prefix');
  await knex.raw('drop index acknowledgements_one_per_buyer');
}
