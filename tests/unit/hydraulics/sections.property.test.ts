import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { criticalDepth, criticalDepths } from '@/lib/hydraulics/critical-depth';
import { EngineError } from '@/lib/hydraulics/errors';
import { frictionSlope, froudeNumber, specificEnergy, specificForce } from '@/lib/hydraulics/flow-properties';
import { normalDepth } from '@/lib/hydraulics/normal-depth';
import { CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO } from '@/lib/hydraulics/prismatic/circle-geometry';
import { type PrismaticShapeSpec, prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import type { FlowSection } from '@/lib/hydraulics/section';
import { sequentDepth } from '@/lib/hydraulics/sequent-depth';
import { surveyedSection } from '@/lib/hydraulics/surveyed-section';
import { GRAVITY } from '@/lib/hydraulics/units';

const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const roughness = positive(0.008, 0.2);
const sideSlope = positive(0, 10);

const openSpec: fc.Arbitrary<PrismaticShapeSpec> = fc.oneof(
  positive(0.1, 200).map((width) => ({ shape: 'rectangular' as const, width })),
  fc.record({ bottomWidth: positive(0.1, 200), sideSlopeLeft: sideSlope, sideSlopeRight: sideSlope }).map((s) => ({ shape: 'trapezoidal' as const, ...s })),
  fc.record({ sideSlopeLeft: positive(0.05, 10), sideSlopeRight: sideSlope }).map((s) => ({ shape: 'triangular' as const, ...s })),
);
const anySpec: fc.Arbitrary<PrismaticShapeSpec> = fc.oneof(openSpec, positive(0.1, 10).map((diameter) => ({ shape: 'circular' as const, diameter })));

function relative(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

/** Random surveys that hold water: ends high, interior points lower than both. */
const surveySpec = fc
  .record({
    widths: fc.array(positive(0, 30), { minLength: 2, maxLength: 9 }),
    lows: fc.array(positive(0, 4), { minLength: 2, maxLength: 9 }),
    leftEnd: positive(4.5, 8),
    rightEnd: positive(4.5, 8),
    n: fc.record({ left: roughness, channel: roughness, right: roughness }),
    banks: fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })),
  })
  .filter(({ widths }) => widths.slice(1).reduce((s, w) => s + w, 0) > 0.5)
  .map(({ widths, lows, leftEnd, rightEnd, n, banks }) => {
    const interior = lows.slice(0, widths.length - 1);
    let station = 0;
    const points: [number, number][] = [[0, leftEnd]];
    interior.forEach((elevation, i) => {
      station += widths[i];
      points.push([station, elevation]);
    });
    station += widths[widths.length - 1] + 0.5;
    points.push([station, rightEnd]);
    const [a, b] = [Math.min(...banks), Math.max(...banks)];
    const bankStations: [number, number] = [a * station, Math.max(b * station, a * station + 1e-3)];
    return bankStations[1] <= station ? { points, manningN: n, bankStations } : { points, manningN: n.channel };
  });

function capacity(section: FlowSection, depth: number, slope: number): number {
  return section.stateAtDepth(depth).conveyance * Math.sqrt(slope);
}

describe('prismatic sections (property-based)', () => {
  it('area and conveyance increase with depth in open shapes', () => {
    fc.assert(
      fc.property(openSpec, roughness, positive(1e-3, 50), positive(1e-3, 50), (spec, n, a, b) => {
        fc.pre(Math.abs(a - b) > 1e-9 * Math.max(a, b));
        const section = prismaticSection(spec, n);
        const [low, high] = [section.stateAtDepth(Math.min(a, b)), section.stateAtDepth(Math.max(a, b))];
        expect(high.area).toBeGreaterThan(low.area);
        expect(high.conveyance).toBeGreaterThan(low.conveyance);
        expect(high.firstMoment).toBeGreaterThan(low.firstMoment);
      }),
    );
  });

  it('normal depth is a root of Q = K√S for every shape, and recovers the depth that set Q', () => {
    fc.assert(
      fc.property(anySpec, roughness, positive(1e-3, 50), positive(1e-5, 0.1), positive(0.001, 0.999), (spec, n, openDepth, slope, fraction) => {
        const section = prismaticSection(spec, n);
        // In a circle only depths below the conveyance peak are recoverable (the lower root is returned).
        const depthSetting = spec.shape === 'circular' ? fraction * CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO * spec.diameter : openDepth;
        const discharge = capacity(section, depthSetting, slope);
        const depth = normalDepth(section, discharge, slope);
        expect(relative(capacity(section, depth, slope), discharge)).toBeLessThan(1e-6);
        expect(relative(frictionSlope(section, depth, discharge), slope)).toBeLessThan(2e-6);
        expect(relative(depth, depthSetting)).toBeLessThan(1e-6);
      }),
    );
  });

  it('critical depth gives Fr = 1, recovers the depth that set Q, and has the least specific energy nearby', () => {
    fc.assert(
      fc.property(anySpec, roughness, positive(1e-3, 50), positive(0.001, 0.99), (spec, n, openDepth, fraction) => {
        const section = prismaticSection(spec, n);
        const depthSetting = spec.shape === 'circular' ? fraction * spec.diameter : openDepth;
        const state = section.stateAtDepth(depthSetting);
        const discharge = Math.sqrt((GRAVITY * state.area ** 3) / state.topWidth); // Fr = 1 at depthSetting
        const yc = criticalDepth(section, discharge);
        expect(Math.abs(froudeNumber(section, yc, discharge) - 1)).toBeLessThan(1e-6);
        expect(relative(yc, depthSetting)).toBeLessThan(1e-6);
        const e = specificEnergy(section, yc, discharge);
        expect(specificEnergy(section, yc * 1.01, discharge)).toBeGreaterThan(e);
        expect(specificEnergy(section, yc * 0.99, discharge)).toBeGreaterThan(e);
      }),
    );
  });

  it('sequent depths pair up: equal specific force, and the sequent of the sequent is the start', () => {
    fc.assert(
      fc.property(openSpec, roughness, positive(1e-2, 1e3), positive(0.05, 0.95), (spec, n, discharge, fraction) => {
        const section = prismaticSection(spec, n);
        const y1 = fraction * criticalDepth(section, discharge);
        const y2 = sequentDepth(section, y1, discharge);
        expect(y2).toBeGreaterThan(y1);
        expect(relative(specificForce(section, y2, discharge), specificForce(section, y1, discharge))).toBeLessThan(1e-9);
        expect(relative(sequentDepth(section, y2, discharge), y1)).toBeLessThan(1e-6);
      }),
    );
  });

  it('a trapezoid given equal left and right slopes is the equal-slope trapezoid', () => {
    fc.assert(
      fc.property(positive(0.1, 200), sideSlope, roughness, positive(0, 30), (bottomWidth, z, n, depth) => {
        const equal = prismaticSection({ shape: 'trapezoidal', bottomWidth, sideSlope: z }, n).stateAtDepth(depth);
        const split = prismaticSection({ shape: 'trapezoidal', bottomWidth, sideSlopeLeft: z, sideSlopeRight: z }, n).stateAtDepth(depth);
        expect(split).toEqual(equal);
      }),
    );
  });
});

