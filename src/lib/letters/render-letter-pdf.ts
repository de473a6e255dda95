import 'server-only';
import PDFDocument from 'pdfkit';
import { longDate } from '@/lib/dates/calendar-dates';
import { distance } from '@/lib/parcels/format-quantity';
import { registerPdfFonts } from '@/lib/pdf/fonts';
import type { LetterPlan } from '@/lib/plan/letter-plan-page';
import type { LetterParagraphs } from '@/lib/validation/letter-schemas';
import { drawLetterDiagram } from './draw-letter-diagram';
import { ADDRESS_FIELD, addressLines } from './letter-address';
import { eventParagraph } from './letter-content';
import type { LetterImpact } from './letter-impact';
import { cautionBox, certificateCheck, eventTable, planOfTheLand } from './letter-impact-sections';
import { type Doc, INK, MARGIN, SOFT, heading, paragraph } from './letter-page-style';
import { letterText } from './pdf-text';

export interface LetterDocument {
  reference: string;
  version: number;
  /** ISO timestamp the letter was made; also the PDF's creation date, so the same letter renders to the same bytes. */
  date: string;
  /** The letter's date and the day to respond by, as calendar dates (YYYY-MM-DD) in the portal's time zone. */
  letterDate: string;
  respondBy: string;
  preliminary: boolean;
  organisation: string;
  recipient: { name: string; address: string };
  scheme: { name: string; reference: string };
  /** The template's paragraphs with the placeholders already filled in. */
  paragraphs: LetterParagraphs;
  impact: LetterImpact;
  /** The plan cropped round the parcel, when the scheme has a plan with its outline. */
  plan?: LetterPlan | null;
  /** Set on a reminder: the day of the first letter it follows up (the dates above are the reminder's own). */
  reminderOf?: { firstLetterDate: string };
}

const BANK_WORDS: Record<string, string> = { left: 'left bank', right: 'right bank', both: 'both banks' };

function watermark(doc: Doc): void {
  const { x, y } = doc;
  doc.save().rotate(-40, { origin: [297, 421] }).font('sansSemiBold').fontSize(88).fillColor('#a33a2a').fillOpacity(0.12);
  doc.text('PRELIMINARY', 0, 380, { width: 595, align: 'center', lineBreak: false });
  doc.restore().fillOpacity(1);
  doc.x = x;
  doc.y = y;
}

function letterhead(doc: Doc, letter: LetterDocument, top: number): void {
  doc.font('sansSemiBold').fontSize(14).fillColor(INK).text(letterText(letter.organisation), MARGIN, top, { width: 300 });
  doc.font('sans').fontSize(9).fillColor(SOFT).text('Landowner liaison', { width: 300 });
  const right = { width: 200, align: 'right' as const };
  doc.font('sans').fontSize(9).fillColor(INK).text(`Our reference: ${letterText(letter.reference)}`, 339, top, right);
  doc.text(`Date: ${longDate(letter.letterDate)}`, right);
  doc.font('sansSemiBold').text(`Please respond by: ${longDate(letter.respondBy)}`, right).font('sans');
  doc.text(`Scheme ${letterText(letter.scheme.reference)}, revision ${letter.impact.revision.number} (${letter.impact.revision.status})`, right);
  if (letter.impact.certificate) doc.text(`Certificate ${letterText(letter.impact.certificate.number)}`, right);
  const { leftPt, addressTopPt, widthPt, topPt, heightPt } = ADDRESS_FIELD;
  doc.font('sans').fontSize(9.5).fillColor(INK);
  addressLines(letter.recipient.name, letter.recipient.address).forEach((line, i) => doc.text(letterText(line), leftPt, addressTopPt + i * 12.7, { width: widthPt, lineBreak: false, ellipsis: true }));
  doc.x = MARGIN;
  doc.y = topPt + heightPt + 6;
}

function footers(doc: Doc, letter: LetterDocument, firstPage: number): void {
  const range = doc.bufferedPageRange();
  const count = range.start + range.count - firstPage;
  for (let i = 0; i < count; i++) {
    doc.switchToPage(firstPage + i);
    // The footer sits in the bottom margin; without this pdfkit would start a new page for it.
    doc.page.margins.bottom = 0;
    if (letter.preliminary) watermark(doc);
    const footer = `Letter ${letter.reference}, version ${letter.version}${letter.preliminary ? ', PRELIMINARY' : ''}, from scheme revision ${letter.impact.revision.number}. ${letterText(letter.organisation)}. Page ${i + 1} of ${count}.`;
    doc.font('sans').fontSize(7.5).fillColor(SOFT).text(letterText(footer), MARGIN, 842 - MARGIN + 20, { width: 483, align: 'center', lineBreak: false });
  }
}

