import type { Request, Response } from 'express';
import { rateLimit, type Options } from 'express-rate-limit';

import type { Limits } from './config';
import type { Middleware } from './requests';

const MINUTE = 60_000;

// The answer past a limit: 429, Retry-After (set by the library), and when to try again in words.
function refuse(what: string) {
  return (req: Request, res: Response) => {
    const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
    const minutes = Math.max(1, Math.ceil(((reset?.getTime() ?? Date.now() + MINUTE) - Date.now()) / MINUTE));
    res.status(429).json({ error: `${what} Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.` });
  };
}

const common = (windowMinutes: number, limit: number): Partial<Options> => ({
  windowMs: windowMinutes * MINUTE,
  limit,
  standardHeaders: 'draft-7',
  legacyHeaders: false,
});

// The e-mail as the sign-in reads it; a body without one is not an attempt at any account.
const accountOf = (req: Request): string | null => {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : null;
};

/**
 * Failed sign-ins per address (before the body is read) and per account (after): each attempt counts
 * from its start and is taken back when it succeeds, so a burst is cut off before bcrypt runs.
 */
export function signInLimits(limits: Limits['signIn']): { perAddress: Middleware; perAccount: Middleware } {
  return {
    perAddress: rateLimit({
      ...common(limits.windowMinutes, limits.failuresPerAddress),
      skipSuccessfulRequests: true,
      handler: refuse('Too many failed sign-ins from this address.'),
    }),
    perAccount: rateLimit({
      ...common(limits.windowMinutes, limits.failuresPerAccount),
      skipSuccessfulRequests: true,
      skip: (req) => accountOf(req) == null,
      keyGenerator: (req) => `account:${accountOf(req)}`,
      handler: refuse('Too many failed sign-ins for this account.'),
    }),
  };
}

/** Anonymous list reads (the catalogue) per address: each one runs a search, so a scraper is slowed. */
export function publicReadLimit(limits: Limits['publicReads']): Middleware {
  return rateLimit({ ...common(limits.windowMinutes, limits.perAddress), handler: refuse('Too many requests from this address.') });
}

/** Anonymous writes (acknowledgements, deposit checkouts) per address, successful or not. */
export function publicWriteLimit(limits: Limits['publicWrites']): Middleware {
  return rateLimit({ ...common(limits.windowMinutes, limits.perAddress), handler: refuse('Too many requests from this address.') });
}
