// The deposit terms a buyer reads before paying: the dealer's template, in plain words.
import { defaultDepositRules, depositAmount } from '@/modules/deposits/core/deposit';
import { isCurrency, money } from '@/modules/disclosure/ui/disclosure-format';
import { toMinor } from '@/modules/shop/core/money';
import type { PublicDisclosure } from '@/modules/disclosure/ui/public-disclosure';

export interface DepositQuote {
  amountMinor: number;
  currency: string;
  holdDays: number;
  /** how the amount is reached, when worked out from the default rules */
  basis: string | null;
}

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

/** The template's points, in order; the last says what kind of text this is. */
export function depositTerms(quote: DepositQuote, dealerName: string): string[] {
  const amount = money(quote.amountMinor, quote.currency);
  return [
    `The deposit is ${amount}${quote.basis ? ` (${quote.basis})` : ''}. It is paid by card on the payment provider's secure page; ${dealerName} never sees your card number.`,
    `Once your payment arrives, ${dealerName} takes the piano off the floor and holds it for you for ${quote.holdDays} days.`,
    'The deposit counts toward the price. The balance (the price plus any sales tax, less the deposit) is due at the sale.',
    'If another buyer’s deposit for this piano arrived before yours, yours is refunded in full, automatically.',
    `What happens to the deposit if you decide not to buy, or the hold ends without a sale, follows ${dealerName}’s terms of sale: ask before you pay.`,
    `These terms are a template for the dealer to adapt to local consumer-protection and sales law. They are not legal advice.`,
  ];
}
