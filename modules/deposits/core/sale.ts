import { z } from '@/modules/input/core/zod';
import { sellerInput } from '@/modules/assessment/core/intake-input';
import { pianoInput } from '@/modules/pianos/core/piano';
import type { Currency } from '@/modules/shop/core/money';

// The sale's totals, in integer minor units of one ISO 4217 currency.

/** Sales tax rates are kept to four decimals of a percent (8.875 % is 88 750 ten-thousandths). */
const RATE_SCALE = 10_000;

export interface SaleTerms {
  /** The price agreed with the buyer (it may differ from the asking price). */
  agreedPriceMinor: number;
  currency: Currency;
  /** The dealer's sales tax rate in percent, 0 where none applies. */
  salesTaxPct: number;
  /** The deposit already paid online and applied at the sale. */
  depositMinor: number;
  /** What the dealer allows for the buyer's own piano taken in trade, 0 for none. */
  tradeInAllowanceMinor: number;
}

export interface SaleTotals extends SaleTerms {
  taxMinor: number;
  /** Agreed price + sales tax. */
  totalMinor: number;
  /** What the buyer still pays: total less deposit and trade-in allowance, never below zero. */
  balanceMinor: number;
  /** What the dealer owes the buyer when deposit and allowance exceed the total (paid back, never a negative balance). */
  owedToBuyerMinor: number;
}

const whole = (n: number) => Number.isSafeInteger(n) && n >= 0;

/**
 * Sales tax on the agreed price: price x rate, rounded once, half away from zero, to the currency's
 * minor unit. Computed in whole numbers, so no binary fraction tips a half the wrong way.
 * The trade-in allowance does not lower the taxed amount: where local law taxes the net price, the
 * dealer sets the rate accordingly (a template, not tax advice).
 */
export function salesTaxMinor(priceMinor: number, salesTaxPct: number): number {
  if (!whole(priceMinor)) throw new RangeError('the price must be a whole, non-negative number of minor units');
  if (!(salesTaxPct >= 0 && salesTaxPct <= 100)) throw new RangeError('the sales tax rate must be 0-100 %');
  const rate = Math.round(salesTaxPct * RATE_SCALE);
  const divisor = 100 * RATE_SCALE;
  return Math.floor((priceMinor * rate + divisor / 2) / divisor);
}

/** The sale's lines and what is left to pay, or owed back to the buyer. */
export function saleTotals(terms: SaleTerms): SaleTotals {
  for (const key of ['agreedPriceMinor', 'depositMinor', 'tradeInAllowanceMinor'] as const) {
    if (!whole(terms[key])) throw new RangeError(`${key} must be a whole, non-negative number of minor units`);
  }
  const taxMinor = salesTaxMinor(terms.agreedPriceMinor, terms.salesTaxPct);
  const totalMinor = terms.agreedPriceMinor + taxMinor;
  const left = totalMinor - terms.depositMinor - terms.tradeInAllowanceMinor;
  return { ...terms, taxMinor, totalMinor, balanceMinor: Math.max(0, left), owedToBuyerMinor: Math.max(0, -left) };
}

const minor = (what: string) => z.number().int(`${what} must be a whole number of minor units`).min(0, `${what} cannot be negative`).max(1_000_000_000, `${what} is too large`);

/**
 * What a manager records at the sale, in the piano's own currency: the buyer (private like a
 * seller), the agreed price, the rate when it differs from the shop's, and the buyer's own piano taken in trade.
 */
export const saleInput = z
  .object({
    buyer: sellerInput,
    agreedPriceMinor: minor('the agreed price').min(1, 'the agreed price must be more than zero'),
    /** Left out: the shop's rate from the deposit rules. */
    salesTaxPct: z.number().min(0, 'must be 0-30 %').max(30, 'must be 0-30 %').nullish(),
    tradeIn: z.object({ piano: pianoInput, allowanceMinor: minor('the trade-in allowance') }).strict().nullish(),
  })
  .strict();
export type SaleInput = z.infer<typeof saleInput>;
