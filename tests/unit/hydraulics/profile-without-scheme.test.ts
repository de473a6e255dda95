import { describe, expect, it } from 'vitest';
import { NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { surveyedReach } from '@/lib/hydraulics/profiles/reach-sections';
import { withoutSchemePrismatic, withoutSchemeSurveyed } from '@/lib/hydraulics/profiles/without-scheme';
import { referenceNormalDepth } from './profile-reference-solutions';

// Invented channel: trapezoid b = 12 m, z = 1.5, n = 0.03, 45 m³/s, S₀ = 0.0008; normal depth by the test's own bisection.
const spec = { bottomWidth: 12, sideSlope: 1.5, manningN: 0.03, discharge: 45, bedSlope: 0.0008, alpha: 1 };
const section = prismaticSection({ shape: 'trapezoidal', bottomWidth: 12, sideSlope: 1.5 }, 0.03);
const yn = referenceNormalDepth(spec);

describe('without-scheme levels, prismatic reach', () => {
  it('is normal depth at the given distances, on a bed rising upstream', () => {
    const result = withoutSchemePrismatic({ section, discharge: 45, bedSlope: 0.0008, bedLevelAtControl: 50, reachLength: 3000, distances: [500, 0, 1250] });
    expect(result.points.map((p) => p.distanceUpstream)).toEqual([0, 500, 1250]);
    for (const p of result.points) {
      expect(p.depth).toBeCloseTo(yn, 9);
      expect(p.waterLevel).toBeCloseTo(50 + 0.0008 * p.distanceUpstream + yn, 9);
      expect(p.frictionSlope).toBeCloseTo(0.0008, 9); // uniform flow: Sf = S₀
    }
    expect(result.levelAt(2000)).toBeCloseTo(50 + 1.6 + yn, 9);
    expect(result.profile).toBeNull();
  });

  it("follows an existing control's own profile, then normal depth beyond it", () => {
    const result = withoutSchemePrismatic({ section, discharge: 45, bedSlope: 0.0008, bedLevelAtControl: 50, reachLength: 3000, distances: [], existingControlDepth: 1.5 * yn });
    expect(result.profile?.profileType).toBe('M1');
    expect(result.levelAt(0)).toBeCloseTo(50 + 1.5 * yn, 9);
    expect(result.levelAt(2999)).toBeGreaterThan(50 + 0.0008 * 2999 + yn);
    expect(result.levelAt(2999)).toBeLessThan(50 + 0.0008 * 2999 + 1.5 * yn);
    expect(result.levelAt(10000)).toBeCloseTo(50 + 8 + yn, 9);
  });

  it('needs an existing control on a horizontal bed', () => {
    try {
      withoutSchemePrismatic({ section, discharge: 45, bedSlope: 0, bedLevelAtControl: 50, reachLength: 3000, distances: [0] });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(NoPhysicalSolutionError);
      expect((error as NoPhysicalSolutionError).field).toBe('withoutScheme.controlDepth');
    }
  });
});

describe('without-scheme levels, surveyed reach', () => {
  it('on a uniform surveyed reach stays at normal depth from the first section to the last', () => {
    const trapezoid = (bed: number) => ({ points: [[0, bed + 8], [12, bed], [24, bed], [36, bed + 8]] as [number, number][], manningN: 0.03 });
    const reach = surveyedReach([0, 700, 1500].map((d) => ({ distanceUpstream: d, survey: trapezoid(50 + 0.0008 * d) })));
    const result = withoutSchemeSurveyed({ reach, discharge: 45 });
    expect(result.profile?.stoppedBy).toBe('reach-end');
    for (const p of result.points) expect(Math.abs(p.depth - yn)).toBeLessThan(0.001);
    expect(result.levelAt(1500)).toBeCloseTo(50 + 1.2 + result.points[result.points.length - 1].depth, 9);
    expect(result.levelAt(1600)).toBeCloseTo(result.levelAt(1500) + 0.08, 6);
  });
});
