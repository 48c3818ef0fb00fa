import type { Knex } from 'knex';
import type Stripe from 'stripe';

import type { Actor } from '@/modules/accounts/server/user-service';
import { User } from '@/modules/accounts/server/user-model';
import { balanceDue, defaultDepositRules, depositAmount, depositRulesInput, type DepositRules } from '@/modules/deposits/core/deposit';
import { Acknowledgement, ShopSetting } from '@/modules/disclosure/server/disclosure-models';
import { disclosureByToken } from '@/modules/disclosure/server/disclosure-service';
import { Piano } from '@/modules/pianos/server/piano-model';
import { movePiano } from '@/modules/pianos/server/stage-service';
import { formatMoney, type Currency } from '@/modules/shop/core/money';
import { AppError, badInput, notAllowed, notFound } from '@/server/errors';
import type { Mailer } from '@/server/mail';

import { Deposit, PaymentEvent } from './deposit-models';

export interface DepositDeps {
  stripe: Stripe;
  mailer: Mailer;
  publicUrl: string;
  webhookSecret: string;
}

const DAY = 86_400_000;
const pianoName = (p: Piano) => [p.maker, p.model].filter(Boolean).join(' ');
const money = (minor: number, currency: string) => formatMoney(minor, currency as Currency);

export async function depositRules(): Promise<DepositRules> {
  const row = await ShopSetting.query().findById('depositRules');
  return { ...defaultDepositRules, ...((row?.value as Partial<DepositRules>) ?? {}) };
}

export async function setDepositRules(actor: Actor, raw: unknown): Promise<DepositRules> {
  if (actor.role !== 'manager') throw notAllowed('change the deposit rules');
  const rules = depositRulesInput.parse(raw);
  await ShopSetting.query().insert({ key: 'depositRules', value: rules, updatedById: actor.id }).onConflict('key').merge();
  return rules;
}

/** The deposit a buyer would pay on a disclosed price, under the shop's current rules. */
export async function publicDepositTerms(price: { minor: number; currency: string }): Promise<{ amountMinor: number; currency: Currency; holdDays: number }> {
  const rules = await depositRules();
  const currency = price.currency as Currency;
  return { amountMinor: depositAmount(price.minor, currency, rules), currency, holdDays: rules.holdDays };
}

/** A buyer who acknowledged the current disclosure version starts a checkout for the deposit. */
export async function startDeposit(deps: DepositDeps, token: string, raw: unknown): Promise<{ url: string; amountMinor: number; currency: string }> {
  const { link, newest } = await disclosureByToken(token);
  const receiptToken = (raw as { receiptToken?: unknown })?.receiptToken;
  if (typeof receiptToken !== 'string' || !/^[A-Za-z0-9_-]{32}$/.test(receiptToken)) throw badInput('receiptToken', 'acknowledge the disclosure first');
  const ack = await Acknowledgement.query().findOne({ receipt_token: receiptToken });
  if (!ack || ack.disclosureId !== newest.id) throw new AppError('CONFLICT', 'Acknowledge the current version of the disclosure before paying a deposit.', 'receiptToken');
  const piano = (await Piano.query().findById(link.pianoId))!;
  if (piano.stage !== 'on_floor') throw new AppError('CONFLICT', piano.stage === 'held' ? 'This piano is already held for another buyer.' : 'This piano is not available for a deposit.');
  // The deposit is figured on the price printed on the version the buyer acknowledged.
  const price = newest.content.askingPrice;
  if (!price) throw new AppError('CONFLICT', 'This piano has no asking price yet.');

  // A second press reuses the open checkout instead of starting another.
  const open = await Deposit.query().findOne({ acknowledgement_id: ack.id, status: 'pending' });
  if (open) {
    const session = await deps.stripe.checkout.sessions.retrieve(open.checkoutSessionId);
    if (session.status === 'open' && session.url) return { url: session.url, amountMinor: open.amountMinor, currency: open.currency };
  }
  const { amountMinor, currency } = await publicDepositTerms(price);
  const session = await deps.stripe.checkout.sessions.create(
    {
      mode: 'payment',
      customer_email: ack.buyerEmail,
      line_items: [{ quantity: 1, price_data: { currency: currency.toLowerCase(), unit_amount: amountMinor, product_data: { name: `Deposit to hold ${piano.stockNumber}, ${pianoName(piano)}` } } }],
      success_url: `${deps.publicUrl}/d/${token}/deposit?session={CHECKOUT_SESSION_ID}`,
      cancel_url: `${deps.publicUrl}/d/${token}`,
      metadata: { pianoId: String(piano.id), stockNumber: piano.stockNumber, disclosureVersion: String(newest.version), disclosureDigest: newest.digest, acknowledgementId: String(ack.id) },
    },
    { idempotencyKey: `deposit-ack-${ack.id}-${Date.now()}` },
  );
  await Deposit.query().insert({
    pianoId: piano.id,
    disclosureId: newest.id,
    acknowledgementId: ack.id,
    disclosureDigest: newest.digest,
    buyerName: ack.buyerName,
    buyerEmail: ack.buyerEmail,
    amountMinor,
    currency,
    checkoutSessionId: session.id,
  });
  return { url: session.url!, amountMinor, currency };
}

