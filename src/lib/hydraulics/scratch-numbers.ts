// Reusable working space for building tables. Why: a refined reach builds a table for every interpolated section, and
// each Float64Array allocated is a separate block outside the heap, costing far more than its numbers and driving
// collections; the engine runs synchronously, so one table is built at a time and a shared buffer is safe.

let buffer = new Float64Array(1024);

/** A zeroed view of `length` numbers, valid until the next call. */
export function scratchNumbers(length: number): Float64Array {
  if (buffer.length < length) buffer = new Float64Array(Math.max(length, 2 * buffer.length));
  const view = buffer.subarray(0, length);
  view.fill(0);
  return view;
}
