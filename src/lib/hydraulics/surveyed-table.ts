// A surveyed section's wetted geometry tabulated once against the water level, exactly, for every sub-area.
import { groundLevels } from './ground-levels';
import { allocatedNumbers } from './number-arena';
import { SCRATCH_SLOTS, scratchNumbers } from './scratch-numbers';
import type { Metres } from './units';

/** Wetted area, perimeter, top width and first moment of one sub-area at one level (the same four as WettedPiece). */
export interface PieceValues {
  area: number;
  wettedPerimeter: number;
  topWidth: number;
  firstMoment: number;
}

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

const SUB_AREA_COUNT = 3;

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
  readonly levels: Float64Array;
  /** The levels just above which the top width or the wetted perimeter jumps (flat ground starts to flood), ascending. */
  readonly jumpLevels: number[] = [];
  /**
   * Per interval k (above levels[k]), per sub-area j, from index 6(3k + j): area, first moment, top width, its rate,
   * perimeter, its rate, the values just above levels[k], stored from `values[base]` (see number-arena.ts).
   */
  private readonly values: Float64Array;
  private readonly base: number;
  /** The interval last found. Why: a scan or a root search asks for level after level in one or the next interval. */
  private lastInterval = -1;

  constructor(ground: SurveyGround) {
    const { stations: x, elevations: z, segmentSubAreas } = ground;
    const found = groundLevels(z, ground.order);
    const { pointLevels } = found;
    const count = found.levels.length;
    // The levels and the values side by side in one run of numbers kept with the section (see number-arena.ts).
    const { numbers, offset } = allocatedNumbers((1 + 6 * SUB_AREA_COUNT) * count);
    const levels = numbers.subarray(offset, offset + count);
    levels.set(found.levels);
    this.levels = levels;
    this.values = numbers;
    this.base = offset + count;
    // Per level and sub-area, from index 4(3k + j): jumps in top width and perimeter, then changes in their rates.
    const changes = scratchNumbers(4 * SUB_AREA_COUNT * count, SCRATCH_SLOTS.changes);
    const negligibleRise = 1e-13 * Math.max(levels[count - 1] - levels[0], Math.abs(levels[0]), Math.abs(levels[count - 1]), Number.MIN_VALUE);
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
    for (let j = 0; j < SUB_AREA_COUNT; j++) this.accumulate(j, changes);
    for (let k = 0; k < count; k++) {
      for (let j = 0, at = 4 * SUB_AREA_COUNT * k; j < SUB_AREA_COUNT; j++, at += 4) {
        if (changes[at] > 0 || changes[at + 1] > 0) {
          this.jumpLevels.push(levels[k]);
          break;
        }
      }
    }
  }

  /** Sub-area j's values at every level, from the changes at each (see the constructor). */
  private accumulate(j: number, changes: Float64Array): void {
    const { levels, values } = this;
    const count = levels.length;
    let area = 0;
    let moment = 0;
    let width = 0;
    let perimeter = 0;
    let widthRate = 0;
    let perimeterRate = 0;
    for (let k = 0; k < count; k++) {
      const change = 4 * (SUB_AREA_COUNT * k + j);
      width += changes[change];
      perimeter += changes[change + 1];
      widthRate += changes[change + 2];
      perimeterRate += changes[change + 3];
      // Past the highest rise of this sub-area, rounding must not leave a slope behind.
      if (k === count - 1) widthRate = perimeterRate = 0;
      const at = this.base + 6 * (SUB_AREA_COUNT * k + j);
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

  /** The interval holding `level`: the last k with levels[k] < level, or −1 at or below the lowest ground. */
  interval(level: Metres): number {
    const levels = this.levels;
    if (!(level > levels[0])) return -1;
    const last = levels.length - 1;
    for (let k = Math.max(0, this.lastInterval); k <= this.lastInterval + 1 && k <= last; k++) {
      if (levels[k] < level && (k === last || !(levels[k + 1] < level))) return (this.lastInterval = k);
    }
    let lo = 0;
    let hi = levels.length;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (levels[mid] < level) lo = mid;
      else hi = mid;
    }
    this.lastInterval = lo;
    return lo;
  }

  /** Sub-area j's values at `level` inside interval k (from `interval`), written into `out`. */
  fill(k: number, j: number, level: Metres, out: PieceValues): void {
    if (k < 0) {
      out.area = out.wettedPerimeter = out.topWidth = out.firstMoment = 0;
      return;
    }
    const values = this.values;
    const at = this.base + 6 * (3 * k + j);
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
