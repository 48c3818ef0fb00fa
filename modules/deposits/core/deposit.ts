import { z } from '@/modules/input/core/zod';

import { CURRENCY_DIGITS, roundMinor, toMinor, type Currency } from '@/modules/shop/core/money';

import { salesTaxMinor } from './sale';

// Shop rules for deposits and the balance at sale: shop defaults, set by a manager.
/** Where a deposit stands: paid and holding the piano, applied at the sale, or ended otherwise. */
export const DEPOSIT_STATUSES = ['pending', 'holding', 'applied', 'released', 'expired', 'refunding', 'refunded', 'cancelled'] as const;
export type DepositStatus = (typeof DEPOSIT_STATUSES)[number];

export interface DepositRules {
  /** Share of the asking price taken as a deposit. */
  percent: number;
  /** The least deposit, in major units of the piano's currency. */
  minimumMajor: number;
  holdDays: number;
  /** Sales tax on the price, in percent (0 where none applies). */
  salesTaxPct: number;
}

export const defaultDepositRules: DepositRules = { percent: 10, minimumMajor: 250, holdDays: 14, salesTaxPct: 0 };

export const depositRulesInput = z
  .object({
    percent: z.number().min(1, 'must be 1-100 %').max(100, 'must be 1-100 %'),
    minimumMajor: z.number().min(0).max(1_000_000),
    holdDays: z.number().int().min(1, 'must be 1-90 days').max(90, 'must be 1-90 days'),
    salesTaxPct: z.number().min(0, 'must be 0-30 %').max(30, 'must be 0-30 %'),
  })
  .strict();

/**
 * The deposit for a price: `percent` of it, at least the minimum, never more than the price,
 * rounded half away from zero to the currency's minor unit (ISO 4217).
 */
export function depositAmount(priceMinor: number, currency: Currency, rules: DepositRules = defaultDepositRules): number {
  if (!Number.isInteger(priceMinor) || priceMinor <= 0) throw new RangeError('the price must be a positive whole number of minor units');
  const share = roundMinor((priceMinor * rules.percent) / 100);
  return Math.min(priceMinor, Math.max(share, toMinor(rules.minimumMajor, currency)));
}

export interface Balance {
  priceMinor: number;
  taxMinor: number;
  totalMinor: number;
  depositMinor: number;
  balanceMinor: number;
  currency: Currency;
  salesTaxPct: number;
}

/** Balance due at sale: price + sales tax - deposit. Tax is rounded once, on the price, half away from zero (`salesTaxMinor`). */
export function balanceDue(priceMinor: number, depositMinor: number, currency: Currency, rules: DepositRules = defaultDepositRules): Balance {
  const taxMinor = salesTaxMinor(priceMinor, rules.salesTaxPct);
  const totalMinor = priceMinor + taxMinor;
  return { priceMinor, taxMinor, totalMinor, depositMinor, balanceMinor: totalMinor - depositMinor, currency, salesTaxPct: rules.salesTaxPct };
}

export const minorDigits = (currency: Currency) => CURRENCY_DIGITS[currency];
