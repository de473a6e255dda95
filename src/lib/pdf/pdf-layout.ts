import type PDFDocument from 'pdfkit';
import { pdfText } from './certificate-text';

// Drawing helpers shared by the certificate and the calculation sheet, so both read as one family of sheets.

export type Doc = InstanceType<typeof PDFDocument>;

export const INK = '#1f2a2e';
export const SOFT = '#4a5a60';
export const FAINT = '#7d8b90';
export const EDGE = '#d9d2c3';
export const ACCENT = '#17636b';
export const PASS = '#2f6b3a';
export const FAIL = '#a33a2a';
export const CAUTION = '#8a6212';

export const MARGIN = 50;
/** Room kept free above the bottom margin for the footer line. */
const FOOTER_ROOM = 20;
/** Height of a heading with its rule and the space around it. */
const HEADING_HEIGHT = 34;

/**
 * The monospaced face for codes, hashes and links; text with spaces falls back to the sans face, whose figures are
 * tabular too. (fontkit cannot measure the space glyph of the IBM Plex Mono files: it is the last, empty glyph.)
 */
export function monoFont(text: string, semiBold = false): string {
  if (/[\s\u00a0]/.test(text)) return semiBold ? 'sansSemiBold' : 'sans';
  return semiBold ? 'monoSemiBold' : 'mono';
}

export function contentWidth(doc: Doc): number {
  return doc.page.width - 2 * MARGIN;
}

export function roomLeft(doc: Doc): number {
  return doc.page.height - MARGIN - FOOTER_ROOM - doc.y;
}

/** Starts a new page when the next block of the given height would run past the bottom margin. */
export function keepTogether(doc: Doc, height: number): void {
  if (height > roomLeft(doc)) doc.addPage();
}

/**
 * A section heading, moved to the next page with what it heads: `keepWith` is the height of the first block below
 * it (a table's header and first row, a drawing), so a heading never stands alone at the foot of a page.
 */
export function heading(doc: Doc, text: string, keepWith = 40): void {
  keepTogether(doc, HEADING_HEIGHT + keepWith);
  doc.moveDown(0.8).font('sansSemiBold').fontSize(11).fillColor(ACCENT).text(pdfText(text), MARGIN, doc.y, { width: contentWidth(doc) });
  doc.moveTo(MARGIN, doc.y + 2).lineTo(MARGIN + contentWidth(doc), doc.y + 2).lineWidth(0.5).strokeColor(EDGE).stroke();
  doc.moveDown(0.5).font('sans').fontSize(9).fillColor(INK);
}

export function paragraph(doc: Doc, text: string, options: { size?: number; colour?: string; font?: string } = {}): void {
  doc.font(options.font ?? 'sans').fontSize(options.size ?? 9).fillColor(options.colour ?? INK);
  doc.text(pdfText(text), MARGIN, doc.y, { width: contentWidth(doc), lineGap: 1.5 });
  doc.moveDown(0.3);
}

export function bullets(doc: Doc, lines: string[]): void {
  for (const line of lines) {
    keepTogether(doc, 24);
    const y = doc.y;
    doc.font('sans').fontSize(9).fillColor(SOFT).text('–', MARGIN, y, { width: 10 });
    doc.fillColor(INK).text(pdfText(line), MARGIN + 12, y, { width: contentWidth(doc) - 12, lineGap: 1.5 });
    doc.moveDown(0.25);
  }
}

export type FieldRow = [label: string, value: string, mono?: boolean];

/** Label and value pairs in two columns; values in the monospaced face when they are numbers or hashes. */
export function fields(doc: Doc, rows: FieldRow[], labelWidth = 150): void {
  for (const [label, value, mono] of rows) {
    const valueWidth = contentWidth(doc) - labelWidth;
    keepTogether(doc, doc.font('sans').fontSize(9).heightOfString(pdfText(value), { width: valueWidth }) + 4);
    const y = doc.y;
    doc.font('sans').fontSize(9).fillColor(SOFT).text(pdfText(label), MARGIN, y, { width: labelWidth - 8 });
    const afterLabel = doc.y;
    doc.font(mono ? monoFont(value) : 'sans').fontSize(mono ? 8.5 : 9).fillColor(INK).text(pdfText(value), MARGIN + labelWidth, y, { width: valueWidth });
    doc.y = Math.max(doc.y, afterLabel) + 2;
  }
}

export interface Column {
  title: string;
  width: number;
  align?: 'left' | 'right';
  mono?: boolean;
}

export interface Row {
  cells: string[];
  colour?: string;
}

/** A ruled table that repeats its header on each new page; number cells are monospaced and right-aligned. */
export function table(doc: Doc, columns: Column[], rows: Row[], size = 8): void {
  const total = columns.reduce((s, c) => s + c.width, 0);
  const widths = columns.map((c) => (c.width * contentWidth(doc)) / total);
  const fontOf = (cell: string, i: number, header: boolean) => (header ? 'sansSemiBold' : columns[i].mono ? monoFont(cell) : 'sans');
  const heightOf = (cells: string[], header: boolean) =>
    Math.max(...cells.map((cell, i) => doc.font(fontOf(cell, i, header)).fontSize(size).heightOfString(pdfText(cell), { width: widths[i] - 6 }))) + 6;
  const titles = columns.map((c) => c.title);
  const drawRow = (cells: string[], header: boolean, colour = INK) => {
    const y = doc.y;
    let x = MARGIN;
    cells.forEach((cell, i) => {
      doc.font(fontOf(cell, i, header)).fontSize(size).fillColor(header ? SOFT : colour);
      doc.text(pdfText(cell), x + 3, y + 3, { width: widths[i] - 6, align: columns[i].align ?? 'left' });
      x += widths[i];
    });
    const bottom = y + heightOf(cells, header);
    doc.moveTo(MARGIN, bottom).lineTo(MARGIN + contentWidth(doc), bottom).lineWidth(header ? 0.8 : 0.4).strokeColor(header ? SOFT : EDGE).stroke();
    doc.y = bottom;
  };
  keepTogether(doc, heightOf(titles, true) + (rows[0] ? heightOf(rows[0].cells, false) : 0));
  drawRow(titles, true);
  for (const row of rows) {
    if (heightOf(row.cells, false) > roomLeft(doc)) {
      doc.addPage();
      drawRow(titles, true);
    }
    drawRow(row.cells, false, row.colour);
  }
  doc.x = MARGIN;
  doc.moveDown(0.6);
}

/** A word across every page in large light letters (DRAFT, RETURNED, REVOKED …); nothing when `word` is null. */
export function watermarkEveryPage(doc: Doc, word: string | null): void {
  if (word === null) return;
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const { width, height } = doc.page;
    doc.save().rotate(-35, { origin: [width / 2, height / 2] });
    doc.font('sansSemiBold').fontSize(word.length > 8 ? 72 : 110).fillColor(FAIL).fillOpacity(0.12).text(pdfText(word), 0, height / 2 - 60, { width, align: 'center', lineBreak: false });
    doc.restore();
  }
}

/** The footer line on every page: what the sheet is, then "page i of n". */
export function footers(doc: Doc, text: string): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    // Writing inside the bottom margin would otherwise make pdfkit start a new page.
    doc.page.margins.bottom = 0;
    const y = doc.page.height - MARGIN + 14;
    doc.font('sans').fontSize(7).fillColor(FAINT).fillOpacity(1).text(pdfText(`${text} · page ${i - range.start + 1} of ${range.count}`), MARGIN, y, { width: contentWidth(doc), align: 'right', lineBreak: false });
  }
}
