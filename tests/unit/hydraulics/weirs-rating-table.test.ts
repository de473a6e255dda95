import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { weirDischarge, weirHead, type WeirSpec } from '@/lib/hydraulics/weirs';

const channel = prismaticSection({ shape: 'trapezoidal', bottomWidth: 10, sideSlope: 2 }, 0.03);
// An invented rating sampled from Q = 15 h^1.5 (our own numbers).
const levels = [0, 0.25, 0.5, 1, 1.5, 2, 3];
const table: [number, number][] = levels.map((h) => [h, 15 * h ** 1.5]);
const spec: WeirSpec = { kind: 'rating-table', crestLength: 10, sillHeight: 1, ratingTable: table };

describe('user rating table', () => {
  it('returns the tabulated level at each tabulated discharge', () => {
    for (const [level, discharge] of table.slice(1)) expect(weirHead(spec, discharge, channel).head).toBeCloseTo(level, 10);
  });

  it('interpolates a smooth rating closely (within 2 % of the head of Q = 15 h^1.5 between points)', () => {
    for (const q of [2, 7, 12, 25, 40, 60]) {
      const exact = (q / 15) ** (2 / 3);
      expect(Math.abs(weirHead(spec, q, channel).head - exact) / exact).toBeLessThan(0.02);
    }
  });

  it('is monotone: a higher level never gives less discharge', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0, max: 3, noNaN: true }), (a, b) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        return weirDischarge(spec, lo, channel) <= weirDischarge(spec, hi, channel);
      }),
    );
  });

  it('a discharge beyond the table is an error naming control.ratingTable', () => {
    expect(() => weirHead(spec, 100, channel)).toThrow(InvalidInputError);
    expect(() => weirHead(spec, 100, channel)).toThrow(/^control\.ratingTable/);
  });

  it('a table whose levels do not increase names the offending row', () => {
    const bad: WeirSpec = { ...spec, ratingTable: [[0, 0], [1, 5], [0.8, 9]] };
    expect(() => weirHead(bad, 3, channel)).toThrow(/control\.ratingTable\[2\]/);
  });

  it('does not add an approach-velocity head to a measured rating', () => {
    const plain = weirHead({ ...spec, approachVelocity: false }, 20, channel);
    const asked = weirHead({ ...spec, approachVelocity: true }, 20, channel);
    expect(asked.head).toBe(plain.head);
  });
});
