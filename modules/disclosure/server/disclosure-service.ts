import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

import Handlebars from 'handlebars';
import type { Knex } from 'knex';

import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { User } from '@/modules/accounts/server/user-model';
import { gradedAssessments, remeasuredFieldsOf } from '@/modules/assessment/server/assessment-service';
import { balanceDue } from '@/modules/deposits/core/deposit';
import { depositTerms } from '@/modules/deposits/core/deposit-terms';
import { Deposit } from '@/modules/deposits/server/deposit-models';
import { depositRules, publicDepositTerms } from '@/modules/deposits/server/deposit-rules';
import { acknowledgeInput, buildDisclosure, type AcknowledgementAnswer, DEFAULT_WARRANTY, priceInput, publishBlockers, textsInput, type AnyDisclosureContent, type DisclosureContent } from '@/modules/disclosure/core/disclosure';
import { digestPrefixOf, parseVerificationCode, verificationCode } from '@/modules/disclosure/core/verification';
import { enqueue } from '@/modules/jobs/server/queue';
import { Photo } from '@/modules/photos/server/photo-model';
import type { PhotoStore } from '@/modules/photos/server/photo-store';
import { pianoName } from '@/modules/pianos/core/piano';
import { Piano } from '@/modules/pianos/server/piano-model';
import { changeAskingPrice, type PricingDeps } from '@/modules/pricing/server/pricing-service';
import { StageMove } from '@/modules/pianos/server/stage-move-model';
import { formatDay, formatDayTime, type DealerLocality } from '@/modules/shop/core/dealer-time';
import { formatMoney, moneyText, type Currency } from '@/modules/shop/core/money';
import { contactLines } from '@/modules/shop/core/shop-profile';
import { WorkItem } from '@/modules/shop/server/shop-models';
import { shopLocality, shopProfile } from '@/modules/shop/server/shop-profile-service';
import { latestPlayTest } from '@/modules/tone/server/tone-service';
import { systemClock, type Clock } from '@/server/clock';
import { AppError, notAllowed, notFound } from '@/server/errors';

import { contentDigest } from './digest';
import { paperView } from './disclosure-paper';
import { floorTagPdf, signedCopyPdf, type SignedCopyMeta } from './disclosure-pdf';
import { Acknowledgement, Disclosure, DisclosureLink, ShopSetting } from './disclosure-models';

export type { AcknowledgementAnswer };

const template = (name: string, options?: Parameters<typeof Handlebars.compile>[1]) => Handlebars.compile(fs.readFileSync(path.join(__dirname, 'templates', name), 'utf8'), options);
const DISCLOSURE_HTML = template('disclosure.hbs');
// Plain text: "Thornquist & Hale" stays as typed, with no HTML escapes.
const SIGNED_COPY_EMAIL = template('signed-copy-email.hbs', { noEscape: true });

export interface DisclosureDeps {
  photos: PhotoStore;
  publicUrl: string;
  /** the time publishing and countersigning run on; tests move it on */
  clock?: Clock;
}

const nowIso = (deps: DisclosureDeps) => (deps.clock ?? systemClock).now().toISOString();
/** Where anyone checks a paper's verification code. */
export const checkUrl = (deps: Pick<DisclosureDeps, 'publicUrl'>) => `${deps.publicUrl}/check`;

// 24 random bytes: 192 bits, written in 32 URL-safe characters.
const TOKEN = /^[A-Za-z0-9_-]{32}$/;
const newToken = () => randomBytes(24).toString('base64url');
const NOT_FOUND = () => new AppError('NOT_FOUND', 'Not found.');

const canPublish = (a: Actor) => can(a.role, 'showToBuyers');

export function priceText(minor: number | null, currency: string | null): string | null {
  return minor != null && currency ? formatMoney(minor, currency as Currency) : null;
}

export async function shopTexts(): Promise<{ dealerName: string; warranty: string }> {
  const rows = await ShopSetting.query().whereIn('key', ['dealerName', 'warranty']);
  const get = (k: string) => rows.find((r) => r.key === k)?.value as string | undefined;
  return { dealerName: get('dealerName') ?? 'Larkspur Lane Pianos', warranty: get('warranty') ?? DEFAULT_WARRANTY };
}

