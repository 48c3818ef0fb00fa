import http from 'node:http';
import type { AddressInfo } from 'node:net';

import Stripe from 'stripe';

import { luhnValid } from '@/stripe-fake/luhn';
import { startStripeFake, type StripeFake } from '@/stripe-fake/stripe-fake';

describe('luhnValid', () => {
  // ISO/IEC 7812-1 (Luhn); the provider's published test cards: 4242 4242 4242 4242 and 4000 0000 0000 0002
  it.each([
    ['4242 4242 4242 4242', true],
    ['4000 0000 0000 0002', true],
    ['4242 4242 4242 4241', false],
    // card numbers are 12-19 digits; a shorter string is refused whatever its digits
    ['42424242424', false],
    ['0000000000000', true],
    ['4242-4242-4242-4242', true],
    ['4242 4242 4242 424x', false],
  ])('%s: %p', (card, ok) => expect(luhnValid(card)).toBe(ok));
});

describe('webhook deliveries', () => {
  let fake: StripeFake;
  let server: http.Server;
  const answers: number[] = [];
  const received: { signature: string; at: number }[] = [];
  const secret = 'whsec_retry_test';

  beforeAll(async () => {
    server = http.createServer((req, res) => {
      received.push({ signature: String(req.headers['stripe-signature']), at: Date.now() });
      req.resume();
      res.statusCode = answers.shift() ?? 200;
      res.end();
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
    fake = await startStripeFake({ port: 0, retryDelaysMs: [40, 80, 160] });
    fake.setWebhook(`http://127.0.0.1:${(server.address() as AddressInfo).port}/hook`, secret);
  });
  afterAll(async () => {
    await fake.close();
    await new Promise((resolve) => server.close(resolve));
  });

  async function paidCheckout(): Promise<void> {
    const stripe = new Stripe('sk_test_x', { host: '127.0.0.1', port: fake.port, protocol: 'http' });
    const session = await stripe.checkout.sessions.create({
      mode: 'payment',
      success_url: 'http://x.test/ok',
      cancel_url: 'http://x.test/no',
      line_items: [{ quantity: 1, price_data: { currency: 'usd', unit_amount: 25000, product_data: { name: 'Deposit' } } }],
    });
    const pay = await fetch(`${fake.url}/checkout/${session.id}/pay`, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ card: '4242424242424242', exp: '12/30', cvc: '123' }),
    });
    expect(pay.status).toBe(303);
    await fake.idle();
  }

  it('retries a delivery that gets no 2xx, with growing waits, until one succeeds', async () => {
    received.length = 0;
    answers.push(500, 503);
    await paidCheckout();
    expect(received).toHaveLength(3);
    expect(fake.deliveries[0]).toMatchObject({ type: 'checkout.session.completed', attempts: 3, lastStatus: 200 });
    const gaps = [received[1].at - received[0].at, received[2].at - received[1].at];
    expect(gaps[0]).toBeGreaterThanOrEqual(35);
    expect(gaps[1]).toBeGreaterThanOrEqual(75);
    // each attempt is signed afresh: t=<unix>,v1=<HMAC-SHA256>
    for (const r of received) expect(r.signature).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
  });

  it('gives up after a bounded number of attempts', async () => {
    received.length = 0;
    answers.push(500, 500, 500, 500, 500, 500);
    await paidCheckout();
    expect(received).toHaveLength(4);
    expect(fake.deliveries[0]).toMatchObject({ attempts: 4, lastStatus: 500 });
    answers.length = 0;
  });
});

describe('failures on request', () => {
  let fake: StripeFake;
  beforeAll(async () => {
    fake = await startStripeFake({ port: 0 });
  });
  afterAll(() => fake.close());

  it('fails the next refund in the provider’s error shape, keeps that answer under its key, then refunds', async () => {
    const stripe = new Stripe('sk_test_x', { host: '127.0.0.1', port: fake.port, protocol: 'http', maxNetworkRetries: 2 });
    const session = await stripe.checkout.sessions.create({ mode: 'payment', success_url: 'http://x.test/ok', cancel_url: 'http://x.test/no', line_items: [{ quantity: 1, price_data: { currency: 'usd', unit_amount: 25000, product_data: { name: 'Deposit' } } }] });
    await fetch(`${fake.url}/checkout/${session.id}/pay`, { method: 'POST', redirect: 'manual', headers: { 'Content-Type': 'application/x-www-form-urlencoded' }, body: new URLSearchParams({ card: '4242424242424242', exp: '12/30', cvc: '123' }) });
    const pi = String(fake.sessions.get(session.id)!.payment_intent);
    fake.failNext('refunds', 1);
    // The provider asks the SDK not to retry its 500s, so one call is one attempt.
    await expect(stripe.refunds.create({ payment_intent: pi }, { idempotencyKey: 'refund-a' })).rejects.toMatchObject({ type: 'StripeAPIError', statusCode: 500, message: 'An unknown error occurred while processing this request.' });
    await expect(stripe.refunds.create({ payment_intent: pi }, { idempotencyKey: 'refund-a' })).rejects.toMatchObject({ statusCode: 500 });
    expect(fake.refunds.size).toBe(0);
    const refund = await stripe.refunds.create({ payment_intent: pi }, { idempotencyKey: 'refund-b' });
    expect(refund).toMatchObject({ amount: 25000, payment_intent: pi, status: 'succeeded' });
    expect((await stripe.refunds.list({ payment_intent: pi })).data.map((r) => r.id)).toEqual([refund.id]);
    await fake.idle();
  });
});

