import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { prismaticReach, refinedReach, surveyedReach } from '@/lib/hydraulics/profiles/reach-sections';
import { isPrismaticReach, meanBedSlope } from '@/lib/hydraulics/profiles/reach-geometry';
import { interpolatedSurvey } from '@/lib/hydraulics/profiles/survey-interpolation';
import { surveyedSection } from '@/lib/hydraulics/surveyed-section';

// Invented compound sections: a channel with floodplains, zoned roughness, bank stations.
const upstream = {
  points: [[0, 104], [20, 102.5], [40, 102], [45, 99], [60, 99], [65, 102], [90, 102.4], [110, 104]] as [number, number][],
  manningN: { left: 0.06, channel: 0.03, right: 0.05 },
  bankStations: [40, 65] as [number, number],
};
const downstream = {
  points: [[0, 103.5], [30, 101.5], [50, 101.2], [52, 98], [70, 98], [74, 101.2], [100, 103.5]] as [number, number][],
  manningN: { left: 0.07, channel: 0.035, right: 0.06 },
  bankStations: [50, 74] as [number, number],
};

describe('interpolatedSurvey', () => {
  it.each([0, 1])('reproduces the end sections at weight %i', (weight) => {
    const original = surveyedSection(weight === 0 ? downstream : upstream);
    const blended = surveyedSection(interpolatedSurvey(downstream, upstream, weight));
    for (const level of [99.5, 101, 102.3, 103]) {
      const a = original.stateAtLevel(level);
      const b = blended.stateAtLevel(level);
      expect(b.area).toBeCloseTo(a.area, 9);
      expect(b.topWidth).toBeCloseTo(a.topWidth, 9);
      expect(b.conveyance).toBeCloseTo(a.conveyance, 6);
    }
  });

  it('lies between the two at the midpoint: invert, banks and roughness blended halfway', () => {
    const middle = interpolatedSurvey(downstream, upstream, 0.5);
    expect(surveyedSection(middle).invertLevel).toBeCloseTo(98.5, 12);
    expect(middle.bankStations).toEqual([45, 69.5]);
    expect(middle.manningN).toEqual({ left: 0.065, channel: 0.0325, right: 0.055 });
  });
});

describe('reaches', () => {
  it('builds a prismatic reach with stations at most the spacing apart and the bed rising upstream', () => {
    const section = prismaticSection({ shape: 'rectangular', width: 4 }, 0.02);
    const reach = prismaticReach({ section, bedSlope: 0.001, bedLevelAtControl: 5, reachLength: 1000, spacing: 300 });
    expect(reach.map((s) => s.distanceUpstream)).toEqual([0, 250, 500, 750, 1000]);
    expect(reach[4].bedLevel).toBeCloseTo(6, 12);
    expect(isPrismaticReach(reach)).toBe(true);
    expect(meanBedSlope(reach)).toBeCloseTo(0.001, 12);
  });

  it('refines a surveyed reach with interpolated sections', () => {
    const reach = surveyedReach([
      { distanceUpstream: 0, survey: downstream },
      { distanceUpstream: 400, survey: upstream },
    ]);
    expect(isPrismaticReach(reach)).toBe(false);
    const { stations, warnings } = refinedReach(reach, 100);
    expect(warnings).toEqual([]);
    expect(stations.map((s) => s.distanceUpstream)).toEqual([0, 100, 200, 300, 400]);
    expect(stations[2].bedLevel).toBeCloseTo(98.5, 12);
  });

  it('rejects sections out of order or not starting at the control', () => {
    expect(() => surveyedReach([{ distanceUpstream: 5, survey: downstream }, { distanceUpstream: 400, survey: upstream }])).toThrow(InvalidInputError);
    expect(() => surveyedReach([{ distanceUpstream: 0, survey: downstream }, { distanceUpstream: 0, survey: upstream }])).toThrow(InvalidInputError);
  });
});