export async function setShopTexts(actor: Actor, raw: unknown) {
  if (!can(actor.role, 'editShopTexts')) throw notAllowed('edit the disclosure texts');
  const input = textsInput.parse(raw);
  for (const [key, value] of Object.entries(input)) {
    await ShopSetting.query().insert({ key, value: JSON.stringify(value) as never, updatedById: actor.id }).onConflict('key').merge();
  }
  return shopTexts();
}

/** The disclosure desk's price field: the same one path as every other price change, so the history keeps it. */
export async function setAskingPrice(actor: Actor, raw: unknown, pricing: PricingDeps): Promise<Piano> {
  if (!can(actor.role, 'setPrices')) throw notAllowed('set prices');
  const input = priceInput.parse(raw);
  const { piano } = await changeAskingPrice(pricing, actor, { ...input, reason: input.reason ?? 'No reason given' });
  return piano;
}

/**
 * Gathers only public facts about a piano and builds its disclosure content: the newest inspection of
 * kind intake (or its correction), the re-measurements after the work since then, the work done, and
 * whether the manager chose to sell it as it stands.
 */
async function contentFor(pianoId: number): Promise<DisclosureContent> {
  const piano = await Piano.query().findById(pianoId);
  if (!piano) throw notFound(`piano ${pianoId}`);
  const versions = await gradedAssessments(pianoId);
  if (!versions.length) throw new AppError('CONFLICT', `${piano.stockNumber} has no assessment to disclose yet.`);
  const latest = versions[versions.length - 1];
  const blockers = publishBlockers(latest.grade);
  if (blockers.length) throw new AppError('CONFLICT', `${piano.stockNumber} cannot be published yet. ${blockers.join(' ')}`);
  const baseAt = versions.map((v) => v.kind).lastIndexOf('intake');
  const base = versions[Math.max(0, baseAt)];
  const afterVersions = versions.slice(baseAt + 1).filter((v) => v.kind === 'post_workshop');
  const remeasured = [...new Set(afterVersions.flatMap((v) => remeasuredFieldsOf(v, versions[versions.indexOf(v) - 1])))];
  const newestAfter = afterVersions[afterVersions.length - 1];
  const work = await WorkItem.query().where({ piano_id: pianoId, status: 'done' }).orderBy('id');
  const photos = await Photo.query().where('piano_id', pianoId).where((q) => q.whereNull('phase').orWhere('phase', 'after')).orderBy('id');
  // Sold as it stands: the newest decision between the workshop and the floor was to skip the workshop.
  const decision = await StageMove.query().where('piano_id', pianoId).whereIn('action', ['sell_as_is', 'approve_plan']).orderBy([{ column: 'at', order: 'desc' }, { column: 'id', order: 'desc' }]).first();
  return buildDisclosure({
    piano,
    askingPriceMinor: piano.askingPriceMinor,
    currency: piano.priceCurrency ?? 'USD',
    intake: { measurements: base.measurements, grade: base.grade, submittedAt: base.submittedAt },
    after: newestAfter ? { measurements: newestAfter.measurements, grade: newestAfter.grade, submittedAt: newestAfter.submittedAt, remeasured } : null,
    workDone: work.map((w) => ({ task: w.task, title: w.title, because: w.because ?? [] })),
    soldAsItStands: decision?.action === 'sell_as_is',
    photos: photos.map((ph) => ({ id: ph.id, area: ph.area, caption: ph.caption })),
    texts: await shopTexts(),
    timeZone: (await shopLocality()).timeZone,
    tone: await latestPlayTest(pianoId),
  });
}

/** Who published a page and where: the dealer's contact and dates as they stood when it was frozen. */
export interface PageDealer {
  where: DealerLocality;
  contact: string[];
  checkUrl: string;
}

/** The published page of one version, as it is frozen with it. */
export function renderDisclosureHtml(content: DisclosureContent, version: number, digest: string, publishedAt: string, dealer: PageDealer): string {
  return DISCLOSURE_HTML({
    content,
    paper: paperView(content, dealer.where),
    version,
    code: verificationCode(digest),
    checkUrl: dealer.checkUrl,
    contact: dealer.contact,
    publishedOn: formatDay(publishedAt, dealer.where),
    price: priceText(content.askingPrice?.minor ?? null, content.askingPrice?.currency ?? null),
  });
}

