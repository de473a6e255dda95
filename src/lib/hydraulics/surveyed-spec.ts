// Checking a surveyed cross-section (station–elevation points, roughness, bank stations).
import { InvalidInputError, requireFinite, requirePositive } from './errors';
import type { Metres } from './units';

export interface SurveyedSectionSpec {
  /** Ground points across the section, stations non-decreasing (equal stations make a vertical wall). */
  points: [station: Metres, elevation: Metres][];
  /** One n for the whole section, or one per sub-area (needs bankStations). */
  manningN: number | { left: number; channel: number; right: number };
  /** Stations dividing left overbank | main channel | right overbank. */
  bankStations?: [left: Metres, right: Metres];
}

export interface ValidatedSurvey {
  points: { station: Metres; elevation: Metres }[];
  roughness: { left: number; channel: number; right: number };
  banks: { left: Metres; right: Metres };
}

function checkedPoints(points: unknown, field: string): { station: Metres; elevation: Metres }[] {
  if (!Array.isArray(points) || points.length < 3) throw new InvalidInputError(`${field}.points`, 'must list at least three [station, elevation] points');
  const checked = points.map((point: unknown, i) => {
    // The field path is spelt out only for a point that fails: every interpolated section passes through here.
    const valid = Array.isArray(point) && point.length === 2 && Number.isFinite(point[0]) && Number.isFinite(point[1]);
    if (!valid) {
      const at = `${field}.points[${i}]`;
      if (!Array.isArray(point) || point.length !== 2) throw new InvalidInputError(at, 'must be a [station, elevation] pair');
      requireFinite(point[0], `${at}.station`);
      requireFinite(point[1], `${at}.elevation`);
    }
    // Indexed, not destructured: destructuring walks an iterator, an object per point of every survey.
    return { station: (point as [number, number])[0], elevation: (point as [number, number])[1] };
  });
  checked.forEach((point, i) => {
    if (i > 0 && point.station < checked[i - 1].station) {
      throw new InvalidInputError(`${field}.points[${i}].station`, 'must not be less than the station before it');
    }
  });
  const first = checked[0];
  const last = checked[checked.length - 1];
  if (!(last.station > first.station)) throw new InvalidInputError(`${field}.points`, 'must span some width (last station above the first)');
  requireHoldsWater(checked.map((point) => point.elevation), `${field}.points`);
  return checked;
}

/** Ground elevations across a section (at least three) hold water when some interior point lies lower than both ends. */
export function requireHoldsWater(elevations: readonly Metres[], field: string): void {
  const endLevel = Math.min(elevations[0], elevations[elevations.length - 1]);
  for (let i = 1; i < elevations.length - 1; i++) if (elevations[i] < endLevel) return;
  throw new InvalidInputError(field, 'cannot hold water: no interior point lies lower than both ends');
}

function checkedRoughness(manningN: SurveyedSectionSpec['manningN'], field: string): ValidatedSurvey['roughness'] {
  if (typeof manningN === 'number') {
    requirePositive(manningN, `${field}.manningN`);
    return { left: manningN, channel: manningN, right: manningN };
  }
  if (manningN === null || typeof manningN !== 'object') throw new InvalidInputError(`${field}.manningN`, 'must be a number or { left, channel, right }');
  for (const part of ['left', 'channel', 'right'] as const) requirePositive(manningN[part], `${field}.manningN.${part}`);
  return { left: manningN.left, channel: manningN.channel, right: manningN.right };
}

function checkedBanks(spec: SurveyedSectionSpec, first: Metres, last: Metres, field: string): ValidatedSurvey['banks'] {
  const at = `${field}.bankStations`;
  if (spec.bankStations === undefined) {
    if (typeof spec.manningN === 'object') throw new InvalidInputError(at, 'are required when manningN gives left, channel and right values');
    return { left: first, right: last };
  }
  if (!Array.isArray(spec.bankStations) || spec.bankStations.length !== 2) throw new InvalidInputError(at, 'must be a [left, right] pair of stations');
  const [left, right] = spec.bankStations;
  requireFinite(left, `${at}[0]`);
  requireFinite(right, `${at}[1]`);
  if (left < first || right > last) throw new InvalidInputError(at, `must lie within the surveyed stations ${first} to ${last} m`);
  if (!(right > left)) throw new InvalidInputError(at, 'the right bank station must be greater than the left one');
  return { left, right };
}

export function validatedSurvey(spec: SurveyedSectionSpec, field: string): ValidatedSurvey {
  if (spec === null || typeof spec !== 'object') throw new InvalidInputError(field, 'must be an object describing the surveyed section');
  const points = checkedPoints(spec.points, field);
  const roughness = checkedRoughness(spec.manningN, field);
  const banks = checkedBanks(spec, points[0].station, points[points.length - 1].station, field);
  return { points, roughness, banks };
}
