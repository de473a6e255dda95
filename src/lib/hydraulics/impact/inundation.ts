// Where the water stands above the banks, along a profile.
import { requireFinite } from '../errors';
import type { ProfilePoint } from '../profiles/profile-point';
import type { Metres } from '../units';

export interface InundatedStretch {
  from: Metres;
  to: Metres;
  length: Metres;
  /** Greatest depth of water above the bank within the stretch. */
  maxDepth: Metres;
}

export interface Inundation {
  stretches: InundatedStretch[];
  totalLength: Metres;
  maxDepth: Metres;
  /** Furthest inundated point upstream; 0 when nothing is inundated. */
  extentUpstream: Metres;
}

/**
 * Stretches where water level exceeds bank level. The depth over the bank is taken as linear between
 * profile points, so each bank crossing is interpolated where that line passes zero.
 */
export function inundation(profile: readonly ProfilePoint[], bankLevelAt: (distanceUpstream: Metres) => Metres): Inundation {
  const overBank = profile.map((point) => {
    const bank = bankLevelAt(point.distanceUpstream);
    requireFinite(bank, 'bankLevel');
    return { x: point.distanceUpstream, depth: point.waterLevel - bank };
  });
  const stretches: InundatedStretch[] = [];
  let open: { from: Metres; maxDepth: Metres } | null = null;
  for (let i = 0; i < overBank.length; i++) {
    const { x, depth } = overBank[i];
    const previous = i > 0 ? overBank[i - 1] : null;
    const crossing = previous === null ? x : previous.x + ((x - previous.x) * previous.depth) / (previous.depth - depth);
    if (depth > 0 && open === null) open = { from: previous === null || previous.depth > 0 ? x : crossing, maxDepth: depth };
    else if (depth > 0 && open !== null) open.maxDepth = Math.max(open.maxDepth, depth);
    else if (depth <= 0 && open !== null) {
      const to = depth === 0 ? x : crossing;
      stretches.push({ from: open.from, to, length: to - open.from, maxDepth: open.maxDepth });
      open = null;
    }
  }
  if (open !== null) {
    const to = overBank[overBank.length - 1].x;
    stretches.push({ from: open.from, to, length: to - open.from, maxDepth: open.maxDepth });
  }
  return {
    stretches,
    totalLength: stretches.reduce((sum, s) => sum + s.length, 0),
    maxDepth: stretches.reduce((max, s) => Math.max(max, s.maxDepth), 0),
    extentUpstream: stretches.length === 0 ? 0 : stretches[stretches.length - 1].to,
  };
}

export interface InundationComparison {
  withScheme: Inundation;
  withoutScheme: Inundation;
  /** With-scheme minus without-scheme inundated length. */
  addedLength: Metres;
}

export function inundationComparison(
  withScheme: readonly ProfilePoint[],
  withoutScheme: readonly ProfilePoint[],
  bankLevelAt: (distanceUpstream: Metres) => Metres,
): InundationComparison {
  const withResult = inundation(withScheme, bankLevelAt);
  const withoutResult = inundation(withoutScheme, bankLevelAt);
  return { withScheme: withResult, withoutScheme: withoutResult, addedLength: withResult.totalLength - withoutResult.totalLength };
}
