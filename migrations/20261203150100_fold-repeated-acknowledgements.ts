import type { Knex } from 'knex';

// Data: every acknowledgement after the first by the same e-mail on the same version points at the first.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    update acknowledgements a set repeats_id = f.first_id
    from (
      select id, first_value(id) over (partition by disclosure_id, lower(buyer_email) order by acknowledged_at, id) as first_id
      from acknowledgements
    ) f
    where a.id = f.id and f.first_id <> a.id and a.repeats_id is null
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex('acknowledgements').update({ repeats_id: null });
}
