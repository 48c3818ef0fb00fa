import type { Knex } from 'knex';
import { UniqueViolationError } from 'objection';
import type Stripe from 'stripe';

import { can, rolesThatCan } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { User } from '@/modules/accounts/server/user-model';
import { balanceDue, depositRulesInput, type Balance, type DepositRules } from '@/modules/deposits/core/deposit';
import { saleInput, saleTotals, type SaleInput, type SaleTotals } from '@/modules/deposits/core/sale';
import { Intake } from '@/modules/assessment/server/assessment-models';
import { Acknowledgement, ShopSetting } from '@/modules/disclosure/server/disclosure-models';
import { disclosureByToken } from '@/modules/disclosure/server/disclosure-service';
import type { QueuedMail, RefundNotice } from '@/modules/jobs/core/job-kinds';
import { enqueue, JobFailure, removeJob } from '@/modules/jobs/server/queue';
import type { JobRun } from '@/modules/jobs/server/worker';
import { pianoName, type PianoInput } from '@/modules/pianos/core/piano';
import { Piano } from '@/modules/pianos/server/piano-model';
import { insertArrivedPiano } from '@/modules/pianos/server/piano-service';
import { movePiano } from '@/modules/pianos/server/stage-service';
import { verificationCode } from '@/modules/disclosure/core/verification';
import { formatDayTime, type DealerLocality } from '@/modules/shop/core/dealer-time';
import { formatMoney, type Currency } from '@/modules/shop/core/money';
import { shopLocality } from '@/modules/shop/server/shop-profile-service';
import type { Clock } from '@/server/clock';
import { AppError, badInput, notAllowed, notFound } from '@/server/errors';

import { Deposit, PaymentEvent, Sale } from './deposit-models';
import { depositRules, publicDepositTerms } from './deposit-rules';

export { depositRules, publicDepositTerms } from './deposit-rules';

export interface DepositDeps {
  stripe: Stripe;
  publicUrl: string;
  webhookSecret: string;
  clock: Clock;
}

const DAY = 86_400_000;
// How far a webhook's signed time may stand from ours, either way (the provider's default).
const WEBHOOK_TOLERANCE_S = 300;
// A hold's end job that wakes this little before the end still ends it (clocks differ slightly).
const EXPIRY_GRACE_MS = 5_000;
const money = (minor: number, currency: string) => formatMoney(minor, currency as Currency);
const expiryKey = (depositId: number) => `expire-hold:${depositId}`;

export async function setDepositRules(actor: Actor, raw: unknown): Promise<DepositRules> {
  if (!can(actor.role, 'manageDeposits')) throw notAllowed('change the deposit rules');
  const rules = depositRulesInput.parse(raw);
  await ShopSetting.query().insert({ key: 'depositRules', value: rules, updatedById: actor.id }).onConflict('key').merge();
  return rules;
}

