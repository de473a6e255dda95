// How one land parcel along the reach is affected in one event: the afflux over it, and how much of it is under water
// with and without the scheme. A one-dimensional reading: the water level is taken as level across the channel,
// so both banks at one distance see the same level.
import { requireFinite, requireNonNegative } from '../errors';
import { pointAtDistance } from '../profiles/profile-interpolation';
import type { ProfilePoint } from '../profiles/profile-point';
import type { Metres } from '../units';
import { inundation } from './inundation';

export interface ParcelSpan {
  /** Distances upstream of the control where the parcel's river frontage starts and ends. */
  from: Metres;
  to: Metres;
  /** Lowest ground level of the parcel; null to judge flooding by the bank level instead. */
  groundLevel: Metres | null;
}

export type ParcelCategory = 'affected' | 'below-threshold' | 'not-affected' | 'outside-reach';

export interface ParcelFlooding {
  /** Length of the parcel's frontage where the water stands above the ground (or bank) level. */
  inundatedLength: Metres;
  /** Greatest depth of water above that ground level over the parcel; 0 when dry. */
  maxDepth: Metres;
  maxWaterLevel: Metres;
}

export interface ParcelEventImpact {
  affluxAtFrom: Metres;
  affluxAtTo: Metres;
  maxAfflux: Metres;
  maxAffluxAt: Metres;
  withScheme: ParcelFlooding | null;
  withoutScheme: ParcelFlooding | null;
  /** What flooding was judged against: the parcel's own ground level, the reach's bank level, or nothing given. */
  floodingJudgedBy: 'ground-level' | 'bank-level' | null;
  /** The part of the parcel inside the computed reach; `to` is less than the parcel's when it runs beyond it. */
  assessed: { from: Metres; to: Metres } | null;
  category: ParcelCategory;
}

/** A rise below half a millimetre shows as 0.000 m: the parcel is "not affected" rather than "below the threshold". */
export const NEGLIGIBLE_AFFLUX: Metres = 0.0005;
/** Newly flooded frontage shorter than this is within the rounding of the profile's points. */
export const NEGLIGIBLE_LENGTH: Metres = 0.5;

/** Every distance where either profile has a point, inside [from, to], with both ends: the interpolated levels are straight between them. */
function breakpoints(from: Metres, to: Metres, ...profiles: readonly (readonly ProfilePoint[])[]): Metres[] {
  const inside = profiles.flatMap((p) => p.map((point) => point.distanceUpstream)).filter((d) => d > from && d < to);
  return [...new Set([from, ...inside, to])].sort((a, b) => a - b);
}

function flooding(points: ProfilePoint[], groundAt: ((d: Metres) => Metres) | null): ParcelFlooding | null {
  const maxWaterLevel = points.reduce((m, p) => Math.max(m, p.waterLevel), -Infinity);
  if (!groundAt) return null;
  const wet = inundation(points, groundAt);
  return { inundatedLength: wet.totalLength, maxDepth: wet.maxDepth, maxWaterLevel };
}

/**
 * The impact on one parcel. Levels between profile points are interpolated linearly, as everywhere in the engine; the
 * afflux is evaluated at the parcel's ends and at every profile point between them, which finds its exact maximum.
 * Upstream of the with-scheme profile the water is back at its without-scheme level (as for the limits).
 */
export function parcelImpact(
  span: ParcelSpan,
  withScheme: readonly ProfilePoint[],
  withoutScheme: readonly ProfilePoint[],
  opts: { impactThreshold: Metres; bankLevelAt: ((d: Metres) => Metres) | null },
): ParcelEventImpact {
  requireNonNegative(span.from, 'parcel.distanceFromM');
  requireNonNegative(span.to, 'parcel.distanceToM');
  if (span.groundLevel !== null) requireFinite(span.groundLevel, 'parcel.groundLevelM');
  const groundAt = span.groundLevel !== null ? () => span.groundLevel as Metres : opts.bankLevelAt;
  const floodingJudgedBy = span.groundLevel !== null ? 'ground-level' : opts.bankLevelAt ? 'bank-level' : null;
  const reachEnd = withoutScheme.length ? withoutScheme[withoutScheme.length - 1].distanceUpstream : 0;
  if (withoutScheme.length === 0 || span.from > reachEnd) {
    return { affluxAtFrom: 0, affluxAtTo: 0, maxAfflux: 0, maxAffluxAt: span.from, withScheme: null, withoutScheme: null, floodingJudgedBy, assessed: null, category: 'outside-reach' };
  }
  const to = Math.min(span.to, reachEnd);
  const distances = breakpoints(span.from, to, withScheme, withoutScheme);
  const without = distances.map((d) => pointAtDistance(withoutScheme, d) as ProfilePoint);
  const withPoints = distances.map((d, i) => pointAtDistance(withScheme, d) ?? without[i]);
  const afflux = distances.map((d, i) => ({ d, rise: withPoints[i].waterLevel - without[i].waterLevel }));
  const peak = afflux.reduce((best, a) => (a.rise > best.rise ? a : best), afflux[0]);

  const withFlooding = flooding(withPoints, groundAt);
  const withoutFlooding = flooding(without, groundAt);
  const newlyFlooded = withFlooding && withoutFlooding ? withFlooding.inundatedLength - withoutFlooding.inundatedLength : 0;
  const category: ParcelCategory =
    peak.rise >= opts.impactThreshold || newlyFlooded > NEGLIGIBLE_LENGTH ? 'affected' : peak.rise > NEGLIGIBLE_AFFLUX ? 'below-threshold' : 'not-affected';
  return {
    affluxAtFrom: afflux[0].rise,
    affluxAtTo: afflux[afflux.length - 1].rise,
    maxAfflux: Math.max(0, peak.rise),
    maxAffluxAt: peak.d,
    withScheme: withFlooding,
    withoutScheme: withoutFlooding,
    floodingJudgedBy,
    assessed: { from: span.from, to },
    category,
  };
}

const RANK: Record<ParcelCategory, number> = { 'outside-reach': 0, 'not-affected': 1, 'below-threshold': 2, affected: 3 };

/** The parcel's category over all events: the most severe one. */
export function worstCategory(categories: readonly ParcelCategory[]): ParcelCategory {
  return categories.reduce<ParcelCategory>((worst, c) => (RANK[c] > RANK[worst] ? c : worst), 'outside-reach');
}