async function pageDealer(deps: DisclosureDeps): Promise<PageDealer> {
  const profile = await shopProfile();
  return { where: { locale: profile.locale, timeZone: profile.timeZone }, contact: contactLines(profile), checkUrl: checkUrl(deps) };
}

export interface Published {
  version: number;
  digest: string;
  token: string;
  url: string;
  publishedAt: string;
  unchanged: boolean;
}

/** Freezes the piano's disclosure as a new version, unless nothing in it changed since the last one. */
export async function publishDisclosure(deps: DisclosureDeps, actor: Actor, pianoId: number): Promise<Published> {
  if (!canPublish(actor)) throw notAllowed('publish disclosures');
  const content = await contentFor(pianoId);
  const digest = contentDigest(content);
  const dealer = await pageDealer(deps);
  return Disclosure.transaction(async (trx) => {
    await trx.raw('select pg_advisory_xact_lock(?)', [pianoId]);
    let link = await DisclosureLink.query(trx).findById(pianoId);
    if (!link) link = await DisclosureLink.query(trx).insertAndFetch({ pianoId, token: newToken() });
    const url = `${deps.publicUrl}/d/${link.token}`;
    const latest = await Disclosure.query(trx).where('piano_id', pianoId).orderBy('version', 'desc').first();
    if (latest && latest.digest === digest) return { version: latest.version, digest, token: link.token, url, publishedAt: latest.publishedAt, unchanged: true };
    const version = (latest?.version ?? 0) + 1;
    const publishedAt = nowIso(deps);
    await Disclosure.query(trx).insert({ pianoId, version, content, html: renderDisclosureHtml(content, version, digest, publishedAt, dealer), digest, publishedById: actor.id, publishedAt });
    return { version, digest, token: link.token, url, publishedAt, unchanged: false };
  });
}

export async function disclosureVersions(actor: Actor, pianoId: number) {
  if (!can(actor.role, 'readPianos')) throw notAllowed('read disclosures');
  const link = await DisclosureLink.query().findById(pianoId);
  const rows = await Disclosure.query().where('piano_id', pianoId).orderBy('version').select('id', 'version', 'digest', 'published_at', 'published_by_id');
  return { token: link?.token ?? null, versions: rows.map((r) => ({ id: r.id, version: r.version, digest: r.digest, publishedAt: r.publishedAt })) };
}

export async function disclosureByToken(token: string): Promise<{ link: DisclosureLink; newest: Disclosure }> {
  if (typeof token !== 'string' || !TOKEN.test(token)) throw NOT_FOUND();
  const link = await DisclosureLink.query().findOne({ token });
  if (!link) throw NOT_FOUND();
  const newest = await Disclosure.query().where('piano_id', link.pianoId).orderBy('version', 'desc').first();
  if (!newest) throw NOT_FOUND();
  return { link, newest };
}

/** What anyone with the link may read: the content, never the piano's internal record. */
export async function publicDisclosure(deps: DisclosureDeps, token: string, version?: number) {
  const { link, newest } = await disclosureByToken(token);
  const shown = version == null ? newest : await Disclosure.query().findOne({ piano_id: link.pianoId, version });
  if (!shown) throw NOT_FOUND();
  const photoRows = shown.content.photos.length ? await Photo.query().whereIn('id', shown.content.photos.map((p) => p.id)) : [];
  const photos = await Promise.all(
    shown.content.photos.map(async (p) => {
      const row = photoRows.find((r) => r.id === p.id);
      return { ...p, url: row ? await deps.photos.readUrl(row.objectKey) : null };
    }),
  );
  const held = (await Piano.query().findById(link.pianoId).select('stage'))?.stage;
  const profile = await shopProfile();
  return {
    version: shown.version,
    digest: shown.digest,
    verificationCode: verificationCode(shown.digest),
    // The buyer's page writes its dates in the shop's words and shows whom to ask.
    dealer: { name: shown.content.dealerName, locale: profile.locale, timeZone: profile.timeZone, contact: contactLines(profile) },
    publishedAt: shown.publishedAt,
    newestVersion: newest.version,
    changedAt: newest.publishedAt,
    isNewest: shown.version === newest.version,
    available: held === 'on_floor',
    content: { ...shown.content, photos },
  };
}