/** The buyer's open checkout for this piano and version, started from this acknowledgement or by the same e-mail. */
async function openCheckout(deps: DepositDeps, ack: Acknowledgement, pianoId: number, disclosureId: number): Promise<{ url: string; amountMinor: number; currency: string } | null> {
  const open = await Deposit.query()
    .where({ piano_id: pianoId, disclosure_id: disclosureId, status: 'pending' })
    .where((q) => q.where('acknowledgement_id', ack.id).orWhereRaw('lower(buyer_email) = lower(?)', [ack.buyerEmail]))
    .orderBy('id', 'desc');
  for (const d of open) {
    const session = await deps.stripe.checkout.sessions.retrieve(d.checkoutSessionId);
    if (session.status === 'open' && session.url) return { url: session.url, amountMinor: d.amountMinor, currency: d.currency };
  }
  return null;
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

  // The n-th checkout of this acknowledgement: two presses at once send one key and get one session.
  // Counted before the search for an open one, so a press that counts the other's row also finds it.
  const tries = await Deposit.query().where('acknowledgement_id', ack.id).resultSize();
  // A second press, or the same buyer acknowledging again, reuses the open checkout.
  const reused = await openCheckout(deps, ack, piano.id, newest.id);
  if (reused) return reused;
  const { amountMinor, currency } = await publicDepositTerms(price);
  const session = await deps.stripe.checkout.sessions.create(
    {
      mode: 'payment',
      customer_email: ack.buyerEmail,
      line_items: [{ quantity: 1, price_data: { currency: currency.toLowerCase(), unit_amount: amountMinor, product_data: { name: `Deposit to hold ${piano.stockNumber}, ${pianoName(piano)}` } } }],
      success_url: `${deps.publicUrl}/d/${token}/deposit?session={CHECKOUT_SESSION_ID}`,
      // Back on the disclosure, which says plainly that nothing was paid (a declined card ends here too).
      cancel_url: `${deps.publicUrl}/d/${token}?checkout=cancelled`,
      metadata: { pianoId: String(piano.id), stockNumber: piano.stockNumber, disclosureVersion: String(newest.version), disclosureDigest: newest.digest, acknowledgementId: String(ack.id) },
    },
    { idempotencyKey: `deposit-checkout-ack-${ack.id}-${tries + 1}` },
  );
  try {
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
  } catch (err) {
    // The other press recorded this very session first.
    if (!(err instanceof UniqueViolationError)) throw err;
  }
  return { url: session.url!, amountMinor, currency };
}

async function staffEmails(trx: Knex.Transaction): Promise<string[]> {
  return (await User.query(trx).whereIn('role', rolesThatCan('sellPianos')).where('active', true)).map((u) => u.email);
}

function receiptMail(deposit: Deposit, piano: Piano, rules: DepositRules, where: DealerLocality): QueuedMail {
  const b = balanceDue(piano.askingPriceMinor!, deposit.amountMinor, deposit.currency as Currency, rules);
  const until = formatDayTime(deposit.holdExpiresAt!, where);
  return {
    to: deposit.buyerEmail,
    subject: `Receipt: deposit to hold ${piano.stockNumber}`,
    text:
      `Dear ${deposit.buyerName},\n\nWe received your deposit of ${money(deposit.amountMinor, deposit.currency)} for the ${pianoName(piano)} (stock number ${piano.stockNumber}). ` +
      `The piano is held for you until ${until}.\n\nPrice ${money(b.priceMinor, b.currency)}\nSales tax (${b.salesTaxPct} %) ${money(b.taxMinor, b.currency)}\nDeposit paid -${money(b.depositMinor, b.currency)}\nBalance due at sale ${money(b.balanceMinor, b.currency)}\n\n` +
      `Your deposit refers to the condition disclosure you acknowledged, verification code ${verificationCode(deposit.disclosureDigest)}.\n`,
  };
}

function refundMail(notice: RefundNotice, deposit: Deposit, piano: Piano): QueuedMail {
  const amount = money(deposit.amountMinor, deposit.currency);
  const what = `the ${pianoName(piano)} (stock number ${piano.stockNumber})`;
  if (notice === 'lost_race') {
    return {
      to: deposit.buyerEmail,
      subject: `Your deposit for ${piano.stockNumber} has been refunded`,
      text: `Dear ${deposit.buyerName},\n\nAnother buyer's deposit for ${what} reached us moments before yours, so the piano is held for them. We have refunded your deposit of ${amount} in full; your card provider shows it within a few days.\n\nWe are sorry for the disappointment. Ask us about similar pianos on the floor.\n`,
    };
  }
  if (notice === 'released') {
    return { to: deposit.buyerEmail, subject: 'Your piano hold has been released', text: `Dear ${deposit.buyerName},\n\nThe hold on your piano has been released. Your deposit of ${amount} has been refunded.\n` };
  }
  return { to: deposit.buyerEmail, subject: `Your deposit for ${piano.stockNumber} has been refunded`, text: `Dear ${deposit.buyerName},\n\nWe have refunded your deposit of ${amount} for ${what}; your card provider shows it within a few days.\n` };
}

