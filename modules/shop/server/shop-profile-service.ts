import type { Knex } from 'knex';

import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { ShopSetting } from '@/modules/disclosure/server/disclosure-models';
import { Piano } from '@/modules/pianos/server/piano-model';
import type { DealerLocality } from '@/modules/shop/core/dealer-time';
import { DEFAULT_SHOP_PROFILE, shopProfileInput, type IdlePiano, type ShopProfile } from '@/modules/shop/core/shop-profile';
import { notAllowed } from '@/server/errors';

import { WorkItem } from './shop-models';

const KEY = 'shopProfile';
const DAY_MS = 86_400_000;

/** The dealer's address, contact, locale, time zone and workshop rule; the defaults for what was never set. */
export async function shopProfile(trx?: Knex.Transaction): Promise<ShopProfile> {
  const row = await ShopSetting.query(trx).findById(KEY);
  return { ...DEFAULT_SHOP_PROFILE, ...((row?.value as Partial<ShopProfile>) ?? {}) };
}

/** Where the shop is, for writing its dates. */
export async function shopLocality(trx?: Knex.Transaction): Promise<DealerLocality> {
  const { locale, timeZone } = await shopProfile(trx);
  return { locale, timeZone };
}

export async function readShopProfile(actor: Actor): Promise<ShopProfile> {
  if (!can(actor.role, 'readPianos')) throw notAllowed('read the shop details');
  return shopProfile();
}

export async function setShopProfile(actor: Actor, raw: unknown): Promise<ShopProfile> {
  if (!can(actor.role, 'editShopProfile')) throw notAllowed('change the shop details');
  const profile = shopProfileInput.parse(raw);
  await ShopSetting.query().insert({ key: KEY, value: profile, updatedById: actor.id }).onConflict('key').merge();
  return profile;
}


/** The most a manager's list of idle pianos shows at once (GraphQL `maxRows`). */
export const MAX_IDLE_LISTED = 50;

/**
 * Pianos in the workshop longer than the shop's `workshopIdleDays` with no work items at all, longest
 * first: in the workshop on paper, and nobody has planned a thing. One statement.
 */
export async function idleInWorkshop(actor: Actor, now: Date): Promise<{ idleDays: number; pianos: IdlePiano[] }> {
  if (!can(actor.role, 'seeIdleWorkshop')) throw notAllowed('see idle pianos in the workshop');
  const { workshopIdleDays } = await shopProfile();
  const before = new Date(now.getTime() - workshopIdleDays * DAY_MS).toISOString();
  const rows = await Piano.query()
    .where('stage', 'in_workshop')
    .where('stage_changed_at', '<', before)
    .whereNotExists(WorkItem.query().select(1).whereColumn('work_items.piano_id', 'pianos.id'))
    .orderBy('stage_changed_at')
    .orderBy('id')
    .limit(MAX_IDLE_LISTED)
    .select('id', 'stock_number', 'maker', 'model', 'stage_changed_at');
  return {
    idleDays: workshopIdleDays,
    pianos: rows.map((p) => ({ pianoId: p.id, stockNumber: p.stockNumber, maker: p.maker, model: p.model, inWorkshopSince: p.stageChangedAt, days: Math.floor((now.getTime() - Date.parse(p.stageChangedAt)) / DAY_MS) })),
  };
}