describe('surveyed sections (property-based)', () => {
  it('a surveyed trapezoid, rectangle or triangle reproduces the prismatic formulas', () => {
    fc.assert(
      fc.property(positive(0, 50), sideSlope, sideSlope, positive(0.5, 10), positive(-50, 500), roughness, positive(0.01, 0.99), (b, zL, zR, height, datum, n, share) => {
        fc.pre(b + zL + zR > 0.05);
        const points: [number, number][] = [[0, datum + height], [zL * height, datum], [zL * height + b, datum], [zL * height + b + zR * height, datum + height]];
        const surveyed = surveyedSection({ points, manningN: n });
        const prismatic = prismaticSection({ shape: 'trapezoidal', bottomWidth: Math.max(b, 1e-300), sideSlopeLeft: zL, sideSlopeRight: zR }, n);
        const depth = share * height;
        const actual = surveyed.stateAtDepth(depth);
        const expected = prismatic.stateAtDepth(depth);
        for (const key of ['area', 'wettedPerimeter', 'topWidth', 'conveyance', 'firstMoment'] as const) {
          expect(relative(actual[key], expected[key])).toBeLessThan(1e-9);
        }
      }),
    );
  });

  it('normal and critical depths are roots of their own equations in random compound surveys', () => {
    fc.assert(
      fc.property(surveySpec, positive(1e-5, 0.05), positive(0.01, 0.95), (spec, slope, fraction) => {
        const section = surveyedSection(spec);
        const top = capacity(section, section.maxDepth, slope);
        const discharge = fraction * top;
        fc.pre(discharge > 1e-9);
        const yn = normalDepth(section, discharge, slope);
        expect(relative(capacity(section, yn, slope), discharge)).toBeLessThan(1e-6);
        let roots: number[] = [];
        try {
          roots = criticalDepths(section, discharge);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          expect((error as EngineError).code).toBe('section-overtopped');
        }
        for (const y of roots) expect(Math.abs(froudeNumber(section, y, discharge) - 1)).toBeLessThan(1e-6);
      }),
    );
  });
});

describe('fuzzing: invalid or extreme inputs throw EngineError, never NaN', () => {
  const anyNumber = fc.oneof(fc.double(), fc.constantFrom(0, -1, Number.NaN, Number.POSITIVE_INFINITY, 1e-300, 1e300));

  function finiteOrEngineError(action: () => number | number[]): void {
    try {
      const result = action();
      for (const value of Array.isArray(result) ? result : [result]) expect(Number.isFinite(value)).toBe(true);
    } catch (error) {
      expect(error).toBeInstanceOf(EngineError);
    }
  }

  it('prismatic sections and every solver', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('rectangular', 'trapezoidal', 'triangular', 'circular', 'oval'),
        fc.record({ width: anyNumber, bottomWidth: anyNumber, sideSlope: anyNumber, sideSlopeLeft: anyNumber, diameter: anyNumber }),
        anyNumber,
        anyNumber,
        anyNumber,
        anyNumber,
        (shape, dimensions, n, depth, discharge, slope) => {
          let section: FlowSection;
          try {
            section = prismaticSection({ shape, ...dimensions } as PrismaticShapeSpec, n);
          } catch (error) {
            expect(error).toBeInstanceOf(EngineError);
            return;
          }
          finiteOrEngineError(() => Object.values(section.stateAtDepth(depth)).filter((v): v is number => typeof v === 'number' && v !== Infinity));
          finiteOrEngineError(() => normalDepth(section, discharge, slope));
          finiteOrEngineError(() => criticalDepth(section, discharge));
          finiteOrEngineError(() => sequentDepth(section, depth, discharge));
          finiteOrEngineError(() => froudeNumber(section, depth, discharge));
        },
      ),
    );
  });

  it('surveyed sections from random point lists', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(anyNumber, anyNumber), { maxLength: 8 }), anyNumber, anyNumber, anyNumber, (points, n, discharge, slope) => {
        let section: FlowSection;
        try {
          section = surveyedSection({ points, manningN: n });
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          return;
        }
        finiteOrEngineError(() => normalDepth(section, discharge, slope));
        finiteOrEngineError(() => criticalDepths(section, discharge));
        finiteOrEngineError(() => sequentDepth(section, section.maxDepth / 3, discharge));
      }),
    );
  });
});
