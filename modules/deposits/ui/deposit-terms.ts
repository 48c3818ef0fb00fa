// The deposit a buyer is quoted before paying; the terms' words are in deposits/core.
import { defaultDepositRules, depositAmount } from '@/modules/deposits/core/deposit';
import type { DepositQuote } from '@/modules/deposits/core/deposit-terms';
import { isCurrency, money } from '@/modules/disclosure/ui/disclosure-format';
import { toMinor } from '@/modules/shop/core/money';
import type { PublicDisclosure } from '@/modules/disclosure/ui/public-disclosure';

export { depositTerms, type DepositQuote } from '@/modules/deposits/core/deposit-terms';

/** The deposit this piano asks: the server's figure when it sends one, else the shop's default rules. */
export function depositQuote(disclosure: PublicDisclosure): DepositQuote | null {
  if (disclosure.depositTerms) return { ...disclosure.depositTerms, basis: null };
  const price = disclosure.content.askingPrice;
  if (!price || price.minor <= 0 || !isCurrency(price.currency)) return null;
  const rules = defaultDepositRules;
  return {
    amountMinor: depositAmount(price.minor, price.currency, rules),
    currency: price.currency,
    holdDays: rules.holdDays,
    basis: `${rules.percent} % of the asking price, at least ${money(toMinor(rules.minimumMajor, price.currency), price.currency)}`,
  };
}
