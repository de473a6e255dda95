// A surveyed (station–elevation) cross-section as a FlowSection, with left overbank / channel / right overbank.
import { InvalidInputError, requireFinite } from './errors';
import { allocatedNumbers } from './number-arena';
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

/** Distinct depths in (0, maxDepth] of the table's levels (all of them, or those where it jumps), ascending. */
function depthsOfLevels(table: SurveyTable, onlyJumps: boolean, invertLevel: Metres, maxDepth: Metres): Metres[] {
  const depths: Metres[] = [];
  for (let k = 0; k < table.levelCount; k++) {
    if (onlyJumps && !table.jumpsAbove(k)) continue;
    const depth = table.levelAt(k) - invertLevel;
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
 * The lists of depths last made, for one section only. Why: a critical-depth search reads them a few times over for
 * the section in hand, and keeping them for every section is what they are made when asked for to avoid.
 */
let lastBreakpoints: { section: SurveyedSection | null; depths: readonly Metres[] } = { section: null, depths: [] };
let lastJumps: { section: SurveyedSection | null; depths: readonly Metres[] } = { section: null, depths: [] };

/** Where a section's own numbers stand in its run (see number-arena.ts): Manning's n first, as flowAtLevel reads them. */
const AT = { roughness: 0, invertLevel: 3, lowerEndLevel: 4, leftBankLevel: 5, rightBankLevel: 6 } as const;
const SECTION_NUMBERS = 7;

/**
 * A class, not an object of closures. Why: a march calls the same few methods on thousands of sections, and sections
 * that share one hidden class and one set of functions keep those calls monomorphic. Its numbers stand in a shared
 * block beside its table's and the lists of depths are made when asked for: a refined reach keeps some 1,600
 * sections, and every small object each keeps (a boxed number, a short list) is work for every collection.
 */
class TabulatedSection implements SurveyedSection {
  readonly shape = 'surveyed' as const;
  private readonly table: SurveyTable;
  private readonly numbers: Float64Array;
  private readonly at: number;

  constructor(ground: SurveyedGround) {
    const { elevations } = ground;
    let invertLevel = elevations[0];
    for (let i = 1; i < elevations.length; i++) invertLevel = Math.min(invertLevel, elevations[i]);
    const { numbers, offset } = allocatedNumbers(SECTION_NUMBERS);
    this.numbers = numbers;
    this.at = offset;
    numbers[offset + AT.roughness] = ground.roughness.left;
    numbers[offset + AT.roughness + 1] = ground.roughness.channel;
    numbers[offset + AT.roughness + 2] = ground.roughness.right;
    numbers[offset + AT.invertLevel] = invertLevel;
    numbers[offset + AT.lowerEndLevel] = Math.min(elevations[0], elevations[elevations.length - 1]);
    numbers[offset + AT.leftBankLevel] = highestGroundAt(ground, ground.banks.left);
    numbers[offset + AT.rightBankLevel] = highestGroundAt(ground, ground.banks.right);
    this.table = new SurveyTable({ stations: ground.stations, elevations, segmentSubAreas: segmentSubAreas(ground), order: ground.order });
  }

  get invertLevel(): Metres {
    return this.numbers[this.at + AT.invertLevel];
  }

  get lowerEndLevel(): Metres {
    return this.numbers[this.at + AT.lowerEndLevel];
  }

  get maxDepth(): Metres {
    return this.lowerEndLevel - this.invertLevel;
  }

  get bankLevels(): { left: Metres; right: Metres } {
    return { left: this.numbers[this.at + AT.leftBankLevel], right: this.numbers[this.at + AT.rightBankLevel] };
  }

  get breakpointDepths(): readonly Metres[] {
    if (lastBreakpoints.section !== this) lastBreakpoints = { section: this, depths: depthsOfLevels(this.table, false, this.invertLevel, this.maxDepth) };
    return lastBreakpoints.depths;
  }

  get jumpDepths(): readonly Metres[] {
    if (lastJumps.section !== this) lastJumps = { section: this, depths: depthsOfLevels(this.table, true, this.invertLevel, this.maxDepth) };
    return lastJumps.depths;
  }

  stateAtLevel(level: Metres): SectionState {
    requireFinite(level, 'level');
    const { invertLevel } = this;
    if (level < invertLevel) throw new InvalidInputError('level', `must not be below the lowest ground point (${invertLevel} m)`);
    const { area, wettedPerimeter, topWidth, firstMoment, conveyance, energyCoefficient } = flowAtLevel(this.table, this.numbers, this.at + AT.roughness, level, flow);
    return sectionState({ depth: level - invertLevel, area, wettedPerimeter, topWidth, firstMoment }, conveyance, energyCoefficient, level > this.lowerEndLevel);
  }

  stateAtDepth(depth: Metres): SectionState {
    requireDepth(depth);
    return { ...this.stateAtLevel(this.invertLevel + depth), depth };
  }

  sampleInto(depth: Metres, out: SectionSample): void {
    requireDepth(depth);
    flowAtLevel(this.table, this.numbers, this.at + AT.roughness, this.invertLevel + depth, flow);
    out.area = flow.area;
    out.topWidth = flow.topWidth;
    out.conveyance = flow.conveyance;
    out.energyCoefficient = flow.energyCoefficient;
  }

  froudeFactorBoundsInto(from: Metres, to: Metres, out: FroudeFactorBounds): void {
    const { invertLevel } = this;
    froudeFactorBoundsBetween(this.table, this.numbers, this.at + AT.roughness, invertLevel, invertLevel + from, invertLevel + to, out);
  }
}
