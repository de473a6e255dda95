import { describe, expect, it } from 'vitest';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { directStepProfile } from '@/lib/hydraulics/profiles/direct-step';
import type { GvfProfile } from '@/lib/hydraulics/profiles/profile-point';
import { CUBIC_METRES_PER_CUBIC_FOOT, METRES_PER_FOOT } from '@/lib/hydraulics/units';
import {
  type TrapezoidCase,
  bisect,
  odexAlongDistance,
  quadratureDistance,
  referenceCriticalDepth,
  referenceNormalDepth,
} from './profile-reference-solutions';

const FT = METRES_PER_FOOT;

function sectionOf(c: TrapezoidCase) {
  return prismaticSection({ shape: 'trapezoidal', bottomWidth: c.bottomWidth, sideSlope: c.sideSlope }, c.manningN, { energyCoefficient: c.alpha });
}

function expectWellFormed(profile: GvfProfile, reachLength: number) {
  expect(profile.points[0].distanceUpstream).toBe(0);
  for (let i = 1; i < profile.points.length; i++) expect(profile.points[i].distanceUpstream).toBeGreaterThanOrEqual(profile.points[i - 1].distanceUpstream);
  for (const p of profile.points) {
    for (const value of Object.values(p)) expect(Number.isFinite(value)).toBe(true);
    expect(p.waterLevel).toBeCloseTo(p.bedLevel + p.depth, 12);
    expect(p.energyLevel).toBeGreaterThan(p.waterLevel);
  }
  expect(profile.points[profile.points.length - 1].distanceUpstream).toBeLessThanOrEqual(reachLength);
}

// Chow, Open-Channel Hydraulics (1959), Example 10-1: trapezoidal channel behind a dam, b = 20 ft, z = 2,
// S0 = 0.0016, n = 0.025, Q = 400 ft³/s, α = 1.10, depth 5 ft at the dam; M1 profile computed upstream.
describe('Chow 1959 Example 10-1 (US customary, converted to SI)', () => {
  const chow: TrapezoidCase = { bottomWidth: 20 * FT, sideSlope: 2, manningN: 0.025, discharge: 400 * CUBIC_METRES_PER_CUBIC_FOOT, bedSlope: 0.0016, alpha: 1.1 };
  const section = sectionOf(chow);
  const controlDepth = 5 * FT;
  const profile = directStepProfile({ section, discharge: chow.discharge, bedSlope: chow.bedSlope, controlDepth, bedLevelAtControl: 0, reachLength: 5000 });
  const yn = referenceNormalDepth(chow);
  const extent = profile.points[profile.points.length - 1].distanceUpstream;

  it('has the book\'s normal and critical depths', () => {
    expect(yn / FT).toBeCloseTo(3.36, 1); // Chow 1959 Example 10-1: yn ≈ 3.36 ft (from memory)
    expect(referenceCriticalDepth(chow) / FT).toBeCloseTo(2.2, 1); // Chow 1959 Example 10-1: yc ≈ 2.2 ft (from memory)
  });

  it('is an M1 curve that stops 1 % above normal depth, converged', () => {
    expect(profile.profileType).toBe('M1');
    expect(profile.stoppedBy).toBe('normal-depth');
    expect(profile.points[profile.points.length - 1].depth).toBeCloseTo(yn * 1.01, 6);
    expect(profile.refinement.converged).toBe(true);
    expect(profile.refinement.extentChangeOnHalving).toBeLessThan(0.001);
    expectWellFormed(profile, 5000);
  });

  it('reaches about as far as the book\'s hand computation', () => {
    // Chow 1959 Example 10-1: roughly 2,200–2,300 ft to about 1 % above normal depth (from memory); loose bounds,
    // as the hand table uses coarse depth steps.
    expect(extent / FT).toBeGreaterThan(2000);
    expect(extent / FT).toBeLessThan(2700);
  });

  it('agrees with quadrature of x = ∫(1 − Fr²)/(S₀ − Sf) dy within 0.5 % in extent', () => {
    const reference = quadratureDistance(chow, controlDepth, yn * 1.01); // adaptive Simpson, written in the test
    expect(Math.abs(extent - reference) / reference).toBeLessThan(0.005);
  });

  it('agrees with odex integrating dy/dx in distance: extent within 0.5 %, levels within 3 mm', () => {
    const distances = profile.points.map((p) => p.distanceUpstream);
    const { depths, distanceToTarget } = odexAlongDistance(chow, controlDepth, [...distances, extent * 1.5], yn * 1.01);
    expect(distanceToTarget).not.toBeNull();
    expect(Math.abs(extent - distanceToTarget!) / distanceToTarget!).toBeLessThan(0.005);
    profile.points.forEach((p, i) => expect(Math.abs(p.depth - depths[i])).toBeLessThan(0.003));
  });

  it('reports a self-check that agrees with it', () => {
    expect(profile.selfCheck).not.toBeNull();
    expect(profile.selfCheck!.method).toContain('odex');
    expect(profile.selfCheck!.extentDifference).toBeLessThan(0.005);
    expect(profile.selfCheck!.maxLevelDifference).toBeLessThan(0.003);
  });

  it('with a fixed step count, reports the change on halving the step', () => {
    const coarse = directStepProfile({ section, discharge: chow.discharge, bedSlope: chow.bedSlope, controlDepth, bedLevelAtControl: 0, reachLength: 5000, depthSteps: 4 });
    expect(coarse.refinement.stepsUsed).toBe(4);
    expect(coarse.refinement.extentChangeOnHalving).toBeGreaterThan(0);
    const fine = directStepProfile({ section, discharge: chow.discharge, bedSlope: chow.bedSlope, controlDepth, bedLevelAtControl: 0, reachLength: 5000, depthSteps: 512 });
    expect(fine.refinement.extentChangeOnHalving).toBeLessThan(coarse.refinement.extentChangeOnHalving);
  });
});

