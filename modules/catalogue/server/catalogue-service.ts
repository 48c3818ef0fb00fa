import { catalogueEntry, catalogueQuery, CATALOGUE_PAGE, type CataloguePage } from '@/modules/catalogue/core/catalogue';
import type { AnyDisclosureContent } from '@/modules/disclosure/core/disclosure';
import { Disclosure } from '@/modules/disclosure/server/disclosure-models';
import { Photo } from '@/modules/photos/server/photo-model';
import type { PhotoStore } from '@/modules/photos/server/photo-store';

export interface CatalogueDeps {
  photos: PhotoStore;
}

interface Row {
  token: string;
  content: AnyDisclosureContent;
  published_at: string | Date;
  asking_price_minor: number | null;
  price_currency: string | null;
  total: string | number;
}

/**
 * The pianos on the floor that nobody holds, each as its newest published disclosure describes it,
 * with the live asking price. The piano's own record gives only its stage, hold and price: every
 * other word comes from the published content, so nothing unpublished can appear.
 */
export async function catalogue(deps: CatalogueDeps, raw: unknown): Promise<CataloguePage> {
  const q = catalogueQuery.parse(raw);
  const knex = Disclosure.knex();
  const offset = q.offset ?? 0;
  // The size the published text states, in cm ("upright, 125 cm tall").
  const sizeCm = knex.raw(`nullif(substring(d.content->'piano'->>'size' from '([0-9]+) cm'), '')::int`);
  const query = knex('pianos as p')
    .join('disclosure_links as l', 'l.piano_id', 'p.id')
    .joinRaw('join lateral (select content, published_at from disclosures where piano_id = p.id order by version desc limit 1) d on true')
    .where('p.stage', 'on_floor')
    .whereNotExists(knex('deposits').whereRaw('deposits.piano_id = p.id').where('deposits.status', 'holding'))
    .select('l.token', 'd.content', 'd.published_at', 'p.asking_price_minor', 'p.price_currency', knex.raw('count(*) over () as total'))
    .orderBy([{ column: 'p.stage_changed_at', order: 'desc' }, { column: 'p.id', order: 'desc' }])
    .limit(CATALOGUE_PAGE)
    .offset(offset);
  if (q.kind) query.whereRaw(`d.content->'piano'->>'kind' = ?`, [q.kind]);
  if (q.minSizeCm != null) query.where(sizeCm, '>=', q.minSizeCm);
  if (q.maxSizeCm != null) query.where(sizeCm, '<=', q.maxSizeCm);
  if (q.minPriceMinor != null) query.where('p.asking_price_minor', '>=', q.minPriceMinor);
  if (q.maxPriceMinor != null) query.where('p.asking_price_minor', '<=', q.maxPriceMinor);
  const rows = (await query) as Row[];

  const photoIds = rows.flatMap((r) => (r.content.photos[0] ? [r.content.photos[0].id] : []));
  const photoRows = photoIds.length ? await Photo.query().whereIn('id', photoIds).select('id', 'object_key') : [];
  const pianos = await Promise.all(
    rows.map(async (r) => {
      const first = r.content.photos[0];
      const stored = first ? photoRows.find((ph) => ph.id === first.id) : undefined;
      return catalogueEntry(r.content, {
        token: r.token,
        askingPrice: r.asking_price_minor != null && r.price_currency ? { minor: r.asking_price_minor, currency: r.price_currency } : null,
        publishedAt: new Date(r.published_at).toISOString(),
        photoUrl: stored ? await deps.photos.readUrl(stored.objectKey) : null,
      });
    }),
  );
  // Past the last page the window count is gone with the rows; count again only then.
  const total = rows.length ? Number(rows[0].total) : offset > 0 ? Number((await query.clone().clearSelect().clearOrder().offset(0).limit(1).select(knex.raw('count(*) over () as total')))[0]?.total ?? 0) : 0;
  return { dealerName: rows[0]?.content.dealerName ?? null, pianos, total, offset, pageSize: CATALOGUE_PAGE };
}