/** Marks a paid deposit as refunding and queues its refund, in the caller's transaction. */
async function requestRefund(trx: Knex.Transaction, deposit: Deposit, notice: RefundNotice, patch: Partial<Deposit>): Promise<Deposit> {
  const refunding = await deposit.$query(trx).patchAndFetch({ ...patch, status: 'refunding' });
  await enqueue(trx, 'refund-deposit', { depositId: deposit.id, notice }, { jobKey: `refund-deposit:${deposit.id}` });
  return refunding;
}

async function onCompleted(deps: DepositDeps, trx: Knex.Transaction, session: Stripe.Checkout.Session): Promise<void> {
  if (session.metadata?.kind === 'balance') return onBalancePaid(deps, trx, session);
  const deposit = await Deposit.query(trx).findOne({ checkout_session_id: session.id }).forUpdate();
  if (!deposit || deposit.status !== 'pending' || session.payment_status !== 'paid') return;
  // The piano's row lock makes two payments for one piano take turns: the first holds it.
  const piano = (await Piano.query(trx).findById(deposit.pianoId).forUpdate())!;
  const now = deps.clock.now();
  const paid = { paymentIntentId: String(session.payment_intent), paidAt: now.toISOString() };
  const holding = await Deposit.query(trx).findOne({ piano_id: piano.id, status: 'holding' });
  if (piano.stage !== 'on_floor' || holding) {
    await requestRefund(trx, deposit, 'lost_race', { ...paid, closedAt: paid.paidAt, closeReason: 'The piano was already held for another buyer.' });
    return;
  }
  const rules = await depositRules(trx);
  const where = await shopLocality(trx);
  const held = await deposit.$query(trx).patchAndFetch({ ...paid, status: 'holding', holdExpiresAt: new Date(now.getTime() + rules.holdDays * DAY).toISOString() });
  const moved = await movePiano({ pianoId: piano.id, action: 'hold', by: 'system', userId: null, why: `Deposit ${money(held.amountMinor, held.currency)} paid by ${held.buyerName}` }, trx);
  await enqueue(trx, 'expire-hold', { depositId: held.id }, { jobKey: expiryKey(held.id), runAt: held.holdExpiresAt! });
  await enqueue(trx, 'send-email', receiptMail(held, moved, rules, where));
  const staff = await staffEmails(trx);
  if (staff.length) {
    await enqueue(trx, 'send-email', {
      to: staff.join(', '),
      subject: `Held: ${moved.stockNumber} for ${held.buyerName}`,
      text: `${moved.stockNumber} (${pianoName(moved)}) is held for ${held.buyerName} <${held.buyerEmail}> until ${formatDayTime(held.holdExpiresAt!, where)}: deposit ${money(held.amountMinor, held.currency)} paid online. Take its floor tag down or mark it held.\n`,
    });
  }
}

/** The signed event, or a 400 saying why not: a wrong signature, or a time outside the tolerance either way. */
function verifiedEvent(deps: DepositDeps, rawBody: Buffer, signature: string | undefined): Stripe.Event {
  const signedAt = Number(/(?:^|,)t=(\d+)(?:,|$)/.exec(signature ?? '')?.[1]);
  const nowS = Math.floor(Date.now() / 1000);
  let event: Stripe.Event;
  try {
    // The SDK refuses old signatures only; the future is checked below, once the signature is known to be ours.
    event = deps.stripe.webhooks.constructEvent(rawBody, signature ?? '', deps.webhookSecret, Number.MAX_SAFE_INTEGER);
  } catch {
    throw new AppError('BAD_INPUT', 'The webhook signature does not match.');
  }
  if (signedAt > nowS + WEBHOOK_TOLERANCE_S) throw new AppError('BAD_INPUT', 'The webhook signature is dated in the future: check the clock of the sender.');
  if (signedAt < nowS - WEBHOOK_TOLERANCE_S) throw new AppError('BAD_INPUT', `The webhook signature is too old: the event was sent more than ${WEBHOOK_TOLERANCE_S / 60} minutes ago.`);
  return event;
}

