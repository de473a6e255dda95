import 'server-only';
import PDFDocument from 'pdfkit';
import { engineTextInWords } from '@/lib/case-words/case-issue-words';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CaseInput } from '@/lib/validation/case-schema';
import { drawEventResults, drawStepTable } from './calculation-sheet-events';
import { type SheetStatus, sheetStatusWords } from './calculation-sheet-status';
import { datumName, fixed, lengthUnit, utcDateTime } from './certificate-text';
import { registerPdfFonts } from './fonts';
import { drawInputSummary } from './input-summary';
import { drawLongSections } from './long-sections';
import { drawRoutingSections } from './routing-sections';
import { ACCENT, CAUTION, INK, MARGIN, SOFT, bullets, footers, heading, paragraph, watermarkEveryPage } from './pdf-layout';
import { drawSensitivity } from './sensitivity-table';

export interface CalculationSheetOptions {
  scheme: { reference: string; name: string; watercourse: string; site: string };
  revision: { number: number; status: SheetStatus };
  designer: string;
  datum: string | null;
  input: CaseInput;
  result: CaseResult;
  generatedAt: Date;
}

const CAUTION_TEXT =
  'Caution. These results are estimates by the named published methods from the data entered. They support, and never replace, the judgement of a licensed engineer and the local codes and regulations that apply to the site.';

/** The calculation sheet of one revision: its status, every input, the results per event, sensitivity, long-sections, warnings and step tables. */
export function renderCalculationSheet(o: CalculationSheetOptions): Promise<Buffer> {
  const status = sheetStatusWords(o.revision.status, o.revision.number);
  const doc = new PDFDocument({ size: 'A4', margin: MARGIN, bufferPages: true, info: { Title: `${o.scheme.reference} revision ${o.revision.number} - calculation sheet`, Author: o.designer, Subject: status.footer } });
  registerPdfFonts(doc);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const r = o.result;
  const L = lengthUnit(r.units);
  doc.font('sansSemiBold').fontSize(16).fillColor(INK).text(`${o.scheme.reference} ${o.scheme.name}`, MARGIN, MARGIN);
  paragraph(doc, `${o.scheme.watercourse} at ${o.scheme.site}. Revision ${o.revision.number}, designer ${o.designer}. Levels in ${L} above ${datumName(o.datum)}. Generated ${utcDateTime(o.generatedAt.toISOString())} by Sillmark engine ${r.engineVersion}.`, { colour: SOFT });
  paragraph(doc, `Status: ${status.line}`, { font: 'sansSemiBold', size: 10, colour: ACCENT });
  paragraph(doc, `${CAUTION_TEXT} ${status.standing}`, { colour: CAUTION });
  heading(doc, `Overall verdict: ${r.verdict === 'pass' ? 'PASS - every limit is met in every event' : 'FAIL - at least one limit is exceeded'}`);
  if (r.governingEvent) paragraph(doc, `Governing event (least margin): ${r.governingEvent.name}, margin ${fixed(r.governingEvent.leastMargin)} ${L}.`);
  if (r.sizing) paragraph(doc, `Crest sizing (${r.sizing.vary === 'sillHeight' ? 'sill height' : 'crest length'}): ${r.sizing.value === null ? 'no passing value in the range searched' : `${fixed(r.sizing.value)} ${L}`} - ${r.sizing.reason}.`);
  drawInputSummary(doc, { inputs: o.input, results: r, datum: o.datum });
  for (const e of r.events) {
    heading(doc, `Results: ${e.name}`);
    drawEventResults(doc, e, o.input.units, o.datum);
  }
  drawSensitivity(doc, r, o.datum);
  drawLongSections(doc, o.input, r, o.datum);
  drawRoutingSections(doc, r, o.datum);
  if (r.warnings.length > 0) {
    heading(doc, 'Warnings from the calculation');
    bullets(doc, r.warnings.map((w) => engineTextInWords(w, o.input)));
  }
  for (const e of r.events) drawStepTable(doc, e, o.input.units, o.datum);
  watermarkEveryPage(doc, status.watermark);
  footers(doc, `${o.scheme.reference} · ${status.footer}`);
  doc.end();
  return done;
}
