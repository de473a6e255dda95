// The distinct ground elevations of a section, ascending, and where among them each point's elevation stands.
import { SCRATCH_SLOTS, scratchNumbers } from './scratch-numbers';
import { sortedDistinct } from './sorted-distinct';

export interface GroundLevels {
  levels: number[];
  /** Per point, the index of its elevation in levels (working space, valid until the next call). */
  pointLevels: Float64Array;
}

/** Shifts per point an insertion sort may make before the order it was given is taken as no help. */
const MOST_SHIFTS_PER_POINT = 8;

/**
 * `order`, when given, lists the point indices by elevation as a neighbouring section had them; it is sorted here in
 * place and left for the next. Why: between two surveys the ground changes little from one interpolated section to
 * the next, so an insertion sort from the neighbour's order makes a few shifts per point, and each point's level
 * comes out of the walk along it; without an order, or with one far off, the elevations are sorted afresh.
 */
export function groundLevels(elevations: ArrayLike<number>, order?: number[]): GroundLevels {
  const usable = order !== undefined && order.length === elevations.length;
  if (usable && sortedByElevation(order, elevations)) return levelsAlong(order, elevations);
  const levels = sortedDistinct(elevations);
  const pointLevels = scratchNumbers(elevations.length, SCRATCH_SLOTS.pointLevels);
  for (let i = 0; i < elevations.length; i++) pointLevels[i] = indexOf(levels, elevations[i]);
  if (usable) orderByLevel(order, pointLevels, levels.length);
  return { levels, pointLevels };
}

/** Insertion sort of `order` by elevation; false (the order left a permutation) once it has shifted too often. */
function sortedByElevation(order: number[], elevations: ArrayLike<number>): boolean {
  let budget = MOST_SHIFTS_PER_POINT * order.length;
  for (let i = 1; i < order.length; i++) {
    const point = order[i];
    const elevation = elevations[point];
    let k = i - 1;
    for (; k >= 0 && elevations[order[k]] > elevation; k--) {
      order[k + 1] = order[k];
      if (--budget < 0) {
        order[k] = point;
        return false;
      }
    }
    order[k + 1] = point;
  }
  return true;
}

function levelsAlong(order: readonly number[], elevations: ArrayLike<number>): GroundLevels {
  const levels: number[] = [];
  const pointLevels = scratchNumbers(order.length, SCRATCH_SLOTS.pointLevels);
  for (const point of order) {
    const elevation = elevations[point];
    if (levels.length === 0 || elevation !== levels[levels.length - 1]) levels.push(elevation);
    pointLevels[point] = levels.length - 1;
  }
  return { levels, pointLevels };
}

/** The index of `value` in the ascending `levels`, which hold it. */
function indexOf(levels: readonly number[], value: number): number {
  let lo = 0;
  let hi = levels.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (levels[mid] < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Rewrites `order` as the points by level (a counting sort), for the next section to start from. */
function orderByLevel(order: number[], pointLevels: Float64Array, levelCount: number): void {
  const starts = new Array<number>(levelCount + 1).fill(0);
  for (const level of pointLevels) starts[level + 1]++;
  for (let k = 1; k <= levelCount; k++) starts[k] += starts[k - 1];
  pointLevels.forEach((level, point) => (order[starts[level]++] = point));
}
