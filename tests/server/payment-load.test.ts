// Payments under load through a listening server: one event delivered 20 times at once, and ten
// buyers paying for one piano at the same moment.
import { startTestApi, type TestApi } from '../support/api';
import { buyers, eventually } from '../support/buyers';

let api: TestApi;
let base: string;
let b: ReturnType<typeof buyers>;
beforeAll(async () => {
  api = await startTestApi();
  base = await api.listen();
  b = buyers(api);
});
afterAll(() => api.close());

/** Polls /healthz until `done` resolves; every answer is kept. */
async function pollHealth(done: Promise<unknown>): Promise<{ status: number; ok: boolean }[]> {
  const answers: { status: number; ok: boolean }[] = [];
  let finished = false;
  void done.finally(() => (finished = true));
  while (!finished) {
    try {
      const res = await fetch(`${base}/healthz`, { signal: AbortSignal.timeout(5000) });
      answers.push({ status: res.status, ok: ((await res.json()) as { ok: boolean }).ok });
    } catch {
      answers.push({ status: 0, ok: false });
    }
    await new Promise((r) => setTimeout(r, 20));
  }
  return answers;
}

describe('payments under load', () => {
  it('20 simultaneous deliveries of one completed checkout: every one answered within 5 s, one hold, /healthz answering throughout', async () => {
    const { pianoId, token } = await b.floorPiano();
    const co = await b.checkout(token, await b.acknowledged(token, 'Oona Pellegrini', 'oona@example.test'));
    api.stripeFake.pauseWebhooks();
    expect((await b.pay(co.sessionId)).status).toBe(303);
    const payload = JSON.stringify(await b.completedEvent(co.sessionId));

    const burst = Promise.all(
      Array.from({ length: 20 }, async () => {
        // The bound: a delivery not answered within 5 s counts as refused.
        const res = await fetch(`${base}/api/webhooks/payments`, { method: 'POST', headers: { 'Content-Type': 'application/json', 'Stripe-Signature': b.signed(payload) }, body: payload, signal: AbortSignal.timeout(5000) }).catch((err: Error) => ({ status: 0, json: async () => ({ error: err.name }) }));
        return { status: res.status, body: (await res.json()) as Record<string, unknown> };
      }),
    );
    const [answers, health] = await Promise.all([burst, pollHealth(burst)]);
    api.stripeFake.resumeWebhooks();
    await api.stripeFake.idle();

    expect(answers.map((a) => a.status)).toEqual(Array(20).fill(200));
    expect(answers.filter((a) => !a.body.duplicate)).toEqual([{ status: 200, body: { received: true } }]);
    expect(answers.filter((a) => a.body.duplicate)).toHaveLength(19);
    expect(health.length).toBeGreaterThan(0);
    expect(health.filter((h) => h.status !== 200 || !h.ok)).toEqual([]);

    const deposits = await api.knex('deposits').where({ piano_id: pianoId });
    expect(deposits.map((d) => [d.checkout_session_id, d.status, d.amount_minor])).toEqual([[co.sessionId, 'holding', co.amountMinor]]);
    expect(await b.stageOf(pianoId)).toBe('held');
    expect(await api.knex('stage_moves').where({ piano_id: pianoId, action: 'hold' })).toHaveLength(1);
  });

  it('10 buyers paying one piano at once: one hold, 9 refunds made by jobs, and the right e-mails', async () => {
    const { pianoId, token } = await b.floorPiano();
    const people = Array.from({ length: 10 }, (_, i) => ({ name: `Buyer Number ${i + 1}`, email: `buyer${i + 1}@crowd.test` }));
    const sessions = [];
    for (const p of people) sessions.push((await b.checkout(token, await b.acknowledged(token, p.name, p.email))).sessionId);
    api.stripeFake.pauseWebhooks();
    const paid = await Promise.all(sessions.map((s) => b.pay(s)));
    expect(paid.map((p) => p.status)).toEqual(Array(10).fill(303));
    // Every completed checkout reaches the server at the same moment.
    api.stripeFake.resumeWebhooks();
    await api.stripeFake.idle();
    const deliveries = api.stripeFake.deliveries.filter((d) => d.type === 'checkout.session.completed').slice(0, 10);
    expect(deliveries.map((d) => [d.attempts, d.lastStatus])).toEqual(Array(10).fill([1, 200]));

    await eventually(async () => (await api.knex('deposits').where({ piano_id: pianoId, status: 'refunded' }).whereNotNull('refund_id')).length === 9);
    const deposits = await api.knex('deposits').where({ piano_id: pianoId }).orderBy('id');
    expect(deposits.map((d) => d.status).sort()).toEqual(['holding', ...Array(9).fill('refunded')]);
    expect(await b.stageOf(pianoId)).toBe('held');
    const winner = deposits.find((d) => d.status === 'holding')!;
    const losers = deposits.filter((d) => d.status === 'refunded');

    // One refund at the provider per losing payment, of the whole deposit, recorded on its row.
    const intents = new Set(losers.map((d) => d.payment_intent_id));
    const refunds = [...api.stripeFake.refunds.values()].filter((r) => intents.has(r.payment_intent as string));
    expect(refunds).toHaveLength(9);
    expect(new Set(refunds.map((r) => r.payment_intent)).size).toBe(9);
    for (const d of losers) {
      const refund = refunds.find((r) => r.payment_intent === d.payment_intent_id)!;
      expect([d.refund_id, d.refunded_minor]).toEqual([refund.id, d.amount_minor]);
      expect(refund.amount).toBe(d.amount_minor);
    }
    expect(refunds.find((r) => r.payment_intent === winner.payment_intent_id)).toBeUndefined();

    await eventually(() => people.every((p) => b.mailTo(p.email).length === 1));
    expect(b.mailTo(winner.buyer_email).map((m) => m.subject)).toEqual([expect.stringMatching(/^Receipt: deposit to hold FW-/)]);
    for (const d of losers) expect(b.mailTo(d.buyer_email).map((m) => m.subject)).toEqual([expect.stringMatching(/has been refunded$/)]);
    const stock = (await api.knex('pianos').where({ id: pianoId }).first()).stock_number;
    await eventually(() => api.mail.messages.some((m) => m.subject === `Held: ${stock} for ${winner.buyer_name}`));
    expect(api.mail.messages.filter((m) => m.subject.startsWith(`Held: ${stock}`))).toHaveLength(1);
  });
});
