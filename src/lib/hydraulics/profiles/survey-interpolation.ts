// A cross-section between two surveyed ones, by linear interpolation of the ground itself.
import { type SurveyedSectionSpec, type ValidatedSurvey, validatedSurvey } from '../surveyed-spec';
import type { Metres } from '../units';

interface GroundPoint {
  station: Metres;
  elevation: Metres;
}

/** A survey laid out on a common position u: 0–1 across the left overbank, 1–2 the channel, 2–3 the right overbank. */
interface LaidOutSurvey {
  points: GroundPoint[];
  positions: number[];
  /** Station at the start of each sub-area and its width. */
  zones: { start: Metres; width: Metres }[];
  roughness: ValidatedSurvey['roughness'];
}

function withPointAt(points: GroundPoint[], station: Metres): GroundPoint[] {
  if (points.some((p) => p.station === station)) return points;
  const i = points.findIndex((p) => p.station > station);
  const a = points[i - 1];
  const b = points[i];
  const elevation = a.elevation + ((station - a.station) * (b.elevation - a.elevation)) / (b.station - a.station);
  return [...points.slice(0, i), { station, elevation }, ...points.slice(i)];
}

/** Surveys already laid out. Why: refinement interpolates many sections between the same two surveys. */
const laidOutSurveys = new WeakMap<SurveyedSectionSpec, LaidOutSurvey>();

function laidOut(spec: SurveyedSectionSpec, field: string): LaidOutSurvey {
  let known = laidOutSurveys.get(spec);
  if (known === undefined) laidOutSurveys.set(spec, (known = layOut(spec, field)));
  return known;
}

function layOut(spec: SurveyedSectionSpec, field: string): LaidOutSurvey {
  const survey = validatedSurvey(spec, field);
  const points = withPointAt(withPointAt(survey.points, survey.banks.left), survey.banks.right);
  const first = points[0].station;
  const last = points[points.length - 1].station;
  const zones = [
    { start: first, width: survey.banks.left - first },
    { start: survey.banks.left, width: survey.banks.right - survey.banks.left },
    { start: survey.banks.right, width: last - survey.banks.right },
  ];
  const positionOf = (s: Metres) => {
    const zone = s < survey.banks.left ? 0 : s <= survey.banks.right ? 1 : 2;
    const { start, width } = zones[zone];
    return zone + (width > 0 ? (s - start) / width : 0);
  };
  return { points, positions: points.map((p) => positionOf(p.station)), zones, roughness: survey.roughness };
}

function stationAt(survey: LaidOutSurvey, u: number): Metres {
  const zone = Math.min(2, Math.max(0, Math.floor(u)));
  const { start, width } = survey.zones[zone];
  return start + Math.min(1, Math.max(0, u - zone)) * width;
}

/** Ground elevations at position u, top to bottom as surveyed: several where a vertical wall stands there. */
function elevationsAt(survey: LaidOutSurvey, u: number): Metres[] {
  const { points, positions } = survey;
  const exact = points.filter((_, i) => positions[i] === u).map((p) => p.elevation);
  if (exact.length > 0) return exact;
  const after = positions.findIndex((p) => p > u);
  if (after < 0) return [points[points.length - 1].elevation];
  if (after === 0) return [points[0].elevation];
  const t = (u - positions[after - 1]) / (positions[after] - positions[after - 1]);
  return [points[after - 1].elevation + t * (points[after].elevation - points[after - 1].elevation)];
}

const mix = (a: number, b: number, w: number) => a + (b - a) * w;

/**
 * The section a fraction `weight` of the way from `from` (0) to `to` (1). Each sub-area (left overbank, channel,
 * right overbank) is matched to its counterpart by relative position across it, and at every breakpoint of
 * either survey the stations, ground levels, bank stations and Manning's n are blended linearly (common
 * practice for filling in sections between surveyed ones). Vertical walls are blended point by point.
 */
export function interpolatedSurvey(from: SurveyedSectionSpec, to: SurveyedSectionSpec, weight: number, field = 'reach.sections'): SurveyedSectionSpec {
  const a = laidOut(from, field);
  const b = laidOut(to, field);
  const positions = [...new Set([...a.positions, ...b.positions])].sort((p, q) => p - q);
  const points: [Metres, Metres][] = [];
  for (const u of positions) {
    const station = mix(stationAt(a, u), stationAt(b, u), weight);
    const levelsA = elevationsAt(a, u);
    const levelsB = elevationsAt(b, u);
    const count = Math.max(levelsA.length, levelsB.length);
    for (let k = 0; k < count; k++) {
      points.push([station, mix(levelsA[Math.min(k, levelsA.length - 1)], levelsB[Math.min(k, levelsB.length - 1)], weight)]);
    }
  }
  const manningN = {
    left: mix(a.roughness.left, b.roughness.left, weight),
    channel: mix(a.roughness.channel, b.roughness.channel, weight),
    right: mix(a.roughness.right, b.roughness.right, weight),
  };
  const bankStations: [Metres, Metres] = [mix(stationAt(a, 1), stationAt(b, 1), weight), mix(stationAt(a, 2), stationAt(b, 2), weight)];
  return { points, manningN, bankStations };
}
