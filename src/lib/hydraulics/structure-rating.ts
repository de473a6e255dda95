// The structure's rating across the range of the case's flood events: for each discharge, the head over the crest and
// the water level just upstream of the structure, worked out exactly as an event's control is (event-control.ts).
import type { CaseInput } from '@/lib/validation/case-schema';
import { defaultDesignHead } from './case-control';
import { reachModel } from './case-reach';
import { caseToSI, unitScale } from './case-units';
import { criticalDepth } from './critical-depth';
import { InvalidInputError } from './errors';
import { heldControl } from './event-control';
import { normalDepth } from './normal-depth';

/** Points on the rating curve between the range's ends (the events' own discharges are added to them). */
export const RATING_POINTS = 24;
/** The curve runs from this fraction of the smallest design discharge to this multiple of the largest. */
export const RATING_RANGE = { below: 0.25, above: 1.25 } as const;

export interface RatingPoint {
  discharge: number;
  /** Head over the crest (0 where the crest does not control). */
  head: number;
  /** Water level just upstream of the structure, above the datum. */
  upstreamLevel: number;
  /** False where the crest is too low to control this discharge: the level is then the channel's own. */
  controls: boolean;
  /** The event at this discharge, when it is one of the case's. */
  event: string | null;
}

export interface StructureRating {
  units: 'SI' | 'US';
  crestLevel: number | null;
  points: RatingPoint[];
}

function dischargesToRate(designDischarges: number[]): number[] {
  const low = Math.min(...designDischarges) * RATING_RANGE.below;
  const high = Math.max(...designDischarges) * RATING_RANGE.above;
  const even = Array.from({ length: RATING_POINTS }, (_, i) => low + ((high - low) * i) / (RATING_POINTS - 1));
  return [...new Set([...even, ...designDischarges])].sort((a, b) => a - b);
}

/** The rating of the case's structure, in the case's own units. Pure: no I/O, run off the request thread by the portal. */
export function structureRating(input: CaseInput): StructureRating {
  if (input.control.type !== 'weir') throw new InvalidInputError('control', 'is a given depth, not a structure: a given depth has no rating');
  const si = caseToSI(input);
  const k = unitScale(input.units);
  const model = reachModel(si.reach);
  const section = model.controlSection;
  // Through a reservoir the structure passes the routed outflow, less than the inflow peak: such an event is marked at its
  // inflow peak and says so, for the routed level is on the results sheet's routing part, not on a steady rating.
  const routed = (e: CaseInput['events'][number]) => si.reservoir !== undefined && e.hydrograph !== undefined;
  const design = si.events.map((e) => ({ name: routed(e) ? `${e.name} (peak inflow, before the storage)` : e.name, discharge: e.discharge * (1 + (e.climateChangeAllowance ?? 0) / 100) }));
  const designHead = defaultDesignHead(si.control, section, Math.max(...design.map((e) => e.discharge)));
  const adjust = designHead !== undefined ? { designHead } : {};
  const points = dischargesToRate(design.map((e) => e.discharge)).map((discharge): RatingPoint => {
    const yc = criticalDepth(section, discharge);
    const yn = model.bedSlope > 0 ? normalDepth(section, discharge, model.bedSlope) : null;
    const withoutDepth = si.existingControl?.depth ?? yn;
    if (withoutDepth === null) throw new InvalidInputError('existingControl', 'is required on a horizontal or adverse reach: without normal depth there is no default level without the scheme; give the existing depth at the control');
    const held = heldControl(si, section, discharge, adjust, withoutDepth, yc, yn);
    return {
      discharge: discharge / k.discharge,
      head: held.structure.head / k.length,
      upstreamLevel: (model.bedLevelAtControl + held.startDepth) / k.length,
      controls: held.controls,
      event: design.find((e) => e.discharge === discharge)?.name ?? null,
    };
  });
  const sill = si.control.type === 'weir' ? si.control.sillHeight : null;
  return { units: input.units, crestLevel: sill === null ? null : (model.bedLevelAtControl + sill) / k.length, points };
}
