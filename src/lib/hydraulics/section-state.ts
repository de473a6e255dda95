import { InvalidInputError, requireFinite } from './errors';
import type { SectionState } from './section';
import type { CubicMetres, CubicMetresPerSecond, Dimensionless, Metres, SquareMetres } from './units';

export interface SectionGeometry {
  depth: Metres;
  area: SquareMetres;
  wettedPerimeter: Metres;
  topWidth: Metres;
  firstMoment: CubicMetres;
}

/**
 * The full state from the basic geometry: R = A/P and D = A/T (Chow 1959, §2-5 — from memory).
 * A dry section has R = D = 0; a brim-full closed conduit (T = 0) has D = ∞, so its Froude number is 0.
 */
export function sectionState(
  geometry: SectionGeometry,
  conveyance: CubicMetresPerSecond,
  energyCoefficient: Dimensionless,
  overtopped: boolean,
): SectionState {
  const { area, wettedPerimeter, topWidth } = geometry;
  const hydraulicRadius = wettedPerimeter > 0 ? area / wettedPerimeter : 0;
  const hydraulicDepth = area <= 0 ? 0 : topWidth > 0 ? area / topWidth : Infinity;
  const finite =
    Number.isFinite(area) && Number.isFinite(wettedPerimeter) && Number.isFinite(topWidth) && Number.isFinite(geometry.firstMoment) &&
    Number.isFinite(hydraulicRadius) && Number.isFinite(conveyance) && Number.isFinite(energyCoefficient);
  if (!finite || Number.isNaN(hydraulicDepth)) {
    throw new InvalidInputError('depth', `${geometry.depth} m gives section properties beyond the range of double precision (check the units)`);
  }
  return { depth: geometry.depth, area, wettedPerimeter, topWidth, firstMoment: geometry.firstMoment, hydraulicRadius, hydraulicDepth, conveyance, energyCoefficient, overtopped };
}

/** A depth handed to stateAtDepth: finite and not negative. */
export function requireDepth(depth: Metres, field = 'depth'): void {
  requireFinite(depth, field);
  if (depth < 0) throw new InvalidInputError(field, 'must be 0 or more');
}
