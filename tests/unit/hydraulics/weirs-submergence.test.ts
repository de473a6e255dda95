import { describe, expect, it } from 'vitest';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { weirDischarge, weirHead, type WeirSpec } from '@/lib/hydraulics/weirs';
import { broadCrestedDrownedFactor, villemonteFactor } from '@/lib/hydraulics/weirs/submergence';

const G = 9.81;
const channel = prismaticSection({ shape: 'rectangular', width: 6 }, 0.03);
const weir: WeirSpec = { kind: 'sharp-crested', crestLength: 6, sillHeight: 1.5, approachVelocity: false };

/** Plain bisection, written here so that the check does not lean on the engine's own solvers. */
function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  for (let i = 0; i < 200; i++) {
    const mid = (a + b) / 2;
    if (f(a) * f(mid) <= 0) b = mid;
    else a = mid;
  }
  return (a + b) / 2;
}

/** Rehbock's free discharge, Q = (2/3)√(2g)(0.611 + 0.08 h/P)·b·h^1.5 (as quoted by Henderson, Open Channel Flow, 1966 — from memory). */
const rehbock = (h: number, p: number, b: number) => (2 / 3) * Math.sqrt(2 * G) * (0.611 + 0.08 * (h / p)) * b * h ** 1.5;

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
    const low = weirHead({ ...weir, tailwaterDepth: 1.0 }, 8, channel);
    expect(low.head).toBeCloseTo(free.head, 12);
    expect(low.submergence).toMatchObject({ tailwaterHead: 0, ratio: 0, factor: 1 });
  });

  it('the submerged head solves Rehbock·Villemonte = Q, found independently by bisection (within 0.01 %)', () => {
    const q = 8;
    const tailwater = 2.0;
    const h2 = tailwater - weir.sillHeight;
    const independent = bisect((h) => rehbock(h, weir.sillHeight, weir.crestLength) * villemonteFactor(h2 / h) - q, h2 + 1e-9, 10);
    const submerged = weirHead({ ...weir, tailwaterDepth: tailwater }, q, channel);
    expect(Math.abs(submerged.head - independent) / independent).toBeLessThan(1e-4);
    expect(submerged.submergence?.ratio).toBeCloseTo(h2 / submerged.head, 12);
    expect(weirDischarge({ ...weir, tailwaterDepth: tailwater }, submerged.head, channel)).toBeCloseTo(q, 9);
    expect(submerged.warnings.some((w) => w.includes('submerged'))).toBe(true);
  });

  it('past H₂/H₁ = 0.95 the head is still computed, above the tailwater, with a warning that says which way it errs', () => {
    const q = 2;
    const tailwater = 3.5;
    const h2 = tailwater - weir.sillHeight;
    const independent = bisect((h) => rehbock(h, weir.sillHeight, weir.crestLength) * villemonteFactor(h2 / h) - q, h2 + 1e-12, 10);
    const result = weirHead({ ...weir, tailwaterDepth: tailwater }, q, channel);
    expect(result.head).toBeGreaterThan(h2);
    expect(Math.abs(result.head - independent) / independent).toBeLessThan(1e-4);
    expect(result.submergence?.extrapolated).toBe(true);
    expect(result.warnings.join(' ')).toMatch(/past the data of the relation.*understate/);
  });

  it('a rating table takes the n of its own curve: a table of Q = 3h^2.5 matches Villemonte with n = 2.5 (within 0.1 %)', () => {
    const table: [number, number][] = Array.from({ length: 41 }, (_, i) => [i * 0.1, 3 * (i * 0.1) ** 2.5]);
    const spec: WeirSpec = { kind: 'rating-table', crestLength: 0, sillHeight: 1, ratingTable: table, tailwaterDepth: 2.2 };
    const q = 12;
    const h2 = 1.2;
    const independent = bisect((h) => 3 * h ** 2.5 * villemonteFactor(h2 / h, 2.5) - q, h2 + 1e-9, 4);
    const result = weirHead(spec, q, channel);
    expect(Math.abs(result.head - independent) / independent).toBeLessThan(1e-3);
  });
});

describe('drowned broad crest (Bos, Discharge Measurement Structures, 1989)', () => {
  const broad: WeirSpec = { kind: 'broad-crested', crestLength: 6, sillHeight: 1, crestBreadth: 4, noseShape: 'square-edged', approachVelocity: false };
  // Square-edged broad crest: Cd = 0.848 (Bos 1989; ISO 3846 — from memory).
  const cd = 0.848;
  const modular = (H: number) => cd * (2 / 3) * Math.sqrt((2 / 3) * G) * 6 * H ** 1.5;

  it('the factor is 1 up to the modular limit h₂/H₁ = 2/3 and matches r√(1 − r)/((2/3)√(1/3)) above it', () => {
    expect(broadCrestedDrownedFactor(0.5)).toBe(1);
    expect(broadCrestedDrownedFactor(2 / 3)).toBeCloseTo(1, 12);
    // Evaluated by hand: 0.8·√0.2 / 0.384900 = 0.929516.
    expect(broadCrestedDrownedFactor(0.8)).toBeCloseTo(0.929516, 5);
    expect(broadCrestedDrownedFactor(1)).toBe(0);
  });

  it('a tailwater inside the modular limit leaves the head as in free flow', () => {
    const free = weirHead(broad, 5, channel);
    const tail = weirHead({ ...broad, tailwaterDepth: 1 + 0.6 * free.head }, 5, channel);
    expect(tail.head).toBeCloseTo(free.head, 10);
    expect(tail.submergence?.modular).toBe(true);
  });

  it('above the modular limit the head solves Q = Cd·b·h₂·√(2g(H − h₂)), found independently (within 0.01 %)', () => {
    const q = 5;
    const free = weirHead(broad, q, channel);
    const h2 = 0.9 * free.head;
    const independent = bisect((H) => (h2 / H > 2 / 3 ? cd * 6 * h2 * Math.sqrt(2 * G * (H - h2)) : modular(H)) - q, h2 + 1e-9, 10);
    const drowned = weirHead({ ...broad, tailwaterDepth: 1 + h2 }, q, channel);
    expect(Math.abs(drowned.head - independent) / independent).toBeLessThan(1e-4);
    expect(drowned.head).toBeGreaterThan(free.head);
    expect(drowned.submergence?.relation).toContain('Bos 1989');
  });
});
