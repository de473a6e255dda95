// Reading a computed profile between its points.
import { InvalidInputError } from '../errors';
import type { Metres } from '../units';
import type { ProfilePoint } from './profile-point';

/** Linear blend of two points, every field; t = 0 gives `a`, t = 1 gives `b`. */
export function blendPoints(a: ProfilePoint, b: ProfilePoint, t: number): ProfilePoint {
  const mix = (p: number, q: number) => p + (q - p) * t;
  return {
    distanceUpstream: mix(a.distanceUpstream, b.distanceUpstream),
    depth: mix(a.depth, b.depth),
    waterLevel: mix(a.waterLevel, b.waterLevel),
    bedLevel: mix(a.bedLevel, b.bedLevel),
    velocity: mix(a.velocity, b.velocity),
    froude: mix(a.froude, b.froude),
    frictionSlope: mix(a.frictionSlope, b.frictionSlope),
    energyLevel: mix(a.energyLevel, b.energyLevel),
  };
}

/** Index i of the segment [i, i+1] holding `distance` (points sorted by distance); -1 outside the range. */
function segmentIndex(points: readonly ProfilePoint[], distance: Metres): number {
  const last = points.length - 1;
  if (last < 0 || distance < points[0].distanceUpstream || distance > points[last].distanceUpstream) return -1;
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (points[mid].distanceUpstream <= distance) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** The profile at `distance`, interpolated linearly between its neighbouring points; null outside the profile. */
export function pointAtDistance(points: readonly ProfilePoint[], distance: Metres): ProfilePoint | null {
  const i = segmentIndex(points, distance);
  if (i < 0) return null;
  if (i === points.length - 1) return points[i];
  const a = points[i];
  const b = points[i + 1];
  const span = b.distanceUpstream - a.distanceUpstream;
  return span > 0 ? blendPoints(a, b, (distance - a.distanceUpstream) / span) : b;
}

/** Water level at `distance`; throws if the profile does not reach that far. */
export function waterLevelAt(points: readonly ProfilePoint[], distance: Metres, field = 'distanceUpstream'): Metres {
  const point = pointAtDistance(points, distance);
  if (point === null) {
    const end = points.length === 0 ? 0 : points[points.length - 1].distanceUpstream;
    throw new InvalidInputError(field, `${distance} m is outside the computed profile (0 to ${end} m)`);
  }
  return point.waterLevel;
}
