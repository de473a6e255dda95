import { describe, expect, it } from 'vitest';
import { EngineError, InvalidInputError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { directStepProfile } from '@/lib/hydraulics/profiles/direct-step';
import { FRICTION_AVERAGING_METHODS, type FrictionAveraging, meanFrictionSlope } from '@/lib/hydraulics/profiles/friction-averaging';
import { meanSlopeNormalDepths } from '@/lib/hydraulics/profiles/reach-geometry';
import { type ReachStation, prismaticReach, surveyedReach } from '@/lib/hydraulics/profiles/reach-sections';
import { standardStepProfile } from '@/lib/hydraulics/profiles/standard-step';
import { interpolatedSurvey } from '@/lib/hydraulics/profiles/survey-interpolation';
import { surveyedSection } from '@/lib/hydraulics/surveyed-section';
import { CUBIC_METRES_PER_CUBIC_FOOT, METRES_PER_FOOT } from '@/lib/hydraulics/units';
import { referenceNormalDepth } from './profile-reference-solutions';

const G = 9.80665;
const FT = METRES_PER_FOOT;

describe('meanFrictionSlope', () => {
  // Invented slopes Sf₁ = 1e-4, Sf₂ = 4e-4; expected values by hand from the defining formulas.
  const discharge = 10;
  const k1 = discharge / Math.sqrt(1e-4);
  const k2 = discharge / Math.sqrt(4e-4);
  it.each([
    ['arithmetic', 2.5e-4], // (1e-4 + 4e-4)/2
    ['geometric', 2e-4], // √(1e-4 · 4e-4)
    ['harmonic', 1.6e-4], // 2·1e-4·4e-4/(5e-4)
    ['average-conveyance', (2 / (100 + 50)) ** 2], // (2Q/(K₁ + K₂))² with K = Q/√Sf
  ] as [FrictionAveraging, number][])('%s', (method, expected) => {
    expect(meanFrictionSlope(method, discharge, k1, k2)).toBeCloseTo(expected, 15);
  });
  it('rejects a dry end', () => {
    expect(() => meanFrictionSlope('arithmetic', discharge, 0, k2)).toThrow(InvalidInputError);
  });
});

// Chow, Open-Channel Hydraulics (1959), Example 10-1 channel (b = 20 ft, z = 2, S0 = 0.0016, n = 0.025, Q = 400 ft³/s, α = 1.10).
const chowSection = prismaticSection({ shape: 'trapezoidal', bottomWidth: 20 * FT, sideSlope: 2 }, 0.025, { energyCoefficient: 1.1 });
const chowQ = 400 * CUBIC_METRES_PER_CUBIC_FOOT;
const chowSlope = 0.0016;

describe('standard step on a prismatic reach agrees with the direct step', () => {
  const direct = directStepProfile({ section: chowSection, discharge: chowQ, bedSlope: chowSlope, controlDepth: 5 * FT, bedLevelAtControl: 0, reachLength: 3000 });
  const directExtent = direct.points[direct.points.length - 1].distanceUpstream;
  const reach = prismaticReach({ section: chowSection, bedSlope: chowSlope, bedLevelAtControl: 0, reachLength: 3000, spacing: 3000 });

  it.each(FRICTION_AVERAGING_METHODS)('with %s friction averaging: extent within 0.5 %, levels within 3 mm', (frictionAveraging) => {
    const standard = standardStepProfile({ reach, discharge: chowQ, controlLevel: 5 * FT, frictionAveraging, expansionCoefficient: 0, contractionCoefficient: 0 });
    expect(standard.profileType).toBe('M1');
    expect(standard.stoppedBy).toBe('normal-depth');
    expect(standard.refinement.converged).toBe(true);
    const extent = standard.points[standard.points.length - 1].distanceUpstream;
    expect(Math.abs(extent - directExtent) / directExtent).toBeLessThan(0.005);
    for (const p of standard.points) {
      const near = direct.points.reduce((best, q) => (Math.abs(q.distanceUpstream - p.distanceUpstream) < Math.abs(best.distanceUpstream - p.distanceUpstream) ? q : best));
      if (Math.abs(near.distanceUpstream - p.distanceUpstream) < 1) expect(Math.abs(near.waterLevel - p.waterLevel)).toBeLessThan(0.003);
    }
    expect(standard.selfCheck).not.toBeNull();
    expect(standard.selfCheck!.extentDifference).toBeLessThan(0.005);
  });

  it('the four averages bracket each other sensibly and close up as the spacing shrinks', () => {
    const levelAtEnd = (frictionAveraging: FrictionAveraging, maxSpacing: number) => {
      const shortReach = prismaticReach({ section: chowSection, bedSlope: chowSlope, bedLevelAtControl: 0, reachLength: 600, spacing: 600 });
      const p = standardStepProfile({ reach: shortReach, discharge: chowQ, controlLevel: 5 * FT, frictionAveraging, maxSpacing, expansionCoefficient: 0, contractionCoefficient: 0, reachNormalDepthAt: () => null });
      expect(p.stoppedBy).toBe('reach-end');
      return p.points[p.points.length - 1].waterLevel;
    };
    const spread = (spacing: number) => {
      const [h, k, g, a] = (['harmonic', 'average-conveyance', 'geometric', 'arithmetic'] as const).map((m) => levelAtEnd(m, spacing));
      // For any two slopes harmonic ≤ average-conveyance ≤ geometric ≤ arithmetic; a larger mean loss raises the level upstream.
      expect(h).toBeLessThanOrEqual(k);
      expect(k).toBeLessThanOrEqual(g);
      expect(g).toBeLessThanOrEqual(a);
      return { spread: a - h, arithmetic: a };
    };
    const coarse = spread(300);
    const fine = spread(18.75);
    expect(coarse.spread).toBeGreaterThan(0);
    expect(fine.spread).toBeLessThan(coarse.spread / 50); // second-order: 16× finer spacing, about 256× smaller spread
    const direct600 = directStepProfile({ section: chowSection, discharge: chowQ, bedSlope: chowSlope, controlDepth: 5 * FT, bedLevelAtControl: 0, reachLength: 600 });
    expect(Math.abs(fine.arithmetic - direct600.points[direct600.points.length - 1].waterLevel)).toBeLessThan(0.001);
  });
});

// Invented surveyed reach: a trapezoid (b = 12 m, z = 1.5, 8 m deep) surveyed at five places, bed falling 0.0008.
const trapezoidSurvey = (bed: number) => ({ points: [[0, bed + 8], [12, bed], [24, bed], [36, bed + 8]] as [number, number][], manningN: 0.03 });

describe('standard step on a surveyed reach', () => {
  const slope = 0.0008;
  const distances = [0, 500, 1000, 1500, 2000];
  const reach = surveyedReach(distances.map((d) => ({ distanceUpstream: d, survey: trapezoidSurvey(100 + slope * d) })));
  const discharge = 45;
  const yn = referenceNormalDepth({ bottomWidth: 12, sideSlope: 1.5, manningN: 0.03, discharge, bedSlope: slope, alpha: 1 });

  it('matches the direct step on the equivalent prismatic trapezoid within 0.5 % in extent', () => {
    const profile = standardStepProfile({ reach, discharge, controlLevel: 100 + 2 * yn, reachNormalDepthAt: meanSlopeNormalDepths(reach, discharge), expansionCoefficient: 0, contractionCoefficient: 0 });
    const prismatic = prismaticSection({ shape: 'trapezoidal', bottomWidth: 12, sideSlope: 1.5 }, 0.03);
    const direct = directStepProfile({ section: prismatic, discharge, bedSlope: slope, controlDepth: 2 * yn, bedLevelAtControl: 100, reachLength: 2000 });
    const extent = (p: { points: { distanceUpstream: number }[] }) => p.points[p.points.length - 1].distanceUpstream;
    expect(profile.stoppedBy).toBe(direct.stoppedBy);
    expect(Math.abs(extent(profile) - extent(direct)) / extent(direct)).toBeLessThan(0.005);
    expect(profile.selfCheck).toBeNull(); // not a single shared section, so no odex self-check
    expect(profile.points.every((p) => Object.values(p).every(Number.isFinite))).toBe(true);
  });

  it('interpolates the ground between two surveys', () => {
    // Invented: a 10 m wide and a 20 m wide rectangular trough, both 3 m deep, n 0.02 and 0.04.
    const narrow = { points: [[0, 3], [0, 0], [10, 0], [10, 3]] as [number, number][], manningN: 0.02 };
    const wide = { points: [[0, 3], [0, 0], [20, 0], [20, 3]] as [number, number][], manningN: 0.04 };
    const middle = surveyedSection(interpolatedSurvey(narrow, wide, 0.5));
    const state = middle.stateAtDepth(1);
    expect(state.area).toBeCloseTo(15, 9); // 15 m wide × 1 m
    expect(state.topWidth).toBeCloseTo(15, 9);
    expect(state.conveyance).toBeCloseTo((15 * Math.pow(15 / 17, 2 / 3)) / 0.03, 6); // Manning with n = 0.03 (the blend), P = 17 m
  });

  it('stops with a warning where the water would have to pass through critical depth', () => {
    // Invented: a horizontal rectangular channel with an abrupt 0.6 m rise in the bed 100 m upstream.
    const section = prismaticSection({ shape: 'rectangular', width: 5 }, 0.02);
    const stepped: ReachStation[] = [
      { distanceUpstream: 0, section, bedLevel: 0 },
      { distanceUpstream: 100, section, bedLevel: 0 },
      { distanceUpstream: 100.5, section, bedLevel: 0.6 },
      { distanceUpstream: 300, section, bedLevel: 0.6 },
    ];
    const yc = Math.cbrt((8 / 5) ** 2 / G);
    const profile = standardStepProfile({ reach: stepped, discharge: 8, controlLevel: 1.05 * yc });
    expect(profile.stoppedBy).toBe('critical-depth');
    expect(profile.warnings.join(' ')).toContain('no subcritical level');
    const last = profile.points[profile.points.length - 1];
    expect(last.distanceUpstream).toBeGreaterThanOrEqual(100);
    expect(last.distanceUpstream).toBeLessThan(100.5);
    expect(profile.points.every((p) => Object.values(p).every(Number.isFinite))).toBe(true);
  });

  it('stops where the water would rise above a surveyed section', () => {
    const low = { points: [[0, 101], [12, 100.2], [24, 100.2], [36, 101]] as [number, number][], manningN: 0.03 };
    const shallowReach = surveyedReach([
      { distanceUpstream: 0, survey: trapezoidSurvey(100) },
      { distanceUpstream: 300, survey: low },
    ]);
    const profile = standardStepProfile({ reach: shallowReach, discharge, controlLevel: 103, maxSpacing: 50 });
    expect(profile.stoppedBy).toBe('section-overtopped');
    expect(profile.warnings.join(' ')).toContain('above the top of the section');
  });

  it('rejects a reach that does not start at the control', () => {
    expect(() => standardStepProfile({ reach: reach.map((s) => ({ ...s, distanceUpstream: s.distanceUpstream + 1 })), discharge, controlLevel: 103 })).toThrow(InvalidInputError);
    expect(() => standardStepProfile({ reach: [reach[0], reach[0]], discharge, controlLevel: 103 })).toThrow(EngineError);
  });
});

describe('expansion and contraction losses', () => {
  // Invented: two rectangular sections 200 m apart on a level bed, 30 m³/s, n = 0.025, no interpolation between them.
  const wide = prismaticSection({ shape: 'rectangular', width: 12 }, 0.025);
  const narrow = prismaticSection({ shape: 'rectangular', width: 7 }, 0.025);
  const hv = (width: number, depth: number) => (30 / (width * depth)) ** 2 / (2 * G);
  const sf = (width: number, depth: number) => ((30 * 0.025) / (width * depth * Math.pow((width * depth) / (width + 2 * depth), 2 / 3))) ** 2;

  it.each([
    ['contraction (flow speeds up going downstream)', narrow, 7, wide, 12, 0.1],
    ['expansion (flow slows down going downstream)', wide, 12, narrow, 7, 0.3],
  ] as const)('%s uses its own coefficient in the energy balance (Chow 1959 §10-4)', (_label, down, downWidth, up, upWidth, coefficient) => {
    const stations: ReachStation[] = [
      { distanceUpstream: 0, section: down, bedLevel: 0 },
      { distanceUpstream: 200, section: up, bedLevel: 0 },
    ];
    const profile = standardStepProfile({ reach: stations, discharge: 30, controlLevel: 2.5, maxSpacing: 500, frictionAveraging: 'arithmetic', expansionCoefficient: 0.3, contractionCoefficient: 0.1 });
    expect(profile.points).toHaveLength(2);
    const [y1, y2] = profile.points.map((p) => p.depth);
    const residual = (c: number) => y2 + hv(upWidth, y2) - (y1 + hv(downWidth, y1)) - 200 * ((sf(downWidth, y1) + sf(upWidth, y2)) / 2) - c * Math.abs(hv(upWidth, y2) - hv(downWidth, y1));
    expect(Math.abs(residual(coefficient))).toBeLessThan(1e-9);
    expect(Math.abs(residual(coefficient === 0.1 ? 0.3 : 0.1))).toBeGreaterThan(1e-4);
  });
});
