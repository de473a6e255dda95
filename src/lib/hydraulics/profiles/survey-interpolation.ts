// A cross-section between two surveyed ones, by linear interpolation of the ground itself.
import { allocatedNumbers } from '../number-arena';
import { type SurveyedGround, withBankPoints } from '../surveyed-ground';
import { type SurveyedSectionSpec, requireHoldsWater } from '../surveyed-spec';
import type { Metres } from '../units';
import { type LaidOutSurvey, laidOut, stationAt } from './survey-layout';

/**
 * Ground elevations at each of the ascending positions `at`, top to bottom as surveyed: several where a vertical wall
 * stands there, interpolated between the survey's points elsewhere, its end levels beyond its ends. One walk along
 * the survey, as both lists ascend. Position p's elevations are levels[starts[p]] to levels[starts[p + 1] − 1]: one
 * list for all, as a pair of surveys is matched once per reach and a list per position was most of that work's garbage.
 */
function elevationsAlong(survey: LaidOutSurvey, at: readonly number[]): { levels: Metres[]; starts: number[] } {
  const { elevations, positions } = survey;
  const last = elevations.length - 1;
  const levels: Metres[] = [];
  const starts: number[] = [];
  let i = 0;
  for (const u of at) {
    starts.push(levels.length);
    while (i <= last && positions[i] < u) i++;
    if (i <= last && positions[i] === u) {
      for (let j = i; j <= last && positions[j] === u; j++) levels.push(elevations[j]);
    } else if (i > last) levels.push(elevations[last]);
    else if (i === 0) levels.push(elevations[0]);
    else {
      const t = (u - positions[i - 1]) / (positions[i] - positions[i - 1]);
      levels.push(elevations[i - 1] + t * (elevations[i] - elevations[i - 1]));
    }
  }
  starts.push(levels.length);
  return { levels, starts };
}

/** The positions of both surveys, ascending, each once: one merge, as each survey's positions ascend already. */
function mergedPositions(a: LaidOutSurvey, b: LaidOutSurvey): number[] {
  const [p, q] = [a.positions, b.positions];
  const distinct: number[] = [];
  for (let i = 0, j = 0; i < p.length || j < q.length; ) {
    const next = j >= q.length || (i < p.length && p[i] <= q[j]) ? p[i++] : q[j++];
    if (distinct.length === 0 || next !== distinct[distinct.length - 1]) distinct.push(next);
  }
  return distinct;
}

const mix = (a: number, b: number, w: number) => a + (b - a) * w;

/**
 * Everything about blending two surveys that does not depend on the weight: per matched point, its stations and ground
 * levels in both, from numbers[at]: `count` stations in `from`, then as many in `to`, then the levels in each, in one
 * run of a shared block (see number-arena.ts), as a reach keeps a pair for every two neighbouring surveys.
 */
interface MatchedPair {
  numbers: Float64Array;
  at: number;
  count: number;
  from: LaidOutSurvey;
  to: LaidOutSurvey;
  /** The blended points by elevation at the weight last blended (see ground-levels.ts). */
  order: number[];
}

function matchedPair(a: LaidOutSurvey, b: LaidOutSurvey): MatchedPair {
  const positions = mergedPositions(a, b);
  const elevationsA = elevationsAlong(a, positions);
  const elevationsB = elevationsAlong(b, positions);
  let count = 0;
  for (let p = 0; p < positions.length; p++) {
    count += Math.max(elevationsA.starts[p + 1] - elevationsA.starts[p], elevationsB.starts[p + 1] - elevationsB.starts[p]);
  }
  const { numbers, offset: at } = allocatedNumbers(4 * count);
  for (let p = 0, i = 0; p < positions.length; p++) {
    const stationA = stationAt(a, positions[p]);
    const stationB = stationAt(b, positions[p]);
    const startA = elevationsA.starts[p];
    const countA = elevationsA.starts[p + 1] - startA;
    const startB = elevationsB.starts[p];
    const countB = elevationsB.starts[p + 1] - startB;
    for (let k = 0; k < Math.max(countA, countB); k++, i++) {
      numbers[at + i] = stationA;
      numbers[at + count + i] = stationB;
      numbers[at + 2 * count + i] = elevationsA.levels[startA + Math.min(k, countA - 1)];
      numbers[at + 3 * count + i] = elevationsB.levels[startB + Math.min(k, countB - 1)];
    }
  }
  const order = new Array<number>(count);
  for (let i = 0; i < count; i++) order[i] = i;
  return { numbers, at, count, from: a, to: b, order };
}

/** Pairs already matched. Why: refinement interpolates a section at several weights between the same two surveys. */
const matchedPairs = new WeakMap<SurveyedSectionSpec, WeakMap<SurveyedSectionSpec, MatchedPair>>();

function rememberedPair(from: SurveyedSectionSpec, to: SurveyedSectionSpec, field: string): MatchedPair {
  let fromHere = matchedPairs.get(from);
  if (fromHere === undefined) matchedPairs.set(from, (fromHere = new WeakMap()));
  let pair = fromHere.get(to);
  if (pair === undefined) fromHere.set(to, (pair = matchedPair(laidOut(from, field), laidOut(to, field))));
  return pair;
}

/**
 * The ground a fraction `weight` of the way from `from` (0) to `to` (1). Each sub-area (left overbank, channel,
 * right overbank) is matched to its counterpart by relative position across it, and at every breakpoint of
 * either survey the stations, ground levels, bank stations and Manning's n are blended linearly (common
 * practice for filling in sections between surveyed ones). Vertical walls are blended point by point.
 * Blending two checked surveys keeps stations in order, a width and the bank stations inside it; it may lose the
 * low point between the ends (a channel moving across the valley under a higher bank), which is checked here.
 */
export function interpolatedGround(from: SurveyedSectionSpec, to: SurveyedSectionSpec, weight: number, field = 'reach.sections'): SurveyedGround {
  const pair = rememberedPair(from, to, field);
  const { from: a, to: b } = pair;
  const { numbers, at, count } = pair;
  const stations: Metres[] = new Array(count);
  const elevations: Metres[] = new Array(count);
  for (let i = 0; i < count; i++) {
    stations[i] = mix(numbers[at + i], numbers[at + count + i], weight);
    elevations[i] = mix(numbers[at + 2 * count + i], numbers[at + 3 * count + i], weight);
  }
  requireHoldsWater(elevations, `${field}.points`);
  const roughness = {
    left: mix(a.roughness.left, b.roughness.left, weight),
    channel: mix(a.roughness.channel, b.roughness.channel, weight),
    right: mix(a.roughness.right, b.roughness.right, weight),
  };
  const banks = { left: mix(stationAt(a, 1), stationAt(b, 1), weight), right: mix(stationAt(a, 2), stationAt(b, 2), weight) };
  return withBankPoints({ stations, elevations, roughness, banks, order: pair.order });
}

/** The interpolated ground of interpolatedGround as a survey, to be interpolated from in turn. */
export function surveyOfGround(ground: SurveyedGround): SurveyedSectionSpec {
  return {
    points: ground.stations.map((station, i) => [station, ground.elevations[i]]),
    manningN: { ...ground.roughness },
    bankStations: [ground.banks.left, ground.banks.right],
  };
}

export function interpolatedSurvey(from: SurveyedSectionSpec, to: SurveyedSectionSpec, weight: number, field = 'reach.sections'): SurveyedSectionSpec {
  return surveyOfGround(interpolatedGround(from, to, weight, field));
}