/**
 * The payment provider's webhook: signature checked on the raw body, each event acted on once. The
 * event, the state change and the work it causes (refund, e-mails, the hold's end) commit together.
 */
export async function handlePaymentWebhook(deps: DepositDeps, rawBody: Buffer, signature: string | undefined): Promise<{ received: true; duplicate?: true }> {
  const event = verifiedEvent(deps, rawBody, signature);
  const fresh = await Deposit.transaction(async (trx) => {
    const inserted = await trx(PaymentEvent.tableName).insert({ event_id: event.id, type: event.type }).onConflict('event_id').ignore().returning('event_id');
    if (!inserted.length) return false;
    if (event.type === 'checkout.session.completed') await onCompleted(deps, trx, event.data.object as Stripe.Checkout.Session);
    if (event.type === 'checkout.session.expired') {
      await Deposit.query(trx).patch({ status: 'cancelled', closedAt: deps.clock.now().toISOString(), closeReason: 'The checkout expired unpaid.' }).where({ checkout_session_id: (event.data.object as Stripe.Checkout.Session).id, status: 'pending' });
    }
    if (event.type === 'charge.refunded') {
      const charge = event.data.object as Stripe.Charge;
      await Deposit.query(trx).patch({ refundedMinor: charge.amount_refunded }).where({ payment_intent_id: String(charge.payment_intent) });
    }
    return true;
  });
  return fresh ? { received: true } : { received: true, duplicate: true };
}

/**
 * The refund job. The provider keeps a failed answer under its idempotency key, so each try sends a
 * key of its own; before it, the job looks for a refund already made for this deposit, so a try whose
 * answer was lost never leads to a second refund.
 */
export async function refundDepositJob(deps: DepositDeps, depositId: number, notice: RefundNotice, run: JobRun): Promise<void> {
  const deposit = await Deposit.query().findById(depositId);
  if (deposit?.status !== 'refunding') return;
  let refund: Stripe.Refund;
  try {
    const made = await deps.stripe.refunds.list({ payment_intent: deposit.paymentIntentId!, limit: 100 });
    refund =
      made.data.find((r) => r.metadata?.depositId === String(depositId) && r.status !== 'failed' && r.status !== 'canceled') ??
      (await deps.stripe.refunds.create({ payment_intent: deposit.paymentIntentId!, metadata: { depositId: String(depositId), reason: notice } }, { idempotencyKey: `refund-deposit-${depositId}-try-${run.attempt}` }));
  } catch (err) {
    throw new JobFailure(`The payment provider did not refund deposit #${depositId}: ${(err as Error).message}`);
  }
  await Deposit.transaction(async (trx) => {
    const d = await Deposit.query(trx).findById(depositId).forUpdate();
    if (d?.status !== 'refunding') return;
    const refunded = await d.$query(trx).patchAndFetch({ status: 'refunded', refundId: refund.id, refundedMinor: refund.amount });
    const piano = (await Piano.query(trx).findById(d.pianoId))!;
    await enqueue(trx, 'send-email', refundMail(notice, refunded, piano));
  });
}

async function loadHolding(trx: Knex.Transaction, depositId: number): Promise<Deposit> {
  const deposit = await Deposit.query(trx).findById(depositId).forUpdate();
  if (!deposit) throw notFound(`deposit ${depositId}`);
  if (deposit.status !== 'holding') throw new AppError('CONFLICT', `This deposit is ${deposit.status}, not holding the piano.`);
  return deposit;
}

