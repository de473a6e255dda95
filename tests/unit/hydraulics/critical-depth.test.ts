import { describe, expect, it } from 'vitest';
import { criticalDepth, criticalDepths } from '@/lib/hydraulics/critical-depth';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { froudeNumber, specificEnergy } from '@/lib/hydraulics/flow-properties';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { surveyedSection } from '@/lib/hydraulics/surveyed-section';
import { CUBIC_METRES_PER_CUBIC_FOOT, GRAVITY, METRES_PER_FOOT } from '@/lib/hydraulics/units';
import { caught } from './test-helpers';


describe('critical depth, prismatic channels', () => {
  it('Chow 1959, channel of Example 10-1 (b = 20 ft, z = 2, Q = 400 ft³/s, α = 1): yc ≈ 2.15 ft (from memory)', () => {
    const section = prismaticSection({ shape: 'trapezoidal', bottomWidth: 20 * METRES_PER_FOOT, sideSlope: 2 }, 0.025);
    const depth = criticalDepth(section, 400 * CUBIC_METRES_PER_CUBIC_FOOT);
    expect(Math.abs(depth / METRES_PER_FOOT - 2.15) / 2.15).toBeLessThan(0.005);
  });

  it('rectangle: yc = (αq²/g)^(1/3) (Chow 1959, §4-3, from memory; analytic)', () => {
    for (const [width, discharge, alpha] of [[4, 12, 1], [0.5, 0.01, 1], [30, 900, 1.1]]) {
      const section = prismaticSection({ shape: 'rectangular', width }, 0.015, { energyCoefficient: alpha });
      const q = discharge / width;
      expect(criticalDepth(section, discharge)).toBeCloseTo(((alpha * q * q) / GRAVITY) ** (1 / 3), 12);
    }
  });

  it('rectangle: specific energy at critical depth is 1.5 yc (analytic)', () => {
    const section = prismaticSection({ shape: 'rectangular', width: 4 }, 0.015);
    const yc = criticalDepth(section, 12);
    expect(specificEnergy(section, yc, 12)).toBeCloseTo(1.5 * yc, 12);
  });

  it('triangle: yc = (2Q²/(g z²))^(1/5) (analytic, from A = zy², T = 2zy)', () => {
    const section = prismaticSection({ shape: 'triangular', sideSlope: 1.5 }, 0.015);
    expect(criticalDepth(section, 3)).toBeCloseTo(((2 * 9) / (GRAVITY * 1.5 ** 2)) ** 0.2, 12);
  });

  it('is the depth of least specific energy (α = 1), checked by a fine independent scan', () => {
    const section = prismaticSection({ shape: 'trapezoidal', bottomWidth: 3, sideSlopeLeft: 1, sideSlopeRight: 2.5 }, 0.03);
    const yc = criticalDepth(section, 25);
    let lowest = Infinity;
    let argument = 0;
    for (let i = 1; i <= 50_000; i++) {
      const y = i * 8e-5;
      const energy = specificEnergy(section, y, 25);
      if (energy < lowest) [lowest, argument] = [energy, y];
    }
    expect(Math.abs(argument - yc)).toBeLessThan(1e-4);
  });

  it('part-full circle: Fr = 1 at the critical depth, which stays below the soffit even for large flows', () => {
    const pipe = prismaticSection({ shape: 'circular', diameter: 1 }, 0.013);
    for (const discharge of [0.01, 0.5, 3, 50]) {
      const yc = criticalDepth(pipe, discharge);
      expect(yc).toBeLessThan(1);
      expect(Math.abs(froudeNumber(pipe, yc, discharge) - 1)).toBeLessThan(1e-9);
    }
  });

  it('rejects a zero or negative discharge', () => {
    const section = prismaticSection({ shape: 'rectangular', width: 4 }, 0.015);
    expect(caught(() => criticalDepth(section, 0))).toBeInstanceOf(InvalidInputError);
    expect(caught(() => criticalDepth(section, -3, { dischargeField: 'flows[1]' })).field).toBe('flows[1]');
  });
});

