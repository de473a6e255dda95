// A surveyed reach that narrows until the flow chokes: the standard step halves its steps towards the choke, and the
// sections it puts there must be blended from the surveys themselves, not from blends of blends.
import { describe, expect, it } from 'vitest';
import { Solver } from '@/lib/hydraulics/profiles/odex-solver';
import { stationBetween, surveyedReach } from '@/lib/hydraulics/profiles/reach-sections';
import { standardStepProfile } from '@/lib/hydraulics/profiles/standard-step';
import type { SurveyedSection } from '@/lib/hydraulics/surveyed-section';

const G = 9.80665;

describe('a step halved between two surveys', () => {
  // Invented: a wide irregular section and a narrower one whose points lie at other places across it.
  const wide = { points: [[0, 4], [3, 2.2], [7, 1.1], [11, 0.4], [15, 0], [19, 0.3], [24, 1.2], [29, 2.5], [33, 4]] as [number, number][], manningN: 0.035 };
  const narrow = { points: [[0, 4], [2.5, 1.7], [6, 0.5], [9.5, 0.1], [12, 0.6], [16, 2.9], [18, 4]] as [number, number][], manningN: 0.035 };
  const [a, b] = surveyedReach([
    { distanceUpstream: 0, survey: wide },
    { distanceUpstream: 100, survey: narrow },
  ]);

  it('blends the ground from the two surveys at the combined weight, as the direct blend does', () => {
    const half = stationBetween(a, b, 0.5);
    const threeQuarters = stationBetween(half, b, 0.5);
    const fiveEighths = stationBetween(half, threeQuarters, 0.5);
    const direct = stationBetween(a, b, 0.625);
    expect(threeQuarters.blend).toMatchObject({ from: wide, to: narrow, weight: 0.75 });
    expect(fiveEighths.blend).toMatchObject({ from: wide, to: narrow, weight: 0.625 });
    expect(fiveEighths.distanceUpstream).toBe(62.5);
    for (const depth of [0.3, 1, 2.5]) {
      const halved = fiveEighths.section.stateAtDepth(depth);
      const blended = direct.section.stateAtDepth(depth);
      expect(halved.area).toBeCloseTo(blended.area, 12);
      expect(halved.conveyance).toBeCloseTo(blended.conveyance, 9);
    }
  });

  it('keeps the blended ground as small however often the step is halved', () => {
    let near = a;
    let far = b;
    for (let halving = 0; halving < 40; halving++) [near, far] = halving % 2 === 0 ? [near, stationBetween(near, far, 0.5)] : [stationBetween(near, far, 0.5), far];
    const groundLevels = (station: typeof a) => (station.section as SurveyedSection).breakpointDepths.length;
    expect(groundLevels(far)).toBeLessThanOrEqual(groundLevels(stationBetween(a, b, 0.5)) + 2);
  });
});

describe('a surveyed reach narrowing to a choke', () => {
  // Invented: a rectangular channel 20 m wide for 100 m upstream of the control, narrowing linearly to 4 m at 200 m,
  // bed rising 1 in 1,000 upstream, n 0.03, 20 m³/s, control level 1.2 m. No transition losses, so the standard step
  // is the trapezoidal rule for dH/dx = Sf along the reach (energy H = z + y + Q²/(2g w² y²), Chow 1959 §10-4).
  const [Q, N, SLOPE] = [20, 0.03, 0.001];
  const width = (x: number) => (x <= 100 ? 20 : 20 - (16 * (x - 100)) / 100);
  const bed = (x: number) => SLOPE * x;
  const rectangle = (w: number, z: number) => ({ points: [[0, z + 3], [0, z], [w, z], [w, z + 3]] as [number, number][], manningN: N });
  const reach = surveyedReach([0, 100, 200].map((x) => ({ distanceUpstream: x, survey: rectangle(width(x), bed(x)) })));
  const profile = standardStepProfile({ reach, discharge: Q, controlLevel: 1.2, expansionCoefficient: 0, contractionCoefficient: 0 });

  /** Critical depth of a rectangle, (q²/g)^(1/3) (Chow 1959 §4-3 — from memory). */
  const criticalDepth = (x: number) => Math.cbrt((Q / width(x)) ** 2 / G);
  /** The subcritical depth with specific energy e, by bisection (critical depth when e is below the least specific energy). */
  const subcriticalDepth = (x: number, e: number) => {
    let [lo, hi] = [criticalDepth(x), Math.max(e, criticalDepth(x))];
    const energy = (y: number) => y + (Q / (width(x) * y)) ** 2 / (2 * G);
    if (energy(lo) >= e) return lo;
    for (let i = 0; i < 200; i++) [lo, hi] = energy((lo + hi) / 2) < e ? [(lo + hi) / 2, hi] : [lo, (lo + hi) / 2];
    return (lo + hi) / 2;
  };
  /** Energy level at x by odex (Hairer & Wanner's extrapolation code, from npm) on dH/dx = (Qn/(A R^(2/3)))². */
  const energyLevelAt = (x: number) => {
    const solver = new Solver(1);
    solver.relativeTolerance = 1e-11;
    solver.absoluteTolerance = 1e-11;
    solver.maxSteps = 100_000;
    const control = 1.2 + (Q / (20 * 1.2)) ** 2 / (2 * G);
    const frictionSlope = (s: number, h: number) => {
      const y = subcriticalDepth(s, h - bed(s));
      const area = width(s) * y;
      return ((Q * N) / (area * Math.pow(area / (width(s) + 2 * y), 2 / 3))) ** 2;
    };
    return solver.solve((s, [h]) => [frictionSlope(s, h)], 0, [control], x).y[0];
  };
  /** The choke: where the energy above the bed falls to the least specific energy, 1.5 times critical depth. */
  const chokeDistance = () => {
    let [lo, hi] = [100, 200];
    for (let i = 0; i < 50; i++) {
      const mid = (lo + hi) / 2;
      if (energyLevelAt(mid) - bed(mid) > 1.5 * criticalDepth(mid)) lo = mid;
      else hi = mid;
    }
    return lo;
  };

  it('stops at critical depth where an independent integration puts the choke', () => {
    expect(profile.stoppedBy).toBe('critical-depth');
    expect(profile.warnings.join(' ')).toContain('no subcritical level');
    expect(profile.refinement.converged).toBe(true);
    const last = profile.points[profile.points.length - 1];
    expect(last.distanceUpstream).toBeCloseTo(chokeDistance(), 1);
    // The march stops within a millimetre of the choke, where the depth is still a little above critical (y − yc ∝ √distance).
    expect(last.depth).toBeCloseTo(criticalDepth(last.distanceUpstream), 2);
    expect(last.depth).toBeGreaterThanOrEqual(criticalDepth(last.distanceUpstream));
  });

  it('settles under refinement instead of running to the largest number of steps', () => {
    expect(profile.refinement.stepsUsed).toBeLessThan(1000);
    expect(profile.warnings.join(' ')).not.toContain('did not settle');
  });
});
