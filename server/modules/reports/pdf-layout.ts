import path from 'node:path';
import { fileURLToPath } from 'node:url';
import PDFDocument from 'pdfkit';
import type { Verdict } from '../../../shared/schemas/reading';

// DejaVu Sans Condensed ships with the app (fonts/, Bitstream Vera licence): it has Ω, °, √, ², ± and
// the other signs a report needs, which the PDF standard fonts lack. Nothing is fetched at run time.
const FONT_DIR = path.join(path.dirname(fileURLToPath(import.meta.url)), 'fonts');
export const FONTS = { body: path.join(FONT_DIR, 'DejaVuSansCondensed.ttf'), bold: path.join(FONT_DIR, 'DejaVuSansCondensed-Bold.ttf') };

export const INK = '#15191E';
export const MUTED = '#48515B';
export const LINE = '#D3D7DC';
export const MARGIN = 42;

export type Doc = PDFKit.PDFDocument;

export function createDoc(info: { title: string; author: string; subject: string }): Doc {
  const doc = new PDFDocument({ size: 'A4', margins: { top: MARGIN, bottom: MARGIN + 18, left: MARGIN, right: MARGIN }, bufferPages: true, info: { Title: info.title, Author: info.author, Subject: info.subject } });
  doc.registerFont('body', FONTS.body);
  doc.registerFont('bold', FONTS.bold);
  doc.font('body').fontSize(10).fillColor(INK);
  return doc;
}

export const contentWidth = (doc: Doc) => doc.page.width - doc.page.margins.left - doc.page.margins.right;
const bottom = (doc: Doc) => doc.page.height - doc.page.margins.bottom;

/** Starts a new page when fewer than `height` points are left. */
export function ensureRoom(doc: Doc, height: number): void {
  if (doc.y + height > bottom(doc)) doc.addPage();
}

export function heading(doc: Doc, text: string): void {
  // Keep a heading with the first lines of its section.
  ensureRoom(doc, 110);
  doc.moveDown(0.8);
  doc.font('bold').fontSize(13).fillColor(INK).text(text, doc.page.margins.left, doc.y, { width: contentWidth(doc) });
  const y = doc.y + 2;
  doc.moveTo(doc.page.margins.left, y).lineTo(doc.page.width - doc.page.margins.right, y).lineWidth(0.8).strokeColor(LINE).stroke();
  doc.y = y + 6;
  doc.font('body').fontSize(10);
}

export function paragraph(doc: Doc, text: string, options: { muted?: boolean; bold?: boolean } = {}): void {
  doc.font(options.bold ? 'bold' : 'body').fontSize(10).fillColor(options.muted ? MUTED : INK);
  doc.text(text, doc.page.margins.left, doc.y, { width: contentWidth(doc) });
  doc.fillColor(INK).font('body');
}

/** Label–value pairs in two columns; the value wraps. */
export function facts(doc: Doc, rows: [string, string][]): void {
  const left = doc.page.margins.left;
  const labelWidth = 130;
  const valueWidth = contentWidth(doc) - labelWidth - 8;
  for (const [label, value] of rows) {
    doc.font('body').fontSize(10);
    const h = Math.max(doc.heightOfString(value, { width: valueWidth }), 12);
    ensureRoom(doc, h + 4);
    const y = doc.y;
    doc.font('bold').fillColor(MUTED).text(label, left, y, { width: labelWidth });
    doc.font('body').fillColor(INK).text(value, left + labelWidth + 8, y, { width: valueWidth });
    doc.y = y + h + 4;
  }
}

export interface Column {
  header: string;
  width: number;
}

/** A table whose rows grow with their text; the header is repeated on each new page. */
export function table(doc: Doc, columns: Column[], rows: string[][], options: { fontSize?: number; beforeCell?: (row: number, col: number, x: number, y: number) => number } = {}): void {
  const size = options.fontSize ?? 9;
  const left = doc.page.margins.left;
  const pad = 3;
  const drawHeader = () => {
    doc.font('bold').fontSize(size).fillColor(MUTED);
    const y = doc.y;
    let x = left;
    const h = Math.max(...columns.map((c) => doc.heightOfString(c.header, { width: c.width - 2 * pad })));
    for (const c of columns) {
      doc.text(c.header, x + pad, y, { width: c.width - 2 * pad });
      x += c.width;
    }
    doc.y = y + h + pad;
    doc.moveTo(left, doc.y).lineTo(x, doc.y).lineWidth(0.8).strokeColor(INK).stroke();
    doc.y += pad;
  };
  ensureRoom(doc, 40);
  drawHeader();
  rows.forEach((row, r) => {
    doc.font('body').fontSize(size);
    const h = Math.max(...row.map((cell, c) => doc.heightOfString(cell, { width: columns[c]!.width - 2 * pad }))) + 2 * pad;
    if (doc.y + h > bottom(doc)) {
      doc.addPage();
      drawHeader();
    }
    const y = doc.y;
    let x = left;
    row.forEach((cell, c) => {
      const indent = options.beforeCell?.(r, c, x + pad, y + pad) ?? 0;
      doc.font('body').fontSize(size).fillColor(INK).text(cell, x + pad + indent, y + pad, { width: columns[c]!.width - 2 * pad - indent });
      x += columns[c]!.width;
    });
    doc.y = y + h;
    doc.moveTo(left, doc.y).lineTo(x, doc.y).lineWidth(0.4).strokeColor(LINE).stroke();
  });
  doc.font('body').fontSize(10).fillColor(INK);
}

