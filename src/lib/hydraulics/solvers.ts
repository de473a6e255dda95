// General-purpose root finding for the engine. Every loop has a cap, and every root comes from a bracket.
import { EngineError } from './errors';

export interface BrentOptions {
  /** Absolute tolerance on x; Brent adds 2·ε·|x| on top, so roots are also relatively exact. */
  tolerance?: number;
  maxIterations?: number;
  /** Field path reported if the bracket is missing or the function misbehaves. */
  field?: string;
}

const DEFAULT_FIELD = 'solver';

function evaluated(f: (x: number) => number, x: number, field: string): number {
  const value = f(x);
  if (!Number.isFinite(value)) {
    throw new EngineError(`${field}: the equation gave a non-finite value at x = ${x}`, field, 'non-finite');
  }
  return value;
}

function sameSign(a: number, b: number): boolean {
  return (a > 0 && b > 0) || (a < 0 && b < 0);
}

/**
 * The root of f in [lo, hi], where f(lo) and f(hi) differ in sign.
 * Brent's method: inverse quadratic interpolation and secant steps, falling back on bisection,
 * so it never leaves the bracket (Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4,
 * procedure "zero"; laid out as in Press et al., Numerical Recipes, 2nd ed., 1992, §9.3).
 */
export function brentRoot(f: (x: number) => number, lo: number, hi: number, opts: BrentOptions = {}): number {
  const field = opts.field ?? DEFAULT_FIELD;
  const tolerance = opts.tolerance ?? 1e-12;
  const maxIterations = opts.maxIterations ?? 500;
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) {
    throw new EngineError(`${field}: the bracket [${lo}, ${hi}] is not finite`, field, 'no-bracket');
  }
  let a = lo;
  let b = hi;
  let fa = evaluated(f, a, field);
  let fb = evaluated(f, b, field);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (sameSign(fa, fb)) {
    throw new EngineError(`${field}: f(${lo}) and f(${hi}) have the same sign, so no root is bracketed`, field, 'no-bracket');
  }
  let c = b;
  let fc = fb;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    if (sameSign(fb, fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tolerance1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance;
    const halfInterval = 0.5 * (c - b);
    if (Math.abs(halfInterval) <= tolerance1 || fb === 0) return b;
    if (Math.abs(e) >= tolerance1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * halfInterval * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * halfInterval * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      p = Math.abs(p);
      if (2 * p < Math.min(3 * halfInterval * q - Math.abs(tolerance1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = halfInterval;
        e = d;
      }
    } else {
      d = halfInterval;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tolerance1 ? d : Math.sign(halfInterval) * tolerance1;
    fb = evaluated(f, b, field);
  }
  throw new EngineError(`${field}: no convergence within ${maxIterations} iterations`, field, 'no-convergence');
}

/**
 * A bracket [a, b] with a sign change of f, found by growing hi geometrically from hiStart
 * (hi ← lo + factor·(hi − lo)) up to maxHi; null when f keeps its sign all the way.
 * The returned bracket is the last step, so it is as tight as the search allows.
 */
export function expandBracketUpward(
  f: (x: number) => number,
  lo: number,
  hiStart: number,
  opts: { maxHi?: number; factor?: number; field?: string } = {},
): [number, number] | null {
  const field = opts.field ?? DEFAULT_FIELD;
  const factor = opts.factor ?? 2;
  const maxHi = opts.maxHi ?? 1e6;
  if (!(factor > 1) || !Number.isFinite(factor)) throw new EngineError(`${field}: the growth factor must be above 1`, field, 'no-bracket');
  if (!(hiStart > lo) || !Number.isFinite(lo) || !Number.isFinite(hiStart)) {
    throw new EngineError(`${field}: the starting bracket [${lo}, ${hiStart}] is not increasing`, field, 'no-bracket');
  }
  const fLo = evaluated(f, lo, field);
  if (fLo === 0) return [lo, lo];
  let previous = lo;
  let hi = Math.min(hiStart, maxHi);
  for (let step = 0; step < 2000; step++) {
    const fHi = evaluated(f, hi, field);
    if (!sameSign(fLo, fHi)) return [previous, hi];
    if (hi >= maxHi) return null;
    previous = hi;
    hi = Math.min(lo + factor * (hi - lo), maxHi);
  }
  return null;
}

const RECENT_VALUES = 4;

/**
 * f, answering again for any of the last few x it was asked for without evaluating it. Why: a caller brackets a root
 * and Brent then starts by evaluating the bracket's ends again, so a step of a march paid for three evaluations twice.
 * Only for pure functions of x.
 */
export function rememberingRecent(f: (x: number) => number): (x: number) => number {
  const xs = new Array<number>(RECENT_VALUES).fill(NaN);
  const values = new Array<number>(RECENT_VALUES).fill(NaN);
  let next = 0;
  return (x) => {
    for (let i = 0; i < RECENT_VALUES; i++) if (xs[i] === x) return values[i];
    const value = f(x);
    xs[next] = x;
    values[next] = value;
    next = (next + 1) % RECENT_VALUES;
    return value;
  };
}
