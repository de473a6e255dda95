import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { interpolatedGround, interpolatedSurvey } from '@/lib/hydraulics/profiles/survey-interpolation';
import type { FroudeFactorBounds } from '@/lib/hydraulics/section-sample';
import { sectionOfGround, surveyedSection } from '@/lib/hydraulics/surveyed-section';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { randomSurvey as survey } from './random-surveys';
import { caught } from './test-helpers';

describe('bounds on αT/A³ over a range of depths (for the critical-depth scan)', () => {
  it('hold at every depth in the range, against the section’s own α, T and A there', () => {
    fc.assert(
      fc.property(survey, fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (spec, u, v) => {
        const section = surveyedSection(spec);
        const [from, to] = [Math.min(u, v), Math.max(u, v)].map((t) => section.maxDepth * (1e-6 + (1 - 1e-6) * t));
        const bounds: FroudeFactorBounds = { least: NaN, most: NaN };
        section.froudeFactorBoundsInto!(from, to, bounds);
        for (let k = 0; k <= 20; k++) {
          const state = section.stateAtDepth(from + ((to - from) * k) / 20);
          // In a notch of no width the water has no area and αT/A³ no value; the scan evaluates such depths itself.
          if (!(state.area > 0)) continue;
          const factor = (state.energyCoefficient * state.topWidth) / state.area ** 3;
          expect(factor).toBeGreaterThanOrEqual(bounds.least * (1 - 1e-9));
          expect(factor).toBeLessThanOrEqual(bounds.most * (1 + 1e-9));
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe('a section built from interpolated ground without checking it again', () => {
  it('has the same properties as one built from the same survey through every check', () => {
    fc.assert(
      fc.property(survey, survey, fc.double({ min: 0.05, max: 0.95, noNaN: true }), (a, b, weight) => {
        let checked;
        try {
          checked = surveyedSection(interpolatedSurvey(a, b, weight));
        } catch (error) {
          // A blend that loses the low point between the ends is refused on both paths, with the same field.
          expect(caught(() => interpolatedGround(a, b, weight)).field).toBe((error as InvalidInputError).field);
          return;
        }
        const trusted = sectionOfGround(interpolatedGround(a, b, weight));
        expect(trusted.invertLevel).toBe(checked.invertLevel);
        expect(trusted.maxDepth).toBe(checked.maxDepth);
        expect(trusted.breakpointDepths).toEqual(checked.breakpointDepths);
        for (const t of [0.1, 0.5, 1]) expect(trusted.stateAtDepth(t * trusted.maxDepth)).toEqual(checked.stateAtDepth(t * checked.maxDepth));
      }),
      { numRuns: 200 },
    );
  });

  it('refuses interpolated ground that cannot hold water, naming the field', () => {
    // Invented: a channel at the left of one survey and at the right of the other, each under a bank far higher than
    // the ends; halfway, every blended point lies at or above the ends (105, 110, 120, 120, 110, 105 m).
    const left = { points: [[0, 105], [1, 100], [2, 120], [9, 120], [10, 105]] as [number, number][], manningN: 0.03 };
    const right = { points: [[0, 105], [1, 120], [8, 120], [9, 100], [10, 105]] as [number, number][], manningN: 0.03 };
    const error = caught(() => interpolatedGround(left, right, 0.5));
    expect(error).toBeInstanceOf(InvalidInputError);
    expect(error.field).toBe('reach.sections.points');
  });
});
