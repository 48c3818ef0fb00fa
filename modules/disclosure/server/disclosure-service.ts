import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

import Handlebars from 'handlebars';
import type { Knex } from 'knex';

import { can } from '@/modules/accounts/core/roles';
import type { Actor } from '@/modules/accounts/server/user-service';
import { User } from '@/modules/accounts/server/user-model';
import { gradedAssessments, remeasuredFieldsOf } from '@/modules/assessment/server/assessment-service';
import { acknowledgeInput, buildDisclosure, DEFAULT_WARRANTY, priceInput, publishBlockers, textsInput, type DisclosureContent } from '@/modules/disclosure/core/disclosure';
import { enqueue } from '@/modules/jobs/server/queue';
import { Photo } from '@/modules/photos/server/photo-model';
import type { PhotoStore } from '@/modules/photos/server/photo-store';
import { pianoName } from '@/modules/pianos/core/piano';
import { Piano } from '@/modules/pianos/server/piano-model';
import { changeAskingPrice, type PricingDeps } from '@/modules/pricing/server/pricing-service';
import { StageMove } from '@/modules/pianos/server/stage-move-model';
import { formatMoney, type Currency } from '@/modules/shop/core/money';
import { WorkItem } from '@/modules/shop/server/shop-models';
import { AppError, notAllowed, notFound } from '@/server/errors';

import { contentDigest } from './digest';
import { paperDay, paperView } from './disclosure-paper';
import { floorTagPdf, signedCopyPdf } from './disclosure-pdf';
import { Acknowledgement, Disclosure, DisclosureLink, ShopSetting } from './disclosure-models';

const template = (name: string) => Handlebars.compile(fs.readFileSync(path.join(__dirname, 'templates', name), 'utf8'));
const DISCLOSURE_HTML = template('disclosure.hbs');
const SIGNED_COPY_EMAIL = template('signed-copy-email.hbs');

export interface DisclosureDeps {
  photos: PhotoStore;
  publicUrl: string;
}

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
  });
}

/** The published page of one version, as it is frozen with it. */
export function renderDisclosureHtml(content: DisclosureContent, version: number, digest: string, publishedAt: string): string {
  return DISCLOSURE_HTML({ content, paper: paperView(content), version, digest, publishedOn: paperDay(publishedAt), price: priceText(content.askingPrice?.minor ?? null, content.askingPrice?.currency ?? null) });
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
  return Disclosure.transaction(async (trx) => {
    await trx.raw('select pg_advisory_xact_lock(?)', [pianoId]);
    let link = await DisclosureLink.query(trx).findById(pianoId);
    if (!link) link = await DisclosureLink.query(trx).insertAndFetch({ pianoId, token: newToken() });
    const url = `${deps.publicUrl}/d/${link.token}`;
    const latest = await Disclosure.query(trx).where('piano_id', pianoId).orderBy('version', 'desc').first();
    if (latest && latest.digest === digest) return { version: latest.version, digest, token: link.token, url, publishedAt: latest.publishedAt, unchanged: true };
    const version = (latest?.version ?? 0) + 1;
    const publishedAt = new Date().toISOString();
    await Disclosure.query(trx).insert({ pianoId, version, content, html: renderDisclosureHtml(content, version, digest, publishedAt), digest, publishedById: actor.id, publishedAt });
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
  return {
    version: shown.version,
    digest: shown.digest,
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

/** A buyer acknowledges the version they read; a stale digest is refused, so nobody signs for text they did not see. */
export async function acknowledge(token: string, raw: unknown): Promise<{ acknowledgementId: number; receiptToken: string; version: number; digest: string; acknowledgedAt: string }> {
  const { newest } = await disclosureByToken(token);
  const input = acknowledgeInput.parse(raw);
  if (input.digest !== newest.digest) {
    throw new AppError('CONFLICT', `The disclosure changed since you opened it: version ${newest.version} is the newest. Read it again before acknowledging.`, 'digest');
  }
  const ack = await Acknowledgement.query().insertAndFetch({ disclosureId: newest.id, buyerName: input.fullName, buyerEmail: input.email, digest: newest.digest, receiptToken: newToken() });
  return { acknowledgementId: ack.id, receiptToken: ack.receiptToken, version: newest.version, digest: newest.digest, acknowledgedAt: ack.acknowledgedAt };
}

export async function acknowledgementsFor(actor: Actor, pianoId: number) {
  if (!canPublish(actor)) throw notAllowed('see acknowledgements');
  const rows = await Acknowledgement.query()
    .join('disclosures', 'disclosures.id', 'acknowledgements.disclosure_id')
    .leftJoin('users', 'users.id', 'acknowledgements.countersigned_by_id')
    .where('disclosures.piano_id', pianoId)
    .orderBy('acknowledgements.id', 'desc')
    .select('acknowledgements.*', 'disclosures.version', 'users.name as countersigned_by');
  return rows.map((r) => {
    const row = r as Acknowledgement & { version: number; countersignedBy: string | null };
    return { id: row.id, version: row.version, buyerName: row.buyerName, buyerEmail: row.buyerEmail, digest: row.digest, acknowledgedAt: row.acknowledgedAt, countersignedBy: row.countersignedBy, countersignedAt: row.countersignedAt, hasPdf: !!row.pdfKey };
  });
}

async function pdfFor(trx: Knex.Transaction, ack: Acknowledgement, countersignedBy: string): Promise<{ pdf: Buffer; disclosure: Disclosure }> {
  const disclosure = (await Disclosure.query(trx).findById(ack.disclosureId))!;
  const c = disclosure.content;
  const pdf = await signedCopyPdf(c, {
    version: disclosure.version,
    digest: disclosure.digest,
    price: priceText(c.askingPrice?.minor ?? null, c.askingPrice?.currency ?? null),
    buyerName: ack.buyerName,
    buyerEmail: ack.buyerEmail,
    acknowledgedAt: ack.acknowledgedAt,
    countersignedBy,
    countersignedAt: ack.countersignedAt!,
  });
  return { pdf, disclosure };
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
    const signed = await ack.$query(trx).patchAndFetch({ countersignedById: actor.id, countersignedAt: new Date().toISOString() });
    const { pdf, disclosure } = await pdfFor(trx, signed, signer.name);
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
        version: disclosure.version,
        acknowledgedOn: signed.acknowledgedAt.slice(0, 10),
        countersignedBy: signer.name,
        digest: disclosure.digest,
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
