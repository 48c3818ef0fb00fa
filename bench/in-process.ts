// Figures taken inside the bench's own process: the two PDFs and the token check, each alternating its variants.
import { createSecretKey } from 'node:crypto';
import { performance } from 'node:perf_hooks';

import knexFactory from 'knex';
import type passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';

import type { DisclosureContent } from '@/modules/disclosure/core/disclosure';
import { floorTagPdf, signedCopyPdf } from '@/modules/disclosure/server/disclosure-pdf';
import { verificationCode } from '@/modules/disclosure/core/verification';
import { depositTerms } from '@/modules/deposits/core/deposit-terms';
import { configurePassport, signToken } from '@/server/auth';

import { median, round } from './numbers';


/** The signed copy and the floor tag of a real disclosure from the bench data, warm, alternating. */
export async function measurePdfs(url: string, samples = 25): Promise<{ disclosureMs: number; floorTagMs: number; samples: number }> {
  const knex = knexFactory({ client: 'pg', connection: url, pool: { min: 0, max: 1 } });
  let row: { content: DisclosureContent; version: number; digest: string; token: string };
  try {
    row = await knex('disclosures').join('disclosure_links', 'disclosure_links.piano_id', 'disclosures.piano_id').orderBy('disclosures.id').first('disclosures.content', 'disclosures.version', 'disclosures.digest', 'disclosure_links.token');
  } finally {
    await knex.destroy();
  }
  const c = row.content;
  const signed = () =>
    signedCopyPdf(c, {
      version: row.version,
      digest: row.digest,
      code: verificationCode(row.digest),
      checkUrl: 'http://127.0.0.1:8148/check',
      price: 'USD 4,500.00',
      dealer: { name: c.dealerName, contact: ['1 Bench Row, Millbrook', 'Telephone +1 555 0100'] },
      where: { locale: 'en-GB', timeZone: 'UTC' },
      buyerName: 'Wren Halvorsen',
      buyerEmail: 'buyer@example.test',
      acknowledgedAt: '2026-12-01T10:00:00.000Z',
      countersignedBy: 'Fern Adeyemi-Holt',
      countersignedAt: '2026-12-01T10:05:00.000Z',
      deposit: { kind: 'terms', amount: 'USD 450.00', holdDays: 14, terms: depositTerms({ amountMinor: 45000, currency: 'USD', holdDays: 14, basis: null }, c.dealerName) },
    });
  const tag = () => floorTagPdf({ stockNumber: c.piano.stockNumber, title: `${c.piano.maker} ${c.piano.model ?? ''}`.trim(), price: 'USD 4,500.00', url: `http://127.0.0.1:8148/d/${row.token}`, dealerName: c.dealerName });
  for (let i = 0; i < 3; i += 1) {
    await signed();
    await tag();
  }
  const times = { disclosure: [] as number[], tag: [] as number[] };
  for (let i = 0; i < samples; i += 1) {
    let t = performance.now();
    await signed();
    times.disclosure.push(performance.now() - t);
    t = performance.now();
    await tag();
    times.tag.push(performance.now() - t);
  }
  return { disclosureMs: round(median(times.disclosure)), floorTagMs: round(median(times.tag)), samples };
}

type Checkable = passport.Strategy & { _verify: (payload: unknown, done: (err: unknown, user?: unknown) => void) => void };

/** One token check through a strategy, its user lookup replaced so only the check is timed. */
function checker(strategy: Checkable): (token: string) => Promise<void> {
  strategy._verify = (payload, done) => done(null, payload);
  return (token) =>
    new Promise((resolve, reject) => {
      const s = Object.create(strategy) as Checkable & { success: () => void; fail: (why: unknown) => void; error: (e: unknown) => void };
      s.success = () => resolve();
      s.fail = (why) => reject(new Error(`token refused: ${JSON.stringify(why)}`));
      s.error = reject;
      (s.authenticate as (this: unknown, req: unknown, options: unknown) => void).call(s, { headers: { authorization: `Bearer ${token}` } }, {});
    });
}

/** Microseconds per token check: the server's own strategy, against one given a string and one given a key object. */
export async function measureTokenCheck(): Promise<{ serverUs: number; stringSecretUs: number; keyObjectUs: number }> {
  const opts = { jwtSecret: 'bench-secret-that-is-long-enough-0123456789', jwtTtlSeconds: 3600 };
  const token = signToken({ id: 4, role: 'manager' }, opts);
  const reference = (secretOrKey: string | ReturnType<typeof createSecretKey>) =>
    new JwtStrategy({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: secretOrKey as string, issuer: 'feltwire', audience: 'feltwire-staff', algorithms: ['HS256'] }, () => undefined) as unknown as Checkable;
  const server = (configurePassport(opts) as unknown as { _strategy(name: string): Checkable })._strategy('jwt');
  const variants = { server: checker(server), stringSecret: checker(reference(opts.jwtSecret)), keyObject: checker(reference(createSecretKey(Buffer.from(opts.jwtSecret)))) };
  const per: Record<keyof typeof variants, number[]> = { server: [], stringSecret: [], keyObject: [] };
  const batch = 500;
  for (let round_ = 0; round_ < 8; round_ += 1) {
    for (const [name, check] of Object.entries(variants) as [keyof typeof variants, (t: string) => Promise<void>][]) {
      const t = performance.now();
      for (let i = 0; i < batch; i += 1) await check(token);
      if (round_ > 0) per[name].push(((performance.now() - t) * 1000) / batch);
    }
  }
  return { serverUs: round(median(per.server)), stringSecretUs: round(median(per.stringSecret)), keyObjectUs: round(median(per.keyObject)) };
}