// Invented SI scenario: a 12 m wide trapezoidal channel, z = 1.5, n = 0.030, 45 m³/s.
const channel = (bedSlope: number): TrapezoidCase => ({ bottomWidth: 12, sideSlope: 1.5, manningN: 0.03, discharge: 45, bedSlope, alpha: 1.05 });

describe('reach end, M2, H2 and A2 profiles against quadrature', () => {
  it('stops a long M1 exactly at the reach end, with the level there matching quadrature', () => {
    const c = channel(0.0008);
    const yn = referenceNormalDepth(c);
    const reachLength = 400;
    const profile = directStepProfile({ section: sectionOf(c), discharge: c.discharge, bedSlope: c.bedSlope, controlDepth: 2 * yn, bedLevelAtControl: 50, reachLength });
    const last = profile.points[profile.points.length - 1];
    expect(profile.stoppedBy).toBe('reach-end');
    expect(last.distanceUpstream).toBe(reachLength);
    expect(last.bedLevel).toBeCloseTo(50 + 0.0008 * reachLength, 10);
    const referenceDepth = bisect((y) => quadratureDistance(c, 2 * yn, y) - reachLength, 2 * yn, yn * 1.0001);
    expect(Math.abs(last.depth - referenceDepth)).toBeLessThan(0.001);
    expectWellFormed(profile, reachLength);
  });

  it('computes an M2 drawdown from critical depth (free overfall) to within 0.5 % of quadrature', () => {
    const c = channel(0.0008);
    const yn = referenceNormalDepth(c);
    const yc = referenceCriticalDepth(c);
    const profile = directStepProfile({ section: sectionOf(c), discharge: c.discharge, bedSlope: c.bedSlope, controlDepth: yc, bedLevelAtControl: 0, reachLength: 10000 });
    expect(profile.profileType).toBe('M2');
    expect(profile.stoppedBy).toBe('normal-depth');
    const extent = profile.points[profile.points.length - 1].distanceUpstream;
    const reference = quadratureDistance(c, yc, yn * 0.99);
    expect(Math.abs(extent - reference) / reference).toBeLessThan(0.005);
    expect(profile.points.every((p, i) => i === 0 || p.depth > profile.points[i - 1].depth)).toBe(true);
  });

  it.each([
    ['H2', 0],
    ['A2', -0.0005],
  ])('runs an %s profile to the reach end, the level there matching quadrature within 1 mm', (type, bedSlope) => {
    const c = channel(bedSlope);
    const yc = referenceCriticalDepth(c);
    const reachLength = 1500;
    const control = 1.2 * yc;
    const profile = directStepProfile({ section: sectionOf(c), discharge: c.discharge, bedSlope, controlDepth: control, bedLevelAtControl: 0, reachLength });
    expect(profile.profileType).toBe(type);
    expect(profile.stoppedBy).toBe('reach-end');
    const last = profile.points[profile.points.length - 1];
    const referenceDepth = bisect((y) => quadratureDistance(c, control, y) - reachLength, control, 10 * control);
    expect(Math.abs(last.depth - referenceDepth)).toBeLessThan(0.001);
    expect(profile.selfCheck!.maxLevelDifference).toBeLessThan(0.003);
  });

  it('stops where the water reaches the soffit of a circular culvert on a horizontal bed', () => {
    const section = prismaticSection({ shape: 'circular', diameter: 1.5 }, 0.013);
    const profile = directStepProfile({ section, discharge: 1.2, bedSlope: 0, controlDepth: 1.0, bedLevelAtControl: 0, reachLength: 50000 });
    expect(profile.stoppedBy).toBe('section-overtopped');
    expect(profile.points[profile.points.length - 1].depth).toBeCloseTo(1.5, 12);
    expect(profile.warnings.join(' ')).toContain('top of the section');
  });
});
