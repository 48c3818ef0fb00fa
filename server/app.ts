import compression from 'compression';
import express, { type NextFunction, type Request, type Response } from 'express';
import depthLimit from 'graphql-depth-limit';
import { createHandler } from 'graphql-http/lib/use/express';
import { GraphQLError } from 'graphql';
import type { Knex } from 'knex';

import type { User } from '@/modules/accounts/server/user-model';
import type { PhotoStore } from '@/modules/photos/server/photo-store';
import type { DisclosureDeps } from '@/modules/disclosure/server/disclosure-service';
import { handlePaymentWebhook, publicDepositStatus, startDeposit, type DepositDeps } from '@/modules/deposits/server/deposit-service';
import type Stripe from 'stripe';

import { authRouter, configurePassport, requireUser, type AuthOptions } from './auth';
import { toAppError, toGraphQLError } from './errors';
import type { GraphContext } from './graphql/context';
import { compiledExecution } from './graphql/compiled-execution';
import { documentCache } from './graphql/document-cache';
import { plainResponse } from './graphql/plain-response';
import { DOMAINS } from './graphql/domains';
import { MAX_QUERY_DEPTH } from './graphql/limits';
import { buildSchema } from './graphql/schema';
import { uploadsRouter } from './uploads';
import type { Mailer } from './mail';
import { inboxRouter, type MailFake } from './mail-fake';
import { documentsRouter, publicRouter } from './public-routes';
import { mountWeb } from './web';

export interface AppDeps {
  knex: Knex;
  auth: AuthOptions;
  photos: PhotoStore;
  mailer: Mailer;
  payments: { stripe: Stripe; webhookSecret: string };
  /** The address buyers reach the app at, for links in e-mails and on floor tags. */
  publicUrl: string;
  /** The local inbox, when the mail fake runs (development and tests). */
  mailFake?: MailFake;
  webDir?: string;
}

const API_PREFIXES = ['/graphql', '/auth', '/healthz', '/api', '/dev'];

export function createApp(deps: AppDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  // Answers go compressed to browsers that take it; the web app's files are compressed ahead of time (server/web.ts).
  app.use(compression());
  const pp = configurePassport(deps.auth);
  app.use(pp.initialize());

  app.get('/healthz', async (_req, res) => {
    try {
      await deps.knex.raw('select 1');
      res.json({ ok: true });
    } catch {
      res.status(503).json({ ok: false });
    }
  });

  app.use('/auth', authRouter(deps.auth));
  const disclosure: DisclosureDeps = { photos: deps.photos, mailer: deps.mailer, publicUrl: deps.publicUrl };
  const deposits: DepositDeps = { ...deps.payments, mailer: deps.mailer, publicUrl: deps.publicUrl };
  // The signature is checked over the exact bytes received, so this route reads the raw body.
  app.post('/api/webhooks/payments', express.raw({ type: '*/*', limit: '256kb' }), async (req, res) => {
    res.json(await handlePaymentWebhook(deposits, Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0), req.header('Stripe-Signature')));
  });
  app.post('/api/public/disclosures/:token/deposit', express.json({ limit: '4kb' }), async (req, res) => {
    res.status(201).json(await startDeposit(deposits, req.params.token, req.body));
  });
  app.get('/api/public/disclosures/:token/deposit', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await publicDepositStatus(req.params.token, String(req.query.session ?? '')));
  });
  app.use('/api/public', publicRouter(disclosure));
  app.use('/api', uploadsRouter(pp, deps.photos));
  app.use('/api', documentsRouter(pp, disclosure));
  if (deps.mailFake) app.use('/dev', inboxRouter(deps.mailFake));

  const schema = buildSchema(DOMAINS);
  app.use(express.json({ limit: '100kb' }));
  app.all(
    '/graphql',
    requireUser(pp),
    createHandler<GraphContext>({
      schema,
      ...documentCache(),
      execute: compiledExecution(),
      onOperation: plainResponse,
      context: (req) => ({ user: (req.raw as Request).user as User, photos: deps.photos, disclosure, deposits }),
      validationRules: (_req, _args, specified) => [...specified, depthLimit(MAX_QUERY_DEPTH)],
      formatError: (err) => {
        if (err instanceof GraphQLError && err.originalError && !(err.originalError instanceof GraphQLError)) {
          const mapped = toGraphQLError(err.originalError);
          return new GraphQLError(mapped.message, { path: err.path, nodes: err.nodes, extensions: mapped.extensions });
        }
        return err;
      },
    }),
  );

  if (deps.webDir) mountWeb(app, deps.webDir, API_PREFIXES);

  app.use((err: unknown, _req: Request, res: Response, next: NextFunction) => {
    if (res.headersSent) return next(err);
    const status = (err as { status?: number; type?: string }).type === 'entity.parse.failed' ? 400 : undefined;
    const app = toAppError(err);
    if (app.code === 'INTERNAL' && !status) console.error(err);
    res.status(status ?? app.status).json({ error: status ? 'The request body is not valid JSON.' : app.message });
  });
  return app;
}
