import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { groundLevels } from '@/lib/hydraulics/ground-levels';

// Reference: the distinct elevations sorted by the language's own sort, and each point's index found by indexOf.
function reference(elevations: number[]): { levels: number[]; pointLevels: number[] } {
  const levels = [...new Set(elevations)].sort((a, b) => a - b);
  return { levels, pointLevels: elevations.map((z) => levels.indexOf(z)) };
}

const elevations = fc.array(fc.integer({ min: 0, max: 30 }).map((k) => 100 + k / 10), { minLength: 3, maxLength: 60 });

function levelsOf(z: number[], order?: number[]): { levels: number[]; pointLevels: number[] } {
  const { levels, pointLevels } = groundLevels(z, order);
  return { levels, pointLevels: Array.from(pointLevels) };
}

describe('groundLevels', () => {
  it('gives the distinct elevations ascending and every point’s level, without an order', () => {
    fc.assert(
      fc.property(elevations, (z) => {
        expect(levelsOf(z)).toEqual(reference(z));
      }),
      { numRuns: 300 },
    );
  });

  it('gives the same from any starting order, near or far off, and leaves the order sorted by elevation', () => {
    fc.assert(
      fc.property(elevations, fc.integer(), (z, seed) => {
        const order = z.map((_, i) => i);
        // A random permutation (far off) or the sorted one (what a neighbouring section leaves behind).
        if (seed % 2 === 0) order.sort((a, b) => ((a * 7919 + seed) % 101) - ((b * 7919 + seed) % 101));
        else order.sort((a, b) => z[a] - z[b]);
        expect(levelsOf(z, order)).toEqual(reference(z));
        expect([...order].sort((a, b) => a - b)).toEqual(z.map((_, i) => i));
        for (let i = 1; i < order.length; i++) expect(z[order[i - 1]]).toBeLessThanOrEqual(z[order[i]]);
      }),
      { numRuns: 300 },
    );
  });
});
