import { SCRATCH_SLOTS, scratchNumbers } from './scratch-numbers';

/** The distinct values of `values`, ascending. */
export function sortedDistinct(values: ArrayLike<number>): number[] {
  // A typed array sorts numbers without a comparator call per comparison; equal neighbours are then dropped.
  const sorted = scratchNumbers(values.length, SCRATCH_SLOTS.sorting);
  for (let i = 0; i < values.length; i++) sorted[i] = values[i];
  sorted.sort();
  const distinct: number[] = [];
  for (let i = 0; i < sorted.length; i++) if (i === 0 || sorted[i] !== sorted[i - 1]) distinct.push(sorted[i]);
  return distinct;
}
