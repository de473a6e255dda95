// How a section's top width and wetted perimeter change at each ground level, per sub-area: the makings of its table.
import { SCRATCH_SLOTS, scratchNumbers } from './scratch-numbers';
import type { Metres } from './units';

export const SUB_AREA_COUNT = 3;

/**
 * Ground points across a section, left to right, and per point i ≥ 1 the sub-area (0, 1 or 2) of the segment from
 * point i − 1 to point i; −1 leaves that segment out of every sub-area.
 */
export interface SurveyGround {
  stations: ArrayLike<Metres>;
  elevations: ArrayLike<Metres>;
  segmentSubAreas: ArrayLike<number>;
  /** The point indices by elevation as a neighbouring section had them, sorted here in place (see ground-levels.ts). */
  order?: number[];
}

/**
 * Per level k and sub-area j, from index 4(3k + j): the jumps in top width and perimeter just above levels[k], then
 * the changes in their rates there (working space, valid until the next call). `pointLevels` gives each point's
 * level index, `span` the range of the levels (see surveyed-table.ts for why each piece changes as it does).
 */
export function levelChanges(ground: SurveyGround, pointLevels: ArrayLike<number>, levelCount: number, span: number): Float64Array {
  const { stations: x, elevations: z, segmentSubAreas } = ground;
  const changes = scratchNumbers(4 * SUB_AREA_COUNT * levelCount, SCRATCH_SLOTS.changes);
  const negligibleRise = 1e-13 * span;
  for (let i = 1; i < z.length; i++) {
    const j = segmentSubAreas[i];
    if (j < 0) continue;
    const z1 = z[i - 1];
    const z2 = z[i];
    const low = 4 * (SUB_AREA_COUNT * Math.min(pointLevels[i - 1], pointLevels[i]) + j);
    const high = 4 * (SUB_AREA_COUNT * Math.max(pointLevels[i - 1], pointLevels[i]) + j);
    const width = Math.abs(x[i] - x[i - 1]);
    const rise = Math.abs(z2 - z1);
    // Not Math.hypot: ground in metres cannot overflow a square, and hypot costs twenty times as much per segment.
    const length = Math.sqrt(width * width + rise * rise);
    if (rise === 0) {
      changes[low] += width;
      changes[low + 1] += width;
    } else if (rise <= negligibleRise || !Number.isFinite(length / rise)) {
      // A rise far below the precision of the levels (its slope would be all rounding): wholly wet just above its upper end.
      changes[high] += width;
      changes[high + 1] += length;
    } else {
      // A vertical wall (width 0) only adds perimeter, one metre per metre of rise.
      changes[low + 2] += width / rise;
      changes[high + 2] -= width / rise;
      changes[low + 3] += length / rise;
      changes[high + 3] -= length / rise;
    }
  }
  return changes;
}
