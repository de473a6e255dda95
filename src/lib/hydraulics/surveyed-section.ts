// A surveyed (station–elevation) cross-section as a FlowSection, with left overbank / channel / right overbank.
import { InvalidInputError, requireFinite } from './errors';
import { SCRATCH_SLOTS, scratchNumbers } from './scratch-numbers';
import type { FlowSection, SectionState } from './section';
import type { FroudeFactorBounds, SectionSample } from './section-sample';
import { requireDepth, sectionState } from './section-state';
import { emptyFlow, flowAtLevel, froudeFactorBoundsBetween } from './surveyed-flow';
import { SurveyTable } from './surveyed-table';
import { type SurveyedGround, groundOfSurvey } from './surveyed-ground';
import { type SurveyedSectionSpec, validatedSurvey } from './surveyed-spec';
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

function highestGroundAt(ground: SurveyedGround, station: Metres): Metres {
  let highest = -Infinity;
  for (let i = 0; i < ground.stations.length; i++) if (ground.stations[i] === station) highest = Math.max(highest, ground.elevations[i]);
  return highest;
}

/** Per point i ≥ 1, the sub-area of the segment ending there: 0, 1 or 2 for left overbank, channel, right overbank. */
function segmentSubAreas(ground: SurveyedGround): Float64Array {
  const { stations, banks } = ground;
  // Working space: the table reads it once, while it is built.
  const subAreas = scratchNumbers(stations.length, SCRATCH_SLOTS.segmentSubAreas);
  subAreas[0] = -1;
  for (let i = 1; i < stations.length; i++) {
    const middle = (stations[i - 1] + stations[i]) / 2;
    subAreas[i] = middle < banks.left ? 0 : middle > banks.right ? 2 : 1;
  }
  return subAreas;
}

/** Distinct depths in (0, maxDepth] of the table's levels, ascending (the levels are every ground elevation, ascending). */
function depthsOfLevels(levels: ArrayLike<Metres>, invertLevel: Metres, maxDepth: Metres): Metres[] {
  const depths: Metres[] = [];
  for (let k = 0; k < levels.length; k++) {
    const depth = levels[k] - invertLevel;
    if (depth > 0 && depth <= maxDepth && depth !== depths[depths.length - 1]) depths.push(depth);
  }
  return depths;
}

// One record for every section's evaluations: the engine is synchronous, and each result is copied out at once.
const flow = emptyFlow();

export function surveyedSection(spec: SurveyedSectionSpec, opts: { field?: string } = {}): SurveyedSection {
  return sectionOfGround(groundOfSurvey(validatedSurvey(spec, opts.field ?? 'reach.section')));
}

/**
 * The section over ground already checked (as validatedSurvey checks a survey). Why: sections interpolated between
 * two checked surveys are most of a refined reach, and checking each again would cost as much as tabulating it.
 */
export function sectionOfGround(ground: SurveyedGround): SurveyedSection {
  return new TabulatedSection(ground);
}

/**
 * A class, not an object of closures. Why: a march calls the same few methods on thousands of sections, and sections
 * that share one hidden class and one set of functions keep those calls monomorphic; closures would be five per section.
 */
class TabulatedSection implements SurveyedSection {
  readonly shape = 'surveyed' as const;
  readonly invertLevel: Metres;
  readonly maxDepth: Metres;
  readonly lowerEndLevel: Metres;
  readonly bankLevels: { left: Metres; right: Metres };
  readonly breakpointDepths: readonly Metres[];
  readonly jumpDepths: readonly Metres[];
  private readonly table: SurveyTable;
  /** Manning's n of the left overbank, the channel and the right overbank. */
  private readonly roughness: readonly number[];

  constructor(ground: SurveyedGround) {
    const { elevations } = ground;
    let invertLevel = elevations[0];
    for (let i = 1; i < elevations.length; i++) invertLevel = Math.min(invertLevel, elevations[i]);
    this.invertLevel = invertLevel;
    this.lowerEndLevel = Math.min(elevations[0], elevations[elevations.length - 1]);
    this.maxDepth = this.lowerEndLevel - invertLevel;
    this.table = new SurveyTable({ stations: ground.stations, elevations, segmentSubAreas: segmentSubAreas(ground), order: ground.order });
    this.jumpDepths = depthsOfLevels(this.table.jumpLevels, invertLevel, this.maxDepth);
    this.breakpointDepths = depthsOfLevels(this.table.levels, invertLevel, this.maxDepth);
    this.roughness = [ground.roughness.left, ground.roughness.channel, ground.roughness.right];
    this.bankLevels = { left: highestGroundAt(ground, ground.banks.left), right: highestGroundAt(ground, ground.banks.right) };
  }

  stateAtLevel(level: Metres): SectionState {
    requireFinite(level, 'level');
    if (level < this.invertLevel) throw new InvalidInputError('level', `must not be below the lowest ground point (${this.invertLevel} m)`);
    const { area, wettedPerimeter, topWidth, firstMoment, conveyance, energyCoefficient } = flowAtLevel(this.table, this.roughness, level, flow);
    return sectionState({ depth: level - this.invertLevel, area, wettedPerimeter, topWidth, firstMoment }, conveyance, energyCoefficient, level > this.lowerEndLevel);
  }

  stateAtDepth(depth: Metres): SectionState {
    requireDepth(depth);
    return { ...this.stateAtLevel(this.invertLevel + depth), depth };
  }

  sampleInto(depth: Metres, out: SectionSample): void {
    requireDepth(depth);
    flowAtLevel(this.table, this.roughness, this.invertLevel + depth, flow);
    out.area = flow.area;
    out.topWidth = flow.topWidth;
    out.conveyance = flow.conveyance;
    out.energyCoefficient = flow.energyCoefficient;
  }

  froudeFactorBoundsInto(from: Metres, to: Metres, out: FroudeFactorBounds): void {
    froudeFactorBoundsBetween(this.table, this.roughness, this.invertLevel, this.invertLevel + from, this.invertLevel + to, out);
  }
}
