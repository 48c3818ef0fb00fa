// A buyer's steps on the public pages and the payment stand-in, shared by the deposit tests.
import Stripe from 'stripe';

import type { TestApi } from './api';

type Json = Record<string, any>;

export function buyers(api: TestApi) {
  const taken = new Set<number>();
  async function call(role: 'floor' | 'manager' | 'technician', query: string, variables?: Json): Promise<Json> {
    const res = await api.gql(await api.tokenFor(role), query, variables);
    if (res.body.errors) throw Object.assign(new Error(res.body.errors[0].message), { extensions: res.body.errors[0].extensions });
    return res.body.data;
  }

  /** A piano on the floor with a published disclosure, from the demo scenario; each caller takes its own. */
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
    // 200: this buyer had acknowledged this version already, and gets that acknowledgement back.
    if (ack.status !== 201 && ack.status !== 200) throw new Error(`acknowledging failed: ${ack.status} ${JSON.stringify(ack.body)}`);
    return ack.body.receiptToken;
  }

  async function checkout(token: string, receiptToken: string): Promise<{ url: string; sessionId: string; amountMinor: number }> {
    const res = await api.http.post(`/api/public/disclosures/${token}/deposit`).send({ receiptToken });
    if (res.status !== 201) throw new Error(`starting the checkout failed: ${res.status} ${JSON.stringify(res.body)}`);
    return { ...res.body, sessionId: res.body.url.split('/').pop() };
  }

  function pay(sessionId: string, card = '4242424242424242') {
    return fetch(`${api.stripeFake.url}/checkout/${sessionId}/pay`, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ card, exp: '12/30', cvc: '123', name: 'Test Buyer' }),
    });
  }

  const provider = () => new Stripe('sk_test_x', { host: '127.0.0.1', port: api.stripeFake.port, protocol: 'http' });

  /** The checkout.session.completed event the stand-in made for a session. */
  async function completedEvent(sessionId: string): Promise<Stripe.Event> {
    const events = await provider().events.list();
    const found = events.data.find((e) => e.type === 'checkout.session.completed' && (e.data.object as Stripe.Checkout.Session).id === sessionId);
    if (!found) throw new Error(`no completed event for ${sessionId}`);
    return found;
  }

  const signed = (payload: string, timestamp?: number) => Stripe.webhooks.generateTestHeaderString({ payload, secret: api.webhookSecret, ...(timestamp ? { timestamp } : {}) });
  const stageOf = async (id: number) => (await api.knex('pianos').where({ id }).first()).stage;
  const mailTo = (email: string) => api.mail.messages.filter((m) => m.to.includes(email));

  return { call, floorPiano, acknowledged, checkout, pay, provider, completedEvent, signed, stageOf, mailTo };
}

/** Polls until `check` holds (a job's work shows in the data), or fails after `timeoutMs`. */
export async function eventually(check: () => Promise<boolean> | boolean, timeoutMs = 15_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > until) throw new Error('the expected change did not happen in time');
    await new Promise((r) => setTimeout(r, 25));
  }
}