type Outcome = { kind: 'held' | 'refund' | 'none'; deposit?: Deposit; piano?: Piano };

async function onCompleted(trx: Knex.Transaction, session: Stripe.Checkout.Session): Promise<Outcome> {
  const deposit = await Deposit.query(trx).findOne({ checkout_session_id: session.id }).forUpdate();
  if (!deposit || deposit.status !== 'pending' || session.payment_status !== 'paid') return { kind: 'none' };
  // The piano's row lock makes two payments for one piano take turns: the first holds it.
  const piano = (await Piano.query(trx).findById(deposit.pianoId).forUpdate())!;
  const paid = { paymentIntentId: String(session.payment_intent), paidAt: new Date().toISOString() };
  const holding = await Deposit.query(trx).findOne({ piano_id: piano.id, status: 'holding' });
  if (piano.stage !== 'on_floor' || holding) {
    const refunded = await deposit.$query(trx).patchAndFetch({ ...paid, status: 'refunded', closedAt: paid.paidAt, closeReason: 'The piano was already held for another buyer.' });
    return { kind: 'refund', deposit: refunded, piano };
  }
  const rules = await depositRules();
  const held = await deposit.$query(trx).patchAndFetch({ ...paid, status: 'holding', holdExpiresAt: new Date(Date.now() + rules.holdDays * DAY).toISOString() });
  const moved = await movePiano({ pianoId: piano.id, action: 'hold', by: 'system', userId: null, why: `Deposit ${money(held.amountMinor, held.currency)} paid by ${held.buyerName}` }, trx);
  return { kind: 'held', deposit: held, piano: moved };
}

async function staffEmails(): Promise<string[]> {
  return (await User.query().whereIn('role', ['floor', 'manager']).where('active', true)).map((u) => u.email);
}

async function afterCompleted(deps: DepositDeps, outcome: Outcome): Promise<void> {
  const { deposit, piano } = outcome;
  if (!deposit || !piano) return;
  if (outcome.kind === 'refund') {
    const refund = await deps.stripe.refunds.create({ payment_intent: deposit.paymentIntentId!, metadata: { depositId: String(deposit.id), reason: 'already held' } }, { idempotencyKey: `refund-deposit-${deposit.id}` });
    await deposit.$query().patch({ refundId: refund.id, refundedMinor: refund.amount });
    await deps.mailer.send({
      to: deposit.buyerEmail,
      subject: `Your deposit for ${piano.stockNumber} has been refunded`,
      text: `Dear ${deposit.buyerName},\n\nAnother buyer's deposit for the ${pianoName(piano)} (stock number ${piano.stockNumber}) reached us moments before yours, so the piano is held for them. We have refunded your deposit of ${money(deposit.amountMinor, deposit.currency)} in full; your card provider shows it within a few days.\n\nWe are sorry for the disappointment. Ask us about similar pianos on the floor.\n`,
    });
    return;
  }
  const b = balanceDue(piano.askingPriceMinor!, deposit.amountMinor, deposit.currency as Currency, await depositRules());
  const until = deposit.holdExpiresAt!.slice(0, 10);
  await deps.mailer.send({
    to: deposit.buyerEmail,
    subject: `Receipt: deposit to hold ${piano.stockNumber}`,
    text:
      `Dear ${deposit.buyerName},\n\nWe received your deposit of ${money(deposit.amountMinor, deposit.currency)} for the ${pianoName(piano)} (stock number ${piano.stockNumber}). ` +
      `The piano is held for you until ${until}.\n\nPrice ${money(b.priceMinor, b.currency)}\nSales tax (${b.salesTaxPct} %) ${money(b.taxMinor, b.currency)}\nDeposit paid -${money(b.depositMinor, b.currency)}\nBalance due at sale ${money(b.balanceMinor, b.currency)}\n\n` +
      `Your deposit refers to version ${deposit.disclosureDigest.slice(0, 12)}… of the condition disclosure you acknowledged. The deposit terms are the dealer's template, adapted to local law.\n`,
  });
  const staff = await staffEmails();
  if (staff.length) {
    await deps.mailer.send({
      to: staff.join(', '),
      subject: `Held: ${piano.stockNumber} for ${deposit.buyerName}`,
      text: `${piano.stockNumber} (${pianoName(piano)}) is held for ${deposit.buyerName} <${deposit.buyerEmail}> until ${until}: deposit ${money(deposit.amountMinor, deposit.currency)} paid online. Take its floor tag down or mark it held.\n`,
    });
  }
}

