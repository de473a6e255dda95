// How far upstream the scheme raises the water by at least a threshold.
import { requireNonNegative } from '../errors';
import type { ProfileStop } from '../profiles/profile-point';
import type { Metres } from '../units';
import type { AffluxPoint } from './afflux';

export interface ExtentOfImpact {
  distanceUpstream: Metres;
  /** 'beyond-reach': the afflux is still at or above the threshold at the upstream end of the reach. */
  endsBy: 'threshold' | 'reach-end' | 'beyond-reach' | 'hydraulic-jump' | 'no-impact';
  /** Whether the scheme raises the water ('raise') or draws it down ('drawdown', negative afflux) over the extent. */
  sense: 'raise' | 'drawdown';
  /** Afflux where the with-scheme profile ends; set when the impact reaches beyond the reach. */
  affluxAtReachEnd?: Metres;
  /** Set when the afflux is still at or above the threshold where the with-scheme profile stopped. */
  warning?: string;
}

/**
 * The furthest point upstream where afflux ≥ threshold, interpolated linearly between points (afflux need not
 * fall monotonically). When the afflux is still above the threshold at the last point, the extent is that point
 * and `endsBy` follows why the with-scheme profile stopped (`profileStop`, default 'reach-end').
 */
export function extentOfImpact(afflux: readonly AffluxPoint[], thresholdMetres: Metres = 0.01, profileStop: ProfileStop = 'reach-end'): ExtentOfImpact {
  requireNonNegative(thresholdMetres, 'impactThreshold');
  // A drawdown (negative afflux at the control) has an extent of its own: where it is back within the threshold.
  if ((afflux[0]?.afflux ?? 0) < 0) {
    const flipped = afflux.map((a) => ({ distanceUpstream: a.distanceUpstream, afflux: -a.afflux }));
    const extent = raisedExtent(flipped, thresholdMetres, profileStop);
    return { ...extent, sense: 'drawdown', ...(extent.affluxAtReachEnd !== undefined ? { affluxAtReachEnd: -extent.affluxAtReachEnd } : {}) };
  }
  return raisedExtent(afflux, thresholdMetres, profileStop);
}

function raisedExtent(afflux: readonly AffluxPoint[], thresholdMetres: Metres, profileStop: ProfileStop): ExtentOfImpact {
  let furthest = -1;
  for (let i = 0; i < afflux.length; i++) if (afflux[i].afflux >= thresholdMetres) furthest = i;
  if (furthest < 0) return { distanceUpstream: 0, endsBy: 'no-impact', sense: 'raise' };

  const last = afflux.length - 1;
  if (furthest < last) {
    const a = afflux[furthest];
    const b = afflux[furthest + 1];
    const t = (a.afflux - thresholdMetres) / (a.afflux - b.afflux);
    return { distanceUpstream: a.distanceUpstream + t * (b.distanceUpstream - a.distanceUpstream), endsBy: 'threshold', sense: 'raise' };
  }
  const distanceUpstream = afflux[last].distanceUpstream;
  if (profileStop === 'hydraulic-jump') return { distanceUpstream, endsBy: 'hydraulic-jump', sense: 'raise' };
  if (profileStop === 'reach-end') {
    const atEnd = afflux[last].afflux;
    return {
      distanceUpstream,
      endsBy: 'beyond-reach',
      sense: 'raise',
      affluxAtReachEnd: atEnd,
      warning: `the afflux is still ${(atEnd * 1000).toFixed(0)} mm at the upstream end of the reach (${distanceUpstream.toFixed(0)} m): the extent of impact lies beyond the reach; lengthen the reach to locate it`,
    };
  }
  return {
    distanceUpstream,
    endsBy: 'threshold',
    sense: 'raise',
    warning:
      `the afflux is still ${afflux[last].afflux.toFixed(3)} m where the profile stopped (${profileStop}); ` +
      'the impact reaches at least this far — tighten the normal-depth tolerance below the threshold to locate it',
  };
}
