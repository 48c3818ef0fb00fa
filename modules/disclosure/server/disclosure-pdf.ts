import fs from 'node:fs';

import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';

import type { AreaMark } from '@/modules/assessment/core/grade';
import { areaSections, isFormat2, notDoneSummary, pitchSentence, pitchWhen, toneWords, type AnyDisclosureContent, type DisclosureContent, type DisclosureContentV1, type DisclosureToneContent } from '@/modules/disclosure/core/disclosure';
import { formatDayTime, type DealerLocality } from '@/modules/shop/core/dealer-time';
import { pianoName } from '@/modules/pianos/core/piano';
import { MARK_LOOKS, PALETTE } from '@/modules/theme/core/palette';
import { keyboardChartLayout } from '@/modules/tone/core/chart-layout';

import { markWord, paperDay } from './disclosure-paper';

// The app's own font, shipped in an npm package, parsed once (on the first PDF, to keep the server's
// start quick) and subsetted into each PDF: parsing it again per document took half of each PDF's time.
let fonts: Promise<{ body: string; bold: string }> | undefined;
function pdfFonts() {
  fonts ??= import('fontkit').then(({ create }) => {
    const font = (file: string) => create(fs.readFileSync(require.resolve(file))) as unknown as string;
    return { body: font('@expo-google-fonts/source-sans-3/400Regular/SourceSans3_400Regular.ttf'), bold: font('@expo-google-fonts/source-sans-3/600SemiBold/SourceSans3_600SemiBold.ttf') };
  });
  return fonts;
}

async function newDoc(title: string): Promise<PDFKit.PDFDocument> {
  const { body, bold } = await pdfFonts();
  // No default font: pdfkit would load and parse Helvetica's metrics for every document, unused.
  // Pages stay open to the end, so each can be given its footer once the page count is known.
  const doc = new PDFDocument({ size: 'A4', margin: 50, bufferPages: true, info: { Title: title, Producer: 'Feltwire' }, font: null as unknown as string });
  doc.registerFont('body', body);
  doc.registerFont('bold', bold);
  doc.font('body');
  return doc;
}

