// The deposit terms a buyer reads before paying, and on the signed copy: plain words from the figures.
import { moneyText } from '@/modules/shop/core/money';

export interface DepositQuote {
  amountMinor: number;
  currency: string;
  holdDays: number;
  /** how the amount is reached, when worked out from the default rules */
  basis: string | null;
}

/** The terms' points, in order, written to the buyer. */
export function depositTerms(quote: DepositQuote, dealerName: string): string[] {
  const amount = moneyText(quote.amountMinor, quote.currency);
  return [
    `The deposit is ${amount}${quote.basis ? ` (${quote.basis})` : ''}. It is paid by card on the payment provider's secure page; ${dealerName} never sees your card number.`,
    `Once your payment arrives, ${dealerName} takes the piano off the floor and holds it for you for ${quote.holdDays} days.`,
    'The deposit counts toward the price. The balance (the price plus any sales tax, less the deposit) is due at the sale.',
    'If another buyer’s deposit for this piano arrived before yours, yours is refunded in full, automatically.',
    `What happens to the deposit if you decide not to buy, or the hold ends without a sale, follows ${dealerName}’s terms of sale: ask before you pay.`,
  ];
}
