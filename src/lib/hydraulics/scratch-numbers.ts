// Reusable working space for building tables. Why: a refined reach builds a table for every interpolated section, and
// each Float64Array allocated is a separate block outside the heap, costing far more than its numbers and driving
// collections; the engine runs synchronously, so one table is built at a time and a shared buffer is safe.

/** Separate working spaces, so that a builder can hold a few at once. */
export const SCRATCH_SLOTS = { sorting: 0, changes: 1, pointLevels: 2, segmentSubAreas: 3 } as const;
type ScratchSlot = (typeof SCRATCH_SLOTS)[keyof typeof SCRATCH_SLOTS];

const buffers = Object.values(SCRATCH_SLOTS).map(() => new Float64Array(1024));

/** A zeroed view of `length` numbers in `slot`, valid until that slot is asked for again. */
export function scratchNumbers(length: number, slot: ScratchSlot): Float64Array {
  if (buffers[slot].length < length) buffers[slot] = new Float64Array(Math.max(length, 2 * buffers[slot].length));
  const view = buffers[slot].subarray(0, length);
  view.fill(0);
  return view;
}
