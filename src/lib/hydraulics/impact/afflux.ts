// Afflux: the rise in water level the scheme causes, along the with-scheme profile.
import { InvalidInputError } from '../errors';
import { pointAtDistance } from '../profiles/profile-interpolation';
import type { ProfilePoint } from '../profiles/profile-point';
import type { Metres } from '../units';

export interface AffluxPoint {
  distanceUpstream: Metres;
  /** With-scheme level minus without-scheme level at the same place. */
  afflux: Metres;
}

/**
 * Afflux at every with-scheme point, the without-scheme level interpolated linearly at the same distance.
 * The without-scheme profile must cover every with-scheme distance.
 */
export function affluxAlong(withScheme: readonly ProfilePoint[], withoutScheme: readonly ProfilePoint[]): AffluxPoint[] {
  return withScheme.map((point) => {
    const without = pointAtDistance(withoutScheme, point.distanceUpstream);
    if (without === null) {
      throw new InvalidInputError('withoutScheme', `does not reach ${point.distanceUpstream} m upstream, where the with-scheme profile has a point`);
    }
    return { distanceUpstream: point.distanceUpstream, afflux: point.waterLevel - without.waterLevel };
  });
}
