import { depositAmount } from '@/modules/deposits/core/deposit';

import { postGql, startTestApi, type TestApi } from '../support/api';
import { buildIntake } from '../support/builders';
import { buyers, eventually } from '../support/buyers';
import { tableStates } from '../support/db-state';

let api: TestApi;
let b: ReturnType<typeof buyers>;
beforeAll(async () => {
  api = await startTestApi();
  await api.listen();
  b = buyers(api);
});
afterAll(() => api.close());

const SALE = `mutation($id: Int!, $sale: SaleInput) { recordSale(pianoId: $id, sale: $sale) {
  stage balance { priceMinor taxMinor totalMinor depositMinor balanceMinor currency salesTaxPct }
  sale { id currency agreedPriceMinor salesTaxPct taxMinor totalMinor depositMinor tradeInAllowanceMinor balanceMinor owedToBuyerMinor tradeIn { pianoId stockNumber } buyer { name email phone address } balancePaidAt balancePaidHow }
} }`;
const buyer = { name: 'Odile Brennan', email: 'odile@example.test', phone: '+1 555 0100', address: '12 Quarry Row' };
const tradeIn = { piano: { maker: 'Almsbury', model: 'Parlour 44', serialNumber: 'T-1187', kind: 'upright', year: 1978 }, allowanceMinor: 60000 };
// A sale left with its balance due, for the online payment.
let unpaid: { pianoId: number; token: string } | undefined;
const sell = async (role: 'floor' | 'manager' | 'technician', pianoId: number, sale?: unknown) => api.gql(await api.tokenFor(role), SALE, { id: pianoId, sale });