/** A manager frees a held piano, refunding the deposit or keeping it as the shop's terms allow. */
export async function releaseHold(deps: DepositDeps, actor: Actor, depositId: number, refund: boolean, why?: string | null): Promise<Deposit> {
  if (!can(actor.role, 'manageDeposits')) throw notAllowed('release holds');
  return Deposit.transaction(async (trx) => {
    const d = await loadHolding(trx, depositId);
    await movePiano({ pianoId: d.pianoId, action: 'release_hold', by: actor.role, userId: actor.id, why: why ?? (refund ? 'Hold released, deposit refunded' : 'Hold released, deposit kept') }, trx);
    await removeJob(trx, expiryKey(d.id));
    const closed = { closedAt: deps.clock.now().toISOString(), closeReason: why ?? null };
    // With a refund, the buyer hears once it is made.
    if (refund) return requestRefund(trx, d, 'released', closed);
    const released = await d.$query(trx).patchAndFetch({ ...closed, status: 'released' });
    await enqueue(trx, 'send-email', { to: d.buyerEmail, subject: 'Your piano hold has been released', text: `Dear ${d.buyerName},\n\nThe hold on your piano has been released. Your deposit is kept under the terms you agreed to; ask us if you have questions.\n` });
    return released;
  });
}

/** The hold's end job: the piano goes back on the floor; the deposit waits for the manager's decision. */
export async function expireHoldJob(deps: DepositDeps, depositId: number): Promise<void> {
  await Deposit.transaction(async (trx) => {
    const d = await Deposit.query(trx).findById(depositId).forUpdate();
    // Released, applied or gone: nothing to end.
    if (d?.status !== 'holding') return;
    const now = deps.clock.now();
    if (Date.parse(d.holdExpiresAt!) > now.getTime() + EXPIRY_GRACE_MS) {
      await enqueue(trx, 'expire-hold', { depositId }, { jobKey: expiryKey(depositId), runAt: d.holdExpiresAt! });
      return;
    }
    await movePiano({ pianoId: d.pianoId, action: 'release_hold', by: 'system', userId: null, why: 'The hold expired' }, trx);
    const expired = await d.$query(trx).patchAndFetch({ status: 'expired', closedAt: now.toISOString(), closeReason: 'The hold expired.' });
    const text = `The hold for ${expired.buyerName} ended on ${formatDayTime(expired.holdExpiresAt!, await shopLocality(trx))}; the piano is back on the floor. The deposit of ${money(expired.amountMinor, expired.currency)} awaits the dealer's decision under its terms.\n`;
    await enqueue(trx, 'send-email', { to: expired.buyerEmail, subject: 'A piano hold has expired', text });
    const staff = await staffEmails(trx);
    if (staff.length) await enqueue(trx, 'send-email', { to: staff.join(', '), subject: 'A piano hold has expired', text });
  });
}

/** A manager refunds a deposit kept after a release or an expired hold; the refund job makes it. */
export async function refundDeposit(deps: DepositDeps, actor: Actor, depositId: number): Promise<Deposit> {
  if (!can(actor.role, 'manageDeposits')) throw notAllowed('refund deposits');
  return Deposit.transaction(async (trx) => {
    const deposit = await Deposit.query(trx).findById(depositId).forUpdate();
    if (!deposit) throw notFound(`deposit ${depositId}`);
    if (!['released', 'expired'].includes(deposit.status) || deposit.refundId) throw new AppError('CONFLICT', `A ${deposit.status} deposit cannot be refunded here.`);
    return requestRefund(trx, deposit, 'on_request', {});
  });
}

/** The sale's answer: the stage, the balance, and with the sale's details its record (the buyer only for those who may read it). */
export interface RecordedSale {
  stage: Piano['stage'];
  balance: Balance | null;
  sale: SaleRecord | null;
}
type SaleRecord = SaleTotals & { id: number; tradeIn: { pianoId: number; stockNumber: string } | null; buyer: SaleBuyer | null; balancePaidAt: string | null; balancePaidHow: string | null };
interface SaleBuyer {
  name: string;
  email: string | null;
  phone: string | null;
  address: string | null;
}

