import { describe, expect, it } from 'vitest';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { directStepProfile } from '@/lib/hydraulics/profiles/direct-step';
import { distancePerDepth, odeSelfCheck } from '@/lib/hydraulics/profiles/ode-self-check';
import { quadratureDistance } from './profile-reference-solutions';

// Invented scenario: 8 m rectangle, n = 0.028, 20 m³/s, bed slope 0.0006.
const section = prismaticSection({ shape: 'rectangular', width: 8 }, 0.028);
const discharge = 20;
const bedSlope = 0.0006;
const reference = { bottomWidth: 8, sideSlope: 0, manningN: 0.028, discharge, bedSlope, alpha: 1 };

describe('the GVF equation with distance measured upstream', () => {
  it('has depth falling upstream on an M1 curve and rising upstream on H2 and M2 curves', () => {
    // M1: above normal and critical depth on a mild bed, the surface approaches normal depth going upstream.
    expect(distancePerDepth(section, discharge, bedSlope, 3)).toBeLessThan(0);
    // H2: above critical depth on a level bed, the depth grows going upstream.
    expect(distancePerDepth(section, discharge, 0, 1.2)).toBeGreaterThan(0);
    // M2: between critical and normal depth, the depth grows going upstream towards normal depth.
    expect(distancePerDepth(section, discharge, bedSlope, 1.2)).toBeGreaterThan(0);
  });

  it('matches the test\'s own closed-form geometry value of dx/dy', () => {
    // dx/dy = −(1 − Fr²)/(S₀ − Sf) from the reference helpers' elementary trapezoid formulas (z = 0 here).
    const y = 2.7;
    const h = 1e-4;
    const numeric = (quadratureDistance(reference, y - h, y + h)) / (2 * h);
    expect(distancePerDepth(section, discharge, bedSlope, y)).toBeCloseTo(numeric, 3);
  });
});

describe('odeSelfCheck', () => {
  const profile = directStepProfile({ section, discharge, bedSlope, controlDepth: 3.5, bedLevelAtControl: 20, reachLength: 20000, skipSelfCheck: true });

  it('finds a converged direct-step profile in agreement', () => {
    const check = odeSelfCheck({ section, discharge, bedSlope, points: profile.points }).report!;
    expect(check.extentDifference).toBeLessThan(0.002);
    expect(check.maxLevelDifference).toBeLessThan(0.002);
  });

  it('detects a profile stretched by 5 % in distance', () => {
    const stretched = profile.points.map((p) => ({ ...p, distanceUpstream: p.distanceUpstream * 1.05 }));
    const check = odeSelfCheck({ section, discharge, bedSlope, points: stretched }).report!;
    expect(check.extentDifference).toBeGreaterThan(0.04);
    expect(check.maxLevelDifference).toBeGreaterThan(0.005);
  });

  it('detects a profile computed for the wrong bed slope', () => {
    const wrong = directStepProfile({ section, discharge, bedSlope: 0.0005, controlDepth: 3.5, bedLevelAtControl: 20, reachLength: 20000, skipSelfCheck: true });
    const check = odeSelfCheck({ section, discharge, bedSlope, points: wrong.points }).report!;
    expect(check.extentDifference).toBeGreaterThan(0.01);
  });

  it('gives up with a warning, not NaN, when the points run through normal depth (where dx/dy is singular)', () => {
    const wrong = directStepProfile({ section, discharge, bedSlope: 0.0008, controlDepth: 3.5, bedLevelAtControl: 20, reachLength: 20000, skipSelfCheck: true });
    const outcome = odeSelfCheck({ section, discharge, bedSlope, points: wrong.points });
    expect(outcome.report).toBeNull();
    expect(outcome.warnings.join(' ')).toContain('did not finish');
  });

  it('reports nothing to check for a single point', () => {
    expect(odeSelfCheck({ section, discharge, bedSlope, points: profile.points.slice(0, 1) }).report).toEqual({ method: expect.any(String), maxLevelDifference: 0, extentDifference: 0 });
  });
});