describe('recording a sale', () => {
  it('applies the deposit, takes the buyer’s piano in trade as a received intake, and records the totals', async () => {
    const { pianoId, token, price } = await b.floorPiano();
    const co = await b.checkout(token, await b.acknowledged(token, 'Odile Brennan', 'odile@example.test'));
    await b.pay(co.sessionId);
    await api.stripeFake.idle();
    expect(await b.stageOf(pianoId)).toBe('held');
    const deposit = depositAmount(price, 'USD');
    const pianosBefore = Number((await api.knex('pianos').count('* as n').first())!.n);

    const res = await sell('manager', pianoId, { buyer, agreedPriceMinor: 300000, salesTaxPct: 8.25, tradeIn });
    expect(res.body.errors).toBeUndefined();
    const { stage, balance, sale } = res.body.data.recordSale;
    expect(stage).toBe('sold');
    // 8.25 % of 3,000.00 is 247.50; the total 3,247.50 less the deposit and the 600.00 allowance
    expect(sale).toMatchObject({ currency: 'USD', agreedPriceMinor: 300000, salesTaxPct: 8.25, taxMinor: 24750, totalMinor: 324750, depositMinor: deposit, tradeInAllowanceMinor: 60000, balanceMinor: 324750 - deposit - 60000, owedToBuyerMinor: 0, buyer });
    expect(balance).toEqual({ priceMinor: 300000, taxMinor: 24750, totalMinor: 324750, depositMinor: deposit, balanceMinor: 324750 - deposit - 60000, currency: 'USD', salesTaxPct: 8.25 });

    // the trade-in entered stock: a new piano, received, its intake a trade-in with the buyer as the seller
    expect(Number((await api.knex('pianos').count('* as n').first())!.n)).toBe(pianosBefore + 1);
    const traded = await api.knex('pianos').where({ id: sale.tradeIn.pianoId }).first();
    expect(traded).toMatchObject({ stock_number: sale.tradeIn.stockNumber, maker: 'Almsbury', model: 'Parlour 44', serial_number: 'T-1187', stage: 'received', year: 1978 });
    expect(await api.knex('intakes').where({ piano_id: traded.id }).first()).toMatchObject({ acquisition: 'trade_in', seller_name: 'Odile Brennan', seller_email: 'odile@example.test', seller_phone: '+1 555 0100' });
    expect(await api.knex('stage_moves').where({ piano_id: traded.id }).select('action', 'to_stage')).toEqual([{ action: 'receive', to_stage: 'received' }]);
    const row = await api.knex('sales').where({ piano_id: pianoId }).first();
    expect(row).toMatchObject({ trade_in_piano_id: traded.id, trade_in_allowance_minor: 60000, deposit_minor: deposit, balance_minor: 324750 - deposit - 60000, buyer_name: 'Odile Brennan' });
    expect((await api.knex('deposits').where({ checkout_session_id: co.sessionId }).first()).status).toBe('applied');

    // intake staff inspect the traded piano later: the inspection completes the waiting intake
    const inspected = await api.gql(await api.tokenFor('intake'), 'mutation($input: IntakeInput!) { submitIntake(input: $input) }', {
      input: buildIntake({ pianoId: traded.id, seller: { name: 'Odile Brennan', email: 'odile@example.test' }, inspectedAt: 'showroom' }),
    });
    expect(inspected.body.data.submitIntake).toMatchObject({ pianoId: traded.id, version: 1 });
    expect(await api.knex('intakes').where({ piano_id: traded.id })).toEqual([expect.objectContaining({ acquisition: 'trade_in', seller_name: 'Odile Brennan', notes: 'Seller wants it gone before the holidays.' })]);
    expect(await b.stageOf(traded.id)).toBe('assessed');
  });

  it('keeps the buyer’s details from floor staff, and refuses them a trade-in', async () => {
    const { pianoId, token } = await b.floorPiano();
    unpaid = { pianoId, token };
    const before = await tableStates(api.knex);
    const refused = await sell('floor', pianoId, { buyer, agreedPriceMinor: 250000, tradeIn });
    expect(refused.body.errors[0].extensions.code).toBe('NOT_ALLOWED');
    expect(await tableStates(api.knex)).toEqual(before);

    // no deposit here; the shop's rate (0 % by default) applies when none is given
    const res = await sell('floor', pianoId, { buyer, agreedPriceMinor: 250000 });
    expect(res.body.data.recordSale.sale).toMatchObject({ agreedPriceMinor: 250000, taxMinor: 0, depositMinor: 0, balanceMinor: 250000, tradeIn: null, buyer: null });
  });

  it('writes neither the trade-in nor the sale when a step after the trade-in fails', async () => {
    const { pianoId } = await b.floorPiano();
    // A failure on the sale's own row, which is written after the trade-in's piano and intake.
    await api.knex.raw(`create function refuse_sale() returns trigger language plpgsql as $$ begin raise exception 'sale refused for the test'; end $$`);
    await api.knex.raw('create trigger refuse_sale before insert on sales for each row execute function refuse_sale()');
    const before = await tableStates(api.knex);
    const traded = async () => api.knex('pianos').where({ serial_number: 'T-1187' });
    expect(await traded()).toEqual([]);
    const lastPianoId = async () => Number((await api.knex.raw('select last_value from pianos_id_seq')).rows[0].last_value);
    const idBefore = await lastPianoId();
    const logged = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      const res = await sell('manager', pianoId, { buyer, agreedPriceMinor: 300000, tradeIn });
      expect(res.body.errors[0].extensions.code).toBe('INTERNAL');
      expect(String(logged.mock.calls[0]?.[0])).toContain('sale refused for the test');
      expect(await tableStates(api.knex)).toEqual(before);
      expect(await b.stageOf(pianoId)).toBe('on_floor');
      // the trade-in's piano, arrival and intake were rolled back with the sale
      expect(await traded()).toEqual([]);
      // ...after it was written: the piano's id was drawn from its sequence, which a rollback does not give back
      expect(await lastPianoId()).toBeGreaterThan(idBefore);
    } finally {
      logged.mockRestore();
      await api.knex.raw('drop trigger refuse_sale on sales');
      await api.knex.raw('drop function refuse_sale');
    }
  });

  it.each([
    ['an agreed price of zero', { buyer, agreedPriceMinor: 0 }, 'more than zero'],
    ['a negative allowance', { buyer, agreedPriceMinor: 1000, tradeIn: { ...tradeIn, allowanceMinor: -1 } }, 'cannot be negative'],
    ['a price in fractions of a cent', { buyer, agreedPriceMinor: 1000.5 }, 'whole number'],
    ['a tax rate of 40 %', { buyer, agreedPriceMinor: 1000, salesTaxPct: 40 }, '0-30 %'],
    ['a buyer without a name', { buyer: { name: ' ' }, agreedPriceMinor: 1000 }, 'is required'],
    ['a trade-in of an unknown kind', { buyer, agreedPriceMinor: 1000, tradeIn: { ...tradeIn, piano: { ...tradeIn.piano, kind: 'harp' } } }, 'upright or grand'],
  ])('refuses %s and changes nothing', async (_what, sale, message) => {
    const piano = await api.knex('pianos').where('stage', 'on_floor').orderBy('id', 'desc').first();
    const before = await tableStates(api.knex);
    const res = await sell('manager', piano.id, sale);
    expect(res.body.errors[0].extensions.code).toBe('BAD_INPUT');
    expect(res.body.errors[0].message).toContain(message);
    expect(await tableStates(api.knex)).toEqual(before);
  });

  it('marks the balance paid in the shop once, under two staff pressing at the same moment', async () => {
    const { pianoId } = await b.floorPiano();
    const sale = (await sell('manager', pianoId, { buyer, agreedPriceMinor: 180000, salesTaxPct: 6 })).body.data.recordSale.sale;
    // 6 % of 1,800.00 is 108.00
    expect(sale).toMatchObject({ taxMinor: 10800, balanceMinor: 190800, balancePaidAt: null });
    const base = await api.listen();
    const q = `mutation { markBalancePaid(saleId: ${sale.id}) { id balanceMinor balancePaidAt balancePaidHow buyer { name } } }`;
    const [one, two] = await Promise.all([postGql(base, await api.tokenFor('floor'), q), postGql(base, await api.tokenFor('manager'), q)]);
    const answers = [one, two];
    const paid = answers.filter((a) => a.data?.markBalancePaid);
    const refused = answers.filter((a) => a.errors);
    expect(paid).toHaveLength(1);
    expect(refused.map((a) => a.errors![0].extensions.code)).toEqual(['CONFLICT']);
    expect(refused[0].errors![0].message).toMatch(/^The balance of this sale was already paid on \d{4}-\d{2}-\d{2}\.$/);
    expect(paid[0].data.markBalancePaid).toMatchObject({ id: sale.id, balanceMinor: 190800, balancePaidHow: 'in_shop' });
    const row = await api.knex('sales').where({ id: sale.id }).first();
    expect(row.balance_paid_how).toBe('in_shop');
    await api.jobs.settle();
    const balanceReceipts = () => b.mailTo('odile@example.test').filter((m) => m.subject.startsWith('Receipt: balance paid for FW-'));
    await eventually(() => balanceReceipts().length > 0);
    await api.jobs.settle();
    const receipts = balanceReceipts();
    expect(receipts).toHaveLength(1);
    expect(receipts[0].text).toContain('Sales tax (6 %) USD 108.00');
    expect(receipts[0].text).toContain('Balance USD 1,908.00, paid ');
  });

  it('refuses to mark paid a sale with nothing due', async () => {
    // the demo's pianos for sale are used up: the one the rolled-back sale left on the floor
    const { id: pianoId } = await api.knex('pianos').where('stage', 'on_floor').orderBy('id').first();
    const sale = (await sell('manager', pianoId, { buyer, agreedPriceMinor: 50000, tradeIn: { ...tradeIn, piano: { ...tradeIn.piano, serialNumber: 'T-2200' }, allowanceMinor: 70000 } })).body.data.recordSale.sale;
    // the allowance is 200.00 more than the price: nothing due, 200.00 owed back
    expect(sale).toMatchObject({ balanceMinor: 0, owedToBuyerMinor: 20000 });
    const res = await api.gql(await api.tokenFor('manager'), `mutation { markBalancePaid(saleId: ${sale.id}) { id } }`);
    expect(res.body.errors[0]).toMatchObject({ message: 'Nothing is due on this sale: the deposit and trade-in allowance cover it.', extensions: { code: 'CONFLICT' } });
  });

  it('takes the balance online once, under webhook replays and two deliveries at the same moment', async () => {
    const { pianoId, token } = unpaid!;
    const sale = await api.knex('sales').where({ piano_id: pianoId }).first();
    expect(sale).toMatchObject({ balance_minor: 250000, balance_paid_at: null });
    const start = await api.http.post(`/api/public/disclosures/${token}/balance`);
    expect(start.status).toBe(201);
    expect(start.body).toMatchObject({ amountMinor: 250000, currency: 'USD' });
    const sessionId = start.body.url.split('/').pop();
    // a second press reuses the open checkout
    expect((await api.http.post(`/api/public/disclosures/${token}/balance`)).body.url).toBe(start.body.url);
    expect(api.stripeFake.sessions.get(sessionId)).toMatchObject({ amount_total: 250000, metadata: { kind: 'balance', saleId: String(sale.id) } });

    const base = await api.listen();
    api.stripeFake.pauseWebhooks();
    expect((await b.pay(sessionId)).status).toBe(303);
    const payload = JSON.stringify(await b.completedEvent(sessionId));
    const deliver = async () => (await fetch(`${base}/api/webhooks/payments`, { method: 'POST', headers: { 'Content-Type': 'application/json', 'Stripe-Signature': b.signed(payload) }, body: payload })).json();
    const both = await Promise.all([deliver(), deliver()]);
    expect(both.filter((a) => !a.duplicate)).toEqual([{ received: true }]);
    expect(both.filter((a) => a.duplicate)).toHaveLength(1);
    api.stripeFake.resumeWebhooks();
    await api.stripeFake.idle();
    for (let i = 0; i < 5; i += 1) expect(await deliver()).toEqual({ received: true, duplicate: true });

    const paid = await api.knex('sales').where({ id: sale.id }).first();
    expect(paid).toMatchObject({ balance_paid_how: 'online', balance_checkout_session_id: sessionId, balance_paid_by_id: null });
    expect(paid.balance_payment_intent_id).toMatch(/^pi_/);
    const stock = (await api.knex('pianos').where({ id: pianoId }).first()).stock_number;
    const receipts = () => b.mailTo('odile@example.test').filter((m) => m.subject === `Receipt: balance paid for ${stock}`);
    await eventually(() => receipts().length > 0);
    await api.jobs.settle();
    expect(receipts()).toHaveLength(1);
    expect(receipts()[0].text).toContain('We received your payment of USD 2,500.00 online');

    const again = await api.http.post(`/api/public/disclosures/${token}/balance`);
    expect(again.status).toBe(409);
    expect(again.body.error).toBe('The balance is already paid: nothing more is due.');
    const shop = await api.gql(await api.tokenFor('manager'), `mutation { markBalancePaid(saleId: ${sale.id}) { id } }`);
    expect(shop.body.errors[0].extensions.code).toBe('CONFLICT');
  });
});
