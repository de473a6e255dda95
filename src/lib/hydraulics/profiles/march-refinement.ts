// Choosing the number of direct steps from the error the march estimates for itself.
import type { MarchResult } from './direct-step-march';
import { coarseFromFine, type NodeRun, nodeHalvingChange } from './march-halving';
import type { HalvingChange, RefinementOptions } from './step-refinement';

export interface RefinedMarch {
  march: MarchResult;
  change: HalvingChange;
  converged: boolean;
  /** Set when the refinement stopped at maxResolution without settling. */
  warning: string | null;
}

/**
 * The direct step with the trapezoidal mean of the friction slope is second order in the step: halving it cuts the
 * error about fourfold (Richardson and Gaunt, "The deferred approach to the limit", 1927; Press et al., Numerical
 * Recipes, 2nd ed., 1992, §16.4 — from memory). So one halving tells both the error and the resolution needed.
 */
const ORDER = 2;
/** The resolution is chosen for half the tolerance, so that the next check passes without one more round. */
const AIM = 0.5;
const MOST_GROWTH = 16;

function nextResolution(steps: number, change: HalvingChange, extentTolerance: number, levelTolerance: number): number {
  const excess = Math.max(change.extentChange / extentTolerance, change.levelChange / levelTolerance);
  const wanted = Number.isFinite(excess) ? steps * Math.pow(excess / AIM, 1 / ORDER) : steps * 2;
  const bounded = Math.min(Math.max(wanted, 1.5 * steps), MOST_GROWTH * steps);
  return 2 * Math.ceil(bounded / 2);
}

/**
 * March at 2 × initialResolution, compare with the march at half that resolution (read from the same nodes where
 * it can be), and, unless the change is within the tolerances, march again at the resolution the change calls
 * for. Only a halving that puts more steps into the profile counts as evidence of convergence.
 */
export function convergedMarch(compute: (steps: number) => MarchResult, opts: RefinementOptions & { bedSlope: number; reachLength: number }): RefinedMarch {
  const maxResolution = opts.maxResolution ?? 2 ** 14;
  const extentTolerance = opts.extentTolerance ?? 0.001;
  const levelTolerance = opts.levelTolerance ?? 0.001;
  let steps = Math.max(2, Math.min(opts.initialResolution ?? 16, maxResolution));
  for (;;) {
    const march = compute(steps);
    const coarse: NodeRun = coarseFromFine(march, steps, opts.bedSlope, opts.reachLength) ?? compute(Math.max(1, Math.round(steps / 2))).table;
    const change = nodeHalvingChange(coarse, march.table);
    const refined = march.table.count > coarse.count;
    if (refined && change.extentChange < extentTolerance && change.levelChange < levelTolerance) return { march, change, converged: true, warning: null };
    if (steps >= maxResolution) {
      const warning =
        `the profile did not settle within ${maxResolution} steps: on the last halving the extent changed by ` +
        `${(change.extentChange * 100).toFixed(3)} % and levels by ${Number.isFinite(change.levelChange) ? (change.levelChange * 1000).toFixed(1) : '—'} mm`;
      return { march, change, converged: false, warning };
    }
    steps = Math.min(refined ? nextResolution(steps, change, extentTolerance, levelTolerance) : 2 * steps, maxResolution);
  }
}

/** A march at one given resolution, reporting how much it changes when its step is halved once more. */
export function fixedResolutionMarch(compute: (steps: number) => MarchResult, steps: number, opts: RefinementOptions = {}): RefinedMarch {
  const march = compute(steps);
  const change = nodeHalvingChange(march.table, compute(2 * steps).table);
  const converged = change.extentChange < (opts.extentTolerance ?? 0.001) && change.levelChange < (opts.levelTolerance ?? 0.001);
  return { march, change, converged, warning: null };
}
