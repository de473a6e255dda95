import { describe, expect, it } from 'vitest';
import type { FlowSection } from '@/lib/hydraulics/section';
import { directStepProfile } from '@/lib/hydraulics/profiles/direct-step';
import { prismaticReach } from '@/lib/hydraulics/profiles/reach-sections';
import { standardStepProfile } from '@/lib/hydraulics/profiles/standard-step';
import { adaptiveSimpson, wideIdealChannel } from './profile-reference-solutions';

const G = 9.80665;

/**
 * Test double: a wide rectangular channel idealised with R = y and Manning's resistance, K = (1/n)·B·y^{5/3}.
 * Its hydraulic exponents are exact constants: K² ∝ y^N with N = 10/3, and Z² = A³/T ∝ y^M with M = 3
 * (hydraulic exponents as defined in Chow, Open-Channel Hydraulics, 1959, chs. 4 and 6 — from memory).
 */
function wideManningChannel(width: number, manningN: number): FlowSection {
  return wideIdealChannel(width, (area, depth) => (area * Math.pow(depth, 2 / 3)) / manningN);
}

/** Difference of the varied-flow function F(u, N) = ∫₀ᵘ du/(1 − uᴺ) between two points on one side of u = 1, by quadrature. */
const variedFlowFunctionChange = (u1: number, u2: number, exponent: number) => adaptiveSimpson((u) => 1 / (1 - Math.pow(u, exponent)), u1, u2, 1e-12);

/**
 * Bakhmeteff–Chow integration of the GVF equation with constant hydraulic exponents (Chow 1959, §10-2 — from memory):
 * x = (yn/S₀)[u − F(u, N) + (yc/yn)^M (J/N) F(v, J)], u = y/yn, J = N/(N − M + 1), v = u^{N/J}; x downstream.
 */
function chowDistanceUpstream(yn: number, yc: number, bedSlope: number, y1: number, y2: number, N: number, M: number): number {
  const J = N / (N - M + 1);
  const [u1, u2] = [y1 / yn, y2 / yn];
  const [v1, v2] = [Math.pow(u1, N / J), Math.pow(u2, N / J)];
  const downstream = (yn / bedSlope) * (u2 - u1 - variedFlowFunctionChange(u1, u2, N) + Math.pow(yc / yn, M) * (J / N) * variedFlowFunctionChange(v1, v2, J));
  return -downstream;
}

// Invented scenario: 80 m wide, n = 0.035, q = 2.5 m²/s, S₀ = 0.0003.
const width = 80;
const manningN = 0.035;
const unitDischarge = 2.5;
const discharge = width * unitDischarge;
const bedSlope = 0.0003;
const section = wideManningChannel(width, manningN);
const yn = Math.pow((manningN * unitDischarge) / Math.sqrt(bedSlope), 3 / 5); // q = (1/n) yn^{5/3} √S₀ (Manning)
const yc = Math.cbrt((unitDischarge * unitDischarge) / G);

describe('varied-flow function (Bakhmeteff–Chow), wide channel with N = 10/3, M = 3', () => {
  it.each([
    ['M1', 2.5 * yn, 1.01 * yn],
    ['M2', yc, 0.99 * yn],
  ])('%s: direct step and standard step extents agree with the varied-flow-function solution within 0.5 %', (type, control, end) => {
    const reference = chowDistanceUpstream(yn, yc, bedSlope, control, end, 10 / 3, 3);
    expect(reference).toBeGreaterThan(0);
    const direct = directStepProfile({ section, discharge, bedSlope, controlDepth: control, bedLevelAtControl: 10, reachLength: 100000 });
    const reach = prismaticReach({ section, bedSlope, bedLevelAtControl: 10, reachLength: 1.5 * reference, spacing: 1.5 * reference });
    const standard = standardStepProfile({ reach, discharge, controlLevel: 10 + control, expansionCoefficient: 0, contractionCoefficient: 0 });
    for (const profile of [direct, standard]) {
      expect(profile.profileType).toBe(type);
      expect(profile.stoppedBy).toBe('normal-depth');
      const extent = profile.points[profile.points.length - 1].distanceUpstream;
      expect(Math.abs(extent - reference) / reference).toBeLessThan(0.005);
    }
  });

  it('gives intermediate points on the analytic curve too (M1, every direct-step point within 0.5 % of the extent)', () => {
    const control = 2 * yn;
    const profile = directStepProfile({ section, discharge, bedSlope, controlDepth: control, bedLevelAtControl: 0, reachLength: 100000 });
    const extent = profile.points[profile.points.length - 1].distanceUpstream;
    for (const p of profile.points.slice(1)) {
      expect(Math.abs(p.distanceUpstream - chowDistanceUpstream(yn, yc, bedSlope, control, p.depth, 10 / 3, 3))).toBeLessThan(0.005 * extent);
    }
  });
});
