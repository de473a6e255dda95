import { describe, expect, it } from 'vitest';
import { EngineError, InvalidInputError, NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { sensitivity, type Perturbation } from '@/lib/hydraulics/design/sensitivity';

// Invented stand-in model: levels rise with n and Q and fall with the weir coefficient; extent 1000 m × n factor.
const model = (p: Perturbation) => ({
  levelsAtLimits: [10 + 0.5 * (p.manningFactor - 1) + 0.8 * (p.dischargeFactor - 1) - 0.3 * (p.coefficientFactor - 1), 12 + 0.1 * (p.manningFactor - 1)],
  extent: 1000 * p.manningFactor,
});

describe('sensitivity', () => {
  it('runs the base case and the five default perturbations (n ±20 %, Q +20 %, coefficient ±10 %)', () => {
    const report = sensitivity(model);
    expect(report.base.levelsAtLimits).toEqual([10, 12]);
    expect(report.cases.map((c) => c.label)).toEqual(['manning-n-up', 'manning-n-down', 'discharge-up', 'coefficient-up', 'coefficient-down']);
    const byLabel = Object.fromEntries(report.cases.map((c) => [c.label, c]));
    expect(byLabel['manning-n-up'].perturbation).toEqual({ manningFactor: 1.2, dischargeFactor: 1, coefficientFactor: 1 });
    expect(byLabel['manning-n-up'].levelChanges![0]).toBeCloseTo(0.1, 12); // 0.5 × 0.2
    expect(byLabel['manning-n-down'].extentChange).toBeCloseTo(-200, 9);
    expect(byLabel['discharge-up'].levelChanges![0]).toBeCloseTo(0.16, 12); // 0.8 × 0.2
    expect(byLabel['coefficient-up'].levelChanges![0]).toBeCloseTo(-0.03, 12); // −0.3 × 0.1
    expect(byLabel['coefficient-down'].levelChanges![1]).toBeCloseTo(0, 12);
  });

  it('uses the percentages given', () => {
    const report = sensitivity(model, { manningN: 10, discharge: 50, coefficient: 5 });
    expect(report.cases[0].perturbation.manningFactor).toBeCloseTo(1.1, 12);
    expect(report.cases[2].perturbation.dischargeFactor).toBeCloseTo(1.5, 12);
    expect(report.cases[4].perturbation.coefficientFactor).toBeCloseTo(0.95, 12);
  });

  it('reports a perturbed case the engine cannot compute instead of stopping', () => {
    const report = sensitivity((p) => {
      if (p.dischargeFactor > 1) throw new NoPhysicalSolutionError('weir', 'drowned', 'the weir is drowned out');
      return model(p);
    });
    const failed = report.cases.find((c) => c.label === 'discharge-up')!;
    expect(failed.result).toBeNull();
    expect(failed.error).toContain('drowned out');
    expect(report.cases.filter((c) => c.error === null)).toHaveLength(4);
  });

  it('lets a failing base case and bad percentages throw', () => {
    expect(() => sensitivity(() => { throw new NoPhysicalSolutionError('x', 'y', 'z'); })).toThrow(EngineError);
    expect(() => sensitivity(model, { manningN: 100, discharge: 20, coefficient: 10 })).toThrow(InvalidInputError);
    expect(() => sensitivity(model, { manningN: -1, discharge: 20, coefficient: 10 })).toThrow(InvalidInputError);
  });
});