/** The payment provider's webhook: signature checked on the raw body, each event acted on once. */
export async function handlePaymentWebhook(deps: DepositDeps, rawBody: Buffer, signature: string | undefined): Promise<{ received: true; duplicate?: true }> {
  let event: Stripe.Event;
  try {
    event = deps.stripe.webhooks.constructEvent(rawBody, signature ?? '', deps.webhookSecret);
  } catch {
    throw new AppError('BAD_INPUT', 'The webhook signature does not match.');
  }
  let outcome: Outcome = { kind: 'none' };
  const fresh = await Deposit.transaction(async (trx) => {
    const inserted = await trx(PaymentEvent.tableName).insert({ event_id: event.id, type: event.type }).onConflict('event_id').ignore().returning('event_id');
    if (!inserted.length) return false;
    if (event.type === 'checkout.session.completed') outcome = await onCompleted(trx, event.data.object as Stripe.Checkout.Session);
    if (event.type === 'checkout.session.expired') {
      await Deposit.query(trx).patch({ status: 'cancelled', closedAt: new Date().toISOString(), closeReason: 'The checkout expired unpaid.' }).where({ checkout_session_id: (event.data.object as Stripe.Checkout.Session).id, status: 'pending' });
    }
    if (event.type === 'charge.refunded') {
      const charge = event.data.object as Stripe.Charge;
      await Deposit.query(trx).patch({ refundedMinor: charge.amount_refunded }).where({ payment_intent_id: String(charge.payment_intent) });
    }
    return true;
  });
  if (!fresh) return { received: true, duplicate: true };
  await afterCompleted(deps, outcome);
  return { received: true };
}

async function loadHolding(trx: Knex.Transaction, depositId: number): Promise<Deposit> {
  const deposit = await Deposit.query(trx).findById(depositId).forUpdate();
  if (!deposit) throw notFound(`deposit ${depositId}`);
  if (deposit.status !== 'holding') throw new AppError('CONFLICT', `This deposit is ${deposit.status}, not holding the piano.`);
  return deposit;
}

async function refundDepositNow(deps: DepositDeps, deposit: Deposit): Promise<Deposit> {
  const refund = await deps.stripe.refunds.create({ payment_intent: deposit.paymentIntentId!, metadata: { depositId: String(deposit.id) } }, { idempotencyKey: `refund-deposit-${deposit.id}` });
  return deposit.$query().patchAndFetch({ status: 'refunded', refundId: refund.id, refundedMinor: refund.amount });
}

/** A manager frees a held piano, refunding the deposit or keeping it as the shop's terms allow. */
export async function releaseHold(deps: DepositDeps, actor: Actor, depositId: number, refund: boolean, why?: string | null): Promise<Deposit> {
  if (actor.role !== 'manager') throw notAllowed('release holds');
  let deposit = await Deposit.transaction(async (trx) => {
    const d = await loadHolding(trx, depositId);
    await movePiano({ pianoId: d.pianoId, action: 'release_hold', by: actor.role, userId: actor.id, why: why ?? (refund ? 'Hold released, deposit refunded' : 'Hold released, deposit kept') }, trx);
    return d.$query(trx).patchAndFetch({ status: 'released', closedAt: new Date().toISOString(), closeReason: why ?? null });
  });
  if (refund) deposit = await refundDepositNow(deps, deposit);
  await deps.mailer.send({
    to: deposit.buyerEmail,
    subject: 'Your piano hold has been released',
    text: `Dear ${deposit.buyerName},\n\nThe hold on your piano has been released. ${refund ? `Your deposit of ${money(deposit.amountMinor, deposit.currency)} has been refunded.` : 'Your deposit is kept under the terms you agreed to; ask us if you have questions.'}\n`,
  });
  return deposit;
}

