// How much a direct-step march changes when its step is halved, read from the march's own nodes where possible.
import type { Metres, Slope } from '../units';
import type { MarchResult } from './direct-step-march';
import type { HalvingChange } from './step-refinement';

/** Depths and distances of a computed profile, control first. */
export interface NodeRun {
  depth: ArrayLike<number>;
  distance: ArrayLike<number>;
  count: number;
}

function depthAtDistance(run: NodeRun, x: Metres): Metres {
  let lo = 0;
  let hi = run.count - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (run.distance[mid] <= x) lo = mid;
    else hi = mid;
  }
  const span = run.distance[hi] - run.distance[lo];
  if (!(span > 0)) return run.depth[hi];
  const t = (x - run.distance[lo]) / span;
  return run.depth[lo] + (run.depth[hi] - run.depth[lo]) * t;
}

/**
 * Relative change in extent and the largest change in level at the coarse run's nodes, where both reach (as
 * halvingChange in step-refinement.ts). Both runs share the bed, so a level difference is a depth difference.
 */
export function nodeHalvingChange(coarse: NodeRun, fine: NodeRun): HalvingChange {
  const coarseExtent = coarse.count === 0 ? 0 : coarse.distance[coarse.count - 1];
  const fineExtent = fine.count === 0 ? 0 : fine.distance[fine.count - 1];
  const scale = Math.max(coarseExtent, fineExtent);
  const extentChange = scale > 0 ? Math.abs(fineExtent - coarseExtent) / scale : 0;
  const common = Math.min(coarseExtent, fineExtent);
  let levelChange = 0;
  for (let i = 0; i < coarse.count && coarse.distance[i] <= common; i++) {
    levelChange = Math.max(levelChange, Math.abs(coarse.depth[i] - depthAtDistance(fine, coarse.distance[i])));
  }
  return { extentChange, levelChange };
}

/**
 * The march at half the resolution without evaluating anything again. Why it is exact: with depths spaced
 * geometrically, step k of a march with N/2 steps lands on the depth of step 2k of the march with N, so the
 * coarse march is the same direct-step relation applied to every other node. It applies only when the fine march
 * ran the whole depth range (it stopped at its end depth after exactly N steps) and the coarse one, being shorter
 * or longer, still ends inside the reach; otherwise null, and the coarse march must be run.
 */
export function coarseFromFine(march: MarchResult, steps: number, bedSlope: Slope, reachLength: Metres): NodeRun | null {
  const { table } = march;
  const endedAtEndDepth = march.stoppedBy === 'normal-depth' || march.stoppedBy === 'hydraulic-jump';
  if (!endedAtEndDepth || steps % 2 !== 0 || march.stepsTaken !== steps || table.count !== steps + 1) return null;
  const half = steps / 2;
  const depth: number[] = [table.depth[0]];
  const distance: number[] = [0];
  for (let k = 1; k <= half; k++) {
    const [down, up] = [2 * k - 2, 2 * k];
    // Δx = (E_down − E_up)/(S₀ − S̄f), the direct step of direct-step-march.ts (Chow 1959, §10-3).
    const length = (table.energy[down] - table.energy[up]) / (bedSlope - (table.friction[down] + table.friction[up]) / 2);
    if (!(length > 0) || !Number.isFinite(length)) return null;
    const at = distance[k - 1] + length;
    if (at >= reachLength) return null;
    distance.push(at);
    depth.push(table.depth[up]);
  }
  return { depth, distance, count: half + 1 };
}

