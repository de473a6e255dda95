// Checking the with-scheme levels against the maximum levels allowed at named places.
import { InvalidInputError, requireFinite, requireNonNegative } from '../errors';
import { pointAtDistance } from '../profiles/profile-interpolation';
import type { ProfilePoint } from '../profiles/profile-point';
import type { Metres } from '../units';

export interface FloodLimit {
  label: string;
  distanceUpstream: Metres;
  maxLevel: Metres;
  /** Required clearance below maxLevel, default 0. */
  freeboard?: Metres;
}

export interface LimitCheck {
  label: string;
  distanceUpstream: Metres;
  maxLevel: Metres;
  freeboard: Metres;
  waterLevel: Metres;
  withoutSchemeLevel: Metres;
  afflux: Metres;
  /** maxLevel − freeboard − waterLevel: how much room is left (negative when the limit is broken). */
  margin: Metres;
  pass: boolean;
  /**
   * 'beyond-profile': the limit lies upstream of the computed profile, where the flow is back to its without-scheme level;
   * 'reservoir': the limit lies within a routed reservoir and is checked against its peak level.
   */
  source: 'profile' | 'beyond-profile' | 'reservoir';
}

/** Each limit checked: it passes when waterLevel + freeboard ≤ maxLevel. */
export function checkLimits(
  withProfile: readonly ProfilePoint[],
  withoutLevelAt: (distanceUpstream: Metres) => Metres,
  limits: readonly FloodLimit[],
  field = 'limits',
): LimitCheck[] {
  return limits.map((limit, index) => {
    const at = `${field}.${index}`;
    requireNonNegative(limit.distanceUpstream, `${at}.distanceUpstream`);
    requireFinite(limit.maxLevel, `${at}.maxLevel`);
    const freeboard = limit.freeboard ?? 0;
    requireNonNegative(freeboard, `${at}.freeboard`);
    const withoutSchemeLevel = withoutLevelAt(limit.distanceUpstream);
    if (!Number.isFinite(withoutSchemeLevel)) throw new InvalidInputError(`${at}.distanceUpstream`, 'has no without-scheme level');
    const onProfile = pointAtDistance(withProfile, limit.distanceUpstream);
    const waterLevel = onProfile === null ? withoutSchemeLevel : onProfile.waterLevel;
    const margin = limit.maxLevel - freeboard - waterLevel;
    return {
      label: limit.label,
      distanceUpstream: limit.distanceUpstream,
      maxLevel: limit.maxLevel,
      freeboard,
      waterLevel,
      withoutSchemeLevel,
      afflux: waterLevel - withoutSchemeLevel,
      margin,
      pass: waterLevel + freeboard <= limit.maxLevel,
      source: onProfile === null ? 'beyond-profile' : 'profile',
    };
  });
}
