// How far upstream the scheme raises the water by at least a threshold.
import { requireNonNegative } from '../errors';
import type { ProfileStop } from '../profiles/profile-point';
import type { Metres } from '../units';
import type { AffluxPoint } from './afflux';

export interface ExtentOfImpact {
  distanceUpstream: Metres;
  endsBy: 'threshold' | 'reach-end' | 'hydraulic-jump' | 'no-impact';
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
  let furthest = -1;
  for (let i = 0; i < afflux.length; i++) if (afflux[i].afflux >= thresholdMetres) furthest = i;
  if (furthest < 0) return { distanceUpstream: 0, endsBy: 'no-impact' };

  const last = afflux.length - 1;
  if (furthest < last) {
    const a = afflux[furthest];
    const b = afflux[furthest + 1];
    const t = (a.afflux - thresholdMetres) / (a.afflux - b.afflux);
    return { distanceUpstream: a.distanceUpstream + t * (b.distanceUpstream - a.distanceUpstream), endsBy: 'threshold' };
  }
  const distanceUpstream = afflux[last].distanceUpstream;
  if (profileStop === 'hydraulic-jump') return { distanceUpstream, endsBy: 'hydraulic-jump' };
  if (profileStop === 'reach-end') return { distanceUpstream, endsBy: 'reach-end' };
  return {
    distanceUpstream,
    endsBy: 'threshold',
    warning:
      `the afflux is still ${afflux[last].afflux.toFixed(3)} m where the profile stopped (${profileStop}); ` +
      'the impact reaches at least this far — tighten the normal-depth tolerance below the threshold to locate it',
  };
}
