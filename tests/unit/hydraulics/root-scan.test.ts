import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { provenSignChangeBrackets, signChangeBrackets } from '@/lib/hydraulics/root-scan';

// The plain scan is the reference: a proof may only save evaluations, never change a bracket.
// f(x) = Π (x − rᵢ) over invented roots; on [a, b] it keeps one sign when no root lies in [a, b], and that sign is f's at a.
const roots = fc.uniqueArray(fc.integer({ min: 1, max: 999 }).map((k) => k / 100), { maxLength: 6 });
const gridPoints = fc.uniqueArray(fc.integer({ min: 0, max: 1000 }).map((k) => k / 100), { minLength: 2, maxLength: 80 });

function product(rootsOf: number[]): (x: number) => number {
  return (x) => rootsOf.reduce((value, r) => value * (x - r), 1);
}

describe('provenSignChangeBrackets', () => {
  it('gives exactly the brackets of the plain scan, roots on grid points included, with a sound proof', () => {
    fc.assert(
      fc.property(roots, gridPoints, (rootsOf, points) => {
        const grid = [...points].sort((a, b) => a - b);
        const f = product(rootsOf);
        const proof = (from: number, to: number) => (rootsOf.some((r) => r >= from && r <= to) ? 0 : Math.sign(f(from)));
        expect(provenSignChangeBrackets(f, grid, proof)).toEqual(signChangeBrackets(f, grid));
      }),
      { numRuns: 400 },
    );
  });

  it('with a proof that never holds, is the plain scan', () => {
    const f = product([0.5, 2.25, 7]);
    const grid = Array.from({ length: 41 }, (_, i) => i / 4);
    expect(provenSignChangeBrackets(f, grid, () => 0)).toEqual(signChangeBrackets(f, grid));
  });

  it('evaluates nothing inside a stretch proven to keep its sign', () => {
    let evaluations = 0;
    const f = (x: number) => {
      evaluations++;
      return x - 7.35;
    };
    const grid = Array.from({ length: 101 }, (_, i) => i / 10);
    const brackets = provenSignChangeBrackets(f, grid, (from, to) => (to < 7.35 ? -1 : from > 7.35 ? 1 : 0));
    expect(brackets).toEqual([[grid[73], grid[74]]]);
    expect(evaluations).toBeLessThan(15);
  });
});
