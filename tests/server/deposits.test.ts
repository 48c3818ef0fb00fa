import Stripe from 'stripe';

import { depositAmount } from '@/modules/deposits/core/deposit';

import { startTestApi, type TestApi } from '../support/api';
import { buyers } from '../support/buyers';

let api: TestApi;
let b: ReturnType<typeof buyers>;
beforeAll(async () => {
  api = await startTestApi();
  await api.listen();
  b = buyers(api);
});
afterAll(() => api.close());

const DAY = 86_400_000;
const depositOf = async (sessionId: string) => api.knex('deposits').where({ checkout_session_id: sessionId }).first();
// The demo has four pianos for sale: tests that leave the piano on the floor share one, which the last test then sells.
let shared: Promise<{ pianoId: number; token: string; price: number }> | undefined;
const sharedPiano = () => (shared ??= b.floorPiano());
const jobsFor = async (task: string) => api.knex('graphile_worker.jobs').where({ task_identifier: task });

describe('a deposit paid online', () => {
  it('holds the piano, records the deposit once, and e-mails the buyer and the floor staff', async () => {
    const { pianoId, token, price } = await b.floorPiano();
    const early = await api.http.post(`/api/public/disclosures/${token}/deposit`).send({ receiptToken: 'x'.repeat(32) });
    expect(early.status).toBe(409);

    // The buyer's page quotes the deposit before the checkout.
    const page = (await api.http.get(`/api/public/disclosures/${token}`)).body;
    expect(page.depositTerms).toEqual({ amountMinor: depositAmount(price, 'USD'), currency: 'USD', holdDays: 14 });
    const receipt = await b.acknowledged(token, 'Hana Liebermann', 'hana@example.test');
    const co = await b.checkout(token, receipt);
    // 10 % of the price, at least 250.00 (shop default)
    expect(co.amountMinor).toBe(depositAmount(price, 'USD'));
    expect(api.stripeFake.sessions.get(co.sessionId)!.metadata).toMatchObject({ pianoId: String(pianoId), disclosureVersion: '1' });

    const paid = await b.pay(co.sessionId, '4242 4242 4242 4242');
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://feltwire.test/d/${token}/deposit?session=${co.sessionId}`);
    await api.stripeFake.idle();

    expect(await b.stageOf(pianoId)).toBe('held');
    const deposits = await api.knex('deposits').where({ piano_id: pianoId });
    expect(deposits).toHaveLength(1);
    expect(deposits[0]).toMatchObject({ status: 'holding', amount_minor: co.amountMinor, buyer_email: 'hana@example.test' });
    const days = (Date.parse(deposits[0].hold_expires_at) - Date.parse(deposits[0].paid_at)) / DAY;
    expect(Math.round(days)).toBe(14);
    // The hold's end is a job of its own, due when the hold ends.
    const expiry = (await jobsFor('expire-hold')).find((j) => j.key === `expire-hold:${deposits[0].id}`);
    expect(expiry.run_at).toBe(deposits[0].hold_expires_at);
    await api.jobs.settle();
    expect(b.mailTo('hana@example.test').map((m) => m.subject)).toEqual([expect.stringMatching(/^Receipt: deposit to hold FW-/)]);
    expect(api.mail.messages.find((m) => m.to.includes('floor@feltwire.test'))!.subject).toMatch(/^Held: FW-/);

    const status = (await api.http.get(`/api/public/disclosures/${token}/deposit?session=${co.sessionId}`)).body;
    expect(status).toMatchObject({ status: 'holding', amountMinor: co.amountMinor, balance: { priceMinor: price, depositMinor: co.amountMinor, balanceMinor: price - co.amountMinor } });

    // The same event delivered 20 more times changes nothing.
    const completed = await b.completedEvent(co.sessionId);
    const payload = JSON.stringify(completed);
    const mails = api.mail.messages.length;
    for (let i = 0; i < 20; i += 1) {
      const res = await api.http.post('/api/webhooks/payments').set('Stripe-Signature', b.signed(payload)).set('Content-Type', 'application/json').send(payload);
      expect(res.body).toEqual({ received: true, duplicate: true });
    }
    await api.jobs.settle();
    expect(await api.knex('deposits').where({ piano_id: pianoId })).toHaveLength(1);
    expect(await api.knex('payment_events').where({ event_id: completed.id })).toHaveLength(1);
    expect(api.mail.messages.length).toBe(mails);
    const history = await api.knex('stage_moves').where({ piano_id: pianoId, action: 'hold' });
    expect(history).toHaveLength(1);
    expect(history[0]).toMatchObject({ by_role: 'system', from_stage: 'on_floor', to_stage: 'held' });
  });

  it('refuses a forged signature with 400 and stores nothing', async () => {
    const payload = JSON.stringify({ id: 'evt_forged', object: 'event', type: 'checkout.session.completed', data: { object: { id: 'cs_test_forged', payment_status: 'paid' } } });
    const before = await api.knex('payment_events').count('* as n').first();
    const forged = Stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_not_the_secret' });
    const forgedFuture = Stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_not_the_secret', timestamp: Math.floor(Date.now() / 1000) + 3600 });
    for (const header of [forged, forgedFuture, 't=1,v1=00', undefined]) {
      const req = api.http.post('/api/webhooks/payments').set('Content-Type', 'application/json');
      const res = await (header ? req.set('Stripe-Signature', header) : req).send(payload);
      expect(res.status).toBe(400);
      expect(res.body).toEqual({ error: 'The webhook signature does not match.' });
    }
    expect(await api.knex('payment_events').count('* as n').first()).toEqual(before);
  });

  it('refuses a signature dated an hour in the future, or an hour old, with 400 and stores nothing', async () => {
    const { token } = await sharedPiano();
    const co = await b.checkout(token, await b.acknowledged(token, 'Pim Aldana', 'pim@example.test'));
    const payload = JSON.stringify({ id: 'evt_test_timeshift', object: 'event', type: 'checkout.session.completed', data: { object: { id: co.sessionId, payment_status: 'paid', payment_intent: 'pi_test_timeshift' } } });
    const nowSec = Math.floor(Date.now() / 1000);
    const cases: [number, string][] = [
      [nowSec + 3600, 'The webhook signature is dated in the future: check the clock of the sender.'],
      [nowSec - 3600, 'The webhook signature is too old: the event was sent more than 5 minutes ago.'],
    ];
    for (const [timestamp, message] of cases) {
      const res = await api.http.post('/api/webhooks/payments').set('Stripe-Signature', b.signed(payload, timestamp)).set('Content-Type', 'application/json').send(payload);
      expect([res.status, res.body]).toEqual([400, { error: message }]);
    }
    expect(await api.knex('payment_events').where({ event_id: 'evt_test_timeshift' })).toEqual([]);
    expect((await depositOf(co.sessionId)).status).toBe('pending');
  });

  it('two checkouts for one piano completed at the same moment: one hold, one refund made by its job, two e-mails', async () => {
    const { pianoId, token } = await b.floorPiano();
    const a = await b.checkout(token, await b.acknowledged(token, 'Ilse Marchetti', 'ilse@example.test'));
    const c = await b.checkout(token, await b.acknowledged(token, 'Joon Farrow', 'joon@example.test'));
    const [pa, pc] = await Promise.all([b.pay(a.sessionId), b.pay(c.sessionId)]);
    expect([pa.status, pc.status]).toEqual([303, 303]);
    await api.stripeFake.idle();
    await api.jobs.settle();

    expect(await b.stageOf(pianoId)).toBe('held');
    const deposits = await api.knex('deposits').where({ piano_id: pianoId }).orderBy('id');
    expect(deposits.map((d) => d.status).sort()).toEqual(['holding', 'refunded']);
    const loser = deposits.find((d) => d.status === 'refunded')!;
    expect(loser.refund_id).toBe(api.stripeFake.refunds.get(loser.refund_id)!.id);
    expect(loser.refunded_minor).toBe(loser.amount_minor);
    const winner = deposits.find((d) => d.status === 'holding')!;
    expect(b.mailTo(winner.buyer_email).map((m) => m.subject)).toEqual([expect.stringMatching(/^Receipt/)]);
    expect(b.mailTo(loser.buyer_email).map((m) => m.subject)).toEqual([expect.stringMatching(/has been refunded$/)]);
  });

  it('a refund that fails once shows as refunding, is tried again after a wait, and is made once', async () => {
    const { pianoId, token } = await b.floorPiano();
    const first = await b.checkout(token, await b.acknowledged(token, 'Quinn Abernathy', 'quinn@example.test'));
    const late = await b.checkout(token, await b.acknowledged(token, 'Rafa Lindqvist', 'rafa@example.test'));
    await b.pay(first.sessionId);
    await api.stripeFake.idle();
    api.stripeFake.failNext('refunds', 1);
    await b.pay(late.sessionId);
    await api.stripeFake.idle();
    await api.jobs.settle();

    // The first try failed: the deposit says a refund is on its way, the job waits for its next try.
    const waiting = await depositOf(late.sessionId);
    expect(waiting).toMatchObject({ status: 'refunding', refund_id: null, refunded_minor: 0, close_reason: 'The piano was already held for another buyer.' });
    const [job] = (await jobsFor('refund-deposit')).filter((j) => j.key === `refund-deposit:${waiting.id}`);
    expect(job).toMatchObject({ attempts: 1, max_attempts: 12, last_error: `The payment provider did not refund deposit #${waiting.id}: An unknown error occurred while processing this request.` });
    // graphile-worker's back-off: the next try is e^1 seconds later
    expect(Date.parse(job.run_at) - Date.parse(job.updated_at)).toBeGreaterThan(2000);
    expect(b.mailTo('rafa@example.test')).toEqual([]);

    await api.advance(5_000);
    const refunded = await depositOf(late.sessionId);
    const atProvider = [...api.stripeFake.refunds.values()].filter((r) => r.payment_intent === refunded.payment_intent_id);
    expect(atProvider).toHaveLength(1);
    expect(refunded).toMatchObject({ status: 'refunded', refund_id: atProvider[0].id, refunded_minor: late.amountMinor });
    expect(atProvider[0].amount).toBe(late.amountMinor);
    expect((await jobsFor('refund-deposit')).filter((j) => j.key === `refund-deposit:${waiting.id}`)).toEqual([]);
    expect(b.mailTo('rafa@example.test').map((m) => m.subject)).toEqual([expect.stringMatching(/has been refunded$/)]);
    expect(await b.stageOf(pianoId)).toBe('held');
  });

  it('a declined card stores no deposit and leaves the piano on the floor', async () => {
    const { pianoId, token } = await sharedPiano();
    const co = await b.checkout(token, await b.acknowledged(token, 'Kofi Ambrose', 'kofi@example.test'));
    const declined = await b.pay(co.sessionId, '4000 0000 0000 0002');
    expect(declined.status).toBe(402);
    expect(await declined.text()).toContain('Your card was declined');
    // ISO/IEC 7812-1: a number failing the Luhn check is refused before any charge
    const typo = await b.pay(co.sessionId, '4242 4242 4242 4241');
    expect(typo.status).toBe(402);
    expect(await typo.text()).toContain('not valid');
    await api.stripeFake.idle();
    expect(await b.stageOf(pianoId)).toBe('on_floor');
    expect((await depositOf(co.sessionId)).status).toBe('pending');
    expect(b.mailTo('kofi@example.test')).toEqual([]);
  });

  it('reuses the open checkout for the same buyer and piano instead of starting another', async () => {
    const { pianoId, token } = await sharedPiano();
    const receipt = await b.acknowledged(token, 'Sol Brennan', 'sol@example.test');
    // Two presses at the same moment, then the same buyer acknowledging again and pressing once more.
    const [one, two] = await Promise.all([b.checkout(token, receipt), b.checkout(token, receipt)]);
    const again = await b.checkout(token, await b.acknowledged(token, 'Sol Brennan', 'SOL@example.test'));
    const other = await b.checkout(token, await b.acknowledged(token, 'Tova Ring', 'tova@example.test'));
    expect([two.sessionId, again.sessionId]).toEqual([one.sessionId, one.sessionId]);
    expect(other.sessionId).not.toBe(one.sessionId);
    const rows = await api.knex('deposits').where({ piano_id: pianoId }).whereIn('buyer_email', ['sol@example.test', 'tova@example.test']).orderBy('id');
    expect(rows.map((r) => [r.checkout_session_id, r.buyer_email])).toEqual([
      [one.sessionId, 'sol@example.test'],
      [other.sessionId, 'tova@example.test'],
    ]);
    // Once that checkout has ended, the buyer gets a fresh one.
    await b.provider().checkout.sessions.expire(one.sessionId);
    await api.stripeFake.idle();
    const fresh = await b.checkout(token, receipt);
    expect(fresh.sessionId).not.toBe(one.sessionId);
    expect((await depositOf(one.sessionId)).status).toBe('cancelled');
  });

  it('a manager releases a hold with a refund; an expired hold frees the piano when its time comes; a sale applies the deposit', async () => {
    // release with refund: the refund job makes it, then the buyer hears
    const one = await sharedPiano();
    await b.pay((await b.checkout(one.token, await b.acknowledged(one.token, 'Lior Castell', 'lior@example.test'))).sessionId);
    await api.stripeFake.idle();
    const dep = await api.knex('deposits').where({ piano_id: one.pianoId, status: 'holding' }).first();
    const floorTry = await api.gql(await api.tokenFor('floor'), `mutation { releaseHold(depositId: ${dep.id}, refund: true) }`);
    expect(floorTry.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    const released = (await b.call('manager', `mutation { releaseHold(depositId: ${dep.id}, refund: true, why: "Buyer changed plans") }`)).releaseHold;
    expect(released).toMatchObject({ status: 'refunding', refundId: null, closeReason: 'Buyer changed plans' });
    expect(await b.stageOf(one.pianoId)).toBe('on_floor');
    // Its hold's end job went with the hold.
    expect((await jobsFor('expire-hold')).filter((j) => j.key === `expire-hold:${dep.id}`)).toEqual([]);
    await api.jobs.settle();
    const after = await api.knex('deposits').where({ id: dep.id }).first();
    expect(after).toMatchObject({ status: 'refunded', refund_id: expect.stringMatching(/^re_test_/), refunded_minor: dep.amount_minor });
    // The inbox lists the newest first.
    expect(b.mailTo('lior@example.test').map((m) => m.subject)).toEqual(['Your piano hold has been released', expect.stringMatching(/^Receipt/)]);
    expect(b.mailTo('lior@example.test')[0].text).toContain('Your deposit of USD');
    expect(b.mailTo('lior@example.test')[0].text).toContain('has been refunded');

    // the next buyer holds it; the hold runs out on the 14th day
    const mina = await b.checkout(one.token, await b.acknowledged(one.token, 'Mina Okoro', 'mina@example.test'));
    await b.pay(mina.sessionId);
    await api.stripeFake.idle();
    expect(await b.stageOf(one.pianoId)).toBe('held');
    await api.advance(13 * DAY);
    expect(await b.stageOf(one.pianoId)).toBe('held');
    await api.advance(2 * DAY);
    expect(await b.stageOf(one.pianoId)).toBe('on_floor');
    const expired = await depositOf(mina.sessionId);
    expect(expired).toMatchObject({ status: 'expired', close_reason: 'The hold expired.', refund_id: null });
    expect(Date.parse(expired.closed_at)).toBeGreaterThan(Date.parse(expired.hold_expires_at));
    const moves = await api.knex('stage_moves').where({ piano_id: one.pianoId, action: 'release_hold' }).orderBy('id');
    expect(moves.map((m) => [m.by_role, m.why])).toEqual([
      ['manager', 'Buyer changed plans'],
      ['system', 'The hold expired'],
    ]);
    expect(b.mailTo('mina@example.test').map((m) => m.subject)).toEqual(['A piano hold has expired', expect.stringMatching(/^Receipt/)]);

    // the manager refunds the kept deposit later: refunding, then refunded by the job
    const manual = (await b.call('manager', `mutation { refundDeposit(depositId: ${expired.id}) }`)).refundDeposit;
    expect(manual.status).toBe('refunding');
    await api.jobs.settle();
    expect(await depositOf(mina.sessionId)).toMatchObject({ status: 'refunded', refunded_minor: mina.amountMinor });
    const twice = await api.gql(await api.tokenFor('manager'), `mutation { refundDeposit(depositId: ${expired.id}) }`);
    expect(twice.body.errors[0].extensions.code).toBe('CONFLICT');

    // a third buyer holds it and buys it; the sale takes the hold's end job away
    const co = await b.checkout(one.token, await b.acknowledged(one.token, 'Nell Varga', 'nell@example.test'));
    await b.pay(co.sessionId);
    await api.stripeFake.idle();
    const nell = await depositOf(co.sessionId);
    const sale = (await b.call('floor', `mutation { recordSale(pianoId: ${one.pianoId}) }`)).recordSale;
    expect(sale.stage).toBe('sold');
    expect(sale.balance).toMatchObject({ depositMinor: co.amountMinor, balanceMinor: one.price - co.amountMinor, taxMinor: 0 });
    expect((await depositOf(co.sessionId)).status).toBe('applied');
    expect((await jobsFor('expire-hold')).filter((j) => j.key === `expire-hold:${nell.id}`)).toEqual([]);
    const deposits = (await b.call('floor', `{ deposits(pianoId: ${one.pianoId}) }`)).deposits;
    expect(deposits.balance).toMatchObject({ depositMinor: co.amountMinor, balanceMinor: one.price - co.amountMinor });
    await api.advance(20 * DAY);
    expect(await b.stageOf(one.pianoId)).toBe('sold');
  });

  it('answers the SDK in the provider’s error shape', async () => {
    const stripe = b.provider();
    await expect(
      stripe.checkout.sessions.create({ mode: 'payment', success_url: 'http://x.test/ok', cancel_url: 'http://x.test/no', line_items: [{ quantity: 1, price_data: { currency: 'usd', unit_amount: -5, product_data: { name: 'x' } } }] }),
    ).rejects.toMatchObject({ type: 'StripeInvalidRequestError', param: 'line_items[0][price_data][unit_amount]' });
    await expect(new Stripe('rk_live_x', { host: '127.0.0.1', port: api.stripeFake.port, protocol: 'http' }).events.list()).rejects.toMatchObject({ type: 'StripeAuthenticationError' });
  });
});