/**
 * The sale: a held piano's deposit counts toward the price; the balance due is what is left. With the
 * sale's details it also records the buyer, the agreed price and tax, and takes the buyer's own piano
 * in trade: that piano, its arrival and its intake are written in the same transaction as the sale.
 */
export async function recordSale(deps: DepositDeps, actor: Actor, pianoId: number, raw?: unknown): Promise<RecordedSale> {
  if (!can(actor.role, 'sellPianos')) throw notAllowed('record sales');
  const details = raw == null ? null : saleInput.parse(raw);
  if (details?.tradeIn && !can(actor.role, 'createPianos')) throw notAllowed('take a piano in trade');
  return Piano.transaction(async (trx) => {
    const holding = await Deposit.query(trx).findOne({ piano_id: pianoId, status: 'holding' }).forUpdate();
    const piano = await movePiano({ pianoId, action: 'sell', by: actor.role, userId: actor.id, why: holding ? `Deposit of ${money(holding.amountMinor, holding.currency)} applied` : null }, trx);
    const now = deps.clock.now();
    if (holding) {
      await holding.$query(trx).patch({ status: 'applied', closedAt: now.toISOString() });
      await removeJob(trx, expiryKey(holding.id));
    }
    const rules = await depositRules(trx);
    const currency = (piano.priceCurrency ?? 'USD') as Currency;
    if (!details) {
      const b = piano.askingPriceMinor != null ? balanceDue(piano.askingPriceMinor, holding?.amountMinor ?? 0, currency, rules) : null;
      return { stage: piano.stage, balance: b, sale: null };
    }
    let tradeIn: Piano | null = null;
    if (details.tradeIn) tradeIn = await takeInTrade(trx, actor, details.buyer, details.tradeIn.piano, now);
    const totals = saleTotals({
      agreedPriceMinor: details.agreedPriceMinor,
      currency,
      salesTaxPct: details.salesTaxPct ?? rules.salesTaxPct,
      depositMinor: holding?.amountMinor ?? 0,
      tradeInAllowanceMinor: details.tradeIn?.allowanceMinor ?? 0,
    });
    const buyer = { name: details.buyer.name, email: details.buyer.email ?? null, phone: details.buyer.phone ?? null, address: details.buyer.address ?? null };
    const sale = await Sale.query(trx).insertAndFetch({
      pianoId: piano.id,
      buyerName: buyer.name,
      buyerEmail: buyer.email,
      buyerPhone: buyer.phone,
      buyerAddress: buyer.address,
      currency,
      agreedPriceMinor: totals.agreedPriceMinor,
      salesTaxPct: totals.salesTaxPct,
      taxMinor: totals.taxMinor,
      totalMinor: totals.totalMinor,
      depositId: holding?.id ?? null,
      depositMinor: totals.depositMinor,
      tradeInPianoId: tradeIn?.id ?? null,
      tradeInAllowanceMinor: totals.tradeInAllowanceMinor,
      balanceMinor: totals.balanceMinor,
      owedToBuyerMinor: totals.owedToBuyerMinor,
      recordedById: actor.id,
      recordedAt: now.toISOString(),
    });
    const balance: Balance = { priceMinor: totals.agreedPriceMinor, taxMinor: totals.taxMinor, totalMinor: totals.totalMinor, depositMinor: totals.depositMinor, balanceMinor: totals.balanceMinor, currency, salesTaxPct: totals.salesTaxPct };
    return { stage: piano.stage, balance, sale: saleRecord(actor, sale, tradeIn ?? undefined) };
  });
}

