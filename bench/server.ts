// The benchmark's server: the product's own app, with two bench-only routes that never ship in it:
// a statement counter, and the stock list as a plain Express route running the same Objection query.
import express from 'express';

import { Piano } from '@/modules/pianos/server/piano-model';
import { s3PhotoStore } from '@/modules/photos/server/photo-store';
import { createStripe } from '@/modules/deposits/server/payments';
import { createApp } from '@/server/app';
import { configurePassport, requireUser } from '@/server/auth';
import { bindModels, createKnex } from '@/server/db/knex';
import { DEFAULT_PAGE_SIZE } from '@/server/graphql/limits';
import { smtpMailer } from '@/server/mail';
import { createS3 } from '@/server/storage';
import { PIANO_FIELDS } from '@/modules/pianos/ui/use-pianos';

export const BENCH_JWT_SECRET = 'bench-secret-that-is-long-enough-0123456789';

/** The columns the stock list asks for, as the generated GraphQL read selects them (snake_case). */
const STOCK_COLUMNS = PIANO_FIELDS.split(' ').map((f) => `pianos.${f.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)}`);

function main(): void {
  const [url, port, s3Endpoint, webDir] = process.argv.slice(2);
  const knex = createKnex(url, { min: 0, max: 10 });
  bindModels(knex);
  let statements = 0;
  knex.on('query', () => {
    statements += 1;
  });
  if (process.env.BENCH_LOG_SQL === '1') knex.on('query', (q: { sql: string }) => console.log('[sql]', q.sql));
  // The peak resident memory since the last read, sampled every 50 ms.
  let peakRss = process.memoryUsage().rss;
  const sampler = setInterval(() => {
    peakRss = Math.max(peakRss, process.memoryUsage().rss);
  }, 50);
  (sampler as unknown as NodeJS.Timeout).unref();

  const auth = { jwtSecret: BENCH_JWT_SECRET, jwtTtlSeconds: 3600 };
  const s3 = createS3({ endpoint: s3Endpoint, region: 'us-east-1', bucket: 'feltwire-photos', accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' });
  const app = createApp({
    knex,
    auth,
    photos: s3PhotoStore(s3, 'feltwire-photos'),
    // Reads never send mail or take payments: neither address is ever reached.
    mailer: smtpMailer({ host: '127.0.0.1', port: 9, from: 'Bench <bench@feltwire.test>' }),
    payments: { stripe: createStripe('sk_test_bench', 'http://127.0.0.1:9'), webhookSecret: 'whsec_bench' },
    publicUrl: `http://127.0.0.1:${port}`,
    webDir,
  });

  const outer = express();
  outer.disable('x-powered-by');
  let requests = 0;
  outer.use((req, _res, next) => {
    if (!req.path.startsWith('/__bench/stats')) requests += 1;
    next();
  });
  // CPU time is less at the mercy of other work on the machine than requests per second are.
  outer.get('/__bench/stats', (_req, res) => {
    const cpu = process.cpuUsage();
    res.json({ statements, requests, cpuUs: cpu.user + cpu.system, peakRssMb: Math.round(peakRss / 1048576) });
    peakRss = process.memoryUsage().rss;
  });
  outer.use(app);
  // The same query the generated `pianos` read runs for the stock list, signed in the same way, and
  // mounted behind the product's app so a request passes the same middleware on its way as /graphql.
  const pp = configurePassport(auth);
  outer.use(pp.initialize());
  outer.post('/__bench/stock', express.json({ limit: '100kb' }), requireUser(pp), async (req, res) => {
    const { limit = DEFAULT_PAGE_SIZE, offset = 0 } = (req.body?.variables ?? {}) as { limit?: number; offset?: number };
    const pianos = await Piano.query().select(STOCK_COLUMNS).orderBy('pianos.created_at', 'desc').limit(limit).offset(offset);
    res.json({ data: { pianos } });
  });
  outer.listen(Number(port), '127.0.0.1', () => console.log(`bench server on ${port}`));
  process.once('SIGTERM', () => process.exit(0));
}

if (require.main === module) main();
