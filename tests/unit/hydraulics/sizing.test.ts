import { describe, expect, it } from 'vitest';
import { InvalidInputError, NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { sizeCrest } from '@/lib/hydraulics/design/crest-sizing';

// Invented predicates with known thresholds stand in for "every limit passes for every event".
describe('sizeCrest', () => {
  it('finds the highest passing sill level, rounded down to the increment', () => {
    const threshold = 101.2367;
    const tried: number[] = [];
    const result = sizeCrest({ passes: (v) => (tried.push(v), v <= threshold), lower: 99, upper: 104, direction: 'highest-passing' });
    expect(result.value).toBe(101.23);
    expect(result.reason).toContain('101.24 fails');
    expect(tried).toContain(101.23);
    // Bisection over 501 grid values: both ends plus about log₂(500) ≈ 9 more.
    expect(result.evaluations).toBeLessThanOrEqual(2 + Math.ceil(Math.log2(500)));
  });

  it('finds the shortest passing crest length, rounded up to the increment', () => {
    const result = sizeCrest({ passes: (v) => v >= 17.842, lower: 5, upper: 40, increment: 0.05, direction: 'lowest-passing' });
    expect(result.value).toBe(17.85);
  });

  it('says plainly when no value in range can pass', () => {
    const result = sizeCrest({ passes: () => false, lower: 5, upper: 40, increment: 0.1, direction: 'lowest-passing' });
    expect(result.value).toBeNull();
    expect(result.reason).toContain('no value in range passes');
    expect(result.evaluations).toBe(1);
  });

  it('says plainly when every value passes', () => {
    const result = sizeCrest({ passes: () => true, lower: 99, upper: 104, direction: 'highest-passing' });
    expect(result.value).toBe(104);
    expect(result.reason).toContain('every value in range passes');
  });

  it('counts an engine failure (e.g. a weir drowned out) as not passing, and says so', () => {
    const result = sizeCrest({
      passes: (v) => {
        if (v > 102) throw new NoPhysicalSolutionError('weir', 'drowned', 'the weir is drowned out');
        return true;
      },
      lower: 99,
      upper: 104,
      direction: 'highest-passing',
    });
    expect(result.value).toBe(102);
    expect(result.reason).toContain('drowned out');
  });

  it('lets other errors through and rejects bad ranges', () => {
    expect(() => sizeCrest({ passes: () => { throw new TypeError('bug'); }, lower: 0, upper: 1, direction: 'highest-passing' })).toThrow(TypeError);
    expect(() => sizeCrest({ passes: () => true, lower: 2, upper: 1, direction: 'highest-passing' })).toThrow(InvalidInputError);
    expect(() => sizeCrest({ passes: () => true, lower: 1.001, upper: 1.009, increment: 0.01, direction: 'highest-passing' })).toThrow(InvalidInputError);
    expect(() => sizeCrest({ passes: () => true, lower: 0, upper: 1, increment: 0, direction: 'highest-passing' })).toThrow(InvalidInputError);
  });
});
