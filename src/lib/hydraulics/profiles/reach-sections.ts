// A reach as a list of cross-sections by distance upstream of the control, filled in where too far apart.
import { InvalidInputError, requireFinite, requirePositive } from '../errors';
import type { FlowSection } from '../section';
import { groundOfSurvey } from '../surveyed-ground';
import { sectionOfGround } from '../surveyed-section';
import { type SurveyedSectionSpec, validatedSurvey } from '../surveyed-spec';
import type { Metres, Slope } from '../units';
import { interpolatedGround, interpolatedSurvey } from './survey-interpolation';
import { rememberLayout } from './survey-layout';

export interface ReachStation {
  distanceUpstream: Metres;
  section: FlowSection;
  /** Level of the section's lowest point: depth = water level − bedLevel (for a surveyed section, its invert level). */
  bedLevel: Metres;
  bankLevel?: Metres;
  /** The survey the section was built from; lets sections be interpolated between this station and the next. */
  survey?: SurveyedSectionSpec;
  /** For an interpolated station, the surveys and weight its ground was blended from: its survey, written out when asked for. */
  blend?: { from: SurveyedSectionSpec; to: SurveyedSectionSpec; weight: number };
}

/**
 * The station's survey, written out from its blend the first time it is asked for. Why: only a step halved near
 * critical depth interpolates from an interpolated station, and writing out every survey would cost a list per point.
 */
function surveyOf(station: ReachStation): SurveyedSectionSpec | undefined {
  if (station.survey === undefined && station.blend !== undefined) station.survey = interpolatedSurvey(station.blend.from, station.blend.to, station.blend.weight);
  return station.survey;
}

/** Stations at most `spacing` apart over a prismatic reach, all sharing one section; the bed rises upstream at bedSlope. */
export function prismaticReach(input: {
  section: FlowSection;
  bedSlope: Slope;
  bedLevelAtControl: Metres;
  reachLength: Metres;
  spacing: Metres;
  bankHeight?: Metres;
}): ReachStation[] {
  requirePositive(input.reachLength, 'reach.length');
  requirePositive(input.spacing, 'reach.spacing');
  requireFinite(input.bedSlope, 'reach.bedSlope');
  requireFinite(input.bedLevelAtControl, 'reach.bedLevel');
  const steps = Math.ceil(input.reachLength / input.spacing - 1e-9);
  const stations: ReachStation[] = [];
  for (let i = 0; i <= steps; i++) {
    const distanceUpstream = i === steps ? input.reachLength : (input.reachLength * i) / steps;
    const bedLevel = input.bedLevelAtControl + input.bedSlope * distanceUpstream;
    stations.push({ distanceUpstream, section: input.section, bedLevel, bankLevel: input.bankHeight === undefined ? undefined : bedLevel + input.bankHeight });
  }
  return stations;
}

/** Stations from surveys; the first must be the control section, at distance 0. */
export function surveyedReach(sections: readonly { distanceUpstream: Metres; survey: SurveyedSectionSpec; bankLevel?: Metres }[], field = 'reach.sections'): ReachStation[] {
  if (sections.length < 2) throw new InvalidInputError(field, 'needs at least two surveyed sections');
  return sections.map((entry, i) => {
    const at = `${field}.${i}`;
    requireFinite(entry.distanceUpstream, `${at}.distanceUpstream`);
    if (i === 0 && entry.distanceUpstream !== 0) throw new InvalidInputError(`${at}.distanceUpstream`, 'must be 0: the first section is the control section');
    if (i > 0 && !(entry.distanceUpstream > sections[i - 1].distanceUpstream)) throw new InvalidInputError(`${at}.distanceUpstream`, 'must be greater than the distance of the section before it');
    // Checked once: the same ground makes the section and the layout its neighbours are interpolated from.
    const ground = groundOfSurvey(validatedSurvey(entry.survey, `${at}.survey`));
    rememberLayout(entry.survey, ground);
    const section = sectionOfGround(ground);
    return { distanceUpstream: entry.distanceUpstream, section, bedLevel: section.invertLevel, bankLevel: entry.bankLevel, survey: entry.survey };
  });
}

/** Stations between which another can be put: one shared section, or surveys on both. */
export function canInterpolate(a: ReachStation, b: ReachStation): boolean {
  return a.section === b.section || ((a.survey ?? a.blend) !== undefined && (b.survey ?? b.blend) !== undefined);
}

