import { describe, expect, it } from 'vitest';
import type { ProfilePoint, ProfileRun } from '@/lib/hydraulics/profiles/profile-point';
import { convergedProfile, fixedResolutionProfile, halvingChange } from '@/lib/hydraulics/profiles/step-refinement';

/** A synthetic run with `resolution` steps whose extent carries a step error of the given order: L(1 + c/r^order). */
function syntheticRun(resolution: number, c = 1, extentTrue = 1000, order = 2): ProfileRun {
  const extent = extentTrue * (1 + c / resolution ** order);
  const points: ProfilePoint[] = [];
  for (let i = 0; i <= resolution; i++) {
    const x = (extent * i) / resolution;
    const level = 10 + 1 / (1 + x / 100);
    points.push({ distanceUpstream: x, depth: level - 9, waterLevel: level, bedLevel: 9, velocity: 1, froude: 0.2, frictionSlope: 1e-4, energyLevel: level + 0.05 });
  }
  return { points, stoppedBy: 'normal-depth', profileType: 'M1', jump: null, warnings: [] };
}

describe('convergedProfile', () => {
  it('halves the step until the extent changes by less than 0.1 % (analytic error model L(1 + 1/r²))', () => {
    // Change from r to 2r is (3/4)/r² relative: 16→32 gives 0.29 %, 32→64 gives 0.073 %, so it stops at 64 steps.
    const { run, refinement } = convergedProfile((r) => syntheticRun(r));
    expect(refinement.converged).toBe(true);
    expect(refinement.stepsUsed).toBe(64);
    expect(run.points).toHaveLength(65);
    expect(refinement.extentChangeOnHalving).toBeCloseTo(0.75 / 1024, 5);
  });

  it('stops at the cap and warns when the profile never settles', () => {
    const { run, refinement } = convergedProfile((r) => syntheticRun(r, 1e6), { maxResolution: 256 });
    expect(refinement.converged).toBe(false);
    expect(refinement.stepsUsed).toBe(256);
    expect(run.warnings.join(' ')).toContain('did not settle within 256 steps');
  });

  it('does not take a halving that adds no steps as evidence of convergence', () => {
    const stuck = syntheticRun(4);
    const { refinement } = convergedProfile(() => stuck, { maxResolution: 64 });
    expect(refinement.converged).toBe(false);
  });

  it('with the method\'s order, takes a halving\'s change over 2^p − 1 as the finer run\'s error once the changes fall at that order', () => {
    // L(1 + 3.5/r²): 16→32 changes 1.02 %, 32→64 0.256 % (a quarter: second order), whose error estimate 0.256/3 = 0.085 % is
    // below 0.1 %, so it stops at 64 steps; on the bare change it needs 64→128 (0.064 %).
    const withOrder = convergedProfile((r) => syntheticRun(r, 3.5), {}, 2);
    const without = convergedProfile((r) => syntheticRun(r, 3.5));
    expect(withOrder.refinement.stepsUsed).toBe(64);
    expect(without.refinement.stepsUsed).toBe(128);
    expect(withOrder.refinement.converged).toBe(true);
  });

  it('does not divide the change when the first halving has nothing to compare with, or the changes fall slower than the order', () => {
    // L(1 + 0.1/r): changes halve on each halving (first order), so second-order arithmetic would be optimistic.
    const firstOrder = (r: number) => syntheticRun(r, 0.1, 1000, 1);
    expect(convergedProfile(firstOrder, {}, 2).refinement.stepsUsed).toBe(128);
    expect(convergedProfile(firstOrder).refinement.stepsUsed).toBe(128);
    // 16→32 is the first halving: 0.29 % is compared as it is, even with an order.
    expect(convergedProfile((r) => syntheticRun(r, 1), { maxResolution: 32 }, 2).refinement.converged).toBe(false);
  });

  it('reports the change on one more halving for a fixed step count', () => {
    const { refinement } = fixedResolutionProfile((r) => syntheticRun(r), 8);
    expect(refinement.stepsUsed).toBe(8);
    expect(refinement.extentChangeOnHalving).toBeCloseTo((1 / 64 - 1 / 256) / (1 + 1 / 64), 9);
    expect(refinement.converged).toBe(false);
  });
});

describe('halvingChange', () => {
  it('measures the level change where both profiles reach', () => {
    const a = syntheticRun(10, 0);
    const b = { ...a, points: a.points.map((p) => ({ ...p, waterLevel: p.waterLevel + 0.002 })) };
    const change = halvingChange(a.points, b.points);
    expect(change.extentChange).toBe(0);
    expect(change.levelChange).toBeCloseTo(0.002, 12);
  });
});
