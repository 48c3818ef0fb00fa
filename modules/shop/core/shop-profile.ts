// Who the dealer is and where: the address and contact on every paper a buyer is handed, the locale and
// time zone its dates are written in, and how long a piano may sit in the workshop with no work planned.
import { z } from '@/modules/input/core/zod';

import { lineText, multiLineText } from '@/modules/input/core/text';

import { DEFAULT_LOCALITY, isLocale, isTimeZone } from './dealer-time';

export interface ShopProfile {
  /** postal address, one line or several */
  address: string;
  phone: string;
  email: string;
  website: string;
  locale: string;
  timeZone: string;
  /** a piano in the workshop longer than this with no work items is flagged to the manager */
  workshopIdleDays: number;
}

/** Shop defaults until a manager fills them in: no address or contact is invented for a real shop. */
export const DEFAULT_SHOP_PROFILE: ShopProfile = { address: '', phone: '', email: '', website: '', ...DEFAULT_LOCALITY, workshopIdleDays: 14 };

export const shopProfileInput = z
  .object({
    address: multiLineText().trim().max(300),
    phone: lineText().trim().max(40),
    email: lineText()
      .trim()
      .toLowerCase()
      .max(254)
      .refine((v) => v === '' || z.email().safeParse(v).success, 'must be an e-mail address'),
    website: lineText()
      .trim()
      .max(200)
      .refine((v) => v === '' || /^https?:\/\/[^\s/]+\.[^\s]+$/.test(v), 'must start with http:// or https://'),
    locale: lineText().trim().max(35).refine(isLocale, 'must be a language tag such as en-GB, en-US or de-DE'),
    timeZone: lineText().trim().max(64).refine(isTimeZone, 'must be a time zone such as Europe/London or America/Chicago'),
    workshopIdleDays: z.number().int('must be a whole number of days').min(1, 'must be 1-365 days').max(365, 'must be 1-365 days'),
  })
  .strict();

/** The dealer's contact as lines for a letterhead: the address lines, then phone, e-mail and website. */
export function contactLines(p: Pick<ShopProfile, 'address' | 'phone' | 'email' | 'website'>): string[] {
  const address = p.address
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter(Boolean);
  const reach = [p.phone && `Telephone ${p.phone}`, p.email && `E-mail ${p.email}`, p.website].filter(Boolean) as string[];
  return [...address, ...reach];
}

/** A piano in the workshop past the shop's idle days with no work items. */
export interface IdlePiano {
  pianoId: number;
  stockNumber: string;
  maker: string;
  model: string | null;
  inWorkshopSince: string;
  days: number;
}
