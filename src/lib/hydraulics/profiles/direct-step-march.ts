// One pass of the direct step method: from the control upstream through a given sequence of depths.
import { EngineError } from '../errors';
import { frictionSlope, specificEnergy } from '../flow-properties';
import type { FlowSection } from '../section';
import { brentRoot } from '../solvers';
import type { CubicMetresPerSecond, Metres, Slope } from '../units';
import type { DepthSequence } from './depth-grid';
import { profilePointAt } from './point-state';
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
  points: ProfilePoint[];
  /** Null when maxSteps ran out before anything stopped the profile. */
  stoppedBy: ProfileStop | null;
  /** Depth steps taken, the partial last one included. */
  stepsTaken: number;
}

/**
 * Distance upstream covered between depths yDown and yUp:
 * Δx = (E_down − E_up)/(S₀ − S̄f), S̄f the mean of the friction slopes at the two ends
 * (Chow, Open-Channel Hydraulics, 1959, §10-3, direct step method). Chow measures x downstream; going upstream
 * the roles of the two ends swap, which is why E_down comes first here.
 */
function stepLength(reach: DirectStepReach, yDown: Metres, yUp: Metres): Metres {
  const { section, discharge, bedSlope } = reach;
  const energyDrop = specificEnergy(section, yDown, discharge) - specificEnergy(section, yUp, discharge);
  const meanFriction = (frictionSlope(section, yDown, discharge) + frictionSlope(section, yUp, discharge)) / 2;
  return energyDrop / (bedSlope - meanFriction);
}

function pointAt(reach: DirectStepReach, depth: Metres, distance: Metres): ProfilePoint {
  return profilePointAt(reach.section, reach.discharge, depth, distance, reach.bedLevelAtControl + reach.bedSlope * distance);
}

function passes(depth: Metres, limit: Metres, rising: boolean): boolean {
  return rising ? depth >= limit : depth <= limit;
}

/** Marches until the reach end, the end depth, the top of the section, or maxSteps — whichever comes first. */
export function directStepMarch(reach: DirectStepReach, depths: DepthSequence, limits: MarchLimits): MarchResult {
  const start = depths(0);
  const points: ProfilePoint[] = [pointAt(reach, start, 0)];
  const rising = depths(1) > start;
  for (let k = 1; k <= limits.maxSteps; k++) {
    const previous = points[points.length - 1];
    let depth = depths(k);
    let stop: ProfileStop | null = null;
    if (limits.endDepth !== null && passes(depth, limits.endDepth, rising)) [depth, stop] = [limits.endDepth, limits.endsBy];
    if (rising && depth >= reach.section.maxDepth) [depth, stop] = [reach.section.maxDepth, 'section-overtopped'];
    if (depth === previous.depth && stop === null) continue;
    const length = stepLength(reach, previous.depth, depth);
    if (!(length > 0) || !Number.isFinite(length)) {
      throw new EngineError(`profile: the direct step from ${previous.depth} m to ${depth} m gave no forward distance`, 'profile', 'no-convergence');
    }
    const distance = previous.distanceUpstream + length;
    if (distance >= reach.reachLength) {
      points.push(pointAt(reach, depthAtReachEnd(reach, previous, depth), reach.reachLength));
      return { points, stoppedBy: 'reach-end', stepsTaken: k };
    }
    points.push(pointAt(reach, depth, distance));
    if (stop !== null) return { points, stoppedBy: stop, stepsTaken: k };
  }
  return { points, stoppedBy: null, stepsTaken: limits.maxSteps };
}

/** The depth within the last step at which the same direct-step relation lands exactly on the reach end. */
function depthAtReachEnd(reach: DirectStepReach, from: ProfilePoint, stepDepth: Metres): Metres {
  const remaining = reach.reachLength - from.distanceUpstream;
  if (remaining <= 0) return from.depth;
  const shortfall = (y: Metres) => (y === from.depth ? -remaining : stepLength(reach, from.depth, y) - remaining);
  const [lo, hi] = from.depth < stepDepth ? [from.depth, stepDepth] : [stepDepth, from.depth];
  return brentRoot(shortfall, lo, hi, { tolerance: 1e-12 * hi, field: 'profile' });
}
