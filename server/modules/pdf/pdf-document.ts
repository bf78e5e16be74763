import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import PDFDocument from 'pdfkit';

/**
 * pdfkit helpers shared by every Trayline PDF: the fonts shipped in fonts/ (TTF, embedded; no system font is
 * used, so the output is the same on any machine), a header with the coach's business name, "Page N of M" footers
 * (bufferPages), real text (never images of text), headings, paragraphs, lists and simple tables that break across
 * pages and repeat their header row.
 */
export type Doc = PDFKit.PDFDocument;

export const FONT = { body: 'body', bold: 'bold', heading: 'heading' } as const;
type FontName = (typeof FONT)[keyof typeof FONT];

const INK = '#1f1b16';
const SOFT = '#5b544b';
const LINE = '#c9c0b3';
const SHADE = '#f1ece4';

function findFontsDir(): string {
  let dir = path.dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 8; i++) {
    const candidate = path.join(dir, 'fonts');
    if (fs.existsSync(path.join(candidate, 'atkinson-hyperlegible', 'AtkinsonHyperlegible-Regular.ttf'))) return candidate;
    dir = path.dirname(dir);
  }
  const fromCwd = path.resolve('fonts');
  if (fs.existsSync(fromCwd)) return fromCwd;
  throw new Error('fonts/ folder with the PDF fonts not found');
}

let fontFiles: Record<FontName, Buffer> | null = null;
function fonts(): Record<FontName, Buffer> {
  if (!fontFiles) {
    const dir = findFontsDir();
    fontFiles = {
      body: fs.readFileSync(path.join(dir, 'atkinson-hyperlegible', 'AtkinsonHyperlegible-Regular.ttf')),
      bold: fs.readFileSync(path.join(dir, 'atkinson-hyperlegible', 'AtkinsonHyperlegible-Bold.ttf')),
      heading: fs.readFileSync(path.join(dir, 'fraunces', 'Fraunces-SemiBold.ttf')),
    };
  }
  return fontFiles;
}

/** ASCII words for characters a font may lack (only used when the glyph is missing). */
const ASCII_FALLBACK: Record<string, string> = {
  '½': '1/2', '¼': '1/4', '¾': '3/4', '⅓': '1/3', '⅔': '2/3', '⅛': '1/8',
  '°': ' deg', '−': '-', '–': '-', '—': '-', '…': '...', '’': "'", '‘': "'", '“': '"', '”': '"',
  '•': '*', '×': 'x', '≈': '~', '≤': '<=', '≥': '>=', '→': '->', '✓': 'ok', '☐': '[ ]', '€': 'EUR', '£': 'GBP',
};

type FontkitFont = { hasGlyphForCodePoint(cp: number): boolean };
/** The fontkit font pdfkit embedded for the current font (pdfkit keeps it at `_font.font`). */
function currentFontkit(doc: Doc): FontkitFont | null {
  const f = (doc as unknown as { _font?: { font?: FontkitFont } })._font?.font;
  return f && typeof f.hasGlyphForCodePoint === 'function' ? f : null;
}

/** Replaces characters the current font cannot draw with ASCII words, so no glyph comes out as an empty box. */
export function safeText(doc: Doc, text: string): string {
  const font = currentFontkit(doc);
  if (!font) return text;
  let out = '';
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    if (cp < 128 || ch === '\n' || font.hasGlyphForCodePoint(cp)) out += ch;
    else out += ASCII_FALLBACK[ch] ?? '?';
  }
  return out;
}

export interface PdfMeta {
  /** The coach's business name: every page's header. */
  businessName: string;
  title: string;
  subject?: string;
}

const MARGIN = { top: 64, bottom: 56, left: 50, right: 50 };

export function createDoc(meta: PdfMeta): Doc {
  const doc = new PDFDocument({
    size: 'LETTER',
    margins: MARGIN,
    bufferPages: true,
    info: { Title: meta.title, Author: meta.businessName, Subject: meta.subject ?? meta.title, Creator: 'Trayline' },
  });
  const f = fonts();
  doc.registerFont(FONT.body, f.body);
  doc.registerFont(FONT.bold, f.bold);
  doc.registerFont(FONT.heading, f.heading);
  doc.font(FONT.body).fontSize(10).fillColor(INK);
  return doc;
}

/** Draws the header and "Page N of M" on every buffered page, ends the document and returns its bytes. */
export async function finishDoc(doc: Doc, meta: PdfMeta): Promise<Buffer> {
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const ended = new Promise<void>((resolve, reject) => {
    doc.on('end', () => resolve());
    doc.on('error', reject);
  });
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const { width, height } = doc.page;
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing inside the margin must not add a page
    doc.font(FONT.heading).fontSize(11).fillColor(INK);
    doc.text(safeText(doc, meta.businessName), MARGIN.left, 28, { width: width - MARGIN.left - MARGIN.right, lineBreak: false, ellipsis: true });
    doc.font(FONT.body).fontSize(8).fillColor(SOFT);
    doc.text(safeText(doc, meta.title), MARGIN.left, 30, { width: width - MARGIN.left - MARGIN.right, align: 'right', lineBreak: false, ellipsis: true });
    doc.moveTo(MARGIN.left, 46).lineTo(width - MARGIN.right, 46).lineWidth(0.5).strokeColor(LINE).stroke();
    doc.fontSize(9).fillColor(SOFT);
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, MARGIN.left, height - 36, {
      width: width - MARGIN.left - MARGIN.right,
      align: 'center',
      lineBreak: false,
    });
    doc.page.margins.bottom = bottom;
  }
  doc.end();
  await ended;
  return Buffer.concat(chunks);
}

