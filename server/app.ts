import compression from 'compression';
import express, { type Request } from 'express';
import { GraphQLError } from 'graphql';
import type { Knex } from 'knex';

import type { User } from '@/modules/accounts/server/user-model';
import type { PhotoStore } from '@/modules/photos/server/photo-store';
import type { DisclosureDeps } from '@/modules/disclosure/server/disclosure-service';
import type { PricingDeps } from '@/modules/pricing/server/pricing-service';
import { handlePaymentWebhook, publicDepositStatus, startBalancePayment, startDeposit, type DepositDeps } from '@/modules/deposits/server/deposit-service';
import type Stripe from 'stripe';

import { authRouter, configurePassport, inboxGuard, requireUser, type AuthOptions } from './auth';
import { systemClock, type Clock } from './clock';
import { DEFAULT_LIMITS, type Limits } from './config';
import { toGraphQLError } from './errors';
import { securityHeaders } from './headers';
import type { GraphContext } from './graphql/context';
import { DOMAINS } from './graphql/domains';
import { compiledExecution } from './graphql/compiled-execution';
import { graphqlRoute } from './graphql/http';
import { plainResponse } from './graphql/plain-response';
import { buildSchema } from './graphql/schema';
import { publicReadLimit, publicWriteLimit } from './rate-limits';
import { errorHandler, jsonBody, routeNotFound } from './requests';
import { uploadsRouter } from './uploads';
import { mountWeb } from './web';
import type { Mailer } from './mail';
import { inboxRouter, type MailFake } from './mail-fake';
import { catalogueRouter, documentsRouter, publicRouter } from './public-routes';
import { stockRouter } from './stock-routes';

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
  /** The origin presigned photo links point at, allowed as an image source. */
  photoOrigin?: string;
  /** Rate limits; the defaults when not given. */
  limits?: Limits;
  /** The time business rules run on; tests move it on. */
  clock?: Clock;
}

/** What the domains' services need, shared by the request handlers and the background jobs. */
export function serviceDeps(deps: AppDeps): { disclosure: DisclosureDeps; deposits: DepositDeps; pricing: PricingDeps } {
  return {
    disclosure: { photos: deps.photos, publicUrl: deps.publicUrl, clock: deps.clock ?? systemClock },
    pricing: { clock: deps.clock ?? systemClock },
    deposits: { ...deps.payments, publicUrl: deps.publicUrl, clock: deps.clock ?? systemClock },
  };
}

const API_PREFIXES = ['/graphql', '/auth', '/healthz', '/api', '/dev'];

export function createApp(deps: AppDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(securityHeaders(deps.photoOrigin));
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

  const limits = deps.limits ?? DEFAULT_LIMITS;
  const publicWrites = publicWriteLimit(limits.publicWrites);
  app.use('/auth', authRouter(deps.auth, limits.signIn));
  const { disclosure, deposits, pricing } = serviceDeps(deps);
  // The signature is checked over the exact bytes received, so this route reads the raw body.
  app.post('/api/webhooks/payments', express.raw({ type: '*/*', limit: '256kb' }), async (req, res) => {
    res.json(await handlePaymentWebhook(deposits, Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0), req.header('Stripe-Signature')));
  });
  app.post('/api/public/disclosures/:token/deposit', publicWrites, jsonBody('4kb'), async (req, res) => {
    res.status(201).json(await startDeposit(deposits, req.params.token, req.body));
  });
  app.post('/api/public/disclosures/:token/balance', publicWrites, async (req, res) => {
    res.status(201).json(await startBalancePayment(deposits, req.params.token));
  });
  app.get('/api/public/disclosures/:token/deposit', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await publicDepositStatus(req.params.token, String(req.query.session ?? '')));
  });
  app.use('/api/public', catalogueRouter({ photos: deps.photos }, publicReadLimit(limits.publicReads)));
  app.use('/api/public', publicRouter(disclosure, publicWrites));
  app.use('/api', uploadsRouter(pp, deps.photos));
  app.use('/api', documentsRouter(pp, disclosure));
  app.use('/api', stockRouter(pp, pricing));
  if (deps.mailFake) app.use('/dev', inboxGuard(pp), inboxRouter(deps.mailFake));

  // GraphQL over HTTP: GET for queries, POST for everything; other methods are no route.
  const graphql = [
    requireUser(pp),
    express.json({ limit: '100kb' }),
    graphqlRoute<GraphContext>({
      schema: buildSchema(DOMAINS),
      context: (req: Request) => ({ user: req.user as User, photos: deps.photos, disclosure, deposits, pricing }),
      formatError,
      execute: compiledExecution(),
      onOperation: plainResponse,
    }),
  ];
  app.get('/graphql', graphql);
  app.post('/graphql', graphql);
  app.use(API_PREFIXES, routeNotFound);

  if (deps.webDir) mountWeb(app, deps.webDir, API_PREFIXES);
  app.use(errorHandler);
  return app;
}

// Resolver failures are mapped in one place; a document refused before it ran is the caller's to mend.
function formatError(err: Readonly<GraphQLError | Error>): GraphQLError {
  // graphql-http's own refusals of the request (no query, variables not an object) are plain errors.
  if (!(err instanceof GraphQLError)) return new GraphQLError(err.message, { extensions: { code: 'BAD_INPUT' } });
  const original = err.originalError;
  if (original && !(original instanceof GraphQLError) && err.path) {
    const mapped = toGraphQLError(original);
    return new GraphQLError(mapped.message, { path: err.path, nodes: err.nodes, extensions: mapped.extensions });
  }
  if (!err.path && !err.extensions?.code) return new GraphQLError(err.message, { nodes: err.nodes, extensions: { ...err.extensions, code: 'BAD_INPUT' } });
  return err;
}
