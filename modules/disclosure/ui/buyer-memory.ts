// What the buyer's own device remembers about a disclosure link: the acknowledgement receipt,
// the newest version it has seen, and a deposit checkout it started. localStorage on the web.
import { z } from '@/modules/input/core/zod';

const receipt = z.object({
  acknowledgementId: z.number(),
  receiptToken: z.string().regex(/^[A-Za-z0-9_-]{32}$/),
  version: z.number().int(),
  digest: z.string(),
  acknowledgedAt: z.string(),
  fullName: z.string(),
  email: z.string(),
  /** the server answered with this buyer's earlier acknowledgement of the version */
  already: z.boolean().optional(),
});
export type AckReceipt = z.infer<typeof receipt>;

const seen = z.object({ version: z.number().int(), changedAt: z.string() });
export type SeenVersion = z.infer<typeof seen>;

function storage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    // privacy modes may refuse: the page then forgets on reload, nothing worse
    return null;
  }
}

function read<T>(key: string, schema: z.ZodType<T>): T | null {
  const raw = storage()?.getItem(key);
  if (!raw) return null;
  try {
    const parsed = schema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

function write(key: string, value: unknown): void {
  try {
    storage()?.setItem(key, JSON.stringify(value));
  } catch {
    // a full or refused store only costs the reminder
  }
}

export const receiptKey = (token: string) => `feltwire.ack.${token}`;
const seenKey = (token: string) => `feltwire.seen.${token}`;
const checkoutKey = (token: string) => `feltwire.deposit.${token}`;

export const readReceipt = (token: string) => read(receiptKey(token), receipt);
export const writeReceipt = (token: string, value: AckReceipt) => write(receiptKey(token), value);

export const readSeen = (token: string) => read(seenKey(token), seen);
export const writeSeen = (token: string, value: SeenVersion) => write(seenKey(token), value);

/** The checkout session of a deposit this device paid (or started), to find the hold again. */
export const readCheckout = (token: string) => read(checkoutKey(token), z.string().regex(/^cs_[A-Za-z0-9_]{8,80}$/));
export const writeCheckout = (token: string, sessionId: string) => write(checkoutKey(token), sessionId);
