// An independent check of a prismatic profile: the GVF equation integrated by an extrapolation ODE solver.
import { Solver } from './odex-solver';
import { InvalidInputError } from '../errors';
import { wettedState } from '../flow-properties';
import type { FlowSection } from '../section';
import { brentRoot } from '../solvers';
import type { CubicMetresPerSecond, Metres, Slope } from '../units';
import { GRAVITY } from '../units';
import type { ProfilePoint, SelfCheckReport } from './profile-point';

export const SELF_CHECK_METHOD = 'odex (Gragg–Bulirsch–Stoer extrapolation) on dx/dy = −(1 − Fr²)/(S₀ − Sf), x upstream';

const MAX_SOLVER_STEPS = 2_000;

/**
 * The gradually-varied-flow equation dy/dx = (S₀ − Sf)/(1 − Fr²) for x downstream (Chow, Open-Channel Hydraulics,
 * 1959, §9-1, dynamic equation of gradually varied flow — from memory; Henderson, Open Channel Flow, 1966, §4.2 —
 * from memory). With x measured upstream its sign flips, and written for distance as a function of depth it is
 * dx/dy = −(1 − Fr²)/(S₀ − Sf). Depth is the variable of integration because every profile computed here is
 * monotonic in depth and may start at critical depth, where dy/dx is infinite but dx/dy is 0; it ends short of
 * normal depth, the only place where dx/dy is singular.
 */
export function distancePerDepth(section: FlowSection, discharge: CubicMetresPerSecond, bedSlope: Slope, depth: Metres): number {
  const state = wettedState(section, depth, discharge);
  // Fr² = αQ²T/(gA³) and Sf = (Q/K)², as froudeNumber and frictionSlope in flow-properties.ts, from one state.
  const velocity = discharge / state.area;
  const froude = velocity * Math.sqrt((state.energyCoefficient * state.topWidth) / (GRAVITY * state.area));
  const friction = (discharge / state.conveyance) ** 2;
  if (!Number.isFinite(froude) || !Number.isFinite(friction)) throw new InvalidInputError('discharge', 'is out of range for this section (the result overflows)');
  return -(1 - froude * froude) / (bedSlope - friction);
}

/** x at each point's depth from one odex integration, sampled with its dense output; null if the solver gave up. */
function integratedDistances(f: (y: Metres) => number, depths: readonly Metres[]): number[] | null {
  const solver = new Solver(1);
  solver.denseOutput = true;
  // A reference a million times finer than what it checks: the profiles are converged to about 0.1 % in extent, and
  // 1e-9 keeps the integration's own error in micrometres over kilometres. At 1e-11 it cost a fifth more of the whole
  // case and moved the reported differences only in their tenth digit.
  solver.relativeTolerance = 1e-9;
  solver.absoluteTolerance = 1e-7;
  solver.maxSteps = MAX_SOLVER_STEPS;
  const rising = depths[depths.length - 1] > depths[0];
  const distances: number[] = [0];
  const result = solver.solve((y) => [f(y)], depths[0], [0], depths[depths.length - 1], (_n, yOld, y, x, dense) => {
    while (distances.length < depths.length && (rising ? depths[distances.length] <= y : depths[distances.length] >= y)) {
      const at = depths[distances.length];
      distances.push(dense !== undefined && at !== y && at !== yOld ? dense(0, at) : x[0]);
    }
  });
  if (result.outcome !== 0 || distances.length !== depths.length || !distances.every(Number.isFinite)) return null;
  return distances;
}

/** The integrated curve as cubic Hermite pieces in depth between its samples, using the exact slopes dx/dy there. */
function hermiteDistance(depths: readonly Metres[], distances: readonly number[], slopes: readonly number[], j: number): (y: Metres) => number {
  const [y0, y1, x0, x1] = [depths[j], depths[j + 1], distances[j], distances[j + 1]];
  const h = y1 - y0;
  return (y) => {
    const t = (y - y0) / h;
    const t2 = t * t;
    const t3 = t2 * t;
    return (2 * t3 - 3 * t2 + 1) * x0 + (t3 - 2 * t2 + t) * h * slopes[j] + (-2 * t3 + 3 * t2) * x1 + (t3 - t2) * h * slopes[j + 1];
  };
}

/** Depth of the integrated curve at each of `targets` (ascending distances), by Brent on the Hermite pieces. */
function depthsAtDistances(depths: readonly Metres[], distances: readonly number[], slopes: readonly number[], targets: readonly Metres[]): Metres[] {
  const last = depths.length - 1;
  let j = 0;
  return targets.map((distance) => {
    if (distance >= distances[last]) return depths[last] + (distance - distances[last]) / slopes[last];
    while (j < last - 1 && distances[j + 1] < distance) j++;
    if (depths[j + 1] === depths[j] || !(distances[j] <= distance)) return depths[j];
    const curve = hermiteDistance(depths, distances, slopes, j);
    const [lo, hi] = depths[j] < depths[j + 1] ? [depths[j], depths[j + 1]] : [depths[j + 1], depths[j]];
    return brentRoot((y) => curve(y) - distance, lo, hi, { tolerance: 1e-13 * hi, field: 'selfCheck' });
  });
}

export interface SelfCheckOutcome {
  report: SelfCheckReport | null;
  warnings: string[];
}

export function odeSelfCheck(input: { section: FlowSection; discharge: CubicMetresPerSecond; bedSlope: Slope; points: readonly ProfilePoint[] }): SelfCheckOutcome {
  const { section, discharge, bedSlope, points } = input;
  if (points.length < 2) return { report: { method: SELF_CHECK_METHOD, maxLevelDifference: 0, extentDifference: 0 }, warnings: [] };
  const f = (y: Metres) => distancePerDepth(section, discharge, bedSlope, y);
  const depths = points.map((p) => p.depth);
  const distances = integratedDistances(f, depths);
  if (distances === null) return { report: null, warnings: ['the independent odex integration did not finish, so the profile has no self-check'] };
  const slopes = depths.map(f);
  const integratedDepths = depthsAtDistances(depths, distances, slopes, points.map((p) => p.distanceUpstream));
  // Same place, same bed: the level difference is the depth difference.
  const maxLevelDifference = points.reduce((max, p, i) => Math.max(max, Math.abs(integratedDepths[i] - p.depth)), 0);
  const extent = points[points.length - 1].distanceUpstream;
  const extentDifference = extent > 0 ? Math.abs(distances[distances.length - 1] - extent) / extent : 0;
  return { report: { method: SELF_CHECK_METHOD, maxLevelDifference, extentDifference }, warnings: [] };
}
