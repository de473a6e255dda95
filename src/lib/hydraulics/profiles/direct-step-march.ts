// One pass of the direct step method: from the control upstream through a given sequence of depths.
import { EngineError } from '../errors';
import type { FlowSection } from '../section';
import { brentRoot } from '../solvers';
import type { CubicMetresPerSecond, Metres, Slope } from '../units';
import type { DepthSequence } from './depth-grid';
import { MarchTable } from './march-table';
import type { ProfilePoint, ProfileStop } from './profile-point';

export interface DirectStepReach {
  section: FlowSection;
  discharge: CubicMetresPerSecond;
  bedSlope: Slope;
  bedLevelAtControl: Metres;
  reachLength: Metres;
}

export interface MarchLimits {
  /** The depth at which the profile ends (normal-depth tolerance or jump), or null. */
  endDepth: Metres | null;
  endsBy: 'normal-depth' | 'hydraulic-jump' | null;
  maxSteps: number;
}

export interface MarchResult {
  /** The computed nodes, control first. */
  table: MarchTable;
  /** Null when maxSteps ran out before anything stopped the profile. */
  stoppedBy: ProfileStop | null;
  /** Depth steps taken, the partial last one included. */
  stepsTaken: number;
}

/**
 * Distance upstream covered between nodes `down` and `up`:
 * Δx = (E_down − E_up)/(S₀ − S̄f), S̄f the mean of the friction slopes at the two ends
 * (Chow, Open-Channel Hydraulics, 1959, §10-3, direct step method). Chow measures x downstream; going upstream
 * the roles of the two ends swap, which is why E_down comes first here.
 */
export function stepLength(table: MarchTable, bedSlope: Slope, down: number, up: number): Metres {
  return (table.energy[down] - table.energy[up]) / (bedSlope - (table.friction[down] + table.friction[up]) / 2);
}

function passes(depth: Metres, limit: Metres, rising: boolean): boolean {
  return rising ? depth >= limit : depth <= limit;
}

/** Marches until the reach end, the end depth, the top of the section, or maxSteps — whichever comes first. */
export function directStepMarch(reach: DirectStepReach, depths: DepthSequence, limits: MarchLimits): MarchResult {
  const table = new MarchTable(reach.section, reach.discharge);
  const start = depths(0);
  table.evaluate(0, start);
  table.distance[0] = 0;
  let last = 0;
  const rising = depths(1) > start;
  for (let k = 1; k <= limits.maxSteps; k++) {
    let depth = depths(k);
    let stop: ProfileStop | null = null;
    if (limits.endDepth !== null && passes(depth, limits.endDepth, rising)) [depth, stop] = [limits.endDepth, limits.endsBy];
    if (rising && depth >= reach.section.maxDepth) [depth, stop] = [reach.section.maxDepth, 'section-overtopped'];
    if (depth === table.depth[last] && stop === null) continue;
    const next = last + 1;
    table.evaluate(next, depth);
    const length = stepLength(table, reach.bedSlope, last, next);
    if (!(length > 0) || !Number.isFinite(length)) {
      throw new EngineError(`profile: the direct step from ${table.depth[last]} m to ${depth} m gave no forward distance`, 'profile', 'no-convergence');
    }
    const distance = table.distance[last] + length;
    if (distance >= reach.reachLength) {
      landOnReachEnd(reach, table, last, depth);
      return { table, stoppedBy: 'reach-end', stepsTaken: k };
    }
    table.distance[next] = distance;
    table.count = next + 1;
    last = next;
    if (stop !== null) return { table, stoppedBy: stop, stepsTaken: k };
  }
  table.count = last + 1;
  return { table, stoppedBy: null, stepsTaken: limits.maxSteps };
}

/** The last node: the depth within the last step at which the same direct-step relation lands exactly on the reach end. */
function landOnReachEnd(reach: DirectStepReach, table: MarchTable, from: number, stepDepth: Metres): void {
  const slot = from + 1;
  const fromDepth = table.depth[from];
  const remaining = reach.reachLength - table.distance[from];
  let depth = fromDepth;
  if (remaining > 0) {
    const shortfall = (y: Metres) => {
      if (y === fromDepth) return -remaining;
      table.evaluate(slot, y);
      return stepLength(table, reach.bedSlope, from, slot) - remaining;
    };
    const [lo, hi] = fromDepth < stepDepth ? [fromDepth, stepDepth] : [stepDepth, fromDepth];
    depth = brentRoot(shortfall, lo, hi, { tolerance: 1e-12 * hi, field: 'profile' });
  }
  table.evaluate(slot, depth);
  table.distance[slot] = reach.reachLength;
  table.count = slot + 1;
}

/** The march's nodes as reported profile points; the bed rises upstream at the bed slope. */
export function marchPoints(reach: DirectStepReach, march: MarchResult): ProfilePoint[] {
  const { table } = march;
  const points: ProfilePoint[] = new Array(table.count);
  for (let i = 0; i < table.count; i++) points[i] = table.point(i, reach.bedLevelAtControl + reach.bedSlope * table.distance[i]);
  return points;
}
