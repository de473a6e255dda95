import type { CaseResult, EventResult } from '@/lib/hydraulics/case-result';
import { type Doc, FAIL, INK, table } from './pdf-layout';
import { dischargeUnit, fixed, lengthUnit, levelUnit, withUnit } from './certificate-text';

function inundationText(event: EventResult, unit: string): string {
  if (!event.inundation) return 'not checked (no bank level)';
  const withScheme = event.inundation.withScheme;
  if (withScheme.totalLength === 0) return 'none';
  return `${withUnit(withScheme.extentUpstream, unit, 0)} (${withUnit(withScheme.totalLength, unit, 0)} inundated)`;
}

/** The governing results of every design event: head, control depth and level, extents of impact and inundation. */
export function eventsTable(doc: Doc, results: CaseResult, datum: string | null): void {
  const L = lengthUnit(results.units);
  table(
    doc,
    [
      { title: 'Design event', width: 70 },
      { title: 'Discharge', width: 58, align: 'right', mono: true },
      { title: 'Head over crest', width: 52, align: 'right', mono: true },
      { title: 'Control depth', width: 52, align: 'right', mono: true },
      { title: `Control level (${levelUnit(L, datum)})`, width: 62, align: 'right', mono: true },
      { title: 'Greatest afflux', width: 50, align: 'right', mono: true },
      { title: 'Extent of impact', width: 60, align: 'right', mono: true },
      { title: 'Extent of inundation', width: 80, align: 'right', mono: true },
      { title: 'Verdict', width: 40 },
    ],
    results.events.map((e) => ({
      colour: e.verdict === 'pass' ? INK : FAIL,
      cells: [
        e.name,
        withUnit(e.discharge, dischargeUnit(results.units), 2),
        e.control.type === 'weir' ? withUnit(e.control.head, L) : 'no crest',
        withUnit(e.control.depth, L),
        fixed(e.control.level),
        withUnit(e.afflux.max, L),
        withUnit(e.extent.distanceUpstream, L, 0),
        inundationText(e, L),
        e.verdict === 'pass' ? 'pass' : 'FAIL',
      ],
    })),
  );
}

/** Each flood-level limit for each event: the limit, the water level with the scheme, the margin and the outcome. */
export function limitsTable(doc: Doc, results: CaseResult, datum: string | null): void {
  const L = lengthUnit(results.units);
  const rows = results.events.flatMap((e) =>
    e.limits.map((l) => ({
      colour: l.pass ? INK : FAIL,
      cells: [e.name, l.source === 'reservoir' ? `${l.label} (within the reservoir: its peak level)` : l.label, withUnit(l.distanceUpstream, L, 0), fixed(l.maxLevel), withUnit(l.freeboard, L), fixed(l.waterLevel), `${l.margin >= 0 ? '+' : ''}${fixed(l.margin)} ${L}`, l.pass ? 'met' : 'NOT MET'],
    })),
  );
  if (rows.length === 0) return;
  table(
    doc,
    [
      { title: 'Design event', width: 62 },
      { title: 'Flood-level limit', width: 120 },
      { title: 'Upstream', width: 48, align: 'right', mono: true },
      { title: `Maximum level (${levelUnit(L, datum)})`, width: 64, align: 'right', mono: true },
      { title: 'Freeboard', width: 46, align: 'right', mono: true },
      { title: `Water level (${levelUnit(L, datum)})`, width: 64, align: 'right', mono: true },
      { title: 'Margin', width: 50, align: 'right', mono: true },
      { title: 'Outcome', width: 42 },
    ],
    rows,
  );
}
