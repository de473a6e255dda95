import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { flowVelocity, frictionSlope, froudeNumber, specificEnergy, specificForce } from '@/lib/hydraulics/flow-properties';
import { normalDepth } from '@/lib/hydraulics/normal-depth';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { GRAVITY } from '@/lib/hydraulics/units';

// Invented channels; expected values from the textbook definitions written out by hand.
const rectangle = prismaticSection({ shape: 'rectangular', width: 2.5 }, 0.02);
const trapezoid = prismaticSection({ shape: 'trapezoidal', bottomWidth: 2, sideSlope: 2 }, 0.025);

function invalidField(action: () => unknown): string {
  try {
    action();
  } catch (error) {
    if (error instanceof InvalidInputError) return error.field;
    throw error;
  }
  return 'no error';
}

describe('flow properties', () => {
  it('velocity is Q/A (continuity)', () => {
    expect(flowVelocity(rectangle, 0.8, 4)).toBeCloseTo(4 / 2, 12);
  });

  it('Froude number uses the hydraulic depth A/T, not the flow depth (Chow 1959 §3-3, from memory)', () => {
    // b = 2, z = 2, y = 1: A = 4 m², T = 6 m, D = 2/3 m.
    const v = 10 / 4;
    const fr = froudeNumber(trapezoid, 1, 10);
    expect(fr).toBeCloseTo(v / Math.sqrt((GRAVITY * 4) / 6), 12);
    expect(Math.abs(fr - v / Math.sqrt(GRAVITY * 1))).toBeGreaterThan(0.1);
  });

  it('Froude number carries α: Fr² = αQ²T/(gA³)', () => {
    const withAlpha = prismaticSection({ shape: 'rectangular', width: 2.5 }, 0.02, { energyCoefficient: 1.3 });
    expect(froudeNumber(withAlpha, 0.8, 4) ** 2).toBeCloseTo((1.3 * 16 * 2.5) / (GRAVITY * 2 ** 3), 12);
  });

  it('specific energy is y + αV²/2g (Chow 1959 §3-2, from memory)', () => {
    expect(specificEnergy(rectangle, 0.8, 4)).toBeCloseTo(0.8 + 4 / (2 * GRAVITY), 12);
    expect(specificEnergy(rectangle, 0.8, 0)).toBe(0.8);
  });

  it('specific force is Q²/(gA) + by²/2 for a rectangle (Chow 1959 §3-7, from memory)', () => {
    expect(specificForce(rectangle, 0.8, 4)).toBeCloseTo(16 / (GRAVITY * 2) + (2.5 * 0.64) / 2, 12);
  });

  it('friction slope is Manning solved for S: (nV / R^(2/3))², and equals the bed slope at normal depth', () => {
    const r = 2 / (2.5 + 1.6);
    expect(frictionSlope(rectangle, 0.8, 4)).toBeCloseTo(((0.02 * 2) / r ** (2 / 3)) ** 2, 14);
    const yn = normalDepth(trapezoid, 12, 0.0007);
    expect(frictionSlope(trapezoid, yn, 12)).toBeCloseTo(0.0007, 14);
  });

  it('a brim-full pipe has no free surface width, so Fr = 0 rather than NaN', () => {
    const pipe = prismaticSection({ shape: 'circular', diameter: 1 }, 0.013);
    expect(froudeNumber(pipe, 1, 1)).toBe(0);
  });

  it('rejects a zero depth and a negative discharge, naming the field', () => {
    expect(invalidField(() => flowVelocity(rectangle, 0, 4))).toBe('depth');
    expect(invalidField(() => froudeNumber(rectangle, 1, -4))).toBe('discharge');
    expect(invalidField(() => specificEnergy(rectangle, Number.NaN, 4, { depthField: 'control.depth' }))).toBe('control.depth');
  });
});
