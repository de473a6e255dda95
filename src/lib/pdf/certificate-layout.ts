import type PDFDocument from 'pdfkit';
import { pdfText } from './certificate-text';

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

/** Starts a new page when the next block of the given height would run past the bottom margin. */
export function keepTogether(doc: Doc, height: number): void {
  if (doc.y + height > doc.page.height - MARGIN - 20) doc.addPage();
}

export function heading(doc: Doc, text: string): void {
  keepTogether(doc, 60);
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

/** Label and value pairs in two columns; values in the monospaced face when they are numbers or hashes. */
export function fields(doc: Doc, rows: [string, string, boolean?][], labelWidth = 150): void {
  for (const [label, value, mono] of rows) {
    keepTogether(doc, 16);
    const y = doc.y;
    doc.font('sans').fontSize(9).fillColor(SOFT).text(pdfText(label), MARGIN, y, { width: labelWidth - 8 });
    const afterLabel = doc.y;
    doc.font(mono ? monoFont(value) : 'sans').fontSize(mono ? 8.5 : 9).fillColor(INK).text(pdfText(value), MARGIN + labelWidth, y, { width: contentWidth(doc) - labelWidth });
    doc.y = Math.max(doc.y, afterLabel) + 2;
  }
}

export interface Column {
  title: string;
  width: number;
  align?: 'left' | 'right';
  mono?: boolean;
}

/** A ruled table; cells that are numbers use the monospaced face and are right-aligned like a calculation sheet. */
export function table(doc: Doc, columns: Column[], rows: { cells: string[]; colour?: string }[]): void {
  const total = columns.reduce((s, c) => s + c.width, 0);
  const scale = contentWidth(doc) / total;
  const drawRow = (cells: string[], header: boolean, colour = INK) => {
    const fontOf = (cell: string, i: number) => (header ? 'sansSemiBold' : columns[i].mono ? monoFont(cell) : 'sans');
    const heights = cells.map((cell, i) => doc.font(fontOf(cell, i)).fontSize(8).heightOfString(pdfText(cell), { width: columns[i].width * scale - 6 }));
    const height = Math.max(...heights) + 6;
    keepTogether(doc, height + 4);
    const y = doc.y;
    let x = MARGIN;
    cells.forEach((cell, i) => {
      const column = columns[i];
      doc.font(fontOf(cell, i)).fontSize(8).fillColor(header ? SOFT : colour);
      doc.text(pdfText(cell), x + 3, y + 3, { width: column.width * scale - 6, align: column.align ?? 'left' });
      x += column.width * scale;
    });
    doc.moveTo(MARGIN, y + height).lineTo(MARGIN + contentWidth(doc), y + height).lineWidth(header ? 0.8 : 0.4).strokeColor(header ? SOFT : EDGE).stroke();
    doc.y = y + height;
  };
  drawRow(columns.map((c) => c.title), true);
  for (const row of rows) drawRow(row.cells, false, row.colour);
  doc.moveDown(0.6);
}
