import Stripe from 'stripe';

import { depositAmount } from '@/modules/deposits/core/deposit';
import { expireHolds } from '@/modules/deposits/server/deposit-service';

import { startTestApi, type TestApi } from '../support/api';

let api: TestApi;
let base: string;
beforeAll(async () => {
  api = await startTestApi();
  base = await api.listen();
});
afterAll(() => api.close());

type Json = Record<string, any>;
async function call(role: 'floor' | 'manager' | 'technician', query: string, variables?: Json): Promise<Json> {
  const res = await api.gql(await api.tokenFor(role), query, variables);
  if (res.body.errors) throw Object.assign(new Error(res.body.errors[0].message), { extensions: res.body.errors[0].extensions });
  return res.body.data;
}

// A piano on the floor with a published disclosure, from the demo scenario; each test takes its own.
const taken = new Set<number>();
async function floorPiano(): Promise<{ pianoId: number; token: string; price: number }> {
  let row = (await api.knex('pianos').where('stage', 'on_floor').orderBy('id')).find((r) => !taken.has(r.id));
  if (!row) {
    // Floor staff bring the ready piano out and publish its disclosure.
    const ready = await api.knex('pianos').where('stage', 'ready').first();
    await call('floor', `mutation { movePiano(pianoId: ${ready.id}, action: "put_on_floor") { stage } }`);
    await call('floor', `mutation { publishDisclosure(pianoId: ${ready.id}) }`);
    row = await api.knex('pianos').where({ id: ready.id }).first();
  }
  taken.add(row.id);
  const { token } = (await call('floor', `{ disclosures(pianoId: ${row.id}) }`)).disclosures;
  return { pianoId: row.id, token, price: row.asking_price_minor };
}

async function acknowledged(token: string, name: string, email: string): Promise<string> {
  const d = (await api.http.get(`/api/public/disclosures/${token}`)).body;
  const ack = await api.http.post(`/api/public/disclosures/${token}/acknowledge`).send({ fullName: name, email, read: true, digest: d.digest });
  expect(ack.status).toBe(201);
  return ack.body.receiptToken;
}

async function checkout(token: string, receiptToken: string): Promise<{ url: string; sessionId: string; amountMinor: number }> {
  const res = await api.http.post(`/api/public/disclosures/${token}/deposit`).send({ receiptToken });
  expect(res.status).toBe(201);
  return { ...res.body, sessionId: res.body.url.split('/').pop() };
}

function pay(sessionId: string, card: string) {
  return fetch(`${api.stripeFake.url}/checkout/${sessionId}/pay`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ card, exp: '12/30', cvc: '123', name: 'Test Buyer' }),
  });
}
const stageOf = async (id: number) => (await api.knex('pianos').where({ id }).first()).stage;
const mailTo = (email: string) => api.mail.messages.filter((m) => m.to.includes(email));

