import { describe, expect, it } from 'vitest';
import { EngineError } from '@/lib/hydraulics/errors';
import { brentRoot, expandBracketUpward } from '@/lib/hydraulics/solvers';

function codeOf(action: () => unknown): string | undefined {
  try {
    action();
  } catch (error) {
    if (error instanceof EngineError) return error.code;
    throw error;
  }
  return undefined;
}

describe('brentRoot', () => {
  it('finds the fixed point of cos x', () => {
    // Dottie number, the root of cos x = x: 0.7390851332151607 (from memory), also checked by its residual.
    const root = brentRoot((x) => Math.cos(x) - x, 0, 1);
    expect(Math.abs(root - 0.7390851332151607)).toBeLessThan(1e-12);
    const precise = brentRoot((x) => Math.cos(x) - x, 0, 1, { tolerance: 1e-16 });
    expect(Math.abs(Math.cos(precise) - precise)).toBeLessThan(1e-15);
  });

  it("solves Wallis's cubic x³ − 2x − 5 = 0", () => {
    // Real root 2.0945514815423265 (the classic example used by Newton and Wallis, from memory).
    const root = brentRoot((x) => x ** 3 - 2 * x - 5, 2, 3);
    expect(Math.abs(root - 2.0945514815423265)).toBeLessThan(1e-12);
  });

  it('works with the bracket given in either sign order', () => {
    expect(Math.abs(brentRoot((x) => 2 - x * x, 0, 2) - Math.SQRT2)).toBeLessThan(1e-12);
    expect(Math.abs(brentRoot((x) => x * x - 2, 0, 2) - Math.SQRT2)).toBeLessThan(1e-12);
  });

  it('closes in on a jump in sign (bisection fallback) without leaving the bracket', () => {
    const root = brentRoot((x) => (x < 0.3 ? -1 : 1), 0, 1);
    expect(root).toBeGreaterThanOrEqual(0.3 - 1e-11);
    expect(root).toBeLessThanOrEqual(0.3 + 1e-11);
  });

  it('returns an end that is itself a root', () => {
    expect(brentRoot((x) => x - 1, 1, 5)).toBe(1);
    expect(brentRoot((x) => x - 5, 1, 5)).toBe(5);
  });

  it("refuses a bracket without a sign change ('no-bracket')", () => {
    expect(codeOf(() => brentRoot((x) => x * x + 1, -1, 1))).toBe('no-bracket');
    expect(codeOf(() => brentRoot((x) => x, Number.NaN, 1))).toBe('no-bracket');
  });

  it("stops at the iteration cap ('no-convergence') and on non-finite values ('non-finite')", () => {
    expect(codeOf(() => brentRoot((x) => Math.cos(x) - x, 0, 1, { maxIterations: 1 }))).toBe('no-convergence');
    expect(codeOf(() => brentRoot((x) => (x > 0.5 ? Number.NaN : -1), 0, 1))).toBe('non-finite');
  });

  it('names the field it was given in its errors', () => {
    try {
      brentRoot(() => 1, 0, 1, { field: 'reach.bedSlope' });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(EngineError);
      expect((error as EngineError).field).toBe('reach.bedSlope');
    }
  });
});

describe('expandBracketUpward', () => {
  it('grows the upper end until the sign changes, returning the last step', () => {
    const bracket = expandBracketUpward((x) => x - 1000, 0, 1);
    expect(bracket).not.toBeNull();
    const [a, b] = bracket as [number, number];
    expect(a).toBeLessThanOrEqual(1000);
    expect(b).toBeGreaterThanOrEqual(1000);
    expect(b).toBeLessThanOrEqual(2 * a);
    expect(brentRoot((x) => x - 1000, a, b)).toBeCloseTo(1000, 9);
  });

  it('gives null when there is no sign change below maxHi', () => {
    expect(expandBracketUpward((x) => x - 1000, 0, 1, { maxHi: 10 })).toBeNull();
  });

  it('rejects a factor that would not grow the bracket', () => {
    expect(codeOf(() => expandBracketUpward((x) => x - 2, 0, 1, { factor: 1 }))).toBe('no-bracket');
    expect(codeOf(() => expandBracketUpward((x) => x - 2, 1, 1))).toBe('no-bracket');
  });
});
