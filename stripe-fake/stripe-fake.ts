import { createHmac, randomBytes } from 'node:crypto';
import type { Server } from 'node:http';

import express, { type NextFunction, type Request, type Response } from 'express';

import { checkoutPage, paymentsPage } from './checkout-page';
import { luhnValid } from './luhn';

// A local stand-in for the hosted payment API: the calls Feltwire makes, in the provider's own
// request and error shapes, a hosted checkout page, and signed webhooks with bounded retries.

type Obj = Record<string, unknown>;
const DIGITS: Record<string, number> = { usd: 2, cad: 2, eur: 2, gbp: 2, jpy: 0 };
const DECLINE = '4000000000000002';

export interface StripeFakeOptions {
  port: number;
  webhookUrl?: string;
  webhookSecret?: string;
  /** Waits before each retry of a webhook that got no 2xx answer; its length bounds the retries. */
  retryDelaysMs?: number[];
}

/** A failure the stand-in answers instead of doing the call, in the provider's error shape. */
export interface InjectedFailure {
  status: number;
  type: string;
  message: string;
  code?: string;
}

/** The provider's answer to a call that broke on its side: a 500 it asks the SDK not to retry under the same key. */
export const PROVIDER_OUTAGE: InjectedFailure = { status: 500, type: 'api_error', message: 'An unknown error occurred while processing this request.' };

export interface StripeFake {
  port: number;
  url: string;
  sessions: Map<string, Obj>;
  /** Every refund made, by id. */
  refunds: Map<string, Obj>;
  deliveries: { eventId: string; type: string; attempts: number; lastStatus: number | string }[];
  /** Points webhook deliveries at an endpoint (tests start their server after the fake). */
  setWebhook: (url: string, secret: string) => void;
  /** Holds webhook deliveries back until `resumeWebhooks`, which sends every held one at once. */
  pauseWebhooks: () => void;
  resumeWebhooks: () => void;
  /** The next `count` calls to `POST /v1/<endpoint>` fail with `failure` (the provider's error shape). */
  failNext: (endpoint: 'refunds' | 'checkout/sessions', count: number, failure?: InjectedFailure) => void;
  /** Resolves when every webhook delivery started so far has finished (tests wait on it). */
  idle: () => Promise<void>;
  close: () => Promise<void>;
}

const id = (prefix: string) => `${prefix}_test_${randomBytes(12).toString('hex')}`;
const now = () => Math.floor(Date.now() / 1000);

class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: string,
    message: string,
    readonly code?: string,
    readonly param?: string,
  ) {
    super(message);
  }
}

function money(amount: number, currency: string): string {
  const d = DIGITS[currency] ?? 2;
  return `${currency.toUpperCase()} ${(amount / 10 ** d).toLocaleString('en-US', { minimumFractionDigits: d, maximumFractionDigits: d })}`;
}

