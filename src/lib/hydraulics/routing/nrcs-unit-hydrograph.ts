// The NRCS dimensionless unit hydrograph, scaled to a peak discharge and a time to peak.
import { InvalidInputError, requirePositive } from '../errors';
import type { CubicMetresPerSecond } from '../units';
import type { InflowHydrograph } from './inflow-hydrograph';
import type { Seconds } from './routing-result';

export const NRCS_SHAPE_SOURCE =
  'NRCS dimensionless unit hydrograph (USDA Natural Resources Conservation Service, National Engineering Handbook Part 630, Hydrology, ch. 16, table 16-1)';

/**
 * Ratios t/Tp and q/qp of the dimensionless unit hydrograph (USDA NRCS, National Engineering Handbook Part 630, ch. 16,
 * "Hydrographs", table 16-1; peak rate factor 484), linear between ordinates as is common practice.
 */
const TIME_RATIOS = [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2.0, 2.2, 2.4, 2.6, 2.8, 3.0, 3.2, 3.4, 3.6, 3.8, 4.0, 4.5, 5.0];
const DISCHARGE_RATIOS = [
  0, 0.03, 0.1, 0.19, 0.31, 0.47, 0.66, 0.82, 0.93, 0.99, 1.0, 0.99, 0.93, 0.86, 0.78, 0.68, 0.56, 0.46, 0.39, 0.33, 0.28, 0.207, 0.147, 0.107, 0.077, 0.055, 0.04, 0.029, 0.021, 0.015,
  0.011, 0.005, 0,
];

export const NRCS_ORDINATES: readonly (readonly [number, number])[] = TIME_RATIOS.map((t, i) => [t, DISCHARGE_RATIOS[i]] as const);

export type UnitShape = 'nrcs-dimensionless';

/** The shaped hydrograph: peak `peak` at `timeToPeak`, lasting 5 Tp. `field` names the hydrograph, `peakField` its peak. */
export function unitShapeHydrograph(shape: UnitShape, peak: CubicMetresPerSecond, timeToPeak: Seconds, field: string, peakField = `${field}.peak`): InflowHydrograph {
  if (shape !== 'nrcs-dimensionless') throw new InvalidInputError(`${field}.shape`, 'must be nrcs-dimensionless');
  requirePositive(peak, peakField);
  requirePositive(timeToPeak, `${field}.timeToPeak`);
  return { times: TIME_RATIOS.map((r) => r * timeToPeak), discharges: DISCHARGE_RATIOS.map((r) => r * peak) };
}
