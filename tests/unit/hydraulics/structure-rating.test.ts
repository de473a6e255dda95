import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { RATING_POINTS, structureRating } from '@/lib/hydraulics/structure-rating';
import type { CaseInput } from '@/lib/validation/case-schema';
import { parseCase } from '@/lib/validation/parse-case';

const G = 9.80665;

function caseOf(raw: unknown): CaseInput {
  const parsed = parseCase(raw);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed.value;
}

// Invented for this test (the Wendle at Harrowfield): a rectangular channel and a broad-crested weir with the designer's
// own coefficient, no approach velocity and a sill high enough that the flow over it is free.
const plainWeir = caseOf({
  format: 'sillmark-case',
  version: 1,
  units: 'SI',
  reach: { kind: 'prismatic', section: { shape: 'rectangular', width: 8 }, manningN: 0.035, bedSlope: 0.001, length: 3000, bedLevelAtControl: 40 },
  events: [{ name: '50% AEP', discharge: 6 }, { name: '1% AEP', discharge: 20, climateChangeAllowance: 25 }],
  control: { type: 'weir', kind: 'broad-crested', crestLength: 8, sillHeight: 2, crestBreadth: 3, approachVelocity: false, coefficient: 0.9, coefficientReason: 'test value' },
  limits: [],
});

describe('the structure rating across the range of the events', () => {
  const rating = structureRating(plainWeir);

  it('spans a quarter of the smallest to 1.25 times the largest design discharge, with each event marked at its own', () => {
    expect(rating.points).toHaveLength(RATING_POINTS + 2);
    expect(rating.points[0].discharge).toBeCloseTo(6 * 0.25, 9);
    expect(rating.points.at(-1)!.discharge).toBeCloseTo(25 * 1.25, 9);
    expect(rating.points.filter((p) => p.event).map((p) => [p.event, p.discharge])).toEqual([['50% AEP', 6], ['1% AEP', 25]]);
    rating.points.forEach((p, i) => i > 0 && expect(p.discharge).toBeGreaterThan(rating.points[i - 1].discharge));
  });

  it('follows the broad-crested weir equation Q = Cd·(2/3)·√(2g/3)·b·H^1.5 in free flow', () => {
    // Broad-crested weir with critical depth on the crest: Henderson, Open Channel Flow, 1966, §6.6 (from memory; the
    // form is common practice). With no approach velocity the head is the energy head.
    for (const p of rating.points) {
      expect(p.controls).toBe(true);
      expect(0.9 * (2 / 3) * Math.sqrt((2 * G) / 3) * 8 * p.head ** 1.5).toBeCloseTo(p.discharge, 6);
      expect(p.upstreamLevel).toBeCloseTo(40 + 2 + p.head, 9);
    }
    expect(rating.crestLevel).toBeCloseTo(42, 12);
  });

  it('agrees with the evaluated events at their own discharges', () => {
    const result = evaluateCase(plainWeir);
    for (const event of result.events) {
      const point = rating.points.find((p) => p.event === event.name)!;
      expect(point.head).toBeCloseTo(event.control.head, 9);
      expect(point.upstreamLevel).toBeCloseTo(event.control.level, 9);
    }
  });

  it('works in the case’s own units: a US case rates in ft and ft³/s', () => {
    const us = caseOf(JSON.parse(readFileSync(join(__dirname, '../../../db/seeds/cases/wendle-harrowfield-us-customary.json'), 'utf8')));
    const result = evaluateCase(us);
    const usRating = structureRating(us);
    for (const event of result.events) {
      const point = usRating.points.find((p) => p.event === event.name)!;
      expect(point.discharge).toBeCloseTo(event.discharge, 6);
      expect(point.upstreamLevel).toBeCloseTo(event.control.level, 6);
    }
  });

  it('marks an event routed through a reservoir at its peak inflow, and says so', () => {
    const pond = caseOf(JSON.parse(readFileSync(join(__dirname, '../../../db/seeds/cases/wendle-harrowfield-reservoir-spillway.json'), 'utf8')));
    const marked = structureRating(pond).points.filter((p) => p.event !== null);
    expect(marked.length).toBe(pond.events.length);
    for (const p of marked) {
      expect(p.event).toMatch(/\(peak inflow, before the storage\)$/);
      expect(Number.isFinite(p.head) && Number.isFinite(p.upstreamLevel)).toBe(true);
    }
  });

  it('refuses a given depth, which has no rating', () => {
    expect(() => structureRating({ ...plainWeir, control: { type: 'depth', depth: 2 } } as CaseInput)).toThrow(InvalidInputError);
  });
});
