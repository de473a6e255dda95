import { describe, expect, it } from 'vitest';
import type { FlowSection } from '@/lib/hydraulics/section';
import { directStepProfile } from '@/lib/hydraulics/profiles/direct-step';
import { prismaticReach } from '@/lib/hydraulics/profiles/reach-sections';
import { standardStepProfile } from '@/lib/hydraulics/profiles/standard-step';
import { wideIdealChannel } from './profile-reference-solutions';

const G = 9.80665;

/**
 * Test double of the FlowSection interface: a wide rectangular channel per unit width idealised so that R = y,
 * with Chézy's resistance K = C·A·√R (Chézy 1775; Chow, Open-Channel Hydraulics, 1959, §5-2 — from memory).
 * This is the channel for which Bresse (1860) integrated the GVF equation in closed form.
 */
function wideChezyChannel(width: number, chezyC: number): FlowSection {
  return wideIdealChannel(width, (area, depth) => chezyC * area * Math.sqrt(depth));
}

/**
 * Bresse's function φ(u) = ∫ du/(1 − u³) = (1/6) ln((u² + u + 1)/(u − 1)²) − (1/√3) arctan(√3/(2u + 1)) + const
 * (Bresse 1860; Chow 1959 §10-1 — from memory). Differentiating the right side gives back 1/(1 − u³) exactly.
 */
function bresse(u: number): number {
  return Math.log((u * u + u + 1) / ((u - 1) * (u - 1))) / 6 - Math.atan(Math.sqrt(3) / (2 * u + 1)) / Math.sqrt(3);
}

/**
 * Distance upstream between depths y1 and y2 from Bresse's solution. With u = y/yn and β = (yc/yn)³, the GVF
 * equation for this channel is dx/du = (yn/S₀)[1 − (1 − β)/(1 − u³)] (x downstream), so x = (yn/S₀)[u − (1 − β)φ(u)];
 * measuring x upstream flips the sign.
 */
function bresseDistanceUpstream(yn: number, yc: number, bedSlope: number, y1: number, y2: number): number {
  const beta = (yc / yn) ** 3;
  const x = (y: number) => (yn / bedSlope) * (y / yn - (1 - beta) * bresse(y / yn));
  return -(x(y2) - x(y1));
}

// Invented scenario: q = 3 m²/s over a 100 m wide channel, Chézy C = 50 m^½/s.
const width = 100;
const chezyC = 50;
const unitDischarge = 3;
const discharge = unitDischarge * width;
const section = wideChezyChannel(width, chezyC);
const criticalDepth = Math.cbrt((unitDischarge * unitDischarge) / G); // yc³ = q²/g (Chow 1959 §4-3, from memory)
const normalDepthFor = (bedSlope: number) => Math.cbrt((unitDischarge * unitDischarge) / (chezyC * chezyC * bedSlope)); // q = C yn √(yn S₀) (Chézy)

describe("Bresse's analytic solution (wide channel, Chézy resistance)", () => {
  it('M1: direct step matches Bresse within 0.5 % in extent and along the curve', () => {
    const bedSlope = 0.0004;
    const yn = normalDepthFor(bedSlope);
    const control = 4;
    const profile = directStepProfile({ section, discharge, bedSlope, controlDepth: control, bedLevelAtControl: 0, reachLength: 50000 });
    expect(profile.profileType).toBe('M1');
    const extent = profile.points[profile.points.length - 1].distanceUpstream;
    const reference = bresseDistanceUpstream(yn, criticalDepth, bedSlope, control, 1.01 * yn);
    expect(Math.abs(extent - reference) / reference).toBeLessThan(0.005);
    for (const p of profile.points) {
      expect(Math.abs(p.distanceUpstream - bresseDistanceUpstream(yn, criticalDepth, bedSlope, control, p.depth))).toBeLessThan(0.005 * reference);
    }
  });

  it('M2: from critical depth, direct step and standard step both match Bresse within 0.5 %', () => {
    const bedSlope = 0.0004;
    const yn = normalDepthFor(bedSlope);
    const reference = bresseDistanceUpstream(yn, criticalDepth, bedSlope, criticalDepth, 0.99 * yn);
    const direct = directStepProfile({ section, discharge, bedSlope, controlDepth: criticalDepth, bedLevelAtControl: 0, reachLength: 50000 });
    const reach = prismaticReach({ section, bedSlope, bedLevelAtControl: 0, reachLength: 2 * reference, spacing: 2 * reference });
    const standard = standardStepProfile({ reach, discharge, controlLevel: criticalDepth, expansionCoefficient: 0, contractionCoefficient: 0 });
    for (const profile of [direct, standard]) {
      expect(profile.stoppedBy).toBe('normal-depth');
      const extent = profile.points[profile.points.length - 1].distanceUpstream;
      expect(Math.abs(extent - reference) / reference).toBeLessThan(0.005);
    }
  });

  it('S1 on a steep reach: the jump stands where the S1 depth equals the sequent depth of normal flow', () => {
    const bedSlope = 0.01;
    const yn = normalDepthFor(bedSlope);
    expect(yn).toBeLessThan(criticalDepth);
    // Bélanger's sequent depth for a rectangle: y₂ = (y₁/2)(√(1 + 8Fr₁²) − 1) (Bélanger 1828; Chow 1959 eq. 3-20 — from memory).
    const froude2 = (unitDischarge * unitDischarge) / (G * yn ** 3);
    const sequent = (yn / 2) * (Math.sqrt(1 + 8 * froude2) - 1);
    const control = 2;
    const jumpDistance = bresseDistanceUpstream(yn, criticalDepth, bedSlope, control, sequent);
    const direct = directStepProfile({ section, discharge, bedSlope, controlDepth: control, bedLevelAtControl: 0, reachLength: 1000 });
    const reach = prismaticReach({ section, bedSlope, bedLevelAtControl: 0, reachLength: 1000, spacing: 1000 });
    const standard = standardStepProfile({ reach, discharge, controlLevel: control, expansionCoefficient: 0, contractionCoefficient: 0 });
    for (const profile of [direct, standard]) {
      expect(profile.profileType).toBe('S1');
      expect(profile.stoppedBy).toBe('hydraulic-jump');
      expect(profile.jump).not.toBeNull();
      expect(profile.jump!.upstreamDepth).toBeCloseTo(yn, 9);
      expect(profile.jump!.downstreamDepth).toBeCloseTo(sequent, 9);
      expect(Math.abs(profile.jump!.distanceUpstream - jumpDistance) / jumpDistance).toBeLessThan(0.005);
      expect(profile.points[profile.points.length - 1].distanceUpstream).toBeCloseTo(profile.jump!.distanceUpstream, 9);
    }
  });

  it('S1 with a control below the sequent depth: the jump forms at the control', () => {
    const bedSlope = 0.01;
    const profile = directStepProfile({ section, discharge, bedSlope, controlDepth: 1.1 * criticalDepth, bedLevelAtControl: 0, reachLength: 1000 });
    expect(profile.stoppedBy).toBe('hydraulic-jump');
    expect(profile.jump!.distanceUpstream).toBe(0);
    expect(profile.points).toHaveLength(1);
    expect(profile.warnings.join(' ')).toContain('jump forms at the control');
  });
});
