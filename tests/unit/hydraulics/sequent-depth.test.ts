import { describe, expect, it } from 'vitest';
import { criticalDepth } from '@/lib/hydraulics/critical-depth';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { froudeNumber, specificForce } from '@/lib/hydraulics/flow-properties';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { sequentDepth } from '@/lib/hydraulics/sequent-depth';
import { surveyedSection } from '@/lib/hydraulics/surveyed-section';
import { GRAVITY } from '@/lib/hydraulics/units';
import { caught } from './test-helpers';

function belangerRatio(froude: number): number {
  // y₂/y₁ = ½(√(1 + 8Fr₁²) − 1) (Bélanger 1828; Chow 1959 eq. 3-20, from memory)
  return 0.5 * (Math.sqrt(1 + 8 * froude * froude) - 1);
}


describe('sequent depth, rectangle (Bélanger)', () => {
  const width = 3;
  const discharge = 6;
  const channel = prismaticSection({ shape: 'rectangular', width }, 0.015);

  it('reproduces Bélanger’s equation from the supercritical side', () => {
    for (const y1 of [0.05, 0.2, 0.4, 0.7]) {
      const y2 = sequentDepth(channel, y1, discharge);
      expect(y2 / y1).toBeCloseTo(belangerRatio(froudeNumber(channel, y1, discharge)), 9);
    }
  });

  it('reproduces it from the subcritical side as well (the equation is symmetric)', () => {
    for (const y2 of [0.8, 1.5, 4]) {
      const y1 = sequentDepth(channel, y2, discharge);
      expect(y1 / y2).toBeCloseTo(belangerRatio(froudeNumber(channel, y2, discharge)), 9);
    }
  });

  it('returns critical depth for critical depth (α = 1: least specific force at Fr = 1)', () => {
    const yc = criticalDepth(channel, discharge);
    expect(sequentDepth(channel, yc, discharge)).toBeCloseTo(yc, 9);
    expect(yc).toBeCloseTo(((discharge / width) ** 2 / GRAVITY) ** (1 / 3), 12);
  });

  it('gives Bélanger for a surveyed rectangle too', () => {
    const surveyed = surveyedSection({ points: [[0, 5], [0, 0], [3, 0], [3, 5]], manningN: 0.015 });
    const y2 = sequentDepth(surveyed, 0.2, discharge);
    expect(y2 / 0.2).toBeCloseTo(belangerRatio(froudeNumber(channel, 0.2, discharge)), 9);
  });
});

describe('sequent depth, other shapes', () => {
  it('trapezoid: equal specific force by the closed form Q²/(gA) + by²/2 + zy³/3 (by integration; Chow 1959 §3-7, from memory)', () => {
    const b = 4;
    const z = 1.5;
    const discharge = 30;
    const section = prismaticSection({ shape: 'trapezoidal', bottomWidth: b, sideSlope: z }, 0.02);
    const handForce = (y: number) => (discharge * discharge) / (GRAVITY * (b * y + z * y * y)) + (b * y * y) / 2 + (z * y ** 3) / 3;
    const y1 = 0.35;
    const y2 = sequentDepth(section, y1, discharge);
    const yc = criticalDepth(section, discharge);
    expect(y1).toBeLessThan(yc);
    expect(y2).toBeGreaterThan(yc);
    expect(Math.abs(handForce(y2) - handForce(y1)) / handForce(y1)).toBeLessThan(1e-12);
    expect(sequentDepth(section, y2, discharge)).toBeCloseTo(y1, 10);
  });

  it('circle: balances the specific force part-full, and says when the jump would fill the pipe', () => {
    const pipe = prismaticSection({ shape: 'circular', diameter: 2 }, 0.013);
    const y2 = sequentDepth(pipe, 0.4, 2);
    expect(y2).toBeLessThan(2);
    expect(Math.abs(specificForce(pipe, y2, 2) - specificForce(pipe, 0.4, 2)) / specificForce(pipe, 0.4, 2)).toBeLessThan(1e-12);
    const error = caught(() => sequentDepth(pipe, 0.1, 4));
    expect(error.code).toBe('section-overtopped');
  });

  it('compound survey: the jump from a shallow slot depth balances the specific force', () => {
    // Invented: a 4 m slot, 2 m deep, with flat overbanks.
    const slot = surveyedSection({ points: [[0, 4], [0, 2], [60, 2], [60, 0], [64, 0], [64, 2], [120, 2], [120, 4]], manningN: 0.03 });
    for (const [y1, discharge] of [[0.3, 8], [0.6, 30]]) {
      const y2 = sequentDepth(slot, y1, discharge);
      expect(y2).toBeGreaterThan(y1);
      expect(Math.abs(specificForce(slot, y2, discharge) - specificForce(slot, y1, discharge)) / specificForce(slot, y1, discharge)).toBeLessThan(1e-10);
    }
  });

  it('uses α = 1 in the momentum balance even when the energy coefficient is larger', () => {
    const plain = prismaticSection({ shape: 'rectangular', width: 3 }, 0.015);
    const withAlpha = prismaticSection({ shape: 'rectangular', width: 3 }, 0.015, { energyCoefficient: 1.2 });
    expect(sequentDepth(withAlpha, 0.3, 6)).toBeCloseTo(sequentDepth(plain, 0.3, 6), 12);
  });

  it('rejects a non-positive depth or discharge', () => {
    const channel = prismaticSection({ shape: 'rectangular', width: 3 }, 0.015);
    expect(caught(() => sequentDepth(channel, 0, 6))).toBeInstanceOf(InvalidInputError);
    expect(caught(() => sequentDepth(channel, 0.3, 0)).field).toBe('discharge');
    expect(caught(() => sequentDepth(channel, -1, 6, { depthField: 'jump.upstreamDepth' })).field).toBe('jump.upstreamDepth');
  });
});
