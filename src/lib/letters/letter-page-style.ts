import 'server-only';
import type PDFDocument from 'pdfkit';
import { letterText } from './pdf-text';

// The letter's page: A4 in points, its margin, its inks, and its headings and paragraphs.
export type Doc = InstanceType<typeof PDFDocument>;

export const INK = '#1f2a2e';
export const SOFT = '#4a5a60';
export const CAUTION = '#8a6212';
export const MARGIN = 56;

export function heading(doc: Doc, text: string): void {
  doc.moveDown(0.8).font('sansSemiBold').fontSize(11.5).fillColor(INK).text(letterText(text));
  doc.moveDown(0.2).font('sans').fontSize(10);
}

export function paragraph(doc: Doc, text: string): void {
  doc.font('sans').fontSize(10).fillColor(INK).text(letterText(text), { align: 'left', lineGap: 1.5 }).moveDown(0.5);
}
