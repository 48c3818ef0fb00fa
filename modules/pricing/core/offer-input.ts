import { z } from '@/modules/input/core/zod';

import { lineText } from '@/modules/input/core/text';
import { CURRENCIES, type Currency } from '@/modules/shop/core/money';

/** What the seller said to the offer: yes; a figure of their own; a figure both sides settled on after a counter; no. */
export const OFFER_ANSWERS = ['accepted', 'countered', 'agreed', 'declined'] as const;
export type OfferAnswer = (typeof OFFER_ANSWERS)[number];
export const OFFER_ANSWER_WORDS: Record<OfferAnswer, string> = {
  accepted: 'Seller accepted the offer',
  countered: 'Seller asked for more',
  agreed: 'Agreed after a counter-offer',
  declined: 'Seller declined',
};

const amount = z.number().int('must be whole minor units').min(0, 'must be 0 or more').max(1_000_000_000, 'is too large');

export const offerAnswerInput = z
  .object({
    pianoId: z.number().int().positive(),
    answer: z.enum(OFFER_ANSWERS, { message: `must be one of ${OFFER_ANSWERS.join(', ')}` }),
    /** the offer the screen showed: refused when the offer has changed since */
    offeredMinor: amount,
    counterMinor: amount.nullish(),
    agreedMinor: amount.nullish(),
    note: lineText().trim().max(300).nullish(),
  })
  .strict()
  .superRefine((a, ctx) => {
    const need = (field: 'counterMinor' | 'agreedMinor', wanted: boolean, why: string) => {
      if (wanted && a[field] == null) ctx.addIssue({ code: 'custom', path: [field], message: why });
      if (!wanted && a[field] != null) ctx.addIssue({ code: 'custom', path: [field], message: `only goes with the answer ${field === 'counterMinor' ? 'countered' : 'agreed'}` });
    };
    need('counterMinor', a.answer === 'countered', 'is the figure the seller asked for: required with a counter-offer');
    need('agreedMinor', a.answer === 'agreed', 'is the figure both sides agreed on: required with agreed');
  });
export type OfferAnswerInput = z.infer<typeof offerAnswerInput>;

export const PRICE_REASON_MIN = 3;

/** A manager's asking price for one piano, and why it is set or changed. */
export const priceChangeInput = z
  .object({
    pianoId: z.number().int().positive(),
    askingPriceMinor: amount,
    currency: z.enum(CURRENCIES as [Currency, ...Currency[]], { message: `must be one of ${CURRENCIES.join(', ')}` }),
    reason: lineText().trim().min(PRICE_REASON_MIN, `says why, in at least ${PRICE_REASON_MIN} characters`).max(200),
  })
  .strict();
export type PriceChangeInput = z.infer<typeof priceChangeInput>;
