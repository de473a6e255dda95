// The proof that a depth lies above every critical depth, and the energy balance that relies on it to skip the search.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { aboveEveryCriticalDepth } from '@/lib/hydraulics/above-critical';
import { criticalDepth, criticalDepths } from '@/lib/hydraulics/critical-depth';
import { EngineError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { upstreamDepth } from '@/lib/hydraulics/profiles/energy-balance';
import { surveyedReach } from '@/lib/hydraulics/profiles/reach-sections';
import { brentRoot } from '@/lib/hydraulics/solvers';
import { surveyedSection } from '@/lib/hydraulics/surveyed-section';
import { randomSurvey } from './random-surveys';

const G = 9.80665;

function everyCriticalDepth(section: ReturnType<typeof surveyedSection>, discharge: number): number[] | null {
  try {
    return criticalDepths(section, discharge);
  } catch (error) {
    if (error instanceof EngineError && error.code === 'section-overtopped') return null;
    throw error;
  }
}

describe('a depth proven above every critical depth', () => {
  it('is never below one, on random compound grounds (critical depths found by the full search, Fr = 1)', () => {
    let proven = 0;
    fc.assert(
      fc.property(randomSurvey, fc.double({ min: 0.05, max: 200, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (spec, discharge, fraction) => {
        const section = surveyedSection(spec);
        const depth = fraction * section.maxDepth;
        if (!aboveEveryCriticalDepth(section, discharge, depth)) return;
        proven++;
        const roots = everyCriticalDepth(section, discharge);
        // A slit of no width at the invert holds water without area, and the full search finds no critical depth in it.
        if (roots === null && !(section.stateAtDepth(1e-3 * section.maxDepth).area > 0)) return;
        expect(roots).not.toBeNull();
        for (const root of roots!) expect(root).toBeLessThan(depth);
      }),
      { numRuns: 400 },
    );
    // Not vacuous: most random depths well above critical are proven.
    expect(proven).toBeGreaterThan(40);
  });

  it('is proven well above critical depth and not below it, in an invented channel with berms', () => {
    // Invented: a 12 m channel 2 m deep with berms 15 m wide either side, 4 m to the top; n 0.035 and 0.06.
    const section = surveyedSection({
      points: [[0, 104], [2, 102], [17, 102], [19, 100], [31, 100], [33, 102], [48, 102], [50, 104]],
      manningN: { left: 0.06, channel: 0.035, right: 0.06 },
      bankStations: [19, 31],
    });
    const yc = criticalDepth(section, 30);
    expect(aboveEveryCriticalDepth(section, 30, 3 * yc)).toBe(true);
    expect(aboveEveryCriticalDepth(section, 30, 0.9 * yc)).toBe(false);
    // A section without bounds (a prismatic shape) is never proven, and its critical depth is found as before.
    expect(aboveEveryCriticalDepth(prismaticSection({ shape: 'rectangular', width: 5 }, 0.02), 8, 3)).toBe(false);
  });
});

describe('the energy balance without the critical-depth search', () => {
  // Invented: two surveyed sections 25 m apart, the upstream one a little narrower and higher.
  const downstream = { points: [[0, 104], [4, 101.2], [9, 100.1], [15, 100], [21, 100.4], [26, 101.6], [30, 104]] as [number, number][], manningN: { left: 0.05, channel: 0.032, right: 0.05 }, bankStations: [4, 26] as [number, number] };
  const upstream = { points: [[0, 104.1], [3, 101.5], [8, 100.3], [13, 100.05], [18, 100.6], [24, 101.9], [27, 104.1]] as [number, number][], manningN: { left: 0.05, channel: 0.032, right: 0.05 }, bankStations: [3, 24] as [number, number] };
  const [down, up] = surveyedReach([
    { distanceUpstream: 0, survey: downstream },
    { distanceUpstream: 25, survey: upstream },
  ]);
  const settings = { discharge: 40, frictionAveraging: 'average-conveyance' as const, expansionCoefficient: 0.3, contractionCoefficient: 0.1 };

  /** WS₂ + α₂V₂²/2g − (WS₁ + α₁V₁²/2g) − L·(Q/K̄)² − C·|Δhv| (Chow 1959 §10-4), written out from the sections' own states. */
  const residual = (downDepth: number) => (depth: number) => {
    const head = (state: { area: number; energyCoefficient: number }) => (state.energyCoefficient * settings.discharge ** 2) / (2 * G * state.area ** 2);
    const [d, u] = [down.section.stateAtDepth(downDepth), up.section.stateAtDepth(depth)];
    const friction = 25 * (settings.discharge / ((d.conveyance + u.conveyance) / 2)) ** 2;
    const loss = (head(d) < head(u) ? 0.3 : 0.1) * Math.abs(head(u) - head(d));
    return up.bedLevel + depth + head(u) - (down.bedLevel + downDepth + head(d)) - friction - loss;
  };

  it.each([1.2, 2, 3.1])('finds the subcritical level a search from critical depth finds, downstream depth %s m', (downDepth) => {
    const result = upstreamDepth(down, downDepth, up, settings);
    expect(result.kind).toBe('level');
    const depth = (result as { depth: number }).depth;
    const critical = criticalDepth(up.section, settings.discharge);
    const fromCritical = brentRoot(residual(downDepth), critical, up.section.maxDepth, { tolerance: 1e-13 });
    expect(depth).toBeGreaterThan(critical);
    expect(Math.abs(depth - fromCritical)).toBeLessThan(1e-9);
  });
});
