import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { type PrismaticShapeSpec, prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { integratedAreaAndMoment } from './odex-quadrature';

const n = 0.02; // an invented roughness for our own test channels

function relative(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

function invalidField(action: () => unknown): string {
  try {
    action();
  } catch (error) {
    if (error instanceof InvalidInputError) return `${error.field} | ${error.message}`;
    throw error;
  }
  return 'no error';
}

describe('rectangular section', () => {
  // Closed forms for a rectangle, b = 3 m, y = 2 m (Chow 1959, Table 2-1, from memory; plain geometry).
  const state = prismaticSection({ shape: 'rectangular', width: 3 }, n).stateAtDepth(2);

  it('has A = by, P = b + 2y, T = b, R = A/P, D = y, Aȳ = by²/2', () => {
    expect(state.area).toBeCloseTo(6, 12);
    expect(state.wettedPerimeter).toBeCloseTo(7, 12);
    expect(state.topWidth).toBeCloseTo(3, 12);
    expect(state.hydraulicRadius).toBeCloseTo(6 / 7, 12);
    expect(state.hydraulicDepth).toBeCloseTo(2, 12);
    expect(state.firstMoment).toBeCloseTo(6, 12);
  });

  it('has Manning conveyance K = A R^(2/3) / n (Manning 1891; Chow 1959 eq. 5-6, from memory)', () => {
    expect(state.conveyance).toBeCloseTo((6 * (6 / 7) ** (2 / 3)) / n, 10);
    expect(state.energyCoefficient).toBe(1);
    expect(state.overtopped).toBe(false);
  });

  it('is dry at zero depth without NaN', () => {
    const dry = prismaticSection({ shape: 'rectangular', width: 3 }, n).stateAtDepth(0);
    expect(Object.values(dry).every((value) => typeof value === 'boolean' || Number.isFinite(value))).toBe(true);
    expect(dry.area).toBe(0);
    expect(dry.conveyance).toBe(0);
  });
});

describe('trapezoidal and triangular sections', () => {
  it('equal side slopes: b = 4 m, z = 1.5, y = 1.2 m (Chow 1959, Table 2-1, from memory)', () => {
    const s = prismaticSection({ shape: 'trapezoidal', bottomWidth: 4, sideSlope: 1.5 }, n).stateAtDepth(1.2);
    expect(s.area).toBeCloseTo(4 * 1.2 + 1.5 * 1.2 ** 2, 12);
    expect(s.wettedPerimeter).toBeCloseTo(4 + 2 * 1.2 * Math.sqrt(1 + 1.5 ** 2), 12);
    expect(s.topWidth).toBeCloseTo(4 + 2 * 1.5 * 1.2, 12);
    expect(s.hydraulicDepth).toBeCloseTo(s.area / s.topWidth, 12);
  });

  it('unequal side slopes: each side contributes its own triangle (plain geometry)', () => {
    // b = 2 m, zL = 1, zR = 3, y = 1 m: A = 2 + (1 + 3)/2 = 4, P = 2 + √2 + √10, T = 2 + 1 + 3.
    const s = prismaticSection({ shape: 'trapezoidal', bottomWidth: 2, sideSlopeLeft: 1, sideSlopeRight: 3 }, n).stateAtDepth(1);
    expect(s.area).toBeCloseTo(4, 12);
    expect(s.wettedPerimeter).toBeCloseTo(2 + Math.SQRT2 + Math.sqrt(10), 12);
    expect(s.topWidth).toBeCloseTo(6, 12);
  });

  it('a side slope given once applies to both sides, and a side-specific value overrides it', () => {
    const mixed = prismaticSection({ shape: 'trapezoidal', bottomWidth: 2, sideSlope: 1, sideSlopeRight: 3 }, n).stateAtDepth(1);
    expect(mixed.area).toBeCloseTo(4, 12);
  });

  it('triangle: z = 2, y = 1.5 m gives A = zy², P = 2y√(1+z²), T = 2zy (Chow 1959, Table 2-1, from memory)', () => {
    const s = prismaticSection({ shape: 'triangular', sideSlope: 2 }, n).stateAtDepth(1.5);
    expect(s.area).toBeCloseTo(4.5, 12);
    expect(s.wettedPerimeter).toBeCloseTo(3 * Math.sqrt(5), 12);
    expect(s.topWidth).toBeCloseTo(6, 12);
    expect(s.hydraulicDepth).toBeCloseTo(0.75, 12);
  });

  it('first moment agrees with odex integration of ∫(y − η)T(η)dη (independent ODE integrator)', () => {
    const cases: [PrismaticShapeSpec, (eta: number) => number][] = [
      [{ shape: 'trapezoidal', bottomWidth: 2, sideSlopeLeft: 1, sideSlopeRight: 3 }, (eta) => 2 + 4 * eta],
      [{ shape: 'triangular', sideSlopeLeft: 0, sideSlopeRight: 2.5 }, (eta) => 2.5 * eta],
      [{ shape: 'rectangular', width: 7 }, () => 7],
    ];
    for (const [spec, topWidth] of cases) {
      const state = prismaticSection(spec, n).stateAtDepth(1.7);
      const integrated = integratedAreaAndMoment(topWidth, 1.7);
      expect(relative(state.area, integrated.area)).toBeLessThan(1e-9);
      expect(relative(state.firstMoment, integrated.firstMoment)).toBeLessThan(1e-9);
    }
  });
});

describe('circular section (part-full)', () => {
  const diameter = 1.2;
  const pipe = prismaticSection({ shape: 'circular', diameter }, 0.013);

  it('full bore: A = πD²/4, R = D/4, T = 0 and not yet overtopped (plain geometry)', () => {
    const full = pipe.stateAtDepth(diameter);
    expect(full.area).toBeCloseTo((Math.PI * diameter ** 2) / 4, 12);
    expect(full.hydraulicRadius).toBeCloseTo(diameter / 4, 12);
    expect(full.topWidth).toBe(0);
    expect(full.overtopped).toBe(false);
    expect(full.firstMoment).toBeCloseTo(((Math.PI * diameter ** 2) / 4) * (diameter / 2), 12);
    expect(pipe.maxDepth).toBe(diameter);
  });

  it('half full: A = πD²/8, R = D/4, T = D, Aȳ = D³/12 (semicircle centroid 4r/3π, standard mensuration)', () => {
    const half = pipe.stateAtDepth(diameter / 2);
    expect(half.area).toBeCloseTo((Math.PI * diameter ** 2) / 8, 12);
    expect(half.hydraulicRadius).toBeCloseTo(diameter / 4, 12);
    expect(half.topWidth).toBeCloseTo(diameter, 12);
    expect(half.firstMoment).toBeCloseTo(diameter ** 3 / 12, 12);
  });

  it('a quarter of the diameter deep subtends θ = 2π/3: A = D²(θ − sin θ)/8 (Chow 1959, Table 2-1, from memory)', () => {
    const theta = (2 * Math.PI) / 3;
    const state = pipe.stateAtDepth(diameter / 4);
    expect(state.area).toBeCloseTo((diameter ** 2 * (theta - Math.sin(theta))) / 8, 12);
    expect(state.wettedPerimeter).toBeCloseTo((theta * diameter) / 2, 12);
    expect(state.topWidth).toBeCloseTo(diameter * Math.sin(theta / 2), 12);
  });

  it('area and first moment agree with odex integration of the chord width 2√(η(D − η))', () => {
    for (const depth of [0.1, 0.45, 0.6, 0.9, 1.15]) {
      const state = pipe.stateAtDepth(depth);
      const integrated = integratedAreaAndMoment((eta) => 2 * Math.sqrt(Math.max(0, eta * (diameter - eta))), depth);
      expect(relative(state.area, integrated.area)).toBeLessThan(1e-7);
      expect(relative(state.firstMoment, integrated.firstMoment)).toBeLessThan(1e-7);
    }
  });

  it('is overtopped only above the soffit, holding the full-bore geometry there', () => {
    expect(pipe.stateAtDepth(diameter * 0.999999).overtopped).toBe(false);
    const surcharged = pipe.stateAtDepth(diameter * 1.5);
    expect(surcharged.overtopped).toBe(true);
    expect(surcharged.area).toBeCloseTo((Math.PI * diameter ** 2) / 4, 12);
    expect(Number.isNaN(surcharged.hydraulicDepth)).toBe(false);
  });
});

describe('energy coefficient and invalid inputs', () => {
  it('carries the energy coefficient given by the user', () => {
    expect(prismaticSection({ shape: 'rectangular', width: 3 }, n, { energyCoefficient: 1.15 }).stateAtDepth(1).energyCoefficient).toBe(1.15);
    expect(invalidField(() => prismaticSection({ shape: 'rectangular', width: 3 }, n, { energyCoefficient: 0.9 }))).toBe(
      'reach.energyCoefficient | reach.energyCoefficient: must be 1 or more',
    );
  });

  it('names the offending field with the default and a custom prefix', () => {
    expect(invalidField(() => prismaticSection({ shape: 'trapezoidal', bottomWidth: 0, sideSlope: 2 }, n))).toBe(
      'reach.section.bottomWidth | reach.section.bottomWidth: must be greater than 0',
    );
    expect(invalidField(() => prismaticSection({ shape: 'rectangular', width: -2 }, n, { field: 'reaches[1].section' }))).toBe(
      'reaches[1].section.width | reaches[1].section.width: must be greater than 0',
    );
    expect(invalidField(() => prismaticSection({ shape: 'rectangular', width: 2 }, 0))).toBe('reach.manningN | reach.manningN: must be greater than 0');
    expect(invalidField(() => prismaticSection({ shape: 'rectangular', width: 2 }, -0.1, { nField: 'reaches[1].manningN' }))).toMatch(/^reaches\[1\]\.manningN \|/);
    expect(invalidField(() => prismaticSection({ shape: 'circular', diameter: Number.NaN }, n))).toBe(
      'reach.section.diameter | reach.section.diameter: must be a finite number',
    );
  });

  it('checks side slopes and the shape name', () => {
    expect(invalidField(() => prismaticSection({ shape: 'trapezoidal', bottomWidth: 2 }, n))).toMatch(/^reach\.section\.sideSlope \|/);
    expect(invalidField(() => prismaticSection({ shape: 'trapezoidal', bottomWidth: 2, sideSlopeLeft: -1, sideSlopeRight: 1 }, n))).toMatch(
      /^reach\.section\.sideSlopeLeft \|/,
    );
    expect(invalidField(() => prismaticSection({ shape: 'triangular', sideSlope: 0 }, n))).toMatch(/^reach\.section\.sideSlope \|/);
    expect(invalidField(() => prismaticSection({ shape: 'oval' } as unknown as PrismaticShapeSpec, n))).toMatch(/^reach\.section\.shape \|/);
  });

  it('rejects a negative or non-finite depth', () => {
    const section = prismaticSection({ shape: 'rectangular', width: 2 }, n);
    expect(invalidField(() => section.stateAtDepth(-0.1))).toBe('depth | depth: must be 0 or more');
    expect(invalidField(() => section.stateAtDepth(Number.POSITIVE_INFINITY))).toBe('depth | depth: must be a finite number');
  });
});