export async function startStripeFake(opts: StripeFakeOptions): Promise<StripeFake> {
  const sessions = new Map<string, Obj>();
  const intents = new Map<string, Obj>();
  const refunds = new Map<string, Obj>();
  const events = new Map<string, Obj>();
  const idempotent = new Map<string, { status: number; body: unknown }>();
  const deliveries: StripeFake['deliveries'] = [];
  const pending = new Set<Promise<void>>();
  const retryDelays = opts.retryDelaysMs ?? [500, 1000, 2000, 4000];
  const failures = new Map<string, { count: number; failure: InjectedFailure }>();
  let paused: { promise: Promise<void>; release: () => void } | null = null;
  let baseUrl = '';

  function sign(payload: string, secret: string): string {
    const t = now();
    return `t=${t},v1=${createHmac('sha256', secret).update(`${t}.${payload}`).digest('hex')}`;
  }

  async function deliver(event: Obj): Promise<void> {
    if (!opts.webhookUrl || !opts.webhookSecret) return;
    const record = { eventId: event.id as string, type: event.type as string, attempts: 0, lastStatus: '' as number | string };
    deliveries.unshift(record);
    if (paused) await paused.promise;
    const payload = JSON.stringify(event, null, 2);
    for (let attempt = 0; attempt <= retryDelays.length; attempt += 1) {
      if (attempt > 0) await new Promise((r) => setTimeout(r, retryDelays[attempt - 1]));
      record.attempts += 1;
      try {
        const res = await fetch(opts.webhookUrl, { method: 'POST', headers: { 'Content-Type': 'application/json', 'Stripe-Signature': sign(payload, opts.webhookSecret) }, body: payload });
        record.lastStatus = res.status;
        if (res.ok) return;
      } catch (err) {
        record.lastStatus = (err as Error).message;
      }
    }
  }

  function emit(type: string, object: Obj): Obj {
    const event = { id: id('evt'), object: 'event', api_version: '2025-01-27', created: now(), type, livemode: false, pending_webhooks: 1, data: { object } };
    events.set(event.id, event);
    const p = deliver(event).finally(() => pending.delete(p));
    pending.add(p);
    return event;
  }

  const app = express();
  app.set('query parser', 'extended');
  app.disable('x-powered-by');

  // The provider's API: bearer secret key, form-encoded bodies, idempotency keys on POSTs.
  const api = express.Router();
  api.use(express.urlencoded({ extended: true, limit: '100kb' }));
  api.use((req, _res, next) => {
    const key = (req.headers.authorization ?? '').replace(/^Bearer /, '');
    if (!key.startsWith('sk_test_')) return next(new ApiError(401, 'invalid_request_error', 'Invalid API Key provided.', 'api_key_invalid'));
    next();
  });
  api.use((req, res, next) => {
    const key = req.method === 'POST' ? req.header('Idempotency-Key') : undefined;
    if (!key) return next();
    const seen = idempotent.get(`${req.path}:${key}`);
    if (seen) {
      if (seen.status >= 500) res.set('Stripe-Should-Retry', 'false');
      res.status(seen.status).set('Idempotent-Replayed', 'true').json(seen.body);
      return;
    }
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      idempotent.set(`${req.path}:${key}`, { status: res.statusCode, body });
      return json(body);
    };
    next();
  });
  // An injected failure stands for an outage inside the provider: like its real 500s, the answer is
  // kept under the idempotency key (the middleware above), so only a fresh key tries again.
  api.use((req, res, next) => {
    const armed = req.method === 'POST' ? failures.get(req.path.slice(1)) : undefined;
    if (!armed || armed.count < 1) return next();
    armed.count -= 1;
    const { status, type, message, code } = armed.failure;
    res.status(status).set('Stripe-Should-Retry', 'false').json({ error: { type, message, ...(code ? { code } : {}) } });
  });

  api.post('/checkout/sessions', (req, res) => {
    const b = req.body as Obj & { line_items?: Obj[]; metadata?: Obj };
    const item = (b.line_items ?? [])[0] as { price_data?: { currency?: string; unit_amount?: string; product_data?: { name?: string } }; quantity?: string } | undefined;
    const amount = Number(item?.price_data?.unit_amount);
    const currency = String(item?.price_data?.currency ?? '').toLowerCase();
    if (b.mode !== 'payment') throw new ApiError(400, 'invalid_request_error', 'Only mode=payment is supported here.', 'parameter_invalid', 'mode');
    if (!Number.isInteger(amount) || amount < 1) throw new ApiError(400, 'invalid_request_error', 'Invalid integer: unit_amount.', 'parameter_invalid_integer', 'line_items[0][price_data][unit_amount]');
    if (!(currency in DIGITS)) throw new ApiError(400, 'invalid_request_error', `Invalid currency: ${currency}.`, 'parameter_invalid', 'line_items[0][price_data][currency]');
    if (typeof b.success_url !== 'string' || typeof b.cancel_url !== 'string') throw new ApiError(400, 'invalid_request_error', 'Missing required param: success_url.', 'parameter_missing', 'success_url');
    const quantity = Number(item?.quantity ?? 1);
    const session: Obj = {
      id: id('cs'),
      object: 'checkout.session',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: amount * quantity,
      currency,
      description: item?.price_data?.product_data?.name ?? 'Payment',
      customer_email: b.customer_email ?? null,
      metadata: b.metadata ?? {},
      payment_intent: null,
      success_url: b.success_url,
      cancel_url: b.cancel_url,
      created: now(),
      expires_at: Number(b.expires_at ?? now() + 24 * 3600),
      livemode: false,
    };
    session.url = `${baseUrl}/checkout/${session.id}`;
    sessions.set(session.id as string, session);
    res.json(session);
  });
  const findSession = (sid: string) => {
    const s = sessions.get(sid);
    if (!s) throw new ApiError(404, 'invalid_request_error', `No such checkout.session: '${sid}'`, 'resource_missing', 'id');
    return s;
  };
  api.get('/checkout/sessions/:id', (req, res) => {
    res.json(findSession(String(req.params.id)));
  });
  api.post('/checkout/sessions/:id/expire', (req, res) => {
    const s = findSession(String(req.params.id));
    if (s.status !== 'open') throw new ApiError(400, 'invalid_request_error', `Only open sessions can be expired; this one is ${s.status}.`, 'checkout_session_not_open');
    s.status = 'expired';
    emit('checkout.session.expired', s);
    res.json(s);
  });
  api.get('/payment_intents/:id', (req, res) => {
    const pi = intents.get(String(req.params.id));
    if (!pi) throw new ApiError(404, 'invalid_request_error', `No such payment_intent: '${req.params.id}'`, 'resource_missing', 'id');
    res.json(pi);
  });
  api.post('/refunds', (req, res) => {
    const b = req.body as Obj;
    const pi = intents.get(String(b.payment_intent ?? ''));
    if (!pi) throw new ApiError(400, 'invalid_request_error', `No such payment_intent: '${b.payment_intent}'`, 'resource_missing', 'payment_intent');
    const refundable = (pi.amount as number) - (pi.amount_refunded as number);
    const amount = b.amount != null ? Number(b.amount) : refundable;
    if (!Number.isInteger(amount) || amount < 1 || amount > refundable) {
      throw new ApiError(400, 'invalid_request_error', `Refund amount (${amount}) is greater than unrefunded amount on charge (${refundable})`, 'amount_too_large', 'amount');
    }
    pi.amount_refunded = (pi.amount_refunded as number) + amount;
    const refund: Obj = { id: id('re'), object: 'refund', amount, currency: pi.currency, payment_intent: pi.id, charge: pi.latest_charge, status: 'succeeded', reason: b.reason ?? null, metadata: b.metadata ?? {}, created: now() };
    refunds.set(refund.id as string, refund);
    emit('charge.refunded', { id: pi.latest_charge, object: 'charge', amount: pi.amount, amount_refunded: pi.amount_refunded, currency: pi.currency, payment_intent: pi.id, refunded: pi.amount_refunded === pi.amount, metadata: pi.metadata });
    res.json(refund);
  });
  api.get('/refunds', (req, res) => {
    const pi = req.query.payment_intent;
    const data = [...refunds.values()].filter((r) => pi == null || r.payment_intent === pi).reverse();
    res.json({ object: 'list', data: data.slice(0, 100), has_more: data.length > 100, url: '/v1/refunds' });
  });
  api.get('/events/:id', (req, res) => {
    const e = events.get(String(req.params.id));
    if (!e) throw new ApiError(404, 'invalid_request_error', `No such event: '${req.params.id}'`, 'resource_missing', 'id');
    res.json(e);
  });
  api.get('/events', (_req, res) => {
    res.json({ object: 'list', data: [...events.values()].reverse().slice(0, 100), has_more: events.size > 100, url: '/v1/events' });
  });
  app.use('/v1', api);

  // The hosted checkout page the buyer's browser is sent to.
  const page = (s: Obj, extra: Obj = {}) =>
    checkoutPage({ id: s.id, description: s.description, amount: money(s.amount_total as number, s.currency as string), closed: s.status !== 'open', status: s.status, ...extra });
  app.get('/checkout/:id', (req, res) => {
    const s = sessions.get(req.params.id);
    if (!s) {
      res.status(404).type('text').send('No such checkout.');
      return;
    }
    res.type('html').send(page(s));
  });
  app.post('/checkout/:id/pay', express.urlencoded({ extended: false, limit: '4kb' }), (req, res) => {
    const s = sessions.get(req.params.id);
    if (!s) {
      res.status(404).type('text').send('No such checkout.');
      return;
    }
    if (s.status !== 'open') {
      res.status(409).type('html').send(page(s));
      return;
    }
    const card = String(req.body.card ?? '').replace(/[\s-]/g, '');
    const exp = String(req.body.exp ?? '').match(/^(\d{2})\s*\/\s*(\d{2})$/);
    const again = (error: string) => res.status(402).type('html').send(page(s, { error, card: req.body.card }));
    if (!luhnValid(card)) return again('That card number is not valid. Check the digits and try again.');
    if (!exp || Number(exp[1]) < 1 || Number(exp[1]) > 12) return again('Enter the expiry as MM/YY.');
    if (!/^\d{3,4}$/.test(String(req.body.cvc ?? ''))) return again('Enter the 3 or 4 digit security code.');
    if (card === DECLINE) return again('Your card was declined. Try another card.');
    const pi: Obj = { id: id('pi'), object: 'payment_intent', amount: s.amount_total, amount_received: s.amount_total, amount_refunded: 0, currency: s.currency, status: 'succeeded', latest_charge: id('ch'), metadata: s.metadata, created: now() };
    intents.set(pi.id as string, pi);
    Object.assign(s, { status: 'complete', payment_status: 'paid', payment_intent: pi.id });
    emit('checkout.session.completed', s);
    res.redirect(303, String(s.success_url).replace('{CHECKOUT_SESSION_ID}', String(s.id)));
  });
  app.get('/checkout/:id/cancel', (req, res) => {
    const s = sessions.get(req.params.id);
    if (!s) {
      res.status(404).type('text').send('No such checkout.');
      return;
    }
    res.redirect(303, String(s.cancel_url));
  });
  app.get('/payments', (_req, res) => {
    const list = [...sessions.values()].reverse().map((s) => {
      const pi = s.payment_intent ? intents.get(s.payment_intent as string) : undefined;
      return { ...s, amount: money(s.amount_total as number, s.currency as string), refunded: pi ? money(pi.amount_refunded as number, s.currency as string) : '', created: new Date((s.created as number) * 1000).toISOString() };
    });
    res.type('html').send(paymentsPage({ sessions: list, deliveries }));
  });

  app.use((err: unknown, _req: Request, res: Response, next: NextFunction) => {
    if (res.headersSent) return next(err);
    const e = err instanceof ApiError ? err : new ApiError(500, 'api_error', 'Something went wrong in the payment stand-in.');
    res.status(e.status).json({ error: { type: e.type, message: e.message, ...(e.code ? { code: e.code } : {}), ...(e.param ? { param: e.param } : {}) } });
  });

  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(opts.port, '127.0.0.1', () => resolve(s));
    s.once('error', reject);
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : opts.port;
  baseUrl = `http://127.0.0.1:${port}`;
  return {
    port,
    url: baseUrl,
    sessions,
    refunds,
    deliveries,
    setWebhook: (url, secret) => {
      opts.webhookUrl = url;
      opts.webhookSecret = secret;
    },
    pauseWebhooks: () => {
      if (paused) return;
      let release = () => undefined as void;
      const promise = new Promise<void>((resolve) => (release = resolve));
      paused = { promise, release };
    },
    resumeWebhooks: () => {
      paused?.release();
      paused = null;
    },
    failNext: (endpoint, count, failure = PROVIDER_OUTAGE) => {
      failures.set(endpoint, { count, failure });
    },
    idle: async () => {
      while (pending.size) await Promise.all([...pending]);
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
