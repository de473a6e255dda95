import 'server-only';
import PDFDocument from 'pdfkit';
import { engineTextInWords } from '@/lib/case-words/case-issue-words';
import { registerPdfFonts } from './fonts';
import type { CertificateContent } from './certificate-content';
import { certificateAssumptions, certificateMethods } from './certificate-methods';
import { drawQrCode } from './certificate-qr';
import { eventsTable, limitsTable } from './certificate-results';
import { datumName, pdfText, utcDateTime } from './certificate-text';
import { drawInputSummary } from './input-summary';
import { drawLongSections } from './long-sections';
import { drawRoutingSections } from './routing-sections';
import { ACCENT, CAUTION, type Doc, FAIL, INK, MARGIN, PASS, SOFT, bullets, contentWidth, fields, footers, heading, keepTogether, paragraph } from './pdf-layout';
import { drawSensitivity } from './sensitivity-table';

export const CERTIFICATE_CAUTION =
  'Caution. The results on this certificate are estimates by the named published methods from the data entered. They support, and never replace, the judgement of a licensed engineer and the local codes and regulations that apply to the site. The certificate covers the frozen revision identified by its SHA-256 below and nothing else.';

function titleBlock(doc: Doc, c: CertificateContent): void {
  doc.font('sansSemiBold').fontSize(9).fillColor(ACCENT).text('SILLMARK', MARGIN, MARGIN);
  doc.font('sansSemiBold').fontSize(17).fillColor(INK).text('Certificate of upstream flood impact check', MARGIN, doc.y + 4);
  doc.font('mono').fontSize(12).fillColor(INK).text(c.number, MARGIN, doc.y + 4);
  doc.font('sans').fontSize(9).fillColor(SOFT).text(pdfText(`Issued ${utcDateTime(c.issuedAt)} on the countersignature of an independent checker.`), MARGIN, doc.y + 2);
  doc.moveDown(0.6);
  fields(doc, [
    ['Scheme', `${c.scheme.reference} ${c.scheme.name}`],
    ['Watercourse and site', `${c.scheme.watercourse} at ${c.scheme.site}`],
    ['Revision', `${c.revision.number} (engine version ${c.revision.engineVersion})`],
    ['Level datum', `levels in ${c.results.units === 'US' ? 'ft' : 'm'} above ${datumName(c.datum)}`],
  ]);
}

function verdictLine(doc: Doc, c: CertificateContent): void {
  const pass = c.results.verdict === 'pass';
  keepTogether(doc, 40);
  const y = doc.y + 6;
  doc.rect(MARGIN, y, contentWidth(doc), 26).lineWidth(1).strokeColor(pass ? PASS : FAIL).stroke();
  const text = pass ? 'PASS: every flood-level limit is met for every design event.' : 'FAIL: at least one flood-level limit is not met; see the table of limits.';
  doc.font('sansSemiBold').fontSize(10).fillColor(pass ? PASS : FAIL).text(pdfText(`Verdict ${text}`), MARGIN + 10, y + 8, { width: contentWidth(doc) - 20 });
  doc.y = y + 34;
}

function people(doc: Doc, c: CertificateContent): void {
  heading(doc, 'Designer and independent checker');
  for (const p of [c.designer, c.checker]) fields(doc, [[p.role, `${p.name}${p.organisation ? `, ${p.organisation}` : ''}. ${p.act}`]]);
  paragraph(doc, 'The checker is not the designer of this revision, re-ran the frozen inputs on the server, found the stored results reproduced, and countersigned with their password.', { size: 8, colour: SOFT });
}

function integrity(doc: Doc, c: CertificateContent): void {
  heading(doc, 'Integrity and verification');
  fields(doc, [
    ['SHA-256 of the frozen revision', c.revision.revisionSha256, true],
    ['SHA-256 of the inputs', c.revision.inputsSha256, true],
    ['SHA-256 of the results', c.revision.resultsSha256, true],
    ['Verify this certificate at', c.verificationUrl, true],
    ['Signing certificate', c.signingCertificateUrl, true],
  ]);
  const qrSize = 92;
  keepTogether(doc, qrSize + 10);
  const top = doc.y + 6;
  drawQrCode(doc, c.verificationUrl, MARGIN - 6, top, qrSize);
  doc.y = top + 10;
  const textX = MARGIN + qrSize + 6;
  const width = contentWidth(doc) - qrSize - 6;
  doc.font('sans').fontSize(8).fillColor(SOFT);
  doc.text(pdfText('Scan the code, or enter the certificate number on the verification page, to see whether this certificate is issued, superseded or revoked. Verification by number needs no account.'), textX, doc.y, { width, lineGap: 1.5 });
  doc.moveDown(0.5);
  doc.text(pdfText('This PDF carries a digital signature (PKCS#7, detached) by the Sillmark signing identity over the whole file: any change to the file breaks the signature. Signed-in users can upload the file on the verification page to check the signature and that the file is the one issued.'), textX, doc.y, { width, lineGap: 1.5 });
  doc.y = Math.max(doc.y, top + qrSize);
  doc.x = MARGIN;
}

/** The certificate as an unsigned PDF (pdfkit's PDF 1.3 with a classic cross-reference table, ready for signing). */
export function renderCertificatePdf(c: CertificateContent): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: MARGIN, bufferPages: true, info: { Title: `Sillmark certificate ${c.number}`, Author: 'Sillmark', Subject: `${c.scheme.reference} revision ${c.revision.number}`, Keywords: c.number } });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerPdfFonts(doc);
  titleBlock(doc, c);
  verdictLine(doc, c);
  paragraph(doc, 'What is certified: every input of the frozen revision follows under its heading, so that the check can be rebuilt from this certificate.', { colour: SOFT });
  drawInputSummary(doc, { inputs: c.inputs, results: c.results, datum: c.datum });
  heading(doc, 'Governing results', 50);
  eventsTable(doc, c.results, c.datum);
  heading(doc, 'Flood-level limits, as checked', 50);
  limitsTable(doc, c.results, c.datum);
  drawSensitivity(doc, c.results, c.datum);
  drawLongSections(doc, c.inputs, c.results, c.datum);
  drawRoutingSections(doc, c.results, c.datum);
  heading(doc, 'Assumptions');
  bullets(doc, certificateAssumptions(c.inputs, c.results));
  heading(doc, 'Methods and their published sources');
  bullets(doc, certificateMethods(c.inputs, c.results));
  if (c.results.warnings.length) {
    heading(doc, 'Warnings from the calculation');
    bullets(doc, c.results.warnings.map((w) => engineTextInWords(w, c.inputs)));
  }
  people(doc, c);
  heading(doc, 'Caution');
  paragraph(doc, CERTIFICATE_CAUTION, { colour: CAUTION });
  integrity(doc, c);
  footers(doc, `Sillmark certificate ${c.number}`);
  doc.end();
  return done;
}