/** The buyer's own piano enters stock: received today, its intake a trade-in with the buyer as its seller. */
async function takeInTrade(trx: Knex.Transaction, actor: Actor, buyer: SaleInput['buyer'], p: PianoInput, now: Date): Promise<Piano> {
  const piano = await insertArrivedPiano(trx, actor, p);
  await Intake.query(trx).insert({
    pianoId: piano.id,
    sellerName: buyer.name,
    sellerPhone: buyer.phone ?? null,
    sellerEmail: buyer.email ?? null,
    sellerAddress: buyer.address ?? null,
    acquisition: 'trade_in',
    receivedOn: now.toISOString().slice(0, 10),
    inspectedAt: 'showroom',
    notes: 'Taken in trade at a sale; not inspected yet.',
    samePianoAsId: null,
    createdById: actor.id,
  });
  return piano;
}

/** Staff take the balance in the shop: marked paid once; a second mark, or one with nothing due, is refused. */
export async function markBalancePaid(deps: DepositDeps, actor: Actor, saleId: number): Promise<SaleRecord> {
  if (!can(actor.role, 'sellPianos')) throw notAllowed('take balance payments');
  return Sale.transaction(async (trx) => {
    // The row lock makes two marks take turns: the second sees the first one's payment.
    const sale = await Sale.query(trx).findById(saleId).forUpdate();
    if (!sale) throw notFound(`sale ${saleId}`);
    if (sale.balancePaidAt) throw new AppError('CONFLICT', `The balance of this sale was already paid on ${sale.balancePaidAt.slice(0, 10)}.`);
    if (sale.balanceMinor === 0) throw new AppError('CONFLICT', 'Nothing is due on this sale: the deposit and trade-in allowance cover it.');
    const paid = await sale.$query(trx).patchAndFetch({ balancePaidAt: deps.clock.now().toISOString(), balancePaidHow: 'in_shop', balancePaidById: actor.id });
    await enqueueBalanceReceipt(trx, paid);
    return saleRecord(actor, paid, paid.tradeInPianoId ? await Piano.query(trx).findById(paid.tradeInPianoId) : undefined);
  });
}

/** The buyer's receipt for the balance, queued in the transaction that recorded the payment. */
async function enqueueBalanceReceipt(trx: Knex.Transaction, paid: Sale): Promise<void> {
  if (!paid.buyerEmail) return;
  const piano = (await Piano.query(trx).findById(paid.pianoId))!;
  const where = paid.balancePaidHow === 'online' ? 'online' : 'in our shop';
  await enqueue(trx, 'send-email', {
    to: paid.buyerEmail,
    subject: `Receipt: balance paid for ${piano.stockNumber}`,
    text: `Dear ${paid.buyerName},\n\nWe received your payment of ${money(paid.balanceMinor, paid.currency)} ${where}, the balance for the ${pianoName(piano)} (stock number ${piano.stockNumber}). Nothing more is due on it.\n\n${saleLines(paid)}\n`,
  });
}

/** A completed balance checkout: the sale is paid once, whatever the number of deliveries. */
async function onBalancePaid(deps: DepositDeps, trx: Knex.Transaction, session: Stripe.Checkout.Session): Promise<void> {
  const sale = await Sale.query(trx).findById(Number(session.metadata?.saleId)).forUpdate();
  if (!sale || sale.balancePaidAt || session.payment_status !== 'paid') return;
  const paid = await sale.$query(trx).patchAndFetch({ balancePaidAt: deps.clock.now().toISOString(), balancePaidHow: 'online', balancePaymentIntentId: String(session.payment_intent) });
  await enqueueBalanceReceipt(trx, paid);
}