describe('a deposit paid online', () => {
  it('holds the piano, records the deposit once, and e-mails the buyer and the floor staff', async () => {
    const { pianoId, token, price } = await floorPiano();
    const early = await api.http.post(`/api/public/disclosures/${token}/deposit`).send({ receiptToken: 'x'.repeat(32) });
    expect(early.status).toBe(409);

    // The buyer's page quotes the deposit before the checkout.
    const page = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    expect(page.depositTerms).toEqual({ amountMinor: depositAmount(price, 'USD'), currency: 'USD', holdDays: 14 });
    const receipt = await acknowledged(token, 'Hana Liebermann', 'hana@example.test');
    const co = await checkout(token, receipt);
    // 10 % of the price, at least 250.00 (shop default)
    expect(co.amountMinor).toBe(depositAmount(price, 'USD'));
    expect(api.stripeFake.sessions.get(co.sessionId)!.metadata).toMatchObject({ pianoId: String(pianoId), disclosureVersion: '1' });

    const paid = await pay(co.sessionId, '4242 4242 4242 4242');
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://feltwire.test/d/${token}/deposit?session=${co.sessionId}`);
    await api.stripeFake.idle();

    expect(await stageOf(pianoId)).toBe('held');
    const deposits = await api.knex('deposits').where({ piano_id: pianoId });
    expect(deposits).toHaveLength(1);
    expect(deposits[0]).toMatchObject({ status: 'holding', amount_minor: co.amountMinor, buyer_email: 'hana@example.test' });
    const days = (Date.parse(deposits[0].hold_expires_at) - Date.parse(deposits[0].paid_at)) / 86_400_000;
    expect(Math.round(days)).toBe(14);
    expect(mailTo('hana@example.test').map((m) => m.subject)).toEqual([expect.stringMatching(/^Receipt: deposit to hold FW-/)]);
    expect(api.mail.messages.find((m) => m.to.includes('floor@feltwire.test'))!.subject).toMatch(/^Held: FW-/);

    const status = (await api.http.get(`/api/public/disclosures/${token}/deposit?session=${co.sessionId}`)).body;
    expect(status).toMatchObject({ status: 'holding', amountMinor: co.amountMinor, balance: { priceMinor: price, depositMinor: co.amountMinor, balanceMinor: price - co.amountMinor } });

    // The same event delivered 20 more times changes nothing.
    const events = await new Stripe('sk_test_x', { host: '127.0.0.1', port: api.stripeFake.port, protocol: 'http' }).events.list();
    const completed = events.data.find((e) => e.type === 'checkout.session.completed' && (e.data.object as Stripe.Checkout.Session).id === co.sessionId)!;
    const payload = JSON.stringify(completed);
    const mails = api.mail.messages.length;
    for (let i = 0; i < 20; i += 1) {
      const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: api.webhookSecret });
      const res = await api.http.post('/api/webhooks/payments').set('Stripe-Signature', header).set('Content-Type', 'application/json').send(payload);
      expect(res.body).toEqual({ received: true, duplicate: true });
    }
    expect(await api.knex('deposits').where({ piano_id: pianoId })).toHaveLength(1);
    expect(await api.knex('payment_events').where({ event_id: completed.id })).toHaveLength(1);
    expect(api.mail.messages.length).toBe(mails);
    const history = await api.knex('stage_moves').where({ piano_id: pianoId, action: 'hold' });
    expect(history).toHaveLength(1);
    expect(history[0]).toMatchObject({ by_role: 'system', from_stage: 'on_floor', to_stage: 'held' });
  });

  it('refuses a forged or stale signature with 400 and stores nothing', async () => {
    const payload = JSON.stringify({ id: 'evt_forged', object: 'event', type: 'checkout.session.completed', data: { object: { id: 'cs_test_forged', payment_status: 'paid' } } });
    const before = await api.knex('payment_events').count('* as n').first();
    const forged = Stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_not_the_secret' });
    const stale = Stripe.webhooks.generateTestHeaderString({ payload, secret: api.webhookSecret, timestamp: Math.floor(Date.now() / 1000) - 3600 });
    for (const header of [forged, stale, 't=1,v1=00', undefined]) {
      const req = api.http.post('/api/webhooks/payments').set('Content-Type', 'application/json');
      const res = await (header ? req.set('Stripe-Signature', header) : req).send(payload);
      expect(res.status).toBe(400);
      expect(res.body).toEqual({ error: 'The webhook signature does not match.' });
    }
    expect(await api.knex('payment_events').count('* as n').first()).toEqual(before);
  });

  it('two checkouts for one piano completed at the same moment: one hold, one refund, two e-mails', async () => {
    const { pianoId, token } = await floorPiano();
    const a = await checkout(token, await acknowledged(token, 'Ilse Marchetti', 'ilse@example.test'));
    const b = await checkout(token, await acknowledged(token, 'Joon Farrow', 'joon@example.test'));
    const [pa, pb] = await Promise.all([pay(a.sessionId, '4242424242424242'), pay(b.sessionId, '4242424242424242')]);
    expect([pa.status, pb.status]).toEqual([303, 303]);
    await api.stripeFake.idle();

    expect(await stageOf(pianoId)).toBe('held');
    const deposits = await api.knex('deposits').where({ piano_id: pianoId }).orderBy('id');
    expect(deposits.map((d) => d.status).sort()).toEqual(['holding', 'refunded']);
    const loser = deposits.find((d) => d.status === 'refunded')!;
    expect(loser.refund_id).toMatch(/^re_test_/);
    expect(loser.refunded_minor).toBe(loser.amount_minor);
    const winner = deposits.find((d) => d.status === 'holding')!;
    expect(mailTo(winner.buyer_email).map((m) => m.subject)).toEqual([expect.stringMatching(/^Receipt/)]);
    expect(mailTo(loser.buyer_email).map((m) => m.subject)).toEqual([expect.stringMatching(/has been refunded$/)]);
  });

  it('a declined card stores no deposit and leaves the piano on the floor', async () => {
    const { pianoId, token } = await floorPiano();
    const co = await checkout(token, await acknowledged(token, 'Kofi Ambrose', 'kofi@example.test'));
    const declined = await pay(co.sessionId, '4000 0000 0000 0002');
    expect(declined.status).toBe(402);
    expect(await declined.text()).toContain('Your card was declined');
    // ISO/IEC 7812-1: a number failing the Luhn check is refused before any charge
    const typo = await pay(co.sessionId, '4242 4242 4242 4241');
    expect(typo.status).toBe(402);
    expect(await typo.text()).toContain('not valid');
    await api.stripeFake.idle();
    expect(await stageOf(pianoId)).toBe('on_floor');
    expect((await api.knex('deposits').where({ piano_id: pianoId }).first()).status).toBe('pending');
    expect(mailTo('kofi@example.test')).toEqual([]);
  });

  it('a manager releases a hold with a refund; an expired hold frees the piano; a sale applies the deposit', async () => {
    // release with refund
    const one = await floorPiano();
    await pay((await checkout(one.token, await acknowledged(one.token, 'Lior Castell', 'lior@example.test'))).sessionId, '4242424242424242');
    await api.stripeFake.idle();
    const dep = await api.knex('deposits').where({ piano_id: one.pianoId, status: 'holding' }).first();
    const floorTry = await api.gql(await api.tokenFor('floor'), `mutation { releaseHold(depositId: ${dep.id}, refund: true) }`);
    expect(floorTry.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    const released = (await call('manager', `mutation { releaseHold(depositId: ${dep.id}, refund: true, why: "Buyer changed plans") }`)).releaseHold;
    expect(released).toMatchObject({ status: 'refunded', refundedMinor: dep.amount_minor });
    expect(await stageOf(one.pianoId)).toBe('on_floor');

    // the next buyer holds it, the hold runs out
    await pay((await checkout(one.token, await acknowledged(one.token, 'Mina Okoro', 'mina@example.test'))).sessionId, '4242424242424242');
    await api.stripeFake.idle();
    expect(await stageOf(one.pianoId)).toBe('held');
    const deps = { stripe: new Stripe('sk_test_x', { host: '127.0.0.1', port: api.stripeFake.port, protocol: 'http' }), mailer: { send: async () => undefined }, publicUrl: 'http://feltwire.test', webhookSecret: api.webhookSecret };
    expect(await expireHolds(deps, new Date(Date.now() + 13 * 86_400_000))).toBe(0);
    const holding = (await api.knex('deposits').where({ status: 'holding' })).length;
    expect(await expireHolds(deps, new Date(Date.now() + 15 * 86_400_000))).toBe(holding);
    expect(await stageOf(one.pianoId)).toBe('on_floor');
    expect((await api.knex('deposits').where({ piano_id: one.pianoId }).orderBy('id', 'desc').first()).status).toBe('expired');

    // a third buyer holds it and buys it
    const co = await checkout(one.token, await acknowledged(one.token, 'Nell Varga', 'nell@example.test'));
    await pay(co.sessionId, '4242424242424242');
    await api.stripeFake.idle();
    const sale = (await call('floor', `mutation { recordSale(pianoId: ${one.pianoId}) }`)).recordSale;
    expect(sale.stage).toBe('sold');
    expect(sale.balance).toMatchObject({ depositMinor: co.amountMinor, balanceMinor: one.price - co.amountMinor, taxMinor: 0 });
    expect((await api.knex('deposits').where({ checkout_session_id: co.sessionId }).first()).status).toBe('applied');
    const after = (await call('floor', `{ deposits(pianoId: ${one.pianoId}) }`)).deposits;
    expect(after.balance).toMatchObject({ depositMinor: co.amountMinor, balanceMinor: one.price - co.amountMinor });
  });

  it('answers the SDK in the provider’s error shape', async () => {
    const stripe = new Stripe('sk_test_x', { host: '127.0.0.1', port: api.stripeFake.port, protocol: 'http' });
    await expect(
      stripe.checkout.sessions.create({ mode: 'payment', success_url: 'http://x.test/ok', cancel_url: 'http://x.test/no', line_items: [{ quantity: 1, price_data: { currency: 'usd', unit_amount: -5, product_data: { name: 'x' } } }] }),
    ).rejects.toMatchObject({ type: 'StripeInvalidRequestError', param: 'line_items[0][price_data][unit_amount]' });
    await expect(new Stripe('rk_live_x', { host: '127.0.0.1', port: api.stripeFake.port, protocol: 'http' }).events.list()).rejects.toMatchObject({ type: 'StripeAuthenticationError' });
    void base;
  });
});
