import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { type SurveyedSectionSpec, surveyedSection } from '@/lib/hydraulics/surveyed-section';
import { integratedAreaAndMoment } from './odex-quadrature';

// All surveys below are invented shapes of our own; expected values come from plain geometry or the prismatic closed forms.
const n = 0.035;

function relative(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

function invalid(spec: SurveyedSectionSpec, field?: string): string {
  try {
    surveyedSection(spec, field ? { field } : {});
  } catch (error) {
    if (error instanceof InvalidInputError) return error.field;
    throw error;
  }
  return 'no error';
}

function manning(area: number, perimeter: number, roughness: number): number {
  // K = A R^(2/3) / n (Manning 1891; Chow 1959 eq. 5-6, from memory)
  return (area * (area / perimeter) ** (2 / 3)) / roughness;
}

describe('a surveyed polygon of a prismatic shape reproduces its closed forms', () => {
  const cases = [
    { name: 'rectangle with vertical walls', points: [[0, 103], [0, 100], [4, 100], [4, 103]], prismatic: prismaticSection({ shape: 'rectangular', width: 4 }, n) },
    {
      name: 'trapezoid with unequal side slopes',
      points: [[0, 102], [2, 100], [4, 100], [10, 102]],
      prismatic: prismaticSection({ shape: 'trapezoidal', bottomWidth: 2, sideSlopeLeft: 1, sideSlopeRight: 3 }, n),
    },
    { name: 'triangle', points: [[0, 102], [4, 100], [6, 102]], prismatic: prismaticSection({ shape: 'triangular', sideSlopeLeft: 2, sideSlopeRight: 1 }, n) },
  ] as const;

  for (const { name, points, prismatic } of cases) {
    it(name, () => {
      const surveyed = surveyedSection({ points: points.map(([x, z]) => [x, z] as [number, number]), manningN: n });
      expect(surveyed.invertLevel).toBe(100);
      for (const depth of [0.25, 1, 1.3, 1.999]) {
        const expected = prismatic.stateAtDepth(depth);
        const actual = surveyed.stateAtLevel(100 + depth);
        expect(actual.depth).toBeCloseTo(depth, 12);
        for (const key of ['area', 'wettedPerimeter', 'topWidth', 'firstMoment', 'conveyance', 'hydraulicRadius', 'hydraulicDepth'] as const) {
          expect(relative(actual[key], expected[key])).toBeLessThan(1e-12);
        }
        expect(actual.energyCoefficient).toBe(1);
        expect(surveyed.stateAtDepth(depth).area).toBeCloseTo(expected.area, 12);
      }
    });
  }
});

describe('polygon clipping', () => {
  it('counts every pocket below the water surface, each clipped exactly', () => {
    // W-shaped ground: at level 1 two triangular pockets, each 1.5 m wide and 1 m deep (A = 0.75 m² each).
    const w = surveyedSection({ points: [[0, 4], [2, 0], [4, 2], [6, 0], [8, 4]], manningN: n });
    const state = w.stateAtLevel(1);
    expect(state.area).toBeCloseTo(1.5, 12);
    expect(state.topWidth).toBeCloseTo(3, 12);
    // Wetted ground: per pocket √(0.5² + 1²) + √(1² + 1²) (plain geometry).
    expect(state.wettedPerimeter).toBeCloseTo(2 * (Math.hypot(0.5, 1) + Math.SQRT2), 12);
  });

  it('treats ground exactly at the water surface as dry, and wets it as soon as the water rises', () => {
    const berm = surveyedSection({ points: [[0, 3], [0, 2], [10, 2], [10, 0], [14, 0], [14, 3]], manningN: n });
    expect(berm.stateAtLevel(2).topWidth).toBeCloseTo(4, 12);
    expect(berm.stateAtLevel(2 + 1e-9).topWidth).toBeCloseTo(14, 6);
    expect(berm.breakpointDepths).toEqual([2, 3]);
  });

  it('area and first moment agree with odex integration of the section’s own top width (dA/dy = T, dM/dy = A)', () => {
    const ground = surveyedSection({ points: [[0, 3.2], [1.5, 0.4], [3, 0], [5, 0.9], [9, 2.9]], manningN: n });
    for (const depth of [0.3, 1.1, 2.5]) {
      const integrated = integratedAreaAndMoment((eta) => ground.stateAtDepth(eta).topWidth, depth);
      const state = ground.stateAtDepth(depth);
      expect(relative(state.area, integrated.area)).toBeLessThan(1e-8);
      expect(relative(state.firstMoment, integrated.firstMoment)).toBeLessThan(1e-8);
    }
  });
});

describe('overtopping', () => {
  // Left end at 3 m, right end at 2 m: the survey holds water up to 2 m.
  const section = surveyedSection({ points: [[0, 3], [1, 0], [5, 0], [6, 2]], manningN: n });

  it('reports the lower end level and the depth range', () => {
    expect(section.lowerEndLevel).toBe(2);
    expect(section.maxDepth).toBe(2);
    expect(section.stateAtLevel(2).overtopped).toBe(false);
  });

  it('flags a level above the lower end and never extends the survey', () => {
    const state = section.stateAtLevel(2.5);
    expect(state.overtopped).toBe(true);
    // Wet from x = 1/6 to 6 only: left 5/6·2.5/2, bed 4·2.5, right 1·(2.5 + 0.5)/2 (plain geometry).
    expect(state.topWidth).toBeCloseTo(6 - 1 / 6, 12);
    expect(state.area).toBeCloseTo(((5 / 6) * 2.5) / 2 + 10 + 1.5, 12);
  });

  it('rejects a level below the lowest ground point', () => {
    expect(() => section.stateAtLevel(-0.01)).toThrow(InvalidInputError);
  });
});

describe('divided-channel conveyance and energy coefficient', () => {
  // A 4 m wide, 2 m deep main channel between flat overbanks 10 m (left) and 16 m (right) wide.
  const spec: SurveyedSectionSpec = {
    points: [[0, 3], [0, 2], [10, 2], [10, 0], [14, 0], [14, 2], [30, 2], [30, 3]],
    manningN: { left: 0.05, channel: 0.03, right: 0.04 },
    bankStations: [10, 14],
  };
  const section = surveyedSection(spec);

  it('sums the conveyance of the sub-areas without counting the vertical divisions as wetted perimeter', () => {
    const state = section.stateAtLevel(2.5);
    // Left: A = 10·0.5, P = 0.5 + 10; channel: A = 4·2.5, P = 2 + 4 + 2; right: A = 16·0.5, P = 16 + 0.5 (plain geometry).
    const parts = [manning(5, 10.5, 0.05), manning(10, 8, 0.03), manning(8, 16.5, 0.04)];
    expect(state.area).toBeCloseTo(23, 12);
    expect(state.wettedPerimeter).toBeCloseTo(35, 12);
    expect(relative(state.conveyance, parts[0] + parts[1] + parts[2])).toBeLessThan(1e-12);
    // α = (Σ Kᵢ³/Aᵢ²) / (K³/A²) (Chow 1959, definition of α applied to sub-areas, from memory).
    const k = parts[0] + parts[1] + parts[2];
    const alpha = (parts[0] ** 3 / 5 ** 2 + parts[1] ** 3 / 10 ** 2 + parts[2] ** 3 / 8 ** 2) / (k ** 3 / 23 ** 2);
    expect(relative(state.energyCoefficient, alpha)).toBeLessThan(1e-12);
    expect(state.energyCoefficient).toBeGreaterThan(1.2);
  });

  it('has α = 1 while only the main channel is wet, and reports the bank levels', () => {
    expect(section.stateAtLevel(1.5).energyCoefficient).toBe(1);
    expect(section.bankLevels).toEqual({ left: 2, right: 2 });
  });

  it('inserts bank stations that fall between points without changing area, width or perimeter', () => {
    const whole = surveyedSection({ points: [[0, 2], [2, 0], [4, 0], [6, 2]], manningN: n }).stateAtLevel(1.5);
    const divided = surveyedSection({ points: [[0, 2], [2, 0], [4, 0], [6, 2]], manningN: n, bankStations: [1, 5] });
    const state = divided.stateAtLevel(1.5);
    expect(state.area).toBeCloseTo(whole.area, 12);
    expect(state.topWidth).toBeCloseTo(whole.topWidth, 12);
    expect(state.wettedPerimeter).toBeCloseTo(whole.wettedPerimeter, 12);
    expect(divided.bankLevels).toEqual({ left: 1, right: 1 });
    // Sub-areas at level 1.5: banks x 0.5–1 (A = 0.125, P = 0.5√2 each side), channel x 1–5 (A = 5, P = 2 + 2√2) (plain geometry).
    const expected = 2 * manning(0.125, 0.5 * Math.SQRT2, n) + manning(5, 2 + 2 * Math.SQRT2, n);
    expect(relative(state.conveyance, expected)).toBeLessThan(1e-12);
    expect(relative(whole.conveyance, manning(whole.area, whole.wettedPerimeter, n))).toBeLessThan(1e-12);
  });

  it('without bank stations uses the section ends as bank levels', () => {
    expect(surveyedSection({ points: [[0, 3], [1, 0], [5, 0], [6, 2]], manningN: n }).bankLevels).toEqual({ left: 3, right: 2 });
  });
});

describe('invalid surveys name the field', () => {
  const good: [number, number][] = [[0, 2], [1, 0], [2, 2]];

  it('checks the points', () => {
    expect(invalid({ points: [[0, 1], [1, 0]], manningN: n })).toBe('reach.section.points');
    expect(invalid({ points: [[0, 2], [2, 0], [1, 2]], manningN: n })).toBe('reach.section.points[2].station');
    expect(invalid({ points: [[0, 2], [1, Number.NaN], [2, 2]], manningN: n })).toBe('reach.section.points[1].elevation');
    expect(invalid({ points: [[0, 0], [1, 1], [2, 2]], manningN: n })).toBe('reach.section.points');
    expect(invalid({ points: [[0, 2], [0, 0], [0, 2]], manningN: n })).toBe('reach.section.points');
    expect(invalid({ points: [[0, 2], [1, 2], [2, 2]], manningN: n })).toBe('reach.section.points');
  });

  it('checks roughness and bank stations', () => {
    expect(invalid({ points: good, manningN: 0 })).toBe('reach.section.manningN');
    expect(invalid({ points: good, manningN: { left: -1, channel: 0.03, right: 0.04 }, bankStations: [0.5, 1.5] })).toBe('reach.section.manningN.left');
    expect(invalid({ points: good, manningN: { left: 0.05, channel: 0.03, right: 0.04 } })).toBe('reach.section.bankStations');
    expect(invalid({ points: good, manningN: n, bankStations: [-1, 1] })).toBe('reach.section.bankStations');
    expect(invalid({ points: good, manningN: n, bankStations: [1.5, 0.5] })).toBe('reach.section.bankStations');
  });

  it('uses the path prefix given by the caller', () => {
    expect(invalid({ points: [[0, 2], [2, 0], [1, 2]], manningN: n }, 'reach.sections[2]')).toBe('reach.sections[2].points[2].station');
  });

  it('accepts vertical walls (equal stations)', () => {
    expect(invalid({ points: [[0, 2], [0, 0], [1, 0], [1, 2]], manningN: n })).toBe('no error');
  });
});
