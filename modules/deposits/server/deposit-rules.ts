import type { Knex } from 'knex';

import { defaultDepositRules, depositAmount, type DepositRules } from '@/modules/deposits/core/deposit';
import { ShopSetting } from '@/modules/disclosure/server/disclosure-models';
import type { Currency } from '@/modules/shop/core/money';

// The shop's deposit rules and what they ask of a price: read by the deposit service and by the signed copy.
export async function depositRules(trx?: Knex.Transaction): Promise<DepositRules> {
  const row = await ShopSetting.query(trx).findById('depositRules');
  return { ...defaultDepositRules, ...((row?.value as Partial<DepositRules>) ?? {}) };
}

/** The deposit a buyer would pay on a disclosed price, under the shop's current rules. */
export async function publicDepositTerms(price: { minor: number; currency: string }, trx?: Knex.Transaction): Promise<{ amountMinor: number; currency: Currency; holdDays: number }> {
  const rules = await depositRules(trx);
  const currency = price.currency as Currency;
  return { amountMinor: depositAmount(price.minor, currency, rules), currency, holdDays: rules.holdDays };
}
