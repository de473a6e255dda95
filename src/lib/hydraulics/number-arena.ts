// Long-lived runs of numbers cut from shared blocks. Why: a refined reach tabulates some 1,600 sections, and each
// Float64Array of its own is a block outside the heap whose bookkeeping costs more than its numbers and drives
// collections; a block here holds the tables of dozens of sections and is freed once none of them is in use.

const BLOCK_LENGTH = 1 << 16;

let block = new Float64Array(BLOCK_LENGTH);
let used = 0;

/** `length` zeroed numbers for the caller to keep: `numbers[offset]` to `numbers[offset + length − 1]`. */
export function allocatedNumbers(length: number): { numbers: Float64Array; offset: number } {
  if (length > BLOCK_LENGTH / 4) return { numbers: new Float64Array(length), offset: 0 };
  if (used + length > BLOCK_LENGTH) {
    block = new Float64Array(BLOCK_LENGTH);
    used = 0;
  }
  const offset = used;
  used += length;
  return { numbers: block, offset };
}
