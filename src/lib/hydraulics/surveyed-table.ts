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

/** The index of `level` in the ascending `levels`, which hold it. */
function levelIndex(levels: readonly number[], level: number): number {
  let lo = 0;
  let hi = levels.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (levels[mid] < level) lo = mid + 1;
    else hi = mid;
  }
  return lo;
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
  /** Per interval k (above levels[k]), per sub-area j at index 3k + j: the values just above levels[k] and the slopes. */
  private readonly area: Float64Array;
  private readonly moment: Float64Array;
  private readonly width: Float64Array;
  private readonly widthRate: Float64Array;
  private readonly perimeter: Float64Array;
  private readonly perimeterRate: Float64Array;

  constructor(subAreas: readonly (readonly GroundSegment[])[]) {
    // Plain loops and a typed-array sort: a refined reach builds a table for every interpolated section.
    const elevations: number[] = [];
    for (const segments of subAreas) for (const s of segments) elevations.push(s.z1, s.z2);
    const sorted = Float64Array.from(elevations).sort();
    const levels: number[] = [];
    for (let i = 0; i < sorted.length; i++) if (i === 0 || sorted[i] !== sorted[i - 1]) levels.push(sorted[i]);
    this.levels = levels;
    const count = levels.length;
    // Columns of fixed length, filled by index: the look-ups of a march read them, and a typed array stays packed.
    [this.area, this.moment, this.width, this.widthRate, this.perimeter, this.perimeterRate] = Array.from({ length: 6 }, () => new Float64Array(3 * count));
    const jumpT = new Float64Array(count);
    const jumpP = new Float64Array(count);
    const rateT = new Float64Array(count);
    const rateP = new Float64Array(count);
    const negligibleRise = 1e-13 * Math.max(levels[count - 1] - levels[0], Math.abs(levels[0]), Math.abs(levels[count - 1]), Number.MIN_VALUE);
    subAreas.forEach((segments, j) => {
      jumpT.fill(0);
      jumpP.fill(0);
      rateT.fill(0);
      rateP.fill(0);
      for (const { x1, z1, x2, z2 } of segments) {
        const low = levelIndex(levels, z1 <= z2 ? z1 : z2);
        const high = levelIndex(levels, z1 <= z2 ? z2 : z1);
        const width = Math.abs(x2 - x1);
        const rise = Math.abs(z2 - z1);
        const length = Math.hypot(width, rise);
        if (rise === 0) {
          jumpT[low] += width;
          jumpP[low] += width;
        } else if (rise <= negligibleRise || !Number.isFinite(length / rise)) {
          // A rise far below the precision of the levels (its slope would be all rounding): wholly wet just above its upper end.
          jumpT[high] += width;
          jumpP[high] += length;
        } else {
          // A vertical wall (width 0) only adds perimeter, one metre per metre of rise.
          rateT[low] += width / rise;
          rateT[high] -= width / rise;
          rateP[low] += length / rise;
          rateP[high] -= length / rise;
        }
      }
      let area = 0;
      let moment = 0;
      let width = 0;
      let perimeter = 0;
      let widthRate = 0;
      let perimeterRate = 0;
      for (let k = 0; k < count; k++) {
        width += jumpT[k];
        perimeter += jumpP[k];
        widthRate += rateT[k];
        perimeterRate += rateP[k];
        // Past the highest rise of this sub-area, rounding must not leave a slope behind.
        if (k === count - 1) widthRate = perimeterRate = 0;
        const at = 3 * k + j;
        this.area[at] = area;
        this.moment[at] = moment;
        this.width[at] = width;
        this.widthRate[at] = widthRate;
        this.perimeter[at] = perimeter;
        this.perimeterRate[at] = perimeterRate;
        if (k === count - 1) break;
        const s = levels[k + 1] - levels[k];
        moment += area * s + (width * s * s) / 2 + (widthRate * s * s * s) / 6;
        area += width * s + (widthRate * s * s) / 2;
        width = Math.max(0, width + widthRate * s);
        perimeter = Math.max(0, perimeter + perimeterRate * s);
      }
    });
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
    const at = 3 * k + j;
    const s = level - this.levels[k];
    const area = this.area[at];
    const width = this.width[at];
    const widthRate = this.widthRate[at];
    out.area = area + width * s + (widthRate * s * s) / 2;
    out.topWidth = width + widthRate * s;
    out.wettedPerimeter = this.perimeter[at] + this.perimeterRate[at] * s;
    out.firstMoment = this.moment[at] + area * s + (width * s * s) / 2 + (widthRate * s * s * s) / 6;
  }
}