describe('critical depth, compound surveyed sections', () => {
  // Invented: a 6 m wide, 2 m deep main channel with sloping sides between wide flat overbanks.
  const compound = surveyedSection({
    points: [[0, 5], [10, 2], [20, 2], [22, 0], [28, 0], [30, 2], [45, 2], [50, 5]],
    manningN: { left: 0.05, channel: 0.03, right: 0.06 },
    bankStations: [20, 30],
  });

  it('finds every depth where Fr = 1, each a true crossing, matching a fine independent scan', () => {
    const discharge = 50;
    const roots = criticalDepths(compound, discharge);
    let crossings = 0;
    let previous = froudeNumber(compound, 5e-5, discharge);
    for (let i = 2; i <= 60_000; i++) {
      const current = froudeNumber(compound, i * 5e-5, discharge);
      // A continuous crossing of Fr = 1 counts; the jump in top width onto the overbanks does not.
      if (Math.sign(current - 1) !== Math.sign(previous - 1) && Math.abs(current - previous) < 0.05) crossings++;
      previous = current;
    }
    expect(roots.length).toBe(crossings);
    expect(roots.length).toBeGreaterThan(1);
    for (const y of roots) expect(Math.abs(froudeNumber(compound, y, discharge) - 1)).toBeLessThan(1e-6);
    expect([...roots].sort((a, b) => a - b)).toEqual(roots);
  });

  it('picks the critical depth with the least specific energy', () => {
    const roots = criticalDepths(compound, 50);
    const energies = roots.map((y) => specificEnergy(compound, y, 50));
    expect(specificEnergy(compound, criticalDepth(compound, 50), 50)).toBe(Math.min(...energies));
  });

  // Invented: a 4 m wide, 2 m deep slot between 200 m wide flat overbanks, one n, so α = 1 and dE/dy = 1 − Fr².
  const slot = surveyedSection({ points: [[0, 4], [0, 2], [200, 2], [200, 0], [204, 0], [204, 2], [400, 2], [400, 4]], manningN: 0.03 });

  function denseScan(discharge: number): { crossings: number; leastEnergyDepth: number } {
    let crossings = 0;
    let leastEnergy = Infinity;
    let leastEnergyDepth = 0;
    let previous = Infinity;
    for (let i = 1; i <= 40_000; i++) {
      const y = i * 1e-4;
      // Fr² = Q²T/(gA³) and E = y + Q²/(2gA²) with α = 1, written out by hand (Chow 1959 §3-2, §3-3, from memory).
      const { area, topWidth } = slot.stateAtDepth(y);
      const current = Math.sqrt((discharge * discharge * topWidth) / (GRAVITY * area ** 3));
      if (Math.sign(current - 1) !== Math.sign(previous - 1) && Math.abs(current - previous) < 0.05) crossings++;
      previous = current;
      const energy = y + (discharge * discharge) / (2 * GRAVITY * area * area);
      if (energy < leastEnergy) [leastEnergy, leastEnergyDepth] = [energy, y];
    }
    return { crossings, leastEnergyDepth };
  }

  it('finds a root lying just above the flooded berm (within one scan step of it)', () => {
    for (const discharge of [3, 4, 10]) {
      const roots = criticalDepths(slot, discharge);
      expect(roots.length).toBe(denseScan(discharge).crossings);
    }
    const roots = criticalDepths(slot, 4);
    expect(roots).toHaveLength(2);
    expect(roots[1] - 2).toBeLessThan(0.01);
  });

  it('chooses the global minimum of specific energy, which may be the overbank root', () => {
    for (const discharge of [10, 30]) {
      const chosen = criticalDepth(slot, discharge);
      expect(Math.abs(chosen - denseScan(discharge).leastEnergyDepth)).toBeLessThan(2e-4);
    }
    const roots = criticalDepths(slot, 30);
    expect(criticalDepth(slot, 30)).toBe(roots[1]);
    expect(criticalDepth(slot, 10)).toBe(criticalDepths(slot, 10)[0]);
  });

  it('reports a critical depth above the top of the survey as overtopping', () => {
    const small = surveyedSection({ points: [[0, 1], [1, 0], [2, 1]], manningN: 0.03 });
    const error = caught(() => criticalDepth(small, 100));
    expect(error.code).toBe('section-overtopped');
    expect(error.field).toBe('reach.section');
  });

  it('agrees with the closed form for a surveyed rectangle', () => {
    const surveyed = surveyedSection({ points: [[0, 4], [0, 0], [5, 0], [5, 4]], manningN: 0.02 });
    expect(criticalDepths(surveyed, 10)).toHaveLength(1);
    expect(criticalDepth(surveyed, 10)).toBeCloseTo((4 / GRAVITY) ** (1 / 3), 12);
  });
});
