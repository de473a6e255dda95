import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { GRAVITY } from '@/lib/hydraulics/units';
import { weirDischarge, weirHead, type WeirSpec } from '@/lib/hydraulics/weirs';

const kinds = ['sharp-crested', 'broad-crested', 'ogee'] as const;

describe('forward and inverse ratings agree', () => {
  it('weirDischarge(weirHead(Q).head) = Q for random weirs, channels and unit discharges up to 6 m²/s', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...kinds),
        fc.double({ min: 5, max: 20, noNaN: true }),
        fc.double({ min: 0.6, max: 1, noNaN: true }),
        fc.double({ min: 0.3, max: 4, noNaN: true }),
        fc.double({ min: 0.05, max: 6, noNaN: true }),
        fc.boolean(),
        fc.option(fc.double({ min: 0, max: 0.9, noNaN: true }), { nil: undefined }),
        (kind, channelWidth, crestFraction, sillHeight, unitDischarge, approachVelocity, tailwaterFraction) => {
          const discharge = unitDischarge * channelWidth * crestFraction;
          const approach = prismaticSection({ shape: 'rectangular', width: channelWidth }, 0.03);
          const spec: WeirSpec = {
            kind,
            crestLength: channelWidth * crestFraction,
            sillHeight,
            approachVelocity,
            ...(kind === 'sharp-crested' ? { channelWidth } : {}),
            ...(kind === 'broad-crested' ? { crestBreadth: 3 } : {}),
            ...(kind === 'ogee' ? { designHead: 1.5, abutmentCoefficient: 0.1 } : {}),
          };
          // A tailwater up to 0.9 of the free head keeps the solved H₂/H₁ below 0.9, short of drowning.
          if (tailwaterFraction !== undefined) {
            spec.tailwaterDepth = sillHeight + tailwaterFraction * weirHead(spec, discharge, approach).head;
          }
          const result = weirHead(spec, discharge, approach);
          expect(weirDischarge(spec, result.head, approach)).toBeCloseTo(discharge, 6);
          expect(result.head).toBeGreaterThan(0);
          expect(result.energyHead).toBeGreaterThanOrEqual(result.head);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('weirHead on any input', () => {
  it('returns finite numbers or throws a typed engine error, never NaN', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...kinds, 'rating-table' as const),
        fc.double({ min: -1, max: 30, noNaN: true }),
        fc.double({ min: -1, max: 6, noNaN: true }),
        fc.double({ min: -1, max: 500, noNaN: true }),
        fc.option(fc.double({ min: -1, max: 8, noNaN: true }), { nil: undefined }),
        fc.option(fc.double({ min: -0.5, max: 3, noNaN: true }), { nil: undefined }),
        (kind, crestLength, sillHeight, discharge, tailwaterDepth, coefficient) => {
          const approach = prismaticSection({ shape: 'trapezoidal', bottomWidth: 8, sideSlope: 2 }, 0.035);
          const spec: WeirSpec = {
            kind,
            crestLength,
            sillHeight,
            ...(tailwaterDepth === undefined ? {} : { tailwaterDepth }),
            ...(coefficient === undefined ? {} : { coefficient }),
            ...(kind === 'rating-table' ? { ratingTable: [[0, 0], [1, 20], [2, 60]] as [number, number][] } : {}),
          };
          try {
            const result = weirHead(spec, discharge, approach);
            for (const value of [result.head, result.energyHead, result.approachVelocity, result.coefficient]) {
              expect(Number.isFinite(value)).toBe(true);
            }
          } catch (error) {
            expect(error).toBeInstanceOf(EngineError);
          }
        },
      ),
      { numRuns: 400 },
    );
  });
});

describe('approach velocity', () => {
  it('lowers the head of energy-head ratings, with H − h = αV₀²/2g', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('broad-crested' as const, 'ogee' as const),
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.2, max: 5, noNaN: true }),
        (kind, sillHeight, unitDischarge) => {
          const approach = prismaticSection({ shape: 'rectangular', width: 10 }, 0.03);
          const spec: WeirSpec = { kind, crestLength: 10, sillHeight, crestBreadth: 4, designHead: 2 };
          const withV = weirHead({ ...spec, approachVelocity: true }, unitDischarge * 10, approach);
          const without = weirHead({ ...spec, approachVelocity: false }, unitDischarge * 10, approach);
          expect(withV.head).toBeLessThan(without.head);
          expect(withV.energyHead - withV.head).toBeCloseTo(withV.approachVelocity ** 2 / (2 * GRAVITY), 12);
        },
      ),
      { numRuns: 200 },
    );
  });
});
