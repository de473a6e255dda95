// A surveyed section's wetted geometry tabulated once against the water level, exactly, for every sub-area.
import { groundLevels } from './ground-levels';
import { allocatedNumbers } from './number-arena';
import { type SurveyGround, SUB_AREA_COUNT as SUB_AREAS_IN_CHANGES, levelChanges } from './surveyed-table-changes';
import type { Metres } from './units';

export type { SurveyGround } from './surveyed-table-changes';

// Read once into this module: the loops below use it at every level, and under vitest's module loader (which the
// benchmark runs in) every use of an imported binding is a property read through a getter.
const SUB_AREA_COUNT = SUB_AREAS_IN_CHANGES;

/** Wetted area, perimeter, top width and first moment of one sub-area at one level (the same four as WettedPiece). */
export interface PieceValues {
  area: number;
  wettedPerimeter: number;
  topWidth: number;
  firstMoment: number;
}

/**
 * Whether top width or perimeter jumps just above level k in any sub-area (flat ground starts to flood there). Here
 * rather than beside levelChanges: it is asked once per level of every table, and a call into another module costs
 * more than the test under vitest's module loader, which the benchmark runs in.
 */
function jumpsAt(changes: Float64Array, k: number): boolean {
  for (let j = 0, at = 4 * SUB_AREA_COUNT * k; j < SUB_AREA_COUNT; j++, at += 4) if (changes[at] > 0 || changes[at + 1] > 0) return true;
  return false;
}

/** Numbers per level: the level, 1 if the top width or the perimeter jumps just above it, and six per sub-area. */
const NUMBERS_PER_LEVEL = 2 + 6 * SUB_AREA_COUNT;

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
  /** How many distinct ground elevations the section has. */
  readonly levelCount: number;
  /**
   * From `values[levelsAt]`: the distinct ground elevations ascending, then per level 1 where the top width or the
   * perimeter jumps just above it (flat ground starts to flood), else 0; then from `values[base]`, per interval k (above
   * level k), per sub-area j, from index 6(3k + j): area, first moment, top width, its rate, perimeter, its rate, the
   * values just above level k. All in one run of a shared block (see number-arena.ts); offsets only, so that a table
   * is one small object for the collector however many levels it has.
   */
  private readonly values: Float64Array;
  private readonly levelsAt: number;
  private readonly base: number;
  /** The interval last found. Why: a scan or a root search asks for level after level in one or the next interval. */
  private lastInterval = -1;

  constructor(ground: SurveyGround) {
    const found = groundLevels(ground.elevations, ground.order);
    const count = found.levels.length;
    const { numbers, offset } = allocatedNumbers(NUMBERS_PER_LEVEL * count);
    numbers.set(found.levels, offset);
    this.levelCount = count;
    this.values = numbers;
    this.levelsAt = offset;
    this.base = offset + 2 * count;
    const lowest = found.levels[0];
    const highest = found.levels[count - 1];
    const changes = levelChanges(ground, found.pointLevels, count, Math.max(highest - lowest, Math.abs(lowest), Math.abs(highest), Number.MIN_VALUE));
    for (let j = 0; j < SUB_AREA_COUNT; j++) this.accumulate(j, changes);
    for (let k = 0; k < count; k++) numbers[offset + count + k] = jumpsAt(changes, k) ? 1 : 0;
  }

  /** The k-th distinct ground elevation, ascending. */
  levelAt(k: number): Metres {
    return this.values[this.levelsAt + k];
  }

  /** Whether the top width or the perimeter jumps just above level k (flat ground starts to flood). */
  jumpsAbove(k: number): boolean {
    return this.values[this.levelsAt + this.levelCount + k] === 1;
  }

  /** Sub-area j's values at every level, from the changes at each (see levelChanges). */
  private accumulate(j: number, changes: Float64Array): void {
    const { values, levelsAt } = this;
    const count = this.levelCount;
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
      const s = values[levelsAt + k + 1] - values[levelsAt + k];
      moment += area * s + (width * s * s) / 2 + (widthRate * s * s * s) / 6;
      area += width * s + (widthRate * s * s) / 2;
      width = Math.max(0, width + widthRate * s);
      perimeter = Math.max(0, perimeter + perimeterRate * s);
    }
  }

  /** The interval holding `level`: the last k with level k below it, or −1 at or below the lowest ground. */
  interval(level: Metres): number {
    const { values, levelsAt } = this;
    if (!(level > values[levelsAt])) return -1;
    const last = this.levelCount - 1;
    for (let k = Math.max(0, this.lastInterval); k <= this.lastInterval + 1 && k <= last; k++) {
      if (values[levelsAt + k] < level && (k === last || !(values[levelsAt + k + 1] < level))) return (this.lastInterval = k);
    }
    let lo = 0;
    let hi = this.levelCount;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (values[levelsAt + mid] < level) lo = mid;
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
    const s = level - values[this.levelsAt + k];
    const area = values[at];
    const width = values[at + 2];
    const widthRate = values[at + 3];
    out.area = area + width * s + (widthRate * s * s) / 2;
    out.topWidth = width + widthRate * s;
    out.wettedPerimeter = values[at + 4] + values[at + 5] * s;
    out.firstMoment = values[at + 1] + area * s + (width * s * s) / 2 + (widthRate * s * s * s) / 6;
  }
}
