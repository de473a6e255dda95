// A surveyed (station–elevation) cross-section as a FlowSection, with left overbank / channel / right overbank.
import { InvalidInputError, requireFinite } from './errors';
import { manningConveyance } from './manning';
import { type GroundSegment, type WettedPiece, sumPieces, wettedPiece } from './polygon-clip';
import type { FlowSection, SectionState } from './section';
import { requireDepth, sectionState } from './section-state';
import { type SurveyedSectionSpec, type ValidatedSurvey, validatedSurvey } from './surveyed-spec';
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
}

const SUB_AREAS = ['left', 'channel', 'right'] as const;
type SubArea = (typeof SUB_AREAS)[number];
type Point = ValidatedSurvey['points'][number];

function withPointAt(points: Point[], station: Metres): Point[] {
  if (points.some((p) => p.station === station)) return points;
  const i = points.findIndex((p) => p.station > station);
  const a = points[i - 1];
  const b = points[i];
  const elevation = a.elevation + ((station - a.station) * (b.elevation - a.elevation)) / (b.station - a.station);
  return [...points.slice(0, i), { station, elevation }, ...points.slice(i)];
}

function highestGroundAt(points: Point[], station: Metres): Metres {
  return Math.max(...points.filter((p) => p.station === station).map((p) => p.elevation));
}

function subAreaOf(segment: GroundSegment, banks: ValidatedSurvey['banks']): SubArea {
  const middle = (segment.x1 + segment.x2) / 2;
  if (middle < banks.left) return 'left';
  if (middle > banks.right) return 'right';
  return 'channel';
}

/**
 * Energy coefficient of a divided section: α = Σ vᵢ³Aᵢ / (V³A) (Chow, Open-Channel Hydraulics, 1959, §2-7 — from memory)
 * with vᵢ = Kᵢ√S/Aᵢ and V = K√S/A, i.e. α = (Σ Kᵢ³/Aᵢ²) / (K³/A²).
 * Summed as Σ (vᵢ/V)³ (Aᵢ/A) so that a sliver of a sub-area cannot overflow or underflow.
 */
function dividedEnergyCoefficient(parts: { area: number; conveyance: number }[]): number {
  const area = parts.reduce((s, p) => s + p.area, 0);
  const conveyance = parts.reduce((s, p) => s + p.conveyance, 0);
  if (area <= 0 || conveyance <= 0) return 1;
  const meanRatio = conveyance / area;
  const alpha = parts.reduce((s, p) => (p.area > 0 ? s + (p.conveyance / p.area / meanRatio) ** 3 * (p.area / area) : s), 0);
  return Number.isFinite(alpha) ? Math.max(1, alpha) : 1;
}

export function surveyedSection(spec: SurveyedSectionSpec, opts: { field?: string } = {}): SurveyedSection {
  const field = opts.field ?? 'reach.section';
  const survey = validatedSurvey(spec, field);
  const ground = withPointAt(withPointAt(survey.points, survey.banks.left), survey.banks.right);
  const segments = ground.slice(1).map((p, i) => {
    const segment: GroundSegment = { x1: ground[i].station, z1: ground[i].elevation, x2: p.station, z2: p.elevation };
    return { segment, subArea: subAreaOf(segment, survey.banks) };
  });
  const segmentsBySubArea = Object.fromEntries(
    SUB_AREAS.map((subArea) => [subArea, segments.filter((s) => s.subArea === subArea).map((s) => s.segment)]),
  ) as Record<SubArea, GroundSegment[]>;
  const invertLevel = Math.min(...ground.map((p) => p.elevation));
  const lowerEndLevel = Math.min(ground[0].elevation, ground[ground.length - 1].elevation);
  const maxDepth = lowerEndLevel - invertLevel;
  const breakpointDepths = [...new Set(ground.map((p) => p.elevation - invertLevel))].filter((d) => d > 0 && d <= maxDepth).sort((a, b) => a - b);

  function stateAtLevel(level: Metres): SectionState {
    requireFinite(level, 'level');
    if (level < invertLevel) throw new InvalidInputError('level', `must not be below the lowest ground point (${invertLevel} m)`);
    const parts = SUB_AREAS.map((subArea) => {
      const piece: WettedPiece = sumPieces(segmentsBySubArea[subArea].map((segment) => wettedPiece(segment, level)));
      return { ...piece, conveyance: manningConveyance(piece.area, piece.wettedPerimeter, survey.roughness[subArea]) };
    });
    const whole = sumPieces(parts);
    const conveyance = parts.reduce((sum, part) => sum + part.conveyance, 0);
    return sectionState({ depth: level - invertLevel, ...whole }, conveyance, dividedEnergyCoefficient(parts), level > lowerEndLevel);
  }

  return {
    shape: 'surveyed',
    invertLevel,
    maxDepth,
    lowerEndLevel,
    bankLevels: { left: highestGroundAt(ground, survey.banks.left), right: highestGroundAt(ground, survey.banks.right) },
    breakpointDepths,
    stateAtLevel,
    stateAtDepth(depth: Metres): SectionState {
      requireDepth(depth);
      return { ...stateAtLevel(invertLevel + depth), depth };
    },
  };
}
