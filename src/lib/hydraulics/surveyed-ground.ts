// A section's ground once checked: points as parallel lists, with a point at each bank station.
import type { ValidatedSurvey } from './surveyed-spec';
import type { Metres } from './units';

export interface SurveyedGround {
  /** Stations across the section, non-decreasing; one of them at each bank station. */
  stations: Metres[];
  elevations: Metres[];
  roughness: ValidatedSurvey['roughness'];
  banks: ValidatedSurvey['banks'];
  /** The point indices by elevation as a neighbouring section had them, if known (see ground-levels.ts). */
  order?: number[];
}

/** Inserts a point at `station` on the line between its neighbours unless the ground has one there (a bank station must be a vertex). */
function insertPointAt(stations: Metres[], elevations: Metres[], station: Metres): void {
  let i = 0;
  while (i < stations.length && stations[i] < station) i++;
  if (i < stations.length && stations[i] === station) return;
  const elevation = elevations[i - 1] + ((station - stations[i - 1]) * (elevations[i] - elevations[i - 1])) / (stations[i] - stations[i - 1]);
  stations.splice(i, 0, station);
  elevations.splice(i, 0, elevation);
}

/** The ground with its bank stations as vertices; the lists given are changed in place. */
export function withBankPoints(ground: SurveyedGround): SurveyedGround {
  insertPointAt(ground.stations, ground.elevations, ground.banks.left);
  insertPointAt(ground.stations, ground.elevations, ground.banks.right);
  return ground;
}

export function groundOfSurvey(survey: ValidatedSurvey): SurveyedGround {
  const stations = survey.points.map((p) => p.station);
  const elevations = survey.points.map((p) => p.elevation);
  return withBankPoints({ stations, elevations, roughness: survey.roughness, banks: survey.banks });
}