const VERDICT_COLOURS: Record<Verdict, string> = { in_band: '#1B6E34', near_edge: '#8A5300', out_of_band: '#B3261E', open: '#6A3D9A', short: '#8E1D5C' };

/**
 * The verdict's own outline, as on screen: circle with a tick, diamond, square with a cross, broken
 * ring, bow-tie. It reads in black and white; the verdict word is printed beside it as well.
 */
export function verdictShape(doc: Doc, verdict: Verdict, x: number, y: number, size = 9): void {
  const colour = VERDICT_COLOURS[verdict];
  doc.save();
  doc.translate(x, y).scale(size / 20);
  switch (verdict) {
    case 'in_band':
      doc.circle(10, 10, 9).fill(colour);
      doc.path('M5.5 10.5 L8.5 13.5 L14.5 6.5').lineWidth(2.4).strokeColor('#FFFFFF').stroke();
      break;
    case 'near_edge':
      doc.path('M10 1 L19 10 L10 19 L1 10 Z').fill(colour);
      break;
    case 'out_of_band':
      doc.rect(1.5, 1.5, 17, 17).fill(colour);
      doc.path('M6 6 L14 14 M14 6 L6 14').lineWidth(2.4).strokeColor('#FFFFFF').stroke();
      break;
    case 'open':
      doc.path('M13.5 2.2 A8.5 8.5 0 1 1 6.5 2.2').lineWidth(3).strokeColor(colour).stroke();
      break;
    case 'short':
      doc.path('M1.5 2 L10 10 L1.5 18 Z M18.5 2 L10 10 L18.5 18 Z').fill(colour);
      break;
  }
  doc.restore();
}

const SIGNAL_PANELS = {
  DANGER: { fill: '#C8102E', ink: '#FFFFFF' },
  WARNING: { fill: '#FF7900', ink: '#000000' },
  CAUTION: { fill: '#FFD100', ink: '#000000' },
} as const;

/** An ANSI Z535-style panel: the signal word on its colour with the alert triangle, then the message. */
export function safetyPanel(doc: Doc, signalWord: keyof typeof SIGNAL_PANELS, text: string, footnote?: string): void {
  const left = doc.page.margins.left;
  const width = contentWidth(doc);
  const panel = SIGNAL_PANELS[signalWord];
  doc.font('body').fontSize(9.5);
  const bodyHeight = doc.heightOfString(text, { width: width - 16 }) + (footnote ? doc.heightOfString(footnote, { width: width - 16 }) + 4 : 0);
  ensureRoom(doc, bodyHeight + 36);
  const y = doc.y;
  doc.rect(left, y, width, 18).fill(panel.fill);
  doc.save();
  doc.path(`M${left + 8} ${y + 15} L${left + 15} ${y + 3} L${left + 22} ${y + 15} Z`).fill(panel.ink);
  doc.rect(left + 14.2, y + 7, 1.6, 4.5).fill(panel.fill);
  doc.rect(left + 14.2, y + 12.3, 1.6, 1.6).fill(panel.fill);
  doc.restore();
  doc.font('bold').fontSize(11).fillColor(panel.ink).text(signalWord, left + 28, y + 3.5, { width: width - 36 });
  doc.font('body').fontSize(9.5).fillColor(INK).text(text, left + 8, y + 24, { width: width - 16 });
  if (footnote) doc.fillColor(MUTED).text(footnote, left + 8, doc.y + 4, { width: width - 16 });
  const end = doc.y + 6;
  doc.rect(left, y, width, end - y).lineWidth(1.2).strokeColor(panel.fill).stroke();
  doc.y = end + 8;
  doc.fillColor(INK);
}

/** Writes "Report V-000123 · page n of m" on every page once the content is laid out. */
export function footers(doc: Doc, text: string): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const savedBottom = doc.page.margins.bottom;
    // Writing inside the bottom margin would otherwise start a new page.
    doc.page.margins.bottom = 0;
    doc.font('body').fontSize(8.5).fillColor(MUTED);
    doc.text(`${text} · Page ${i + 1} of ${range.count}`, MARGIN, doc.page.height - MARGIN, { width: doc.page.width - 2 * MARGIN, align: 'center', lineBreak: false });
    doc.page.margins.bottom = savedBottom;
  }
}

export function toBuffer(doc: Doc): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}
