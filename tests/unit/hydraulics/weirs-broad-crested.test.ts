import { describe, expect, it } from 'vitest';
import { criticalDepth } from '@/lib/hydraulics/critical-depth';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { GRAVITY } from '@/lib/hydraulics/units';
import { weirDischarge, weirHead, type WeirSpec } from '@/lib/hydraulics/weirs';
import { roundNosedCoefficient, SQUARE_EDGED_COEFFICIENT } from '@/lib/hydraulics/weirs/broad-crested';

// Invented approach channel of our own: a 9 m trapezoidal river channel.
const river = prismaticSection({ shape: 'trapezoidal', bottomWidth: 9, sideSlope: 1.5 }, 0.03);
const BROAD_FACTOR = (2 / 3) * Math.sqrt((2 / 3) * GRAVITY);

describe('broad-crested weir (Bos 1989)', () => {
  it('uses Cd = 0.848 for a square-edged crest (Bos 1989; ISO 3846, from memory)', () => {
    expect(SQUARE_EDGED_COEFFICIENT).toBe(0.848);
  });

  it('uses Cd = 0.93 + 0.10 H/L for a round-nosed crest (Bos 1989, from memory)', () => {
    expect(roundNosedCoefficient(0.3)).toBeCloseTo(0.96, 12);
  });

  it('without the approach velocity, h = (Q / (Cd·(2/3)·√(2g/3)·b))^(2/3) exactly: 1.440834 m for Q = 20, b = 8 (by hand)', () => {
    const spec: WeirSpec = { kind: 'broad-crested', crestLength: 8, sillHeight: 1, noseShape: 'square-edged', approachVelocity: false };
    const result = weirHead(spec, 20, river);
    expect(result.head).toBeCloseTo(1.4408335244, 9);
    expect(result.coefficient).toBe(0.848);
  });

  it('round-nosed: the coefficient follows H/L at the solved head', () => {
    const spec: WeirSpec = { kind: 'broad-crested', crestLength: 8, sillHeight: 1.2, noseShape: 'round-nosed', crestBreadth: 4, approachVelocity: false };
    const result = weirHead(spec, 15, river);
    expect(result.coefficient).toBeCloseTo(0.93 + 0.1 * (result.head / 4), 12);
    expect(result.coefficient * BROAD_FACTOR * 8 * result.head ** 1.5).toBeCloseTo(15, 9);
  });

  it('with Cd = 1 the crest flows at critical depth 2/3 of the energy head (analytic: critical flow over a horizontal crest)', () => {
    const crest = prismaticSection({ shape: 'rectangular', width: 5 }, 0.015);
    const spec: WeirSpec = { kind: 'broad-crested', crestLength: 5, sillHeight: 1, coefficient: 1, approachVelocity: false };
    const q = 12;
    const result = weirHead(spec, q, river);
    expect(criticalDepth(crest, q)).toBeCloseTo((2 / 3) * result.head, 9);
  });

  it('with the approach velocity the head is smaller, and H − h = αV₀²/2g with V₀ = Q/A(P + h)', () => {
    const base: WeirSpec = { kind: 'broad-crested', crestLength: 9, sillHeight: 1.6, crestBreadth: 6 };
    const without = weirHead({ ...base, approachVelocity: false }, 42, river);
    const withV = weirHead({ ...base, approachVelocity: true }, 42, river);
    expect(withV.head).toBeLessThan(without.head);
    const area = river.stateAtDepth(1.6 + withV.head).area;
    expect(withV.approachVelocity).toBeCloseTo(42 / area, 12);
    expect(withV.energyHead - withV.head).toBeCloseTo(withV.approachVelocity ** 2 / (2 * GRAVITY), 12);
    // and the energy head satisfies the rating: Q = Cd (2/3) √(2g/3) b H^1.5
    expect(withV.coefficient * BROAD_FACTOR * 9 * withV.energyHead ** 1.5).toBeCloseTo(42, 8);
  });

  it('uses the energy coefficient α given in the options', () => {
    const spec: WeirSpec = { kind: 'broad-crested', crestLength: 9, sillHeight: 1.6, crestBreadth: 6 };
    const one = weirHead(spec, 42, river);
    const more = weirHead(spec, 42, river, { energyCoefficient: 1.3 });
    expect(more.head).toBeLessThan(one.head);
    expect(more.energyHead - more.head).toBeCloseTo((1.3 * more.approachVelocity ** 2) / (2 * GRAVITY), 12);
  });

  it('warns when H/L lies outside 0.08–0.33 for a square-edged crest (Bos 1989, from memory)', () => {
    const spec: WeirSpec = { kind: 'broad-crested', crestLength: 9, sillHeight: 1.6, crestBreadth: 1, noseShape: 'square-edged' };
    const result = weirHead(spec, 30, river);
    const ratio = result.validity.find((v) => v.name === 'energy head / crest breadth');
    expect(ratio?.ok).toBe(false);
    expect(result.warnings.some((w) => w.includes('energy head / crest breadth'))).toBe(true);
  });

  it('says when the crest breadth or nose shape had to be assumed', () => {
    const result = weirHead({ kind: 'broad-crested', crestLength: 9, sillHeight: 1.6 }, 30, river);
    expect(result.warnings.some((w) => w.includes('crest breadth was not given'))).toBe(true);
    expect(result.warnings.some((w) => w.includes('nose shape was not given'))).toBe(true);
  });

  it('forward rating inverts the head', () => {
    const spec: WeirSpec = { kind: 'broad-crested', crestLength: 9, sillHeight: 1.6, crestBreadth: 6, noseShape: 'round-nosed' };
    const result = weirHead(spec, 33, river);
    expect(weirDischarge(spec, result.head, river)).toBeCloseTo(33, 9);
  });
});
