// A survey laid out for interpolation: each sub-area (left overbank, channel, right overbank) spans one unit of position.
import { type SurveyedSectionSpec, type ValidatedSurvey, validatedSurvey, withGroundPointAt } from '../surveyed-spec';
import type { Metres } from '../units';

interface GroundPoint {
  station: Metres;
  elevation: Metres;
}

/** A survey laid out on a common position u: 0–1 across the left overbank, 1–2 the channel, 2–3 the right overbank. */
export interface LaidOutSurvey {
  points: GroundPoint[];
  positions: number[];
  /** Station at the start of each sub-area and its width. */
  zones: { start: Metres; width: Metres }[];
  roughness: ValidatedSurvey['roughness'];
}


/** Surveys already laid out. Why: refinement interpolates many sections between the same two surveys. */
const laidOutSurveys = new WeakMap<SurveyedSectionSpec, LaidOutSurvey>();

export function laidOut(spec: SurveyedSectionSpec, field: string): LaidOutSurvey {
  let known = laidOutSurveys.get(spec);
  if (known === undefined) laidOutSurveys.set(spec, (known = layOut(spec, field)));
  return known;
}

function layOut(spec: SurveyedSectionSpec, field: string): LaidOutSurvey {
  const survey = validatedSurvey(spec, field);
  const points = withGroundPointAt(withGroundPointAt(survey.points, survey.banks.left), survey.banks.right);
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

export function stationAt(survey: LaidOutSurvey, u: number): Metres {
  const zone = Math.min(2, Math.max(0, Math.floor(u)));
  const { start, width } = survey.zones[zone];
  return start + Math.min(1, Math.max(0, u - zone)) * width;
}
