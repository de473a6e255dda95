import { describe, expect, it } from 'vitest';
import { criticalDepth } from '@/lib/hydraulics/critical-depth';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { normalDepth } from '@/lib/hydraulics/normal-depth';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { classifySlope } from '@/lib/hydraulics/slope-class';
import { CUBIC_METRES_PER_CUBIC_FOOT, METRES_PER_FOOT } from '@/lib/hydraulics/units';

describe('classifySlope (Chow 1959 §9-1, profile classification, from memory)', () => {
  it('the channel of Chow 1959 Example 10-1 is mild: yn ≈ 3.36 ft above yc ≈ 2.15 ft (from memory)', () => {
    const section = prismaticSection({ shape: 'trapezoidal', bottomWidth: 20 * METRES_PER_FOOT, sideSlope: 2 }, 0.025);
    const q = 400 * CUBIC_METRES_PER_CUBIC_FOOT;
    expect(classifySlope(0.0016, normalDepth(section, q, 0.0016), criticalDepth(section, q))).toBe('mild');
    // The same channel made steep enough puts normal depth below critical.
    expect(classifySlope(0.05, normalDepth(section, q, 0.05), criticalDepth(section, q))).toBe('steep');
  });

  it('counts yn within the relative tolerance of yc as critical', () => {
    expect(classifySlope(0.01, 1.0005, 1)).toBe('critical');
    expect(classifySlope(0.01, 1.0005, 1, { relativeTolerance: 1e-4 })).toBe('mild');
    expect(classifySlope(0.01, 0.998, 1)).toBe('steep');
  });

  it('names horizontal and adverse beds without needing a normal depth', () => {
    expect(classifySlope(0, null, 1)).toBe('horizontal');
    expect(classifySlope(-0.002, null, 1)).toBe('adverse');
  });

  it('needs a normal depth on a falling bed and rejects bad numbers', () => {
    expect(() => classifySlope(0.001, null, 1)).toThrow(InvalidInputError);
    expect(() => classifySlope(Number.NaN, 1, 1)).toThrow(InvalidInputError);
    expect(() => classifySlope(0.001, 1, 0)).toThrow(InvalidInputError);
  });
});
