import 'server-only';
import PDFDocument from 'pdfkit';
import type { CaseResult, EventResult } from '@/lib/hydraulics/case-result';
import { stepTableColumns } from '@/lib/revisions/step-table-csv';
import { unitWords } from '@/lib/revisions/draft-inputs';
import type { CaseInput } from '@/lib/validation/case-schema';
import { type Doc, SOFT, facts, heading, markEveryPage, paragraph, table } from './calculation-sheet-layout';
import { registerPdfFonts } from './fonts';

export interface CalculationSheetOptions {
  scheme: { reference: string; name: string; watercourse: string; site: string };
  revision: { number: number; status: string };
  designer: string;
  datum: string | null;
  input: CaseInput;
  result: CaseResult;
  generatedAt: Date;
}

const CAUTION =
  'Caution. These results are estimates by the named published methods from the data entered. They support, and never replace, the judgement of a licensed engineer and the local codes and regulations that apply to the site. This is a DRAFT calculation sheet: it is not checked, not countersigned and not a certificate.';

function fixed(x: number | null | undefined, digits = 3): string {
  return x === null || x === undefined || !Number.isFinite(x) ? '-' : x.toFixed(digits);
}

function eventFacts(doc: Doc, e: EventResult, units: CaseInput['units']): void {
  const u = unitWords(units);
  const weir = e.control.weir;
  facts(doc, [
    ['Design discharge', `${fixed(e.discharge)} ${u.discharge}${e.climateChangeAllowance ? ` (${fixed(e.baseDischarge)} + ${e.climateChangeAllowance} % climate-change allowance)` : ''}`],
    ['Normal depth at the control section', e.normalDepthExists ? `${fixed(e.normalDepth)} ${u.length}` : 'none (horizontal or adverse bed)'],
    ['Critical depth', `${fixed(e.criticalDepth)} ${u.length}`],
    ['Bed slope and class', `${fixed(e.bedSlope, 5)} m/m, ${e.slopeClass}; profile ${e.profileType}`],
    ['Head over the crest', `${fixed(e.control.head)} ${u.length}`],
    ['Control depth and level', `${fixed(e.control.depth)} ${u.length}, level ${fixed(e.control.level)} ${u.length}`],
    ...(weir ? ([['Weir coefficient', `${fixed(weir.coefficient, 4)} (${weir.coefficientIsDefault ? 'published default' : "designer's value"}: ${weir.coefficientSource})`]] as [string, string][]) : []),
    ['Afflux at the control, greatest', `${fixed(e.afflux.atControl)} ${u.length}, ${fixed(e.afflux.max)} ${u.length}`],
    ['Extent of impact', `${fixed(e.extent.distanceUpstream, 1)} ${u.length} upstream (ends by ${e.extent.endsBy})`],
    ['Inundation with the scheme', e.inundation ? `${fixed(e.inundation.withScheme.totalLength, 1)} ${u.length} of bank, to ${fixed(e.inundation.withScheme.extentUpstream, 1)} ${u.length}` : 'not checked (no bank levels)'],
    ['Verdict of this event', e.verdict === 'pass' ? 'PASS' : 'FAIL'],
  ]);
  if (e.limits.length > 0) {
    doc.moveDown(0.4);
    table(
      doc,
      [{ label: 'Limit', width: 3 }, { label: `Distance (${u.length})`, width: 1.3, align: 'right' }, { label: `Max level (${u.length})`, width: 1.3, align: 'right' }, { label: `Freeboard (${u.length})`, width: 1.3, align: 'right' }, { label: `Water level (${u.length})`, width: 1.3, align: 'right' }, { label: `Margin (${u.length})`, width: 1.2, align: 'right' }, { label: 'Result', width: 0.9 }],
      e.limits.map((l) => [l.label, fixed(l.distanceUpstream, 1), fixed(l.maxLevel), fixed(l.freeboard), fixed(l.waterLevel), fixed(l.margin), l.pass ? 'pass' : 'FAIL']),
    );
  }
}

function stepTable(doc: Doc, e: EventResult, units: CaseInput['units']): void {
  const columns = stepTableColumns(units);
  heading(doc, `Step table: ${e.name} (with the scheme, ${e.profile.length} points)`);
  table(doc, columns.map((c) => ({ label: c.label, width: 1, align: 'right' as const })), e.profile.map((p) => columns.map((c) => p[c.key].toFixed(c.digits))), 7);
}

/** The DRAFT calculation sheet of one revision: inputs, the engine's results per event, warnings and step tables. */
export function renderCalculationSheet(o: CalculationSheetOptions): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 48, bufferPages: true, info: { Title: `${o.scheme.reference} revision ${o.revision.number} - draft calculation sheet`, Author: o.designer, Subject: 'Sillmark draft calculation sheet' } });
  registerPdfFonts(doc);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const r = o.result;
  doc.font('sansSemiBold').fontSize(16).text(`${o.scheme.reference} ${o.scheme.name}`);
  paragraph(doc, `${o.scheme.watercourse} at ${o.scheme.site}. Revision ${o.revision.number} (${o.revision.status}), designer ${o.designer}. Levels in ${unitWords(o.input.units).length}${o.datum ? ` above ${o.datum}` : ''}. Generated ${o.generatedAt.toISOString().replace('T', ' ').slice(0, 16)} UTC by Sillmark engine ${r.engineVersion}.`, 9, SOFT);
  doc.moveDown(0.5);
  paragraph(doc, CAUTION, 9);
  heading(doc, `Overall verdict: ${r.verdict === 'pass' ? 'PASS - every limit is met in every event' : 'FAIL - at least one limit is exceeded'}`);
  if (r.governingEvent) paragraph(doc, `Governing event (least margin): ${r.governingEvent.name}, margin ${fixed(r.governingEvent.leastMargin)} ${unitWords(o.input.units).length}.`);
  if (r.sizing) paragraph(doc, `Crest sizing (${r.sizing.vary === 'sillHeight' ? 'sill height' : 'crest length'}): ${r.sizing.value === null ? 'no passing value in the range searched' : fixed(r.sizing.value)} - ${r.sizing.reason}.`);
  for (const e of r.events) {
    heading(doc, `Event: ${e.name}`);
    eventFacts(doc, e, o.input.units);
  }
  if (r.warnings.length > 0) {
    heading(doc, 'Warnings');
    for (const w of r.warnings) paragraph(doc, `- ${w}`, 8.5);
  }
  for (const e of r.events) stepTable(doc, e, o.input.units);
  markEveryPage(doc, `DRAFT calculation sheet ${o.scheme.reference} rev. ${o.revision.number} - not checked, not certified`);
  doc.end();
  return done;
}
