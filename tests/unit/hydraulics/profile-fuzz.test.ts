import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { criticalDepth } from '@/lib/hydraulics/critical-depth';
import { EngineError } from '@/lib/hydraulics/errors';
import { type PrismaticShapeSpec, prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { directStepProfile } from '@/lib/hydraulics/profiles/direct-step';
import type { GvfProfile } from '@/lib/hydraulics/profiles/profile-point';
import { prismaticReach } from '@/lib/hydraulics/profiles/reach-sections';
import { standardStepProfile } from '@/lib/hydraulics/profiles/standard-step';

const shapes: fc.Arbitrary<PrismaticShapeSpec> = fc.oneof(
  fc.record({ shape: fc.constant('rectangular' as const), width: fc.double({ min: 0.5, max: 100, noNaN: true }) }),
  fc.record({ shape: fc.constant('trapezoidal' as const), bottomWidth: fc.double({ min: 0.5, max: 60, noNaN: true }), sideSlope: fc.double({ min: 0, max: 4, noNaN: true }) }),
  fc.record({ shape: fc.constant('triangular' as const), sideSlope: fc.double({ min: 0.3, max: 4, noNaN: true }) }),
  fc.record({ shape: fc.constant('circular' as const), diameter: fc.double({ min: 0.3, max: 5, noNaN: true }) }),
);

const scenarios = fc.record({
  shape: shapes,
  manningN: fc.double({ min: 0.01, max: 0.1, noNaN: true }),
  discharge: fc.double({ min: 0.05, max: 400, noNaN: true }),
  bedSlope: fc.oneof(fc.constant(0), fc.double({ min: -0.005, max: 0.05, noNaN: true })),
  controlOverCritical: fc.double({ min: 0.7, max: 6, noNaN: true }),
  reachLength: fc.double({ min: 5, max: 20000, noNaN: true }),
});

function expectSound(profile: GvfProfile, reachLength: number) {
  expect(profile.points.length).toBeGreaterThan(0);
  expect(profile.points[0].distanceUpstream).toBe(0);
  profile.points.forEach((p, i) => {
    for (const value of Object.values(p)) expect(Number.isFinite(value)).toBe(true);
    if (i > 0) expect(p.distanceUpstream).toBeGreaterThanOrEqual(profile.points[i - 1].distanceUpstream);
  });
  expect(profile.points[profile.points.length - 1].distanceUpstream).toBeLessThanOrEqual(reachLength);
  expect(Number.isFinite(profile.refinement.extentChangeOnHalving)).toBe(true);
  if (profile.selfCheck) expect(Number.isFinite(profile.selfCheck.maxLevelDifference) && Number.isFinite(profile.selfCheck.extentDifference)).toBe(true);
}

/** Runs `compute`; any failure must be one of the engine's typed errors. */
function soundOrEngineError(compute: () => GvfProfile, reachLength: number) {
  let profile: GvfProfile;
  try {
    profile = compute();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineError);
    return;
  }
  expectSound(profile, reachLength);
}

describe('fuzz: random prismatic reaches and controls (invented ranges)', () => {
  it('direct step never gives NaN, always finishes, and fails only with EngineErrors', () => {
    fc.assert(
      fc.property(scenarios, (s) => {
        const section = prismaticSection(s.shape, s.manningN);
        let yc: number;
        try {
          yc = criticalDepth(section, s.discharge);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          return;
        }
        const controlDepth = Math.min(s.controlOverCritical * yc, section.maxDepth);
        soundOrEngineError(() => directStepProfile({ section, discharge: s.discharge, bedSlope: s.bedSlope, controlDepth, bedLevelAtControl: 10, reachLength: s.reachLength }), s.reachLength);
      }),
      { numRuns: 60, seed: 20240601 },
    );
  });

  it('standard step (fixed spacing) never gives NaN, always finishes, and fails only with EngineErrors', () => {
    fc.assert(
      fc.property(scenarios, fc.integer({ min: 1, max: 200 }), (s, pieces) => {
        const section = prismaticSection(s.shape, s.manningN);
        let yc: number;
        try {
          yc = criticalDepth(section, s.discharge);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          return;
        }
        const controlDepth = Math.min(s.controlOverCritical * yc, section.maxDepth);
        const reach = prismaticReach({ section, bedSlope: s.bedSlope, bedLevelAtControl: 10, reachLength: s.reachLength, spacing: s.reachLength });
        soundOrEngineError(() => standardStepProfile({ reach, discharge: s.discharge, controlLevel: 10 + controlDepth, maxSpacing: s.reachLength / pieces }), s.reachLength);
      }),
      { numRuns: 60, seed: 20240602 },
    );
  });

  it('rejects malformed inputs with typed errors', () => {
    const section = prismaticSection({ shape: 'rectangular', width: 5 }, 0.03);
    const base = { section, discharge: 10, bedSlope: 0.001, controlDepth: 3, bedLevelAtControl: 0, reachLength: 1000 };
    for (const bad of [{ discharge: Number.NaN }, { discharge: -1 }, { controlDepth: 0 }, { reachLength: 0 }, { bedSlope: Number.POSITIVE_INFINITY }, { normalDepthTolerance: 0.7 }, { depthSteps: 1.5 }]) {
      expect(() => directStepProfile({ ...base, ...bad })).toThrow(EngineError);
    }
  });
});
