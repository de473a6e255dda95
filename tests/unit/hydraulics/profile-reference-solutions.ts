// Reference solutions for the profile tests, written independently of the engine: closed-form trapezoid
// geometry, Manning friction, an adaptive Simpson quadrature and the odex ODE integrator from npm.
import type { FlowSection, SectionState } from '@/lib/hydraulics/section';
import { Solver } from '@/lib/hydraulics/profiles/odex-solver';

const G = 9.80665;

export interface TrapezoidCase {
  bottomWidth: number;
  sideSlope: number;
  manningN: number;
  discharge: number;
  bedSlope: number;
  alpha: number;
}

/** Area, wetted perimeter and top width of a trapezoid (elementary geometry). */
function geometry(c: TrapezoidCase, y: number) {
  const area = (c.bottomWidth + c.sideSlope * y) * y;
  const perimeter = c.bottomWidth + 2 * y * Math.sqrt(1 + c.sideSlope * c.sideSlope);
  const topWidth = c.bottomWidth + 2 * c.sideSlope * y;
  return { area, perimeter, topWidth };
}

/** Sf from Manning's formula in SI, V = R^{2/3} S^{1/2} / n, solved for S (Manning 1891). */
export function manningFrictionSlope(c: TrapezoidCase, y: number): number {
  const { area, perimeter } = geometry(c, y);
  return (c.manningN * c.discharge) ** 2 / (area * area * Math.pow(area / perimeter, 4 / 3));
}

/** Fr² = αQ²T/(gA³) (Chow 1959 §3-3, from memory). */
export function froudeSquared(c: TrapezoidCase, y: number): number {
  const { area, topWidth } = geometry(c, y);
  return (c.alpha * c.discharge ** 2 * topWidth) / (G * area ** 3);
}

/** Root of a monotone function by plain bisection (the test's own solver). */
export function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let [a, b] = [lo, hi];
  const fa = f(a);
  for (let i = 0; i < 200; i++) {
    const m = (a + b) / 2;
    if (Math.sign(f(m)) === Math.sign(fa)) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

export const referenceNormalDepth = (c: TrapezoidCase) => bisect((y) => manningFrictionSlope(c, y) - c.bedSlope, 1e-6, 100);
export const referenceCriticalDepth = (c: TrapezoidCase) => bisect((y) => froudeSquared(c, y) - 1, 1e-6, 100);

/** Distance upstream per unit change of depth, from the GVF equation with x measured upstream: dx/dy = −(1 − Fr²)/(S₀ − Sf). */
export function distancePerDepth(c: TrapezoidCase, y: number): number {
  return -(1 - froudeSquared(c, y)) / (c.bedSlope - manningFrictionSlope(c, y));
}

/** Adaptive Simpson quadrature (Kuncir 1962; Lyness 1969), tolerance `eps`. */
export function adaptiveSimpson(f: (x: number) => number, a: number, b: number, eps = 1e-10): number {
  const simpson = (fa: number, fm: number, fb: number, h: number) => (h / 6) * (fa + 4 * fm + fb);
  const recurse = (a0: number, b0: number, fa: number, fm: number, fb: number, whole: number, tol: number, depth: number): number => {
    const m = (a0 + b0) / 2;
    const lm = (a0 + m) / 2;
    const rm = (m + b0) / 2;
    const flm = f(lm);
    const frm = f(rm);
    const left = simpson(fa, flm, fm, m - a0);
    const right = simpson(fm, frm, fb, b0 - m);
    if (depth <= 0 || Math.abs(left + right - whole) <= 15 * tol) return left + right + (left + right - whole) / 15;
    return recurse(a0, m, fa, flm, fm, left, tol / 2, depth - 1) + recurse(m, b0, fm, frm, fb, right, tol / 2, depth - 1);
  };
  const fa = f(a);
  const fb = f(b);
  const fm = f((a + b) / 2);
  return recurse(a, b, fa, fm, fb, simpson(fa, fm, fb, b - a), eps, 50);
}

/** Distance upstream over which the depth goes from y0 to y1: x = ∫ −(1 − Fr²)/(S₀ − Sf) dy. */
export function quadratureDistance(c: TrapezoidCase, y0: number, y1: number): number {
  return adaptiveSimpson((y) => distancePerDepth(c, y), y0, y1);
}

/**
 * Integrates dy/dx (x upstream) = −(S₀ − Sf)/(1 − Fr²) with odex from the control, returning the depth at each of
 * `distances` (ascending) and, if `targetDepth` is given, the distance at which the depth first reaches it.
 */
export function odexAlongDistance(c: TrapezoidCase, controlDepth: number, distances: number[], targetDepth?: number): { depths: number[]; distanceToTarget: number | null } {
  const solver = new Solver(1);
  solver.denseOutput = true;
  solver.absoluteTolerance = 1e-12;
  solver.relativeTolerance = 1e-12;
  solver.maxSteps = 100000;
  const slope = (_x: number, y: number[]) => [-(c.bedSlope - manningFrictionSlope(c, y[0])) / (1 - froudeSquared(c, y[0]))];
  const depths: number[] = [];
  let distanceToTarget: number | null = null;
  let previousDepth = controlDepth;
  const end = distances[distances.length - 1];
  solver.solve(slope, 0, [controlDepth], end, (n, xOld, x, y, dense) => {
    if (n === 1) {
      while (depths.length < distances.length && distances[depths.length] <= x) depths.push(y[0]);
      return;
    }
    while (depths.length < distances.length && distances[depths.length] <= x) depths.push(dense!(0, distances[depths.length]));
    if (targetDepth !== undefined && distanceToTarget === null && Math.sign(previousDepth - targetDepth) !== Math.sign(y[0] - targetDepth)) {
      distanceToTarget = bisect((s) => dense!(0, s) - targetDepth, xOld, x);
    }
    previousDepth = y[0];
  });
  return { depths, distanceToTarget };
}

/** Test double of FlowSection: a wide rectangular channel idealised with R = y, its resistance law given as K(A, y). */
export function wideIdealChannel(width: number, conveyanceOf: (area: number, depth: number) => number): FlowSection {
  return {
    shape: 'rectangular',
    invertLevel: 0,
    maxDepth: Infinity,
    stateAtDepth(depth: number): SectionState {
      const area = width * depth;
      return { depth, area, wettedPerimeter: width, topWidth: width, hydraulicRadius: depth, hydraulicDepth: depth, firstMoment: (width * depth * depth) / 2, conveyance: conveyanceOf(area, depth), energyCoefficient: 1, overtopped: false };
    },
  };
}
