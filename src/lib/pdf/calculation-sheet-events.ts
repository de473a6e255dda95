import type { EventResult } from '@/lib/hydraulics/case-result';
import { coefficientWords } from '@/lib/hydraulics/weirs/coefficient-words';
import { stepTableColumns } from '@/lib/revisions/step-table-csv';
import { unitWords } from '@/lib/revisions/draft-inputs';
import type { CaseInput } from '@/lib/validation/case-schema';
import { fixed, levelText, levelUnit } from './certificate-text';
import { type Doc, FAIL, type FieldRow, INK, fields, heading, paragraph, table } from './pdf-layout';

/** One design event's results in full: depths, the control, the coefficient used, afflux, extent and its limits. */
export function drawEventResults(doc: Doc, e: EventResult, units: CaseInput['units'], datum: string | null): void {
  const u = unitWords(units);
  const weir = e.control.weir;
  const rows: FieldRow[] = [
    ['Design discharge', `${fixed(e.discharge)} ${u.discharge}${e.climateChangeAllowance ? ` (${fixed(e.baseDischarge)} + ${e.climateChangeAllowance} % climate-change allowance)` : ''}`],
    ['Normal depth at the control section', e.normalDepthExists ? `${fixed(e.normalDepth)} ${u.length}` : 'none (horizontal or adverse bed)'],
    ['Critical depth', `${fixed(e.criticalDepth)} ${u.length}`],
    ['Bed slope and class', `${fixed(e.bedSlope, 5)} m/m, ${e.slopeClass}; profile ${e.profileType}`],
    ['Head over the crest', e.control.type === 'weir' ? `${fixed(e.control.head)} ${u.length}` : 'no crest (a given depth)'],
    ['Control depth and level', `${fixed(e.control.depth)} ${u.length} deep, level ${levelText(e.control.level, u.length, datum)}`],
    ...(weir ? ([['Weir coefficient', `${coefficientWords(weir.coefficient, weir.coefficientForm)} (${weir.coefficientIsDefault ? 'published value' : "designer's value"}: ${weir.coefficientSource})`]] as FieldRow[]) : []),
    ['Afflux at the control, greatest', `${fixed(e.afflux.atControl)} ${u.length}, ${fixed(e.afflux.max)} ${u.length}`],
    ['Extent of impact', `${fixed(e.extent.distanceUpstream, 1)} ${u.length} upstream (ends by ${e.extent.endsBy})`],
    ['Inundation with the scheme', e.inundation ? `${fixed(e.inundation.withScheme.totalLength, 1)} ${u.length} of bank, to ${fixed(e.inundation.withScheme.extentUpstream, 1)} ${u.length}` : 'not checked (no bank levels)'],
    ['Verdict of this event', e.verdict === 'pass' ? 'PASS' : 'FAIL'],
  ];
  fields(doc, rows, 190);
  if (e.limits.length === 0) return;
  doc.moveDown(0.4);
  table(
    doc,
    [
      { title: 'Limit', width: 3 },
      { title: `Upstream (${u.length})`, width: 1.2, align: 'right', mono: true },
      { title: `Maximum level (${levelUnit(u.length, datum)})`, width: 1.6, align: 'right', mono: true },
      { title: `Freeboard (${u.length})`, width: 1.2, align: 'right', mono: true },
      { title: `Water level (${levelUnit(u.length, datum)})`, width: 1.6, align: 'right', mono: true },
      { title: `Margin (${u.length})`, width: 1.2, align: 'right', mono: true },
      { title: 'Result', width: 0.9 },
    ],
    e.limits.map((l) => ({ colour: l.pass ? INK : FAIL, cells: [l.source === 'reservoir' ? `${l.label} (within the reservoir: its peak level)` : l.label, fixed(l.distanceUpstream, 1), fixed(l.maxLevel), fixed(l.freeboard), fixed(l.waterLevel), fixed(l.margin), l.pass ? 'pass' : 'FAIL'] })),
  );
}

/** The with-scheme profile of one event, point by point. */
export function drawStepTable(doc: Doc, e: EventResult, units: CaseInput['units'], datum: string | null): void {
  const columns = stepTableColumns(units);
  heading(doc, `Step table: ${e.name} (with the scheme, ${e.profile.length} points)`, 70);
  paragraph(doc, `Bed, water and energy levels in ${levelUnit(unitWords(units).length, datum)}; depths above the bed.`, { size: 8 });
  table(doc, columns.map((c) => ({ title: c.label, width: 1, align: 'right' as const, mono: true })), e.profile.map((p) => ({ cells: columns.map((c) => p[c.key].toFixed(c.digits)) })), 7);
}
