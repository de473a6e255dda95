// A survey laid out for interpolation: each sub-area (left overbank, channel, right overbank) spans one unit of position.
import { type SurveyedGround, groundOfSurvey } from '../surveyed-ground';
import { type SurveyedSectionSpec, type ValidatedSurvey, validatedSurvey } from '../surveyed-spec';
import type { Metres } from '../units';

/** A survey laid out on a common position u: 0–1 across the left overbank, 1–2 the channel, 2–3 the right overbank. */
export interface LaidOutSurvey {
  /** The checked ground, a point at each bank station, as parallel lists. */
  stations: readonly Metres[];
  elevations: readonly Metres[];
  positions: number[];
  /** Station at the start of each sub-area and its width. */
  zones: { start: Metres; width: Metres }[];
  roughness: ValidatedSurvey['roughness'];
}

/** Surveys already laid out. Why: refinement interpolates many sections between the same two surveys. */
const laidOutSurveys = new WeakMap<SurveyedSectionSpec, LaidOutSurvey>();

export function laidOut(spec: SurveyedSectionSpec, field: string): LaidOutSurvey {
  let known = laidOutSurveys.get(spec);
  if (known === undefined) laidOutSurveys.set(spec, (known = layOut(groundOfSurvey(validatedSurvey(spec, field)))));
  return known;
}

/**
 * Lays out a survey from its ground, checked already (groundOfSurvey of validatedSurvey), for laidOut to find. Why: a
 * surveyed reach checks every survey to build its section, and checking it again for the layout cost as much.
 */
export function rememberLayout(spec: SurveyedSectionSpec, ground: SurveyedGround): void {
  if (!laidOutSurveys.has(spec)) laidOutSurveys.set(spec, layOut(ground));
}

function layOut(ground: SurveyedGround): LaidOutSurvey {
  const { stations, banks } = ground;
  const first = stations[0];
  const last = stations[stations.length - 1];
  const zones = [
    { start: first, width: banks.left - first },
    { start: banks.left, width: banks.right - banks.left },
    { start: banks.right, width: last - banks.right },
  ];
  const positionOf = (s: Metres) => {
    const zone = s < banks.left ? 0 : s <= banks.right ? 1 : 2;
    const { start, width } = zones[zone];
    return zone + (width > 0 ? (s - start) / width : 0);
  };
  return { stations, elevations: ground.elevations, positions: stations.map(positionOf), zones, roughness: ground.roughness };
}

export function stationAt(survey: LaidOutSurvey, u: number): Metres {
  const zone = Math.min(2, Math.max(0, Math.floor(u)));
  const { start, width } = survey.zones[zone];
  return start + Math.min(1, Math.max(0, u - zone)) * width;
}
