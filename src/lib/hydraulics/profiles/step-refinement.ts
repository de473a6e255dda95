// Refining the step until the profile no longer depends on it.
import type { Metres } from '../units';
import { waterLevelAt } from './profile-interpolation';
import { type ProfilePoint, type ProfileRun, type RefinementReport, profileExtent } from './profile-point';

export interface RefinementOptions {
  /** Resolution of the first calculation (number of steps, or reach length over step length); default 16. */
  initialResolution?: number;
  /** The refinement stops here, converged or not; default 2¹⁴. */
  maxResolution?: number;
  /** Largest relative change in extent accepted on halving the step; default 0.001 (0.1 %). */
  extentTolerance?: number;
  /** Largest change in water level accepted on halving the step; default 0.001 m. */
  levelTolerance?: Metres;
}

export interface HalvingChange {
  /** |extent change| / extent of the finer profile (0 when both have no length). */
  extentChange: number;
  /** Largest level difference at the coarser profile's points, where both profiles reach. */
  levelChange: Metres;
}

export function halvingChange(coarse: readonly ProfilePoint[], fine: readonly ProfilePoint[]): HalvingChange {
  const coarseExtent = profileExtent({ points: coarse });
  const fineExtent = profileExtent({ points: fine });
  const scale = Math.max(coarseExtent, fineExtent);
  const extentChange = scale > 0 ? Math.abs(fineExtent - coarseExtent) / scale : 0;
  const common = Math.min(coarseExtent, fineExtent);
  let levelChange = 0;
  for (const point of coarse) {
    if (point.distanceUpstream > common) break;
    levelChange = Math.max(levelChange, Math.abs(point.waterLevel - waterLevelAt(fine, point.distanceUpstream)));
  }
  return { extentChange, levelChange };
}

export interface RefinedRun {
  run: ProfileRun;
  refinement: RefinementReport;
}

/** Below this ratio of successive changes a halving is not behaving as a method of the stated order. */
const LEAST_ORDER_RATIO = 3;

function fallsAtOrder(earlier: number, latest: number): boolean {
  return latest === 0 || earlier / latest >= LEAST_ORDER_RATIO;
}

/**
 * What a halving's change is divided by to estimate the finer profile's own error. For a method of order p the
 * error of the finer run is about change/(2^p − 1) (Richardson and Gaunt, The deferred approach to the limit,
 * Philosophical Transactions A, 1927 — from memory). It is used only once an earlier halving has shown both the
 * extent and the level changes falling at close to that order (a ratio of at least 3, against 4 for p = 2);
 * otherwise the change itself is the estimate, as without an order.
 */
function errorDivisor(order: number | undefined, earlier: HalvingChange | null, latest: HalvingChange): number {
  if (order === undefined || earlier === null || !(latest.extentChange > 0 || latest.levelChange > 0)) return 1;
  const falling = fallsAtOrder(earlier.extentChange, latest.extentChange) && fallsAtOrder(earlier.levelChange, latest.levelChange);
  return falling ? 2 ** order - 1 : 1;
}

/**
 * Doubles the resolution (halves the step) until the extent changes by less than extentTolerance and the
 * levels by less than levelTolerance, or maxResolution is reached (then `converged` is false and a warning is added).
 * Only a halving that puts more steps into the profile counts. With `order`, the method's order of accuracy, the
 * change is first turned into an estimate of the finer profile's own error (see errorDivisor).
 */
export function convergedProfile(compute: (resolution: number) => ProfileRun, opts: RefinementOptions = {}, order?: number): RefinedRun {
  const maxResolution = opts.maxResolution ?? 2 ** 14;
  const extentTolerance = opts.extentTolerance ?? 0.001;
  const levelTolerance = opts.levelTolerance ?? 0.001;
  let resolution = Math.min(opts.initialResolution ?? 16, maxResolution);
  let previous = compute(resolution);
  let change: HalvingChange = { extentChange: 1, levelChange: Infinity };
  let earlier: HalvingChange | null = null;
  while (resolution * 2 <= maxResolution) {
    resolution *= 2;
    const next = compute(resolution);
    change = halvingChange(previous.points, next.points);
    // A halving that adds no steps to the profile (all of it inside one step) is no evidence of convergence.
    const refined = next.points.length > previous.points.length;
    previous = next;
    const divisor = refined ? errorDivisor(order, earlier, change) : 1;
    if (refined) earlier = change;
    if (refined && change.extentChange / divisor < extentTolerance && change.levelChange / divisor < levelTolerance) {
      return { run: next, refinement: { stepsUsed: next.points.length - 1, extentChangeOnHalving: change.extentChange, converged: true } };
    }
  }
  const warning =
    `the profile did not settle within ${maxResolution} steps: on the last halving the extent changed by ` +
    `${(change.extentChange * 100).toFixed(3)} % and levels by ${Number.isFinite(change.levelChange) ? (change.levelChange * 1000).toFixed(1) : '—'} mm`;
  return {
    run: { ...previous, warnings: [...previous.warnings, warning] },
    refinement: { stepsUsed: previous.points.length - 1, extentChangeOnHalving: change.extentChange, converged: false },
  };
}

/** A calculation at one given resolution, reporting how much it changes when its step is halved once more. */
export function fixedResolutionProfile(compute: (resolution: number) => ProfileRun, resolution: number, opts: RefinementOptions = {}): RefinedRun {
  const run = compute(resolution);
  const change = halvingChange(run.points, compute(2 * resolution).points);
  const converged = change.extentChange < (opts.extentTolerance ?? 0.001) && change.levelChange < (opts.levelTolerance ?? 0.001);
  return { run, refinement: { stepsUsed: run.points.length - 1, extentChangeOnHalving: change.extentChange, converged } };
}