/** The buyer pays the balance online from their disclosure link: a second checkout, for the sale's balance. */
export async function startBalancePayment(deps: DepositDeps, token: string): Promise<{ url: string; amountMinor: number; currency: string }> {
  const { link } = await disclosureByToken(token);
  const sale = await Sale.query().findOne({ piano_id: link.pianoId });
  if (!sale) throw new AppError('NOT_FOUND', 'No sale is recorded for this piano yet.');
  if (sale.balancePaidAt) throw new AppError('CONFLICT', 'The balance is already paid: nothing more is due.');
  if (sale.balanceMinor === 0) throw new AppError('CONFLICT', 'Nothing is due: the deposit and trade-in allowance cover the sale.');
  if (sale.balanceCheckoutSessionId) {
    const open = await deps.stripe.checkout.sessions.retrieve(sale.balanceCheckoutSessionId);
    if (open.status === 'open' && open.url) return { url: open.url, amountMinor: sale.balanceMinor, currency: sale.currency };
  }
  const piano = (await Piano.query().findById(sale.pianoId))!;
  // Keyed on the checkout it replaces: two presses at once send one key and get one session.
  const session = await deps.stripe.checkout.sessions.create(
    {
      mode: 'payment',
      ...(sale.buyerEmail ? { customer_email: sale.buyerEmail } : {}),
      line_items: [{ quantity: 1, price_data: { currency: sale.currency.toLowerCase(), unit_amount: sale.balanceMinor, product_data: { name: `Balance for ${piano.stockNumber}, ${pianoName(piano)}` } } }],
      success_url: `${deps.publicUrl}/d/${token}`,
      cancel_url: `${deps.publicUrl}/d/${token}`,
      metadata: { kind: 'balance', saleId: String(sale.id), pianoId: String(piano.id), stockNumber: piano.stockNumber },
    },
    { idempotencyKey: `balance-checkout-sale-${sale.id}-after-${sale.balanceCheckoutSessionId ?? 'none'}` },
  );
  await Sale.query().patch({ balanceCheckoutSessionId: session.id }).where({ id: sale.id }).whereNull('balance_paid_at');
  return { url: session.url!, amountMinor: sale.balanceMinor, currency: sale.currency };
}

/** The sale's lines as a buyer reads them, in the sale's currency. */
function saleLines(s: Sale): string {
  const lines = [`Agreed price ${money(s.agreedPriceMinor, s.currency)}`, `Sales tax (${s.salesTaxPct} %) ${money(s.taxMinor, s.currency)}`, `Total ${money(s.totalMinor, s.currency)}`];
  if (s.depositMinor) lines.push(`Deposit paid -${money(s.depositMinor, s.currency)}`);
  if (s.tradeInAllowanceMinor) lines.push(`Trade-in allowance -${money(s.tradeInAllowanceMinor, s.currency)}`);
  lines.push(`Balance ${money(s.balanceMinor, s.currency)}${s.balancePaidAt ? `, paid ${s.balancePaidAt.slice(0, 10)}` : ''}`);
  return lines.join('\n');
}

function saleRecord(actor: Actor, s: Sale, traded?: { id: number; stockNumber: string }): SaleRecord {
  return {
    id: s.id,
    agreedPriceMinor: s.agreedPriceMinor,
    currency: s.currency as Currency,
    salesTaxPct: s.salesTaxPct,
    depositMinor: s.depositMinor,
    tradeInAllowanceMinor: s.tradeInAllowanceMinor,
    taxMinor: s.taxMinor,
    totalMinor: s.totalMinor,
    balanceMinor: s.balanceMinor,
    owedToBuyerMinor: s.owedToBuyerMinor,
    tradeIn: traded ? { pianoId: traded.id, stockNumber: traded.stockNumber } : null,
    buyer: can(actor.role, 'readBuyerDetails') ? { name: s.buyerName, email: s.buyerEmail, phone: s.buyerPhone, address: s.buyerAddress } : null,
    balancePaidAt: s.balancePaidAt,
    balancePaidHow: s.balancePaidHow,
  };
}

export async function depositsFor(actor: Actor, pianoId: number) {
  if (!can(actor.role, 'sellPianos')) throw notAllowed('see deposits');
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
  // The page writes the hold's end in the shop's time zone.
  return { status: deposit.status, amountMinor: deposit.amountMinor, currency: deposit.currency, holdExpiresAt: deposit.holdExpiresAt, buyerName: deposit.buyerName, stockNumber: piano.stockNumber, balance, dealer: await shopLocality() };
}