/** Two stations between the same two surveys: those surveys and how far from the first each station lies. */
interface SharedSpan {
  from: SurveyedSectionSpec;
  to: SurveyedSectionSpec;
  weightOfA: number;
  weightOfB: number;
}

function sharedSpan(a: ReachStation, b: ReachStation): SharedSpan | null {
  if (a.blend !== undefined && b.blend !== undefined) {
    return a.blend.from === b.blend.from && a.blend.to === b.blend.to ? { from: a.blend.from, to: a.blend.to, weightOfA: a.blend.weight, weightOfB: b.blend.weight } : null;
  }
  if (a.blend !== undefined && b.survey === a.blend.to) return { from: a.blend.from, to: a.blend.to, weightOfA: a.blend.weight, weightOfB: 1 };
  if (b.blend !== undefined && a.survey === b.blend.from) return { from: b.blend.from, to: b.blend.to, weightOfA: 0, weightOfB: b.blend.weight };
  return null;
}

/**
 * The station a fraction `weight` of the way from `a` to `b`. Between stations that lie between the same two surveys
 * (a step halved near critical depth) the ground is blended from those two surveys themselves. Why: a survey written
 * out from a blend has the points of both its surveys, and blending it again adds the other's once more, so sections
 * halved forty times over would carry exponentially many points.
 */
export function stationBetween(a: ReachStation, b: ReachStation, weight: number): ReachStation {
  const distanceUpstream = a.distanceUpstream + weight * (b.distanceUpstream - a.distanceUpstream);
  const bankLevel = a.bankLevel !== undefined && b.bankLevel !== undefined ? a.bankLevel + weight * (b.bankLevel - a.bankLevel) : undefined;
  if (a.section === b.section) return { distanceUpstream, section: a.section, bedLevel: a.bedLevel + weight * (b.bedLevel - a.bedLevel), bankLevel };
  const span = sharedSpan(a, b);
  const from = span?.from ?? surveyOf(a);
  const to = span?.to ?? surveyOf(b);
  if (from === undefined || to === undefined) throw new InvalidInputError('reach.sections', 'differing sections need surveys to be interpolated');
  const blendWeight = span === null ? weight : span.weightOfA + weight * (span.weightOfB - span.weightOfA);
  const section = sectionOfGround(interpolatedGround(from, to, blendWeight));
  // Both fields present from the start, so that writing the survey out later keeps the station's shape.
  return { distanceUpstream, section, bedLevel: section.invertLevel, bankLevel, survey: undefined, blend: { from, to, weight: blendWeight } };
}

/**
 * The reach with interpolated stations added wherever neighbours lie more than maxSpacing apart: the same
 * section again between stations that share one, interpolated ground between surveyed ones. Stations that
 * differ without surveys cannot be interpolated; they are left as they are and a warning says so.
 */
export function refinedReach(reach: readonly ReachStation[], maxSpacing: Metres, between: typeof stationBetween = stationBetween): { stations: ReachStation[]; warnings: string[] } {
  requirePositive(maxSpacing, 'maxSpacing');
  const stations: ReachStation[] = [reach[0]];
  const warnings: string[] = [];
  for (let i = 1; i < reach.length; i++) {
    const a = reach[i - 1];
    const b = reach[i];
    const pieces = Math.ceil((b.distanceUpstream - a.distanceUpstream) / maxSpacing - 1e-9);
    const interpolable = canInterpolate(a, b);
    if (pieces > 1 && !interpolable) warnings.push(`no sections interpolated between ${a.distanceUpstream} m and ${b.distanceUpstream} m: they carry no survey`);
    if (interpolable) for (let k = 1; k < pieces; k++) stations.push(between(a, b, k / pieces));
    stations.push(b);
  }
  return { stations, warnings };
}

/**
 * stationBetween, remembering each station it makes. Why: halving the spacing puts a station at every place the
 * coarser spacing had one (k/n = 2k/2n exactly), and building a surveyed section, with its critical depth, is
 * most of the cost of a step; one refinement reuses them instead of building them again.
 */
export function rememberedStationsBetween(): typeof stationBetween {
  const known = new Map<ReachStation, Map<number, ReachStation>>();
  return (a, b, weight) => {
    let fromA = known.get(a);
    if (fromA === undefined) known.set(a, (fromA = new Map()));
    let station = fromA.get(weight);
    if (station === undefined) {
      station = stationBetween(a, b, weight);
      fromA.set(weight, station);
    }
    return station;
  };
}
