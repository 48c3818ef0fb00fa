import fs from 'node:fs';

import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';

import type { AreaMark } from '@/modules/assessment/core/grade';
import { areaSections, isFormat2, notDoneSummary, pitchWhen, type AnyDisclosureContent, type DisclosureContent, type DisclosureContentV1 } from '@/modules/disclosure/core/disclosure';
import { pianoName } from '@/modules/pianos/core/piano';
import { MARK_LOOKS, PALETTE } from '@/modules/theme/core/palette';

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
  const doc = new PDFDocument({ size: 'A4', margin: 50, info: { Title: title, Producer: 'Feltwire' }, font: null as unknown as string });
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
  price: string | null;
  buyerName: string;
  buyerEmail: string;
  acknowledgedAt: string;
  countersignedBy: string;
  countersignedAt: string;
}

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
  if (openBox) doc.save().lineWidth(1).rect(x + 0.5, doc.y + 3.5, 7, 7).stroke(PALETTE.walnut).restore();
  else drawMark(doc, mark, x, doc.y + 3);
  const word = markWord(mark);
  doc.fillColor('#1d1a16');
  if (word) doc.font('bold').text(`${word}: `, x + 14, doc.y, { continued: true }).font('body').text(text);
  else doc.text(text, x + 14, doc.y);
  doc.x = doc.page.margins.left;
}

function areasV2(doc: PDFKit.PDFDocument, c: DisclosureContent): void {
  doc.text(`Inspected at intake on ${paperDay(c.inspectedOn)}${c.measuredAfterOn ? `; measured again after the work in our workshop on ${paperDay(c.measuredAfterOn)}` : ''}.`);
  const notDone = notDoneSummary(c);
  if (notDone) doc.moveDown(0.4).font('bold').text(`${notDone.title}. `, { continued: true }).font('body').text(notDone.text);
  if (c.pitch) doc.moveDown(0.4).text(`${c.pitch.text} ${pitchWhen(c.pitch, paperDay)}`);
  for (const area of c.areas) {
    doc.moveDown(0.8).font('bold').fontSize(13).fillColor('#1d1a16').text(`${area.label}: `, { continued: true }).text(area.condition).font('body').fontSize(11);
    for (const section of areaSections(area, c, paperDay)) {
      doc.moveDown(0.3).font('bold').fontSize(10).fillColor('#4a4238').text(section.title.toUpperCase(), { characterSpacing: 0.4 }).font('body').fontSize(11);
      for (const item of section.items) markedLine(doc, item.mark, item.text, section.kind === 'not_done');
    }
  }
  if (c.otherWorkDone.length) {
    doc.moveDown(0.8).font('bold').fontSize(13).text('Other work done in our workshop').font('body').fontSize(11);
    for (const w of c.otherWorkDone) markedLine(doc, 'done', w);
  }
}

// Format 1, as it was published: its own words, each line led by the mark it reads as today.
function areasV1(doc: PDFKit.PDFDocument, c: DisclosureContentV1): void {
  doc.text(`Assessed on ${c.assessedOn}${c.assessedAfterWorkshop ? ', after reconditioning in the workshop' : ''}.`);
  if (c.pitch) doc.text(c.pitch.text);
  for (const area of c.areas) {
    doc.moveDown(0.8).font('bold').fontSize(13).text(`${area.label}: ${area.condition}`).font('body').fontSize(11);
    for (const f of area.findings) doc.text(`• ${f.text}`, { indent: 8 });
    if (area.workDone.length) doc.text(`Work done: ${area.workDone.join('; ')}.`, { indent: 8 });
  }
}

/** The signed copy: the disclosure as the buyer read it, its version and digest, and both signatures. */
export async function signedCopyPdf(content: AnyDisclosureContent, meta: SignedCopyMeta): Promise<Buffer> {
  const doc = await newDoc(`Condition disclosure ${content.piano.stockNumber} v${meta.version}`);
  const p = content.piano;
  doc.fontSize(10).fillColor('#4a4238').text(`${content.dealerName} · condition disclosure · signed copy`);
  doc.moveDown(0.5).font('bold').fontSize(20).fillColor('#1d1a16').text(pianoName(p));
  doc.font('body').fontSize(11).text(`Stock number ${p.stockNumber}${p.serialNumber ? ` · serial ${p.serialNumber}` : ''} · ${p.year} · ${p.size}${p.finish ? ` · ${p.finish}` : ''}`);
  if (meta.price) doc.font('bold').text(`Asking price: ${meta.price}`).font('body');
  doc.text(`Version ${meta.version}.`);
  if (isFormat2(content)) areasV2(doc, content);
  else areasV1(doc, content);
  doc.moveDown(0.8).font('bold').fontSize(13).fillColor('#1d1a16').text('Warranty').font('body').fontSize(11).text(content.warranty);
  for (const n of content.notices) doc.moveDown(0.4).font('bold').text(`${n.title}. `, { continued: true }).font('body').text(n.text);
  doc.moveDown(1).font('bold').fontSize(13).text('Signatures').font('body').fontSize(11);
  doc.text(`Buyer: ${meta.buyerName} (${meta.buyerEmail}) acknowledged reading version ${meta.version} on ${meta.acknowledgedAt}.`);
  doc.text(`Dealer: countersigned by ${meta.countersignedBy} on ${meta.countersignedAt}.`);
  doc.moveDown(0.5).fontSize(9).fillColor('#4a4238').text(`Version ${meta.version} digest (SHA-256): ${meta.digest}`);
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