/** Holds past their end free their pianos; the deposit waits for the manager's refund decision. */
export async function expireHolds(deps: DepositDeps, now: Date = new Date()): Promise<number> {
  const due = await Deposit.query().where('status', 'holding').where('hold_expires_at', '<', now.toISOString());
  let n = 0;
  for (const d of due) {
    const expired = await Deposit.transaction(async (trx) => {
      const fresh = await Deposit.query(trx).findById(d.id).forUpdate();
      if (fresh?.status !== 'holding') return null;
      await movePiano({ pianoId: d.pianoId, action: 'release_hold', by: 'system', userId: null, why: 'The hold expired' }, trx);
      return fresh.$query(trx).patchAndFetch({ status: 'expired', closedAt: now.toISOString(), closeReason: 'The hold expired.' });
    });
    if (!expired) continue;
    n += 1;
    const staff = await staffEmails();
    await deps.mailer.send({ to: [expired.buyerEmail, ...staff].join(', '), subject: 'A piano hold has expired', text: `The hold for ${expired.buyerName} ended on ${expired.holdExpiresAt!.slice(0, 10)}; the piano is back on the floor. The deposit of ${money(expired.amountMinor, expired.currency)} awaits the dealer's decision under its terms.\n` });
  }
  return n;
}

export async function refundDeposit(deps: DepositDeps, actor: Actor, depositId: number): Promise<Deposit> {
  if (actor.role !== 'manager') throw notAllowed('refund deposits');
  const deposit = await Deposit.query().findById(depositId);
  if (!deposit) throw notFound(`deposit ${depositId}`);
  if (!['released', 'expired'].includes(deposit.status) || deposit.refundId) throw new AppError('CONFLICT', `A ${deposit.status} deposit cannot be refunded here.`);
  return refundDepositNow(deps, deposit);
}

/** The sale: a held piano's deposit counts toward the price; the balance due is what is left. */
export async function recordSale(actor: Actor, pianoId: number) {
  return Piano.transaction(async (trx) => {
    const holding = await Deposit.query(trx).findOne({ piano_id: pianoId, status: 'holding' }).forUpdate();
    const piano = await movePiano({ pianoId, action: 'sell', by: actor.role, userId: actor.id, why: holding ? `Deposit of ${money(holding.amountMinor, holding.currency)} applied` : null }, trx);
    if (holding) await holding.$query(trx).patch({ status: 'applied', closedAt: new Date().toISOString() });
    const b = piano.askingPriceMinor != null ? balanceDue(piano.askingPriceMinor, holding?.amountMinor ?? 0, (piano.priceCurrency ?? 'USD') as Currency, await depositRules()) : null;
    return { stage: piano.stage, balance: b };
  });
}

export async function depositsFor(actor: Actor, pianoId: number) {
  if (!['floor', 'manager'].includes(actor.role)) throw notAllowed('see deposits');
  const piano = await Piano.query().findById(pianoId);
  if (!piano) throw notFound(`piano ${pianoId}`);
  const deposits = await Deposit.query().where('piano_id', pianoId).orderBy('id', 'desc');
  // Before the sale the holding deposit counts toward the balance; after it, the applied one.
  const holding = deposits.find((d) => d.status === 'holding') ?? deposits.find((d) => d.status === 'applied');
  const rules = await depositRules();
  const balance = piano.askingPriceMinor != null ? balanceDue(piano.askingPriceMinor, holding?.amountMinor ?? 0, (piano.priceCurrency ?? 'USD') as Currency, rules) : null;
  return { deposits: deposits.map((d) => d.$toJson()), balance, rules };
}

/** What the buyer's confirmation page shows after the checkout. */
export async function publicDepositStatus(token: string, sessionId: string) {
  const { link } = await disclosureByToken(token);
  if (!/^cs_[A-Za-z0-9_]{8,80}$/.test(sessionId)) throw new AppError('NOT_FOUND', 'Not found.');
  const deposit = await Deposit.query().findOne({ checkout_session_id: sessionId, piano_id: link.pianoId });
  if (!deposit) throw new AppError('NOT_FOUND', 'Not found.');
  const piano = (await Piano.query().findById(link.pianoId))!;
  const balance = piano.askingPriceMinor != null ? balanceDue(piano.askingPriceMinor, deposit.amountMinor, deposit.currency as Currency, await depositRules()) : null;
  return { status: deposit.status, amountMinor: deposit.amountMinor, currency: deposit.currency, holdExpiresAt: deposit.holdExpiresAt, buyerName: deposit.buyerName, stockNumber: piano.stockNumber, balance };
}