function body(doc: Doc, letter: LetterDocument): void {
  const { impact, paragraphs } = letter;
  doc.moveDown(1.2).font('sansSemiBold').fontSize(13).fillColor(INK).text(letterText(`${letter.reminderOf ? 'Reminder: ' : ''}${letter.scheme.name}: what it would mean for your land`));
  if (letter.reminderOf) {
    doc.font('sans').fontSize(10).fillColor(INK).text(letterText(`We wrote to you on ${longDate(letter.reminderOf.firstLetterDate)} and have not yet heard from you. We repeat that letter below; please respond by ${longDate(letter.respondBy)}.`));
  }
  if (letter.preliminary) {
    doc.font('sansSemiBold').fontSize(9.5).fillColor('#a33a2a').text('PRELIMINARY: these figures come from a design that has not yet been independently checked and countersigned. They may change.');
  }
  doc.moveDown(0.6);
  paragraph(doc, `Dear ${letter.recipient.name},`);
  paragraph(doc, paragraphs.introduction);
  paragraph(doc, paragraphs.scheme);
  heading(doc, 'What would change on your land');
  const p = impact.parcel;
  paragraph(doc, `Your land (${p.reference}${p.landUse ? `, ${p.landUse}` : ''}) lies along the ${BANK_WORDS[p.bankSide] ?? p.bankSide} of the river from ${distance(p.distanceFromM)} to ${distance(p.distanceToM)} upstream of the structure.`);
  for (const e of impact.events) paragraph(doc, eventParagraph(e, impact));
  eventTable(doc, impact);
  if (impact.strip) {
    if (doc.y + 215 > 842 - MARGIN) doc.addPage();
    doc.moveDown(0.8).font('sansSemiBold').fontSize(9).fillColor(INK).text(letterText(`Diagram: river levels beside your land in the flood "${impact.strip.event}"`));
    drawLetterDiagram(doc, impact.strip, { x: MARGIN, y: doc.y + 4, width: 483, height: 160 });
    doc.x = MARGIN;
    doc.y += 168;
    doc.font('sansItalic').fontSize(8).fillColor(SOFT).text(letterText(`Distance upstream of the structure across, level above datum up. Your land is the shaded band from ${distance(impact.strip.from)} to ${distance(impact.strip.to)}.`));
  }
  if (letter.plan) planOfTheLand(doc, letter.plan, impact.parcel.reference);
  cautionBox(doc, impact);
  if (impact.certificate) certificateCheck(doc, impact.certificate);
  heading(doc, 'How to respond');
  paragraph(doc, paragraphs.response);
  paragraph(doc, paragraphs.contact);
  paragraph(doc, 'Yours sincerely,');
  paragraph(doc, paragraphs.signOff);
}

/** Draws one letter from a fresh page of `doc`, its pages numbered on their own. */
function drawLetter(doc: Doc, letter: LetterDocument, first: boolean): void {
  if (!first) doc.addPage();
  const firstPage = doc.bufferedPageRange().start + doc.bufferedPageRange().count - 1;
  letterhead(doc, letter, MARGIN);
  body(doc, letter);
  footers(doc, letter, firstPage);
  doc.switchToPage(doc.bufferedPageRange().start + doc.bufferedPageRange().count - 1);
}

/** Collects the document's bytes; call the returned function once everything is drawn. */
function collect(doc: Doc): () => Promise<Buffer> {
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  return () => new Promise((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

const newDocument = (title: string, author: string, subject: string, created: string) => {
  const doc = new PDFDocument({ size: 'A4', margins: { top: MARGIN, bottom: MARGIN, left: MARGIN, right: MARGIN }, bufferPages: true, info: { Title: letterText(title), Author: letterText(author), Subject: subject, Creator: letterText(author), CreationDate: new Date(created) } });
  registerPdfFonts(doc);
  return doc;
};

/** The letter as a PDF (A4, our fonts embedded), watermarked PRELIMINARY on every page when it comes from an unchecked revision. */
export function renderLetterPdf(letter: LetterDocument): Promise<Buffer> {
  const doc = newDocument(`${letter.scheme.name}: letter ${letter.reference}`, letter.organisation, 'Extent-of-impact letter', letter.date);
  const finish = collect(doc);
  drawLetter(doc, letter, true);
  return finish();
}

/** Several letters in one PDF for printing, each from a new page with its address in the window-envelope field. */
export function renderLettersForPrint(letters: LetterDocument[], printedAt: string): Promise<Buffer> {
  if (letters.length === 0) throw new RangeError('no letters to print');
  const doc = newDocument(`Letters to post (${letters.length})`, letters[0].organisation, 'Extent-of-impact letters to post', printedAt);
  const finish = collect(doc);
  letters.forEach((letter, i) => drawLetter(doc, letter, i === 0));
  return finish();
}