export async function publicDisclosureHtml(token: string, version?: number): Promise<string> {
  const { link, newest } = await disclosureByToken(token);
  const shown = version == null ? newest : await Disclosure.query().findOne({ piano_id: link.pianoId, version });
  if (!shown) throw NOT_FOUND();
  return shown.html;
}

/**
 * A buyer acknowledges the version they read; a stale digest is refused, so nobody signs for text they did
 * not see. One buyer (e-mail) acknowledges one version once: a second time, even at the same moment, gets
 * the first back (the database's unique index decides between two at once).
 */
export async function acknowledge(token: string, raw: unknown): Promise<AcknowledgementAnswer> {
  const { newest } = await disclosureByToken(token);
  const input = acknowledgeInput.parse(raw);
  if (input.digest !== newest.digest) {
    throw new AppError('CONFLICT', `The disclosure changed since you opened it: version ${newest.version} is the newest. Read it again before acknowledging.`, 'digest');
  }
  const knex = Acknowledgement.knex();
  const inserted = await knex.raw(
    `insert into acknowledgements (disclosure_id, buyer_name, buyer_email, digest, receipt_token) values (?, ?, ?, ?, ?)
     on conflict (disclosure_id, lower(buyer_email)) where repeats_id is null do nothing returning id`,
    [newest.id, input.fullName, input.email, newest.digest, newToken()],
  );
  const id = (inserted.rows as { id: number }[])[0]?.id;
  const ack = id != null ? await Acknowledgement.query().findById(id) : await Acknowledgement.query().where('disclosure_id', newest.id).whereRaw('lower(buyer_email) = lower(?)', [input.email]).whereNull('repeats_id').first();
  if (!ack) throw new AppError('CONFLICT', 'The acknowledgement could not be recorded: send it again.');
  return { acknowledgementId: ack.id, receiptToken: ack.receiptToken, version: newest.version, digest: newest.digest, acknowledgedAt: ack.acknowledgedAt, buyerName: ack.buyerName, buyerEmail: ack.buyerEmail, already: id == null };
}

export async function acknowledgementsFor(actor: Actor, pianoId: number) {
  if (!canPublish(actor)) throw notAllowed('see acknowledgements');
  const rows = await Acknowledgement.query()
    .join('disclosures', 'disclosures.id', 'acknowledgements.disclosure_id')
    .leftJoin('users', 'users.id', 'acknowledgements.countersigned_by_id')
    .where('disclosures.piano_id', pianoId)
    .whereNull('acknowledgements.repeats_id')
    .orderBy('acknowledgements.id', 'desc')
    .select('acknowledgements.*', 'disclosures.version', 'users.name as countersigned_by');
  return rows.map((r) => {
    const row = r as Acknowledgement & { version: number; countersignedBy: string | null };
    return { id: row.id, version: row.version, buyerName: row.buyerName, buyerEmail: row.buyerEmail, digest: row.digest, acknowledgedAt: row.acknowledgedAt, countersignedBy: row.countersignedBy, countersignedAt: row.countersignedAt, hasPdf: !!row.pdfKey };
  });
}

/** The deposit part of a signed copy: what this buyer paid for this version, else the terms a deposit would take. */
async function depositForCopy(trx: Knex.Transaction, ack: Acknowledgement, c: AnyDisclosureContent, where: DealerLocality): Promise<SignedCopyMeta['deposit']> {
  const price = c.askingPrice;
  if (!price) return null;
  const paid = await Deposit.query(trx)
    .where('disclosure_id', ack.disclosureId)
    .whereNotNull('paid_at')
    .where((q) => q.where('acknowledgement_id', ack.id).orWhereRaw('lower(buyer_email) = lower(?)', [ack.buyerEmail]))
    .orderBy('id', 'desc')
    .first();
  const rules = await depositRules(trx);
  if (paid) {
    const b = balanceDue(price.minor, paid.amountMinor, price.currency as Currency, rules);
    const status: Record<string, string> = { refunding: 'The deposit is being refunded.', refunded: 'The deposit was refunded.', released: 'The hold was released.', expired: 'The hold has ended.', applied: 'The deposit went toward the sale.' };
    return {
      kind: 'paid',
      amount: moneyText(paid.amountMinor, paid.currency),
      paidAt: formatDayTime(paid.paidAt!, where),
      holdUntil: paid.status === 'holding' && paid.holdExpiresAt ? formatDayTime(paid.holdExpiresAt, where) : null,
      status: status[paid.status] ?? '',
      balance: [
        { label: 'Price', amount: moneyText(b.priceMinor, b.currency) },
        { label: `Sales tax (${b.salesTaxPct} %)`, amount: moneyText(b.taxMinor, b.currency) },
        { label: 'Deposit paid', amount: `-${moneyText(b.depositMinor, b.currency)}` },
        { label: 'Balance due at the sale', amount: moneyText(b.balanceMinor, b.currency) },
      ],
    };
  }
  const quote = await publicDepositTerms(price, trx);
  return { kind: 'terms', amount: moneyText(quote.amountMinor, quote.currency), holdDays: quote.holdDays, terms: depositTerms({ ...quote, basis: null }, c.dealerName) };
}

