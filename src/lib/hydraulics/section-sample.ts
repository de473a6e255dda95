// The few properties a profile march needs at one depth, written into a reused record.
import type { FlowSection } from './section';
import type { CubicMetresPerSecond, Dimensionless, Metres, SquareMetres } from './units';

/** Area, top width, conveyance and α at one depth: everything the energy and the friction slope are made of. */
export interface SectionSample {
  area: SquareMetres;
  topWidth: Metres;
  conveyance: CubicMetresPerSecond;
  energyCoefficient: Dimensionless;
}

/** Bounds on αT/A³ over a range of depths, which times Q²/g is the square of the Froude number (see FlowSection.froudeFactorBoundsInto). */
export interface FroudeFactorBounds {
  least: number;
  most: number;
}

export function emptySample(): SectionSample {
  return { area: 0, topWidth: 0, conveyance: 0, energyCoefficient: 1 };
}

/**
 * Fills `out` with the section's properties at `depth`. Sections that can do so without building a full
 * SectionState (prismatic shapes, tabulated surveys) provide `sampleInto`; why: a march evaluates thousands of
 * depths, and each full state is an object of ten fields that the march would throw away at once.
 */
export function sampleSection(section: FlowSection, depth: Metres, out: SectionSample): SectionSample {
  if (section.sampleInto !== undefined) {
    section.sampleInto(depth, out);
    return out;
  }
  const state = section.stateAtDepth(depth);
  out.area = state.area;
  out.topWidth = state.topWidth;
  out.conveyance = state.conveyance;
  out.energyCoefficient = state.energyCoefficient;
  return out;
}
