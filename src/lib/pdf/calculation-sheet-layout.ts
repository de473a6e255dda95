import 'server-only';
import type PDFDocument from 'pdfkit';
import { pdfSafe } from './fonts';

// Drawing helpers for the draft calculation sheet: headings, label–value lines, ruled tables, the DRAFT mark.

export type Doc = InstanceType<typeof PDFDocument>;

export const INK = '#1f2a2e';
export const SOFT = '#4a5a60';
export const ACCENT = '#17636b';
export const RULE = '#d9d2c3';

export function contentWidth(doc: Doc): number {
  return doc.page.width - doc.page.margins.left - doc.page.margins.right;
}

export function ensureRoom(doc: Doc, height: number): void {
  if (doc.y + height > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

export function heading(doc: Doc, text: string): void {
  ensureRoom(doc, 40);
  doc.moveDown(0.6).font('sansSemiBold').fontSize(12).fillColor(ACCENT).text(pdfSafe(text), doc.page.margins.left);
  doc.moveDown(0.2).fillColor(INK);
}

export function paragraph(doc: Doc, text: string, size = 9, color = INK): void {
  doc.font('sans').fontSize(size).fillColor(color).text(pdfSafe(text), doc.page.margins.left, doc.y, { width: contentWidth(doc) });
}

/** "Label ........ value" lines in two columns; values in the monospaced face. */
export function facts(doc: Doc, rows: [label: string, value: string][]): void {
  const left = doc.page.margins.left;
  const labelWidth = contentWidth(doc) * 0.45;
  for (const [label, value] of rows) {
    ensureRoom(doc, 14);
    const y = doc.y;
    doc.font('sans').fontSize(9).fillColor(SOFT).text(pdfSafe(label), left, y, { width: labelWidth - 6 });
    const afterLabel = doc.y;
    doc.font('mono').fontSize(9).fillColor(INK).text(pdfSafe(value), left + labelWidth, y, { width: contentWidth(doc) - labelWidth });
    doc.y = Math.max(afterLabel, doc.y) + 2;
  }
}

export interface TableColumn {
  label: string;
  width: number;
  align?: 'left' | 'right';
}

/** A ruled table that repeats its header on each new page. */
export function table(doc: Doc, columns: TableColumn[], rows: string[][], size = 8): void {
  const left = doc.page.margins.left;
  const total = columns.reduce((s, c) => s + c.width, 0);
  const scale = contentWidth(doc) / total;
  const widths = columns.map((c) => c.width * scale);
  const drawRow = (cells: string[], font: string, color: string) => {
    const heights = cells.map((cell, i) => doc.font(font).fontSize(size).heightOfString(pdfSafe(cell), { width: widths[i] - 4 }));
    const height = Math.max(...heights) + 4;
    if (doc.y + height > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      if (font !== 'sansSemiBold') drawRow(columns.map((c) => c.label), 'sansSemiBold', SOFT);
    }
    const y = doc.y;
    let x = left;
    cells.forEach((cell, i) => {
      doc.font(font).fontSize(size).fillColor(color).text(pdfSafe(cell), x + 2, y + 2, { width: widths[i] - 4, align: columns[i].align ?? 'left' });
      x += widths[i];
    });
    doc.moveTo(left, y + height).lineTo(left + contentWidth(doc), y + height).lineWidth(0.4).strokeColor(RULE).stroke();
    doc.y = y + height;
  };
  ensureRoom(doc, 30);
  drawRow(columns.map((c) => c.label), 'sansSemiBold', SOFT);
  for (const row of rows) drawRow(row, 'mono', INK);
  doc.x = left;
}

/** A large, light "DRAFT" across every page, and a footer line naming the sheet and the page. */
export function markEveryPage(doc: Doc, footer: string): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const { width, height } = doc.page;
    doc.save();
    doc.rotate(-35, { origin: [width / 2, height / 2] });
    doc.font('sansSemiBold').fontSize(110).fillColor('#a33a2a').fillOpacity(0.12).text('DRAFT', 0, height / 2 - 60, { width, align: 'center', lineBreak: false });
    doc.restore();
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc.font('sans').fontSize(7).fillColor(SOFT).fillOpacity(1).text(pdfSafe(`${footer} - page ${i - range.start + 1} of ${range.count}`), doc.page.margins.left, height - 30, { width: contentWidth(doc), align: 'center', lineBreak: false });
    doc.page.margins.bottom = bottom;
  }
}