async function signedCopyFor(deps: DisclosureDeps, trx: Knex.Transaction, ack: Acknowledgement, countersignedBy: string) {
  const disclosure = (await Disclosure.query(trx).findById(ack.disclosureId))!;
  const c = disclosure.content;
  const profile = await shopProfile(trx);
  const where = { locale: profile.locale, timeZone: profile.timeZone };
  const meta: SignedCopyMeta = {
    version: disclosure.version,
    digest: disclosure.digest,
    code: verificationCode(disclosure.digest),
    checkUrl: checkUrl(deps),
    price: priceText(c.askingPrice?.minor ?? null, c.askingPrice?.currency ?? null),
    dealer: { name: c.dealerName, contact: contactLines(profile) },
    where,
    buyerName: ack.buyerName,
    buyerEmail: ack.buyerEmail,
    acknowledgedAt: ack.acknowledgedAt,
    countersignedBy,
    countersignedAt: ack.countersignedAt!,
    deposit: await depositForCopy(trx, ack, c, where),
  };
  return { pdf: await signedCopyPdf(c, meta), disclosure, meta };
}

/**
 * Floor staff or a manager countersign; the signed copy is made and stored, and its e-mail to the
 * buyer is queued, all under the acknowledgement's row lock: of two at once, one signs.
 */
export async function countersign(deps: DisclosureDeps, actor: Actor, acknowledgementId: number) {
  if (!canPublish(actor)) throw notAllowed('countersign disclosures');
  const signer = (await User.query().findById(actor.id))!;
  return Acknowledgement.transaction(async (trx) => {
    const ack = await Acknowledgement.query(trx).findById(acknowledgementId).forUpdate();
    if (!ack) throw notFound(`acknowledgement ${acknowledgementId}`);
    if (ack.countersignedAt) throw new AppError('CONFLICT', 'This acknowledgement is already countersigned.');
    if (ack.repeatsId != null) throw new AppError('CONFLICT', `This buyer acknowledged this version before: countersign acknowledgement ${ack.repeatsId}.`);
    const signed = await ack.$query(trx).patchAndFetch({ countersignedById: actor.id, countersignedAt: nowIso(deps) });
    const { pdf, disclosure, meta } = await signedCopyFor(deps, trx, signed, signer.name);
    const pdfKey = `disclosures/${disclosure.pianoId}/signed-${signed.id}-${signed.receiptToken.slice(0, 8)}.pdf`;
    await deps.photos.put(pdfKey, pdf, 'application/pdf');
    await signed.$query(trx).patch({ pdfKey });
    const c = disclosure.content;
    const named = pianoName(c.piano);
    await enqueue(trx, 'send-email', {
      to: signed.buyerEmail,
      subject: `Your signed condition disclosure: ${named}, ${c.piano.stockNumber}`,
      text: SIGNED_COPY_EMAIL({
        buyerName: signed.buyerName,
        piano: named,
        stockNumber: c.piano.stockNumber,
        dealerName: c.dealerName,
        contact: meta.dealer.contact,
        version: disclosure.version,
        acknowledgedOn: formatDayTime(signed.acknowledgedAt, meta.where),
        countersignedBy: signer.name,
        countersignedOn: formatDayTime(signed.countersignedAt!, meta.where),
        code: meta.code,
        checkUrl: `${meta.checkUrl}/${meta.code}`,
        downloadUrl: `${deps.publicUrl}/api/public/receipts/${signed.receiptToken}.pdf`,
      }),
      // The PDF waits in storage; the job carries its key.
      attachments: [{ filename: `disclosure-${c.piano.stockNumber}-v${disclosure.version}-signed.pdf`, contentType: 'application/pdf', objectKey: pdfKey }],
    });
    return { id: signed.id, countersignedAt: signed.countersignedAt, countersignedBy: signer.name, pdfKey };
  });
}

