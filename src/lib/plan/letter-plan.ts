import 'server-only';
import type { ParcelImpactRow } from '@/lib/parcels/compute-parcel-impact';
import { reachLongSections } from '@/lib/parcels/reach-long-section';
import type { RevisionResults } from '@/lib/parcels/revision-results';
import { loadParcelPlan } from './load-parcel-plan';
import { LETTER_PLAN_SIZE, type LetterPlan } from './letter-plan-page';
import { layOutPlan } from './plan-drawing';
import { impactExtent, inundatedStretches } from './river-stretches';

/**
 * For a batch of letters: a function giving each parcel's plan cropped round it, with the river marks of the event
 * its letter's diagram shows. Neighbours are drawn as "other land": a landowner's letter shows only their own category.
 * Null when the scheme has no plan; the function gives null for a parcel without an outline.
 */
export async function letterPlans(schemeId: string, results: RevisionResults): Promise<((row: ParcelImpactRow) => LetterPlan | null) | null> {
  const stored = await loadParcelPlan(schemeId);
  if (!stored) return null;
  const sections = reachLongSections(results);
  const marks = sections.map((s) => ({ inundated: inundatedStretches(s.points), extent: impactExtent(s.points, results.impactThreshold) }));
  return (row) => {
    const reference = row.parcel.reference;
    if (!stored.geometry.outlines.some((o) => o.reference.toLowerCase() === reference.toLowerCase())) return null;
    const mark = marks[row.governingEvent] ?? { inundated: [], extent: null };
    const drawing = layOutPlan({ geometry: stored.geometry, categories: new Map([[reference.toLowerCase(), row.category]]), otherwise: 'other-land', ...mark, ...LETTER_PLAN_SIZE, focus: reference });
    return { drawing, coordinateSystem: stored.coordinateSystem, event: sections[row.governingEvent]?.event ?? '' };
  };
}
