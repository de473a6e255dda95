import type { CaseResult } from '@/lib/hydraulics/case-result';

export type QuantityKind = 'length' | 'discharge' | 'none';

/** One headline number (or outcome) of a revision's results, named so that two revisions can be compared field by field. */
export interface KeyResult {
  key: string;
  label: string;
  value: number | string | boolean | null;
  kind: QuantityKind;
}

/**
 * The results a checker compares: the overall verdict, then per design event the discharge, head, control depth and
 * level, normal and critical depth, greatest afflux, extents of impact and inundation, and each limit's level and margin.
 * Events and limits are keyed by name, so reordering them is not reported as a change.
 */
export function keyResults(results: CaseResult): KeyResult[] {
  const rows: KeyResult[] = [{ key: 'verdict', label: 'Overall verdict', value: results.verdict, kind: 'none' }];
  for (const e of results.events) {
    const at = (field: string, label: string, value: KeyResult['value'], kind: QuantityKind = 'length') => rows.push({ key: `event:${e.name}:${field}`, label: `${e.name}: ${label}`, value, kind });
    at('discharge', 'design discharge', e.discharge, 'discharge');
    at('head', 'head over the crest', e.control.head);
    at('controlDepth', 'control depth', e.control.depth);
    at('controlLevel', 'water level at the control', e.control.level);
    at('normalDepth', 'normal depth', e.normalDepthExists ? e.normalDepth : null);
    at('criticalDepth', 'critical depth', e.criticalDepth);
    at('affluxMax', 'greatest afflux', e.afflux.max);
    at('extent', 'extent of impact upstream', e.extent.distanceUpstream);
    at('inundationExtent', 'extent of inundation upstream', e.inundation ? e.inundation.withScheme.extentUpstream : null);
    at('verdict', 'verdict', e.verdict, 'none');
    for (const l of e.limits) {
      rows.push({ key: `event:${e.name}:limit:${l.label}:level`, label: `${e.name}: water level at ${l.label}`, value: l.waterLevel, kind: 'length' });
      rows.push({ key: `event:${e.name}:limit:${l.label}:margin`, label: `${e.name}: margin at ${l.label}`, value: l.margin, kind: 'length' });
      rows.push({ key: `event:${e.name}:limit:${l.label}:pass`, label: `${e.name}: ${l.label} met`, value: l.pass, kind: 'none' });
    }
  }
  return rows;
}
