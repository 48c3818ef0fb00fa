// Money is held in integer minor units of its currency; minor-unit digits per ISO 4217.
export const CURRENCY_DIGITS = { USD: 2, CAD: 2, EUR: 2, GBP: 2, JPY: 0 } as const;
export type Currency = keyof typeof CURRENCY_DIGITS;
export const CURRENCIES = Object.keys(CURRENCY_DIGITS) as Currency[];

/** Rounds to a whole minor unit, half away from zero (so 0.5 becomes 1 and -0.5 becomes -1). */
export function roundMinor(value: number): number {
  const r = Math.round(Math.abs(value) + 1e-9);
  return value < 0 ? -r : r;
}

/** Major units (as typed, e.g. 95.50) to minor units of the currency. */
export function toMinor(major: number, currency: Currency): number {
  return roundMinor(major * 10 ** CURRENCY_DIGITS[currency]);
}

export function formatMoney(minor: number, currency: Currency): string {
  const digits = CURRENCY_DIGITS[currency];
  const major = minor / 10 ** digits;
  return `${currency} ${major.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits })}`;
}

export function isCurrency(value: string): value is Currency {
  return Object.prototype.hasOwnProperty.call(CURRENCY_DIGITS, value);
}

/** Money as the shop writes it (USD 4,275.00); an unknown currency still shows its number. */
export function moneyText(minor: number, currency: string): string {
  return isCurrency(currency) ? formatMoney(minor, currency) : `${currency} ${minor}`;
}
