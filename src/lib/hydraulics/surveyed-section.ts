// A surveyed (station–elevation) cross-section as a FlowSection, with left overbank / channel / right overbank.
import { InvalidInputError, requireFinite } from './errors';
import { manningConveyance } from './manning';
import type { GroundSegment } from './polygon-clip';
import type { FlowSection, SectionState } from './section';
import type { SectionSample } from './section-sample';
import { requireDepth, sectionState } from './section-state';
import { type PieceValues, SurveyTable } from './surveyed-table';
import { type SurveyedSectionSpec, type ValidatedSurvey, validatedSurvey, withGroundPointAt } from './surveyed-spec';
import type { Metres } from './units';

export type { SurveyedSectionSpec } from './surveyed-spec';

export interface SurveyedSection extends FlowSection {
  readonly shape: 'surveyed';
  /** Properties with the water surface at `level` (m above datum); above lowerEndLevel they cover the surveyed width only and say `overtopped`. */
  stateAtLevel(level: Metres): SectionState;
  /** The lower of the two end elevations: the highest level the survey can contain. */
  readonly lowerEndLevel: Metres;
  /** Ground level at the bank stations (at the section ends when no bank stations are given; the top of a wall standing on one). */
  readonly bankLevels: { left: Metres; right: Metres };
  /** Depths in (0, maxDepth] at which the ground changes slope; root scans put grid points there. */
  readonly breakpointDepths: readonly Metres[];
  /** The breakpoint depths just above which the top width or the wetted perimeter jumps (flat ground starts to flood). */
  readonly jumpDepths: readonly Metres[];
}

const SUB_AREAS = ['left', 'channel', 'right'] as const;
type Point = ValidatedSurvey['points'][number];


function highestGroundAt(points: Point[], station: Metres): Metres {
  return points.reduce((highest, p) => (p.station === station ? Math.max(highest, p.elevation) : highest), -Infinity);
}

/** 0, 1 or 2: left overbank, channel, right overbank (the order of SUB_AREAS). */
function subAreaOf(segment: GroundSegment, banks: ValidatedSurvey['banks']): number {
  const middle = (segment.x1 + segment.x2) / 2;
  if (middle < banks.left) return 0;
  if (middle > banks.right) return 2;
  return 1;
}

/** Distinct depths in (0, maxDepth] of the table's levels, ascending (the levels are every ground elevation, ascending). */
function depthsOfLevels(levels: readonly Metres[], invertLevel: Metres, maxDepth: Metres): Metres[] {
  const depths: Metres[] = [];
  for (const level of levels) {
    const depth = level - invertLevel;
    if (depth > 0 && depth <= maxDepth && depth !== depths[depths.length - 1]) depths.push(depth);
  }
  return depths;
}

/**
 * Energy coefficient of a divided section: α = Σ vᵢ³Aᵢ / (V³A) (Chow, Open-Channel Hydraulics, 1959, §2-7 — from memory)
 * with vᵢ = Kᵢ√S/Aᵢ and V = K√S/A, i.e. α = (Σ Kᵢ³/Aᵢ²) / (K³/A²).
 * Summed as Σ (vᵢ/V)³ (Aᵢ/A) so that a sliver of a sub-area cannot overflow or underflow.
 */
function dividedEnergyCoefficient(parts: readonly PieceValues[], conveyances: readonly number[], area: number, conveyance: number): number {
  if (area <= 0 || conveyance <= 0) return 1;
  const meanRatio = conveyance / area;
  let alpha = 0;
  for (let j = 0; j < parts.length; j++) {
    const part = parts[j];
    if (part.area > 0) {
      const ratio = conveyances[j] / part.area / meanRatio;
      alpha += ratio * ratio * ratio * (part.area / area);
    }
  }
  return Number.isFinite(alpha) ? Math.max(1, alpha) : 1;
}

export function surveyedSection(spec: SurveyedSectionSpec, opts: { field?: string } = {}): SurveyedSection {
  const field = opts.field ?? 'reach.section';
  const survey = validatedSurvey(spec, field);
  const ground = withGroundPointAt(withGroundPointAt(survey.points, survey.banks.left), survey.banks.right);
  const segmentsBySubArea: GroundSegment[][] = [[], [], []];
  let invertLevel = ground[0].elevation;
  for (let i = 1; i < ground.length; i++) {
    const segment: GroundSegment = { x1: ground[i - 1].station, z1: ground[i - 1].elevation, x2: ground[i].station, z2: ground[i].elevation };
    segmentsBySubArea[subAreaOf(segment, survey.banks)].push(segment);
    invertLevel = Math.min(invertLevel, ground[i].elevation);
  }
  const lowerEndLevel = Math.min(ground[0].elevation, ground[ground.length - 1].elevation);
  const maxDepth = lowerEndLevel - invertLevel;
  const table = new SurveyTable(segmentsBySubArea);
  const breakpointDepths = depthsOfLevels(table.levels, invertLevel, maxDepth);
  const jumpDepths = depthsOfLevels(table.levels.filter((_, k) => table.jumpsAbove[k] === 1), invertLevel, maxDepth);
  const roughness = SUB_AREAS.map((subArea) => survey.roughness[subArea]);
  // Scratch for one evaluation at a time: the engine is synchronous, and nothing here calls back out.
  const parts: PieceValues[] = SUB_AREAS.map(() => ({ area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0 }));
  const conveyances = [0, 0, 0];
  const whole: PieceValues = { area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0 };

  /** Fills parts, conveyances and whole at `level`; returns the total conveyance. */
  function evaluate(level: Metres): number {
    const k = table.interval(level);
    whole.area = whole.wettedPerimeter = whole.topWidth = whole.firstMoment = 0;
    let conveyance = 0;
    for (let j = 0; j < 3; j++) {
      const part = parts[j];
      table.fill(k, j, level, part);
      conveyances[j] = manningConveyance(part.area, part.wettedPerimeter, roughness[j]);
      conveyance += conveyances[j];
      whole.area += part.area;
      whole.wettedPerimeter += part.wettedPerimeter;
      whole.topWidth += part.topWidth;
      whole.firstMoment += part.firstMoment;
    }
    return conveyance;
  }

  function stateAtLevel(level: Metres): SectionState {
    requireFinite(level, 'level');
    if (level < invertLevel) throw new InvalidInputError('level', `must not be below the lowest ground point (${invertLevel} m)`);
    const conveyance = evaluate(level);
    const alpha = dividedEnergyCoefficient(parts, conveyances, whole.area, conveyance);
    return sectionState({ depth: level - invertLevel, ...whole }, conveyance, alpha, level > lowerEndLevel);
  }

  return {
    shape: 'surveyed',
    invertLevel,
    maxDepth,
    lowerEndLevel,
    bankLevels: { left: highestGroundAt(ground, survey.banks.left), right: highestGroundAt(ground, survey.banks.right) },
    breakpointDepths,
    jumpDepths,
    stateAtLevel,
    stateAtDepth(depth: Metres): SectionState {
      requireDepth(depth);
      return { ...stateAtLevel(invertLevel + depth), depth };
    },
    sampleInto(depth: Metres, out: SectionSample): void {
      requireDepth(depth);
      const conveyance = evaluate(invertLevel + depth);
      out.area = whole.area;
      out.topWidth = whole.topWidth;
      out.conveyance = conveyance;
      out.energyCoefficient = dividedEnergyCoefficient(parts, conveyances, whole.area, conveyance);
    },
  };
}