function finish(doc: PDFKit.PDFDocument): Promise<Buffer> {
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  return new Promise((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

export interface SignedCopyMeta {
  version: number;
  digest: string;
  /** the version's verification code, and where anyone can check it */
  code: string;
  checkUrl: string;
  price: string | null;
  dealer: { name: string; contact: string[] };
  /** the shop's locale and time zone: every date on the copy is the shop's */
  where: DealerLocality;
  buyerName: string;
  buyerEmail: string;
  acknowledgedAt: string;
  countersignedBy: string;
  countersignedAt: string;
  /** the deposit this buyer paid, or the terms a deposit would be taken on; null without a price */
  deposit:
    | { kind: 'paid'; amount: string; paidAt: string; holdUntil: string | null; status: string; balance: { label: string; amount: string }[] }
    | { kind: 'terms'; amount: string; holdDays: number; terms: string[] }
    | null;
}

const INK = '#1d1a16';
const QUIET = '#4a4238';

/** A mark drawn at the start of a line: the same shapes as on screen, its word printed after it. */
function drawMark(doc: PDFKit.PDFDocument, mark: AreaMark | 'done' | null, x: number, y: number): void {
  if (mark == null) return;
  const s = 8;
  doc.save();
  if (mark === 'done') {
    doc.lineWidth(1.6).strokeColor(PALETTE.moss).moveTo(x, y + s * 0.55).lineTo(x + s * 0.4, y + s * 0.95).lineTo(x + s, y + s * 0.1).stroke();
  } else {
    const { shape, ink } = MARK_LOOKS[mark];
    if (shape === 'circle') doc.circle(x + s / 2, y + s / 2, s / 2).fill(ink);
    if (shape === 'bar') doc.rect(x, y + s * 0.33, s, s * 0.34).fill(ink);
    if (shape === 'square') doc.rect(x, y, s, s).fill(ink);
    if (shape === 'triangle') doc.polygon([x + s / 2, y], [x + s, y + s], [x, y + s]).fill(ink);
    if (shape === 'dashed-ring') doc.lineWidth(1.2).dash(1.6, { space: 1.2 }).circle(x + s / 2, y + s / 2, s / 2 - 0.6).stroke(ink).undash();
  }
  doc.restore();
}

/** One line led by a mark and its word; work not done by an open box. */
function markedLine(doc: PDFKit.PDFDocument, mark: AreaMark | 'done' | null, text: string, openBox = false): void {
  const x = doc.page.margins.left + 8;
  const word = markWord(mark);
  // The mark and its line go on one page: room for the whole line first.
  keepRoom(doc, doc.font('body').heightOfString(`${word ? `${word}: ` : ''}${text}`, { width: doc.page.width - doc.page.margins.right - x - 14 }) + 2);
  if (openBox) doc.save().lineWidth(1).rect(x + 0.5, doc.y + 3.5, 7, 7).stroke(PALETTE.walnut).restore();
  else drawMark(doc, mark, x, doc.y + 3);
  doc.fillColor(INK);
  if (word) doc.font('bold').text(`${word}: `, x + 14, doc.y, { continued: true }).font('body').text(text);
  else doc.text(text, x + 14, doc.y);
  doc.x = doc.page.margins.left;
}

const contentWidth = (doc: PDFKit.PDFDocument) => doc.page.width - doc.page.margins.left - doc.page.margins.right;

/** A new page unless `keep` points are left on this one: a heading never stands alone at a page's foot. */
function keepRoom(doc: PDFKit.PDFDocument, keep: number): void {
  if (doc.y + keep > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

function heading(doc: PDFKit.PDFDocument, text: string, keep = 60): void {
  keepRoom(doc, keep);
  doc.moveDown(0.8).font('bold').fontSize(13).fillColor(INK).text(text).font('body').fontSize(11);
}

/** The keyboard chart, drawn from the layout the screen's SVG uses, so print matches screen. */
function drawChart(doc: PDFKit.PDFDocument, tone: DisclosureToneContent): void {
  const width = contentWidth(doc);
  const height = 150;
  keepRoom(doc, height + 40);
  const x0 = doc.page.margins.left;
  const y0 = doc.y + 4;
  const l = keyboardChartLayout(tone.keys, width, height);
  const r = Math.max(2, Math.min(3.5, l.keyWidth * 0.45));
  doc.save();
  doc.rect(x0 + l.left, y0 + l.top, l.right - l.left, l.bottom - l.top).fillAndStroke(PALETTE.vellum, PALETTE.linen);
  doc.font('body').fontSize(8);
  for (const t of l.ticks) {
    doc.lineWidth(t.cents === 0 ? 1.2 : 0.6).strokeColor(t.cents === 0 ? PALETTE.walnut : PALETTE.linen);
    if (t.cents !== 0) doc.dash(3, { space: 3 });
    doc.moveTo(x0 + l.left, y0 + t.y).lineTo(x0 + l.right, y0 + t.y).stroke().undash();
    doc.fillColor(PALETTE.walnut).text(t.label, x0, y0 + t.y - 4, { width: l.left - 6, align: 'right', lineBreak: false });
  }
  for (const o of l.octaves) {
    doc.lineWidth(0.8).strokeColor(PALETTE.walnut).moveTo(x0 + o.x, y0 + l.bottom).lineTo(x0 + o.x, y0 + l.bottom + 4).stroke();
    doc.fillColor(PALETTE.walnut).text(o.label, x0 + o.x - 15, y0 + l.bottom + 7, { width: 30, align: 'center', lineBreak: false });
  }
  for (const m of l.marks) {
    doc.lineWidth(1.2).strokeColor(PALETTE.felt).moveTo(x0 + m.x, y0 + l.zeroY).lineTo(x0 + m.x, y0 + m.y).stroke();
    if (m.clipped === 'above') doc.polygon([x0 + m.x, y0 + m.y - 2], [x0 + m.x + r + 1, y0 + m.y - 2 + 2 * r], [x0 + m.x - r - 1, y0 + m.y - 2 + 2 * r]).fill(PALETTE.felt);
    else if (m.clipped === 'below') doc.polygon([x0 + m.x, y0 + m.y + 2], [x0 + m.x + r + 1, y0 + m.y + 2 - 2 * r], [x0 + m.x - r - 1, y0 + m.y + 2 - 2 * r]).fill(PALETTE.felt);
    else doc.circle(x0 + m.x, y0 + m.y, r).fill(PALETTE.felt);
  }
  doc.restore();
  doc.x = x0;
  doc.y = y0 + height + 4;
  doc.font('body').fontSize(9).fillColor(QUIET).text(`Cents from equal temperament at A4 = 440 Hz, keys A0 to C8 from left to right; scale plus or minus ${l.rangeCents} cents. A dot is a key heard; a triangle at the edge, a key beyond the scale.`);
  doc.fontSize(11).fillColor(INK);
}

function areasV2(doc: PDFKit.PDFDocument, c: DisclosureContent, locale: string): void {
  const day = (d: string) => paperDay(d, locale);
  doc.text(`Inspected at intake on ${day(c.inspectedOn)}${c.measuredAfterOn ? `; measured again after the work in our workshop on ${day(c.measuredAfterOn)}` : ''}.`);
  const notDone = notDoneSummary(c);
  if (notDone) doc.moveDown(0.4).font('bold').text(`${notDone.title}. `, { continued: true }).font('body').text(notDone.text);
  if (c.pitch) doc.moveDown(0.4).text(`${pitchSentence(c.pitch.a4Hz, c.pitch.cents)} ${pitchWhen(c.pitch, day)}`);
  for (const area of c.areas) {
    keepRoom(doc, 70);
    doc.moveDown(0.8).font('bold').fontSize(13).fillColor(INK).text(`${area.label}: `, { continued: true }).text(area.condition).font('body').fontSize(11);
    for (const section of areaSections(area, c, day)) {
      // A section's title keeps its first line with it.
      keepRoom(doc, 36);
      doc.moveDown(0.3).font('bold').fontSize(10).fillColor(QUIET).text(section.title.toUpperCase(), { characterSpacing: 0.4 }).font('body').fontSize(11);
      for (const item of section.items) markedLine(doc, item.mark, item.text, section.kind === 'not_done');
    }
  }
  if (c.otherWorkDone.length) {
    heading(doc, 'Other work done in our workshop');
    for (const w of c.otherWorkDone) markedLine(doc, 'done', w);
  }
  if (c.tone?.keys.length) {
    heading(doc, 'Pitch by key, from the play test', 220);
    const words = toneWords(c.tone, day);
    doc.text([words.when, ...words.lines].join(' '));
    drawChart(doc, c.tone);
  }
}

// Format 1, as it was published: its own words, each line led by the mark it reads as today.
function areasV1(doc: PDFKit.PDFDocument, c: DisclosureContentV1, locale: string): void {
  doc.text(`Assessed on ${paperDay(c.assessedOn, locale)}${c.assessedAfterWorkshop ? ', after reconditioning in the workshop' : ''}.`);
  if (c.pitch) doc.text(c.pitch.text);
  for (const area of c.areas) {
    heading(doc, `${area.label}: ${area.condition}`);
    for (const f of area.findings) doc.text(`• ${f.text}`, { indent: 8 });
    if (area.workDone.length) doc.text(`Work done: ${area.workDone.join('; ')}.`, { indent: 8 });
  }
}

/** The dealer's name and contact at the head of the first page, what the paper is on the right. */
function letterhead(doc: PDFKit.PDFDocument, meta: SignedCopyMeta): void {
  const left = doc.page.margins.left;
  const top = doc.y;
  const width = contentWidth(doc);
  doc.font('bold').fontSize(15).fillColor(INK).text(meta.dealer.name, left, top, { width: width * 0.6 });
  doc.font('body').fontSize(9.5).fillColor(QUIET);
  for (const line of meta.dealer.contact) doc.text(line, { width: width * 0.6 });
  const below = doc.y;
  doc.font('bold').fontSize(10).fillColor(INK).text('Condition disclosure', left + width * 0.6, top + 2, { width: width * 0.4, align: 'right' });
  doc.font('body').fontSize(9.5).fillColor(QUIET).text(`Signed copy of version ${meta.version}`, { width: width * 0.4, align: 'right' });
  doc.x = left;
  doc.y = Math.max(below, doc.y) + 8;
  doc.lineWidth(1.5).strokeColor(PALETTE.brass).moveTo(left, doc.y).lineTo(left + width, doc.y).stroke();
  doc.y += 12;
}

function depositPart(doc: PDFKit.PDFDocument, meta: SignedCopyMeta): void {
  const d = meta.deposit;
  if (!d) return;
  if (d.kind === 'paid') {
    heading(doc, 'Deposit', 110);
    doc.text(`${meta.buyerName} paid a deposit of ${d.amount} on ${d.paidAt}${d.holdUntil ? `; the piano is held for them until ${d.holdUntil}` : ''}.${d.status ? ` ${d.status}` : ''}`);
    doc.moveDown(0.3);
    const left = doc.page.margins.left + 8;
    for (const line of d.balance) {
      const y = doc.y;
      doc.font(line.label.startsWith('Balance') ? 'bold' : 'body').text(line.label, left, y, { width: 260 });
      doc.text(line.amount, left + 260, y, { width: 140, align: 'right' });
    }
    doc.font('body');
    doc.x = doc.page.margins.left;
    return;
  }
  heading(doc, 'Deposit terms', 140);
  doc.text(`A deposit of ${d.amount} holds this piano for ${d.holdDays} days:`);
  d.terms.forEach((t, i) => doc.moveDown(0.2).text(`${i + 1}. ${t}`, { indent: 8 }));
}

/** Both signatures side by side: the buyer's typed name and the staff member's, each with when and how. */
function signatures(doc: PDFKit.PDFDocument, meta: SignedCopyMeta): void {
  heading(doc, 'Signatures', 150);
  const left = doc.page.margins.left;
  const gap = 24;
  const col = (contentWidth(doc) - gap) / 2;
  const top = doc.y + 6;
  const block = (x: number, label: string, name: string, lines: string[]) => {
    doc.font('body').fontSize(9).fillColor(QUIET).text(label.toUpperCase(), x, top, { width: col, characterSpacing: 0.4 });
    doc.font('bold').fontSize(16).fillColor(INK).text(name, x, top + 18, { width: col });
    const ruleY = doc.y + 2;
    doc.lineWidth(0.8).strokeColor(PALETTE.walnut).moveTo(x, ruleY).lineTo(x + col, ruleY).stroke();
    doc.font('body').fontSize(9.5).fillColor(QUIET).text(lines.join('\n'), x, ruleY + 5, { width: col });
    return doc.y;
  };
  const buyerEnd = block(left, 'Buyer', meta.buyerName, [meta.buyerEmail, `Acknowledged reading version ${meta.version} on ${formatDayTime(meta.acknowledgedAt, meta.where)}, by typing this name and ticking “I have read this disclosure”.`]);
  const dealerEnd = block(left + col + gap, `For ${meta.dealer.name}`, meta.countersignedBy, [`Countersigned on ${formatDayTime(meta.countersignedAt, meta.where)}.`]);
  doc.x = left;
  doc.y = Math.max(buyerEnd, dealerEnd) + 8;
  doc.fontSize(11).fillColor(INK);
}

/** The code and where to check it, and the page number, at the foot of every page. */
function footers(doc: PDFKit.PDFDocument, meta: SignedCopyMeta): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i += 1) {
    doc.switchToPage(i);
    const bottom = doc.page.margins.bottom;
    // Written inside the bottom margin, which would otherwise start a new page.
    doc.page.margins.bottom = 0;
    const y = doc.page.height - 36;
    doc.font('body').fontSize(8.5).fillColor(QUIET);
    doc.text(`Verification code ${meta.code} · check it at ${meta.checkUrl}`, doc.page.margins.left, y, { width: contentWidth(doc) * 0.8, lineBreak: false });
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, doc.page.margins.left, y, { width: contentWidth(doc), align: 'right', lineBreak: false });
    doc.page.margins.bottom = bottom;
  }
}

/**
 * The signed copy: the dealer and its contact, the disclosure as the buyer read it, the price and the deposit,
 * both signatures, and on every page the verification code that ties it to the published version.
 */
export async function signedCopyPdf(content: AnyDisclosureContent, meta: SignedCopyMeta): Promise<Buffer> {
  const doc = await newDoc(`Condition disclosure ${content.piano.stockNumber} v${meta.version}`);
  const p = content.piano;
  letterhead(doc, meta);
  doc.font('bold').fontSize(20).fillColor(INK).text(pianoName(p));
  doc.font('body').fontSize(11).text(`Stock number ${p.stockNumber}${p.serialNumber ? ` · serial ${p.serialNumber}` : ''} · ${p.year} · ${p.size}${p.finish ? ` · ${p.finish}` : ''}`);
  if (meta.price) doc.moveDown(0.3).font('bold').fontSize(13).text(`Asking price: ${meta.price}`).font('body').fontSize(11);
  doc.moveDown(0.5);
  if (isFormat2(content)) areasV2(doc, content, meta.where.locale);
  else areasV1(doc, content, meta.where.locale);
  heading(doc, 'Warranty');
  doc.text(content.warranty);
  for (const n of content.notices) doc.moveDown(0.4).font('bold').text(`${n.title}. `, { continued: true }).font('body').text(n.text);
  depositPart(doc, meta);
  signatures(doc, meta);
  doc.moveDown(0.6).fontSize(9.5).fillColor(QUIET).text(`The verification code ${meta.code} is worked out from every word of version ${meta.version} as it was published. Type it at ${meta.checkUrl} to see which piano and version it belongs to, and to read that version as published.`);
  footers(doc, meta);
  return finish(doc);
}

/** The dark modules of a QR code as runs along each row: [row, first column, length]. */
export function qrRuns(text: string): { size: number; runs: [number, number, number][] } {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const runs: [number, number, number][] = [];
  for (let row = 0; row < modules.size; row += 1) {
    for (let col = 0; col < modules.size; col += 1) {
      if (!modules.get(row, col)) continue;
      const start = col;
      while (col + 1 < modules.size && modules.get(row, col + 1)) col += 1;
      runs.push([row, start, col - start + 1]);
    }
  }
  return { size: modules.size, runs };
}

// Drawn as vector squares, one module of white margin: sharp at any print size, and no PNG to encode
// and decode again for every tag (about half of a tag's time).
function drawQr(doc: PDFKit.PDFDocument, text: string, x: number, y: number, width: number): void {
  const { size, runs } = qrRuns(text);
  const cell = width / (size + 2);
  for (const [row, col, length] of runs) doc.rect(x + (col + 1) * cell, y + (row + 1) * cell, length * cell, cell);
  doc.fillColor('#000000').fill();
}

/** The floor tag: stock number, piano, price, and a QR code of the public disclosure link. */
export async function floorTagPdf(tag: { stockNumber: string; title: string; price: string | null; url: string; dealerName: string }): Promise<Buffer> {
  const doc = await newDoc(`Floor tag ${tag.stockNumber}`);
  doc.fontSize(12).fillColor('#4a4238').text(tag.dealerName, { align: 'center' });
  doc.moveDown(0.5).font('bold').fontSize(34).fillColor('#1d1a16').text(tag.stockNumber, { align: 'center' });
  doc.font('body').fontSize(18).text(tag.title, { align: 'center' });
  if (tag.price) doc.moveDown(0.5).font('bold').fontSize(28).text(tag.price, { align: 'center' }).font('body');
  drawQr(doc, tag.url, (doc.page.width - 240) / 2, doc.y + 20, 240);
  doc.y += 270;
  doc.fillColor('#1d1a16').fontSize(13).text('Scan to read this piano’s condition disclosure on your phone.', { align: 'center' });
  doc.fontSize(9).fillColor('#4a4238').text(tag.url, { align: 'center' });
  return finish(doc);
}