const contentWidth = (doc: Doc) => doc.page.width - doc.page.margins.left - doc.page.margins.right;

/** Starts a new page when less than `needed` points remain. */
export function ensureSpace(doc: Doc, needed: number) {
  if (doc.y + needed > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

export function heading(doc: Doc, text: string, size = 18) {
  ensureSpace(doc, size * 3);
  doc.font(FONT.heading).fontSize(size).fillColor(INK);
  doc.text(safeText(doc, text), doc.page.margins.left, doc.y, { width: contentWidth(doc) });
  doc.moveDown(0.3);
  doc.font(FONT.body).fontSize(10);
}

export function paragraph(doc: Doc, text: string, opts: { bold?: boolean; size?: number; color?: string } = {}) {
  doc.font(opts.bold ? FONT.bold : FONT.body).fontSize(opts.size ?? 10).fillColor(opts.color ?? INK);
  doc.text(safeText(doc, text), doc.page.margins.left, doc.y, { width: contentWidth(doc) });
  doc.font(FONT.body).fontSize(10).fillColor(INK);
}

/** A numbered (or bulleted) list with a bold label line above it. */
export function list(doc: Doc, label: string, items: readonly string[], numbered = true) {
  if (items.length === 0) return;
  ensureSpace(doc, 30);
  paragraph(doc, label, { bold: true });
  doc.font(FONT.body).fontSize(10).fillColor(INK);
  items.forEach((item, i) => {
    const marker = numbered ? `${i + 1}.` : '•';
    const x = doc.page.margins.left + 10;
    ensureSpace(doc, 14);
    const y = doc.y;
    doc.text(safeText(doc, marker), x, y, { width: 16, lineBreak: false });
    doc.text(safeText(doc, item), x + 18, y, { width: contentWidth(doc) - 28 });
  });
  doc.moveDown(0.3);
}

export interface Column {
  header: string;
  /** Fraction of the content width; the fractions of a table add up to 1. */
  width: number;
  align?: 'left' | 'right' | 'center';
}

export interface TableRowStyle {
  bold?: boolean;
  shade?: boolean;
}

/** A table with a header row (repeated after a page break), wrapped cells and optional bold/shaded rows. */
export function table(doc: Doc, columns: readonly Column[], rows: readonly (readonly string[])[], styles: readonly TableRowStyle[] = []) {
  const left = doc.page.margins.left;
  const total = contentWidth(doc);
  const widths = columns.map((c) => c.width * total);
  const pad = 3;
  const drawRow = (cells: readonly string[], style: TableRowStyle, isHeader: boolean) => {
    doc.font(isHeader || style.bold ? FONT.bold : FONT.body).fontSize(isHeader ? 8.5 : 9.5);
    const texts = cells.map((c) => safeText(doc, c));
    const h = Math.max(...texts.map((t, i) => doc.heightOfString(t, { width: widths[i] - 2 * pad }))) + 2 * pad;
    if (doc.y + h > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      if (!isHeader) drawRow(columns.map((c) => c.header), {}, true);
      doc.font(isHeader || style.bold ? FONT.bold : FONT.body).fontSize(isHeader ? 8.5 : 9.5);
    }
    const y = doc.y;
    if (isHeader || style.shade) doc.rect(left, y, total, h).fillColor(SHADE).fill();
    doc.fillColor(isHeader ? SOFT : INK);
    let x = left;
    texts.forEach((t, i) => {
      doc.text(t, x + pad, y + pad, { width: widths[i] - 2 * pad, align: columns[i].align ?? 'left' });
      x += widths[i];
    });
    doc.moveTo(left, y + h).lineTo(left + total, y + h).lineWidth(0.4).strokeColor(LINE).stroke();
    doc.x = left;
    doc.y = y + h;
  };
  ensureSpace(doc, 40);
  drawRow(columns.map((c) => c.header), {}, true);
  rows.forEach((r, i) => drawRow(r, styles[i] ?? {}, false));
  doc.fillColor(INK).font(FONT.body).fontSize(10);
  doc.moveDown(0.6);
}

/** A short empty box to tick by hand (a vector square, not a glyph). */
export function checkbox(doc: Doc, x: number, y: number, size = 8) {
  doc.rect(x, y, size, size).lineWidth(0.8).strokeColor(INK).stroke();
}

/** The usual cautions block at the end of a document. */
export function cautionsBlock(doc: Doc, cautions: readonly { text: string; source: string }[], title = 'Cautions') {
  if (cautions.length === 0) return;
  doc.moveDown(0.5);
  heading(doc, title, 13);
  for (const c of cautions) {
    ensureSpace(doc, 30);
    paragraph(doc, `• ${c.text}`, { size: 9 });
    paragraph(doc, `  Source: ${c.source}`, { size: 7.5, color: SOFT });
    doc.moveDown(0.2);
  }
}

export { contentWidth };
