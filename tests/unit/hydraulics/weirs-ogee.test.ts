import { describe, expect, it } from 'vitest';
import { NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { weirHead, type WeirSpec } from '@/lib/hydraulics/weirs';
import { ogeeDesignCoefficient, ogeeHeadRatioFactor } from '@/lib/hydraulics/weirs/ogee-coefficients';
import { ogeeEffectiveLength } from '@/lib/hydraulics/weirs/ogee';

// Invented approach: a wide rectangular reservoir inlet of our own.
const inlet = prismaticSection({ shape: 'rectangular', width: 20 }, 0.03);

describe('ogee spillway (USBR, Design of Small Dams, 1987, ch. 9)', () => {
  it('effective length Le = L′ − 2(N·Kp + Ka)·He: 20 − 2(2·0.01 + 0.1)·2 = 19.52 m (worked arithmetic)', () => {
    expect(ogeeEffectiveLength(20, 2, 0.01, 0.1, 2)).toBeCloseTo(19.52, 12);
  });

  it('design coefficient tends to 3.95 ft^0.5/s = 2.18 m^0.5/s for a deep approach (USBR 1987 Fig. 9-23, from memory)', () => {
    expect(ogeeDesignCoefficient(5)).toBeCloseTo(2.1807, 3);
    expect(ogeeDesignCoefficient(0.2)).toBeLessThan(ogeeDesignCoefficient(1));
  });

  it('the head-ratio factor is 1 at the design head and below 1 under it (USBR 1987 Fig. 9-24, from memory)', () => {
    expect(ogeeHeadRatioFactor(1)).toBe(1);
    expect(ogeeHeadRatioFactor(0.5)).toBeLessThan(1);
    expect(ogeeHeadRatioFactor(1.3)).toBeGreaterThan(1);
  });

  it('with a user C and no contractions, He = (Q / (C·L))^(2/3) exactly (analytic)', () => {
    const spec: WeirSpec = { kind: 'ogee', crestLength: 20, sillHeight: 4, coefficient: 2.1, abutmentCoefficient: 0, approachVelocity: false };
    expect(weirHead(spec, 60, inlet).head).toBeCloseTo((60 / (2.1 * 20)) ** (2 / 3), 12);
  });

  it('with piers and abutments, Q = C·(L′ − 2(N·Kp + Ka)·He)·He^1.5 at the solved head', () => {
    const spec: WeirSpec = {
      kind: 'ogee', crestLength: 20, sillHeight: 4, coefficient: 2.1, piers: { count: 2, coefficient: 0.01 }, abutmentCoefficient: 0.1, approachVelocity: false,
    };
    const { head } = weirHead(spec, 60, inlet);
    expect(2.1 * ogeeEffectiveLength(20, 2, 0.01, 0.1, head) * head ** 1.5).toBeCloseTo(60, 9);
  });

  it('without a design head the coefficient is the design coefficient at P/He', () => {
    const spec: WeirSpec = { kind: 'ogee', crestLength: 20, sillHeight: 4, abutmentCoefficient: 0 };
    const result = weirHead(spec, 60, inlet);
    expect(result.coefficient).toBeCloseTo(ogeeDesignCoefficient(4 / result.energyHead), 12);
  });

  it('a head below the design head gets a smaller coefficient, so a higher head than at design', () => {
    const atDesign = weirHead({ kind: 'ogee', crestLength: 20, sillHeight: 4, abutmentCoefficient: 0 }, 30, inlet);
    const belowDesign = weirHead({ kind: 'ogee', crestLength: 20, sillHeight: 4, abutmentCoefficient: 0, designHead: 3 }, 30, inlet);
    expect(belowDesign.coefficient).toBeLessThan(atDesign.coefficient);
    expect(belowDesign.head).toBeGreaterThan(atDesign.head);
  });

  it('assumes the largest pier and abutment coefficients when none is given, and says so', () => {
    const result = weirHead({ kind: 'ogee', crestLength: 20, sillHeight: 4, piers: { count: 3 } }, 60, inlet);
    expect(result.warnings.some((w) => w.includes('Kp = 0.02'))).toBe(true);
    expect(result.warnings.some((w) => w.includes('Ka = 0.2'))).toBe(true);
  });

  it('explains a crest that cannot pass the flow at any head', () => {
    const spec: WeirSpec = { kind: 'ogee', crestLength: 0.5, sillHeight: 4, coefficient: 2.1, piers: { count: 4, coefficient: 0.02 }, abutmentCoefficient: 0.2 };
    expect(() => weirHead(spec, 500, inlet)).toThrow(NoPhysicalSolutionError);
  });
});
