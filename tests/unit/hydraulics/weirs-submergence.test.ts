import { describe, expect, it } from 'vitest';
import { NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { weirDischarge, weirHead, type WeirSpec } from '@/lib/hydraulics/weirs';
import { villemonteFactor } from '@/lib/hydraulics/weirs/submergence';

const channel = prismaticSection({ shape: 'rectangular', width: 6 }, 0.03);
const weir: WeirSpec = { kind: 'sharp-crested', crestLength: 6, sillHeight: 1.5, approachVelocity: false };

describe('Villemonte submergence (Villemonte 1947)', () => {
  it('reduction factor (1 − r^1.5)^0.385 at a few ratios (analytic, evaluated by hand)', () => {
    expect(villemonteFactor(0)).toBe(1);
    expect(villemonteFactor(0.2)).toBeCloseTo(0.964569, 6);
    expect(villemonteFactor(0.5)).toBeCloseTo(0.845386, 6);
    expect(villemonteFactor(0.8)).toBeCloseTo(0.616307, 6);
    expect(villemonteFactor(0.9)).toBeCloseTo(0.476966, 6);
    expect(villemonteFactor(1)).toBe(0);
  });

  it('a tailwater below the crest leaves the weir free', () => {
    const free = weirHead(weir, 8, channel);
    const low = weirHead({ ...weir, tailwaterLevel: 1.0 }, 8, channel);
    expect(low.head).toBeCloseTo(free.head, 12);
    expect(low.submergence).toEqual({ tailwaterHead: 0, ratio: 0, factor: 1 });
  });

  it('a submerged weir needs a higher head, and Q = Q_free(h)·factor at that head', () => {
    const free = weirHead(weir, 8, channel);
    const submerged = weirHead({ ...weir, tailwaterLevel: 2.0 }, 8, channel);
    expect(submerged.head).toBeGreaterThan(free.head);
    const sub = submerged.submergence;
    expect(sub?.tailwaterHead).toBeCloseTo(0.5, 12);
    expect(sub?.ratio).toBeCloseTo(0.5 / submerged.head, 12);
    expect(weirDischarge(weir, submerged.head, channel) * (sub?.factor ?? NaN)).toBeCloseTo(8, 9);
    expect(submerged.warnings.some((w) => w.includes('submerged'))).toBe(true);
  });

  it('a weir drowned beyond H₂/H₁ = 0.95 is an explained error naming the tailwater', () => {
    const attempt = () => weirHead({ ...weir, tailwaterLevel: 3.5 }, 2, channel);
    expect(attempt).toThrow(NoPhysicalSolutionError);
    try {
      attempt();
    } catch (error) {
      expect(error).toBeInstanceOf(NoPhysicalSolutionError);
      expect((error as NoPhysicalSolutionError).code).toBe('weir-drowned');
      expect((error as NoPhysicalSolutionError).field).toBe('control.tailwaterLevel');
    }
  });
});
