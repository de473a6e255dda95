// A surveyed section's wetted geometry tabulated once against the water level, exactly, for every sub-area.
import type { GroundSegment } from './polygon-clip';
import type { Metres } from './units';

/** Wetted area, perimeter, top width and first moment of one sub-area at one level (the same four as WettedPiece). */
export interface PieceValues {
  area: number;
  wettedPerimeter: number;
  topWidth: number;
  firstMoment: number;
}

/**
 * Between two consecutive ground elevations every piece of ground is dry, wholly wet, or wet over a fraction that
 * grows linearly with the level, so the top width T and the wetted perimeter P are linear in the level there, and
 * A = ∫T dh and Aȳ = ∫A dh (the first moment about the surface grows by the area) are its exact integrals:
 * A(e + s) = A + T s + T′ s²/2 and Aȳ(e + s) = Aȳ + A s + T s²/2 + T′ s³/6 (by integration; the pieces are those of
 * polygon-clip.ts). A flat piece of ground is dry with the water exactly at its level and wet above it, so T and P
 * jump there: each interval (eₖ, eₖ₊₁] starts from the values just above eₖ. Why: a march asks for thousands of
 * levels; clipping every piece of ground each time costs a pass over the survey, this a binary search.
 */
export class SurveyTable {
  /** Distinct ground elevations, ascending. */
  readonly levels: number[];
  /** 1 where the top width or the wetted perimeter jumps just above levels[k] (flat ground starts to flood there). */
  readonly jumpsAbove: number[];
  /**
   * Per interval k (above levels[k]), per sub-area j, from index 6(3k + j): area, first moment, top width, its rate,
   * perimeter, its rate, the values just above levels[k]. One typed array: a refined reach builds a table for every
   * interpolated section, and each typed array allocated costs far more than its numbers.
   */
  private readonly values: Float64Array;

  constructor(subAreas: readonly (readonly GroundSegment[])[]) {
    // Plain loops and a typed-array sort: a refined reach builds a table for every interpolated section.
    let segmentCount = 0;
    for (const segments of subAreas) segmentCount += segments.length;
    const sorted = new Float64Array(2 * segmentCount);
    let filled = 0;
    for (const segments of subAreas) {
      for (const s of segments) {
        sorted[filled++] = s.z1;
        sorted[filled++] = s.z2;
      }
    }
    sorted.sort();
    const levels: number[] = [];
    for (let i = 0; i < sorted.length; i++) if (i === 0 || sorted[i] !== sorted[i - 1]) levels.push(sorted[i]);
    this.levels = levels;
    const count = levels.length;
    this.values = new Float64Array(18 * count);
    this.jumpsAbove = new Array<number>(count).fill(0);
    // Per level: jumps in top width and perimeter, then changes in their rates (scratch, reset per sub-area).
    const changes = new Float64Array(4 * count);
    const negligibleRise = 1e-13 * Math.max(levels[count - 1] - levels[0], Math.abs(levels[0]), Math.abs(levels[count - 1]), Number.MIN_VALUE);
    for (let j = 0; j < subAreas.length; j++) {
      const segments = subAreas[j];
      changes.fill(0);
      for (const { x1, z1, x2, z2 } of segments) {
        // The index of a ground elevation in levels: one past the interval below it.
        const low = this.interval(z1 <= z2 ? z1 : z2) + 1;
        const high = this.interval(z1 <= z2 ? z2 : z1) + 1;
        const width = Math.abs(x2 - x1);
        const rise = Math.abs(z2 - z1);
        const length = Math.hypot(width, rise);
        if (rise === 0) {
          changes[4 * low] += width;
          changes[4 * low + 1] += width;
        } else if (rise <= negligibleRise || !Number.isFinite(length / rise)) {
          // A rise far below the precision of the levels (its slope would be all rounding): wholly wet just above its upper end.
          changes[4 * high] += width;
          changes[4 * high + 1] += length;
        } else {
          // A vertical wall (width 0) only adds perimeter, one metre per metre of rise.
          changes[4 * low + 2] += width / rise;
          changes[4 * high + 2] -= width / rise;
          changes[4 * low + 3] += length / rise;
          changes[4 * high + 3] -= length / rise;
        }
      }
      let area = 0;
      let moment = 0;
      let width = 0;
      let perimeter = 0;
      let widthRate = 0;
      let perimeterRate = 0;
      for (let k = 0; k < count; k++) {
        if (changes[4 * k] > 0 || changes[4 * k + 1] > 0) this.jumpsAbove[k] = 1;
        width += changes[4 * k];
        perimeter += changes[4 * k + 1];
        widthRate += changes[4 * k + 2];
        perimeterRate += changes[4 * k + 3];
        // Past the highest rise of this sub-area, rounding must not leave a slope behind.
        if (k === count - 1) widthRate = perimeterRate = 0;
        const at = 6 * (3 * k + j);
        const values = this.values;
        values[at] = area;
        values[at + 1] = moment;
        values[at + 2] = width;
        values[at + 3] = widthRate;
        values[at + 4] = perimeter;
        values[at + 5] = perimeterRate;
        if (k === count - 1) break;
        const s = levels[k + 1] - levels[k];
        moment += area * s + (width * s * s) / 2 + (widthRate * s * s * s) / 6;
        area += width * s + (widthRate * s * s) / 2;
        width = Math.max(0, width + widthRate * s);
        perimeter = Math.max(0, perimeter + perimeterRate * s);
      }
    }
  }

  /** The interval holding `level`: the last k with levels[k] < level, or −1 at or below the lowest ground. */
  interval(level: Metres): number {
    const levels = this.levels;
    if (!(level > levels[0])) return -1;
    let lo = 0;
    let hi = levels.length;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (levels[mid] < level) lo = mid;
      else hi = mid;
    }
    return lo;
  }

  /** Sub-area j's values at `level` inside interval k (from `interval`), written into `out`. */
  fill(k: number, j: number, level: Metres, out: PieceValues): void {
    if (k < 0) {
      out.area = out.wettedPerimeter = out.topWidth = out.firstMoment = 0;
      return;
    }
    const values = this.values;
    const at = 6 * (3 * k + j);
    const s = level - this.levels[k];
    const area = values[at];
    const width = values[at + 2];
    const widthRate = values[at + 3];
    out.area = area + width * s + (widthRate * s * s) / 2;
    out.topWidth = width + widthRate * s;
    out.wettedPerimeter = values[at + 4] + values[at + 5] * s;
    out.firstMoment = values[at + 1] + area * s + (width * s * s) / 2 + (widthRate * s * s * s) / 6;
  }
}