export async function signedPdfByReceipt(deps: DisclosureDeps, receiptToken: string): Promise<{ pdf: Buffer; filename: string }> {
  if (!TOKEN.test(receiptToken)) throw NOT_FOUND();
  const ack = await Acknowledgement.query().findOne({ receipt_token: receiptToken });
  if (!ack?.pdfKey) throw NOT_FOUND();
  return { pdf: await deps.photos.get(ack.pdfKey), filename: `disclosure-signed-${ack.id}.pdf` };
}

export async function signedPdfForStaff(deps: DisclosureDeps, actor: Actor, acknowledgementId: number): Promise<{ pdf: Buffer; filename: string }> {
  if (!canPublish(actor)) throw notAllowed('download signed copies');
  const ack = await Acknowledgement.query().findById(acknowledgementId);
  if (!ack?.pdfKey) throw notFound(`a signed copy for acknowledgement ${acknowledgementId}`);
  return { pdf: await deps.photos.get(ack.pdfKey), filename: `disclosure-signed-${ack.id}.pdf` };
}

export async function floorTag(deps: DisclosureDeps, actor: Actor, pianoId: number): Promise<Buffer> {
  if (!canPublish(actor)) throw notAllowed('print floor tags');
  const piano = await Piano.query().findById(pianoId);
  if (!piano) throw notFound(`piano ${pianoId}`);
  const link = await DisclosureLink.query().findById(pianoId);
  if (!link) throw new AppError('CONFLICT', 'Publish the disclosure first: the tag carries its link.');
  return floorTagPdf({
    stockNumber: piano.stockNumber,
    title: pianoName(piano),
    price: priceText(piano.askingPriceMinor, piano.priceCurrency),
    url: `${deps.publicUrl}/d/${link.token}`,
    dealerName: (await shopTexts()).dealerName,
  });
}

export interface CheckedVersion {
  /** the id the published page of this version is asked for by, with the code */
  id: number;
  dealerName: string;
  stockNumber: string;
  piano: string;
  version: number;
  publishedOn: string;
  newestVersion: number;
  newestOn: string;
}

/**
 * What a verification code belongs to: the published version(s) whose digest begins with the code's 60 bits
 * (two versions sharing them is a chance of about one in a billion billion; both are then listed).
 */
export async function checkCode(typed: string): Promise<{ code: string; versions: CheckedVersion[] }> {
  const code = parseVerificationCode(typed);
  if (!code) throw new AppError('BAD_INPUT', 'code: must be the 12 letters and digits printed on the paper, such as 7K3Q-M9TD-20XF', 'code');
  const rows = await Disclosure.query().where('digest', 'like', `${digestPrefixOf(code)}%`).orderBy('id').limit(5).select('id', 'piano_id', 'version', 'published_at', 'content');
  const profile = await shopProfile();
  const versions = await Promise.all(
    rows.map(async (r) => {
      const newest = (await Disclosure.query().where('piano_id', r.pianoId).orderBy('version', 'desc').first().select('version', 'published_at'))!;
      return {
        id: r.id,
        dealerName: r.content.dealerName,
        stockNumber: r.content.piano.stockNumber,
        piano: pianoName(r.content.piano),
        version: r.version,
        publishedOn: formatDay(r.publishedAt, profile),
        newestVersion: newest.version,
        newestOn: formatDay(newest.publishedAt, profile),
      };
    }),
  );
  return { code, versions };
}

/** The published page of the version a code belongs to, as it was frozen: the code must match it. */
export async function checkedVersionHtml(typed: string, id: number): Promise<string> {
  const code = parseVerificationCode(typed);
  if (!code) throw NOT_FOUND();
  const row = await Disclosure.query().findById(id).where('digest', 'like', `${digestPrefixOf(code)}%`).select('html');
  if (!row) throw NOT_FOUND();
  return row.html;
}
