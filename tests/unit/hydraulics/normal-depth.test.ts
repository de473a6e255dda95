import { describe, expect, it } from 'vitest';
import { InvalidInputError, NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { normalDepth } from '@/lib/hydraulics/normal-depth';
import { CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO } from '@/lib/hydraulics/prismatic/circle-geometry';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import type { FlowSection } from '@/lib/hydraulics/section';
import { surveyedSection } from '@/lib/hydraulics/surveyed-section';
import { CUBIC_METRES_PER_CUBIC_FOOT, METRES_PER_FOOT } from '@/lib/hydraulics/units';
import { caught } from './test-helpers';

function uniformFlow(section: FlowSection, depth: number, slope: number): number {
  return section.stateAtDepth(depth).conveyance * Math.sqrt(slope);
}


describe('normal depth, prismatic channels', () => {
  it('Chow 1959, Example 10-1: b = 20 ft, z = 2, S₀ = 0.0016, n = 0.025, Q = 400 ft³/s gives yn ≈ 3.36 ft (from memory)', () => {
    const section = prismaticSection({ shape: 'trapezoidal', bottomWidth: 20 * METRES_PER_FOOT, sideSlope: 2 }, 0.025);
    const depth = normalDepth(section, 400 * CUBIC_METRES_PER_CUBIC_FOOT, 0.0016);
    expect(Math.abs(depth / METRES_PER_FOOT - 3.36) / 3.36).toBeLessThan(0.005);
  });

  it('tends to the wide-channel formula (nq/√S)^(3/5) as the width grows (Manning with R → y)', () => {
    const q = 2; // invented: 2 m²/s per metre of width, n = 0.03, S = 0.0005
    const wide = (0.03 * q) / Math.sqrt(0.0005);
    const errors = [1e2, 1e4, 1e6].map((width) => {
      const depth = normalDepth(prismaticSection({ shape: 'rectangular', width }, 0.03), q * width, 0.0005);
      return Math.abs(depth - wide ** 0.6) / wide ** 0.6;
    });
    expect(errors[2]).toBeLessThan(1e-5);
    expect(errors[1]).toBeLessThan(errors[0]);
    expect(errors[2]).toBeLessThan(errors[1]);
  });

  it('returns a root of Manning’s equation for each open shape', () => {
    const sections = [
      prismaticSection({ shape: 'rectangular', width: 5 }, 0.015),
      prismaticSection({ shape: 'trapezoidal', bottomWidth: 3, sideSlopeLeft: 0.5, sideSlopeRight: 2 }, 0.03),
      prismaticSection({ shape: 'triangular', sideSlope: 1.5 }, 0.02),
    ];
    for (const section of sections) {
      for (const discharge of [1e-4, 0.7, 35, 2500]) {
        const depth = normalDepth(section, discharge, 0.002);
        expect(Math.abs(uniformFlow(section, depth, 0.002) - discharge) / discharge).toBeLessThan(1e-10);
      }
    }
  });

  it('says clearly that a horizontal or adverse bed has no normal depth', () => {
    const section = prismaticSection({ shape: 'rectangular', width: 5 }, 0.015);
    const flat = caught(() => normalDepth(section, 10, 0));
    expect(flat).toBeInstanceOf(NoPhysicalSolutionError);
    expect(flat.code).toBe('no-normal-depth');
    expect(flat.field).toBe('reach.bedSlope');
    expect(flat.message).toBe('reach.bedSlope: no normal depth: the bed is horizontal, uniform flow cannot exist');
    const adverse = caught(() => normalDepth(section, 10, -0.001, { field: 'reaches[3].bedSlope' }));
    expect(adverse.code).toBe('no-normal-depth');
    expect(adverse.message).toBe('reaches[3].bedSlope: no normal depth: the bed is adverse, uniform flow cannot exist');
  });

  it('rejects a negative discharge or a non-finite slope, naming the field', () => {
    const section = prismaticSection({ shape: 'rectangular', width: 5 }, 0.015);
    expect(caught(() => normalDepth(section, -1, 0.001))).toBeInstanceOf(InvalidInputError);
    expect(caught(() => normalDepth(section, -1, 0.001, { dischargeField: 'flows[0]' })).field).toBe('flows[0]');
    expect(caught(() => normalDepth(section, 1, Number.NaN)).field).toBe('reach.bedSlope');
  });
});

describe('normal depth, part-full circle', () => {
  const diameter = 1.5;
  const slope = 0.001;
  const pipe = prismaticSection({ shape: 'circular', diameter }, 0.013);
  const fullBore = uniformFlow(pipe, diameter, slope);

  it('has its conveyance peak near 0.938 D (Chow 1959, circular conduits, from memory), confirmed by a fine scan', () => {
    expect(CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO).toBeCloseTo(0.938, 3);
    let bestRatio = 0;
    let best = 0;
    for (let i = 1; i <= 100_000; i++) {
      const k = pipe.stateAtDepth((diameter * i) / 100_000).conveyance;
      if (k > best) [best, bestRatio] = [k, i / 100_000];
    }
    expect(Math.abs(bestRatio - CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO)).toBeLessThan(2e-5);
  });

  it('solves part-full flow below the full-bore capacity', () => {
    const depth = normalDepth(pipe, 0.4 * fullBore, slope);
    expect(depth).toBeLessThan(diameter);
    expect(Math.abs(uniformFlow(pipe, depth, slope) - 0.4 * fullBore)).toBeLessThan(1e-10 * fullBore);
  });

  it('picks the lower root when Q lies between the full-bore and the peak capacity', () => {
    const discharge = 1.05 * fullBore; // the peak carries about 7.6 % more than full bore (common practice, from memory)
    const depth = normalDepth(pipe, discharge, slope);
    expect(depth).toBeLessThan(CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO * diameter);
    expect(depth).toBeGreaterThan(0.8 * diameter);
    expect(Math.abs(uniformFlow(pipe, depth, slope) - discharge)).toBeLessThan(1e-10 * discharge);
  });

  it('says when the discharge exceeds what the pipe can carry, quoting the full-bore capacity', () => {
    const error = caught(() => normalDepth(pipe, 1.2 * fullBore, slope));
    expect(error).toBeInstanceOf(NoPhysicalSolutionError);
    expect(error.code).toBe('exceeds-capacity');
    expect(error.message).toContain(`full-bore capacity ${fullBore.toPrecision(4)} m³/s`);
  });
});

describe('normal depth, surveyed sections', () => {
  it('matches the prismatic answer for a surveyed rectangle', () => {
    const surveyed = surveyedSection({ points: [[0, 10], [0, 5], [6, 5], [6, 10]], manningN: 0.02 });
    const prismatic = prismaticSection({ shape: 'rectangular', width: 6 }, 0.02);
    expect(normalDepth(surveyed, 20, 0.001)).toBeCloseTo(normalDepth(prismatic, 20, 0.001), 10);
  });

  it('solves a compound section above the banks and reports when the survey is too small', () => {
    const compound = surveyedSection({
      points: [[0, 5], [10, 2], [20, 2], [22, 0], [28, 0], [30, 2], [45, 2], [50, 5]],
      manningN: { left: 0.05, channel: 0.03, right: 0.06 },
      bankStations: [20, 30],
    });
    const depth = normalDepth(compound, 100, 0.001);
    expect(depth).toBeGreaterThan(2);
    expect(Math.abs(uniformFlow(compound, depth, 0.001) - 100) / 100).toBeLessThan(1e-10);
    const error = caught(() => normalDepth(compound, 5000, 0.001));
    expect(error.code).toBe('exceeds-capacity');
  });
});
