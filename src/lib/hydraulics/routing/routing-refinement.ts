// Choosing the routing time step: halved until the peak level settles.
import { InvalidInputError } from '../errors';
import type { Metres } from '../units';
import { ROUTING_STEP_LIMIT } from '@/lib/validation/input-limits';
import { hydrographDuration, type InflowHydrograph } from './inflow-hydrograph';
import { modifiedPulsMarch, type PulsMarch } from './modified-puls';
import type { RoutingRefinement } from './routing-result';
import type { ReservoirModel } from './storage-indication';

/** The peak level must change by less than this when the step is halved. */
export const PEAK_LEVEL_TOLERANCE: Metres = 0.001;

const MIN_STEPS = 32;

/**
 * First step count: at least MIN_STEPS, and two steps per hydrograph interval at its shortest, so that the march sees
 * every point the hydrograph was given at (common practice: Δt well below the time to peak).
 */
function initialStepCount(hydrograph: InflowHydrograph): number {
  const duration = hydrographDuration(hydrograph);
  let shortest = duration;
  for (let i = 1; i < hydrograph.times.length; i++) shortest = Math.min(shortest, hydrograph.times[i] - hydrograph.times[i - 1]);
  return Math.max(MIN_STEPS, Math.ceil((2 * duration) / shortest));
}

export interface RefinedMarch {
  march: PulsMarch;
  refinement: RoutingRefinement;
}

export function refinedPulsMarch(model: ReservoirModel, hydrograph: InflowHydrograph, startLevel: Metres, field: string, stepLimit = ROUTING_STEP_LIMIT): RefinedMarch {
  const hours = (hydrographDuration(hydrograph) / 3600).toPrecision(3);
  const tooMany = (count: number) =>
    new InvalidInputError(
      field,
      `would need more than ${stepLimit} routing time steps (${count} at least) to settle the peak level within ${PEAK_LEVEL_TOLERANCE * 1000} mm: the hydrograph lasts ${hours} h with changes much quicker than that; shorten it, or give fewer, more evenly spaced points`,
    );
  let count = initialStepCount(hydrograph);
  if (count > stepLimit) throw tooMany(count);
  let coarse = modifiedPulsMarch(model, hydrograph, startLevel, count);
  for (let halvings = 1; ; halvings++) {
    if (2 * count > stepLimit) throw tooMany(2 * count);
    count *= 2;
    const fine = modifiedPulsMarch(model, hydrograph, startLevel, count);
    const change = Math.abs(fine.peakLevel.level - coarse.peakLevel.level);
    if (change < PEAK_LEVEL_TOLERANCE) {
      return { march: fine, refinement: { timeStep: fine.timeStep, halvings, peakLevelChangeOnHalving: change, tolerance: PEAK_LEVEL_TOLERANCE, converged: true } };
    }
    coarse = fine;
  }
}
