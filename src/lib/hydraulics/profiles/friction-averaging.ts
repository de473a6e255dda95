// The representative friction slope of a step between two sections.
import { InvalidInputError } from '../errors';
import type { CubicMetresPerSecond, Slope } from '../units';

export type FrictionAveraging = 'average-conveyance' | 'arithmetic' | 'geometric' | 'harmonic';

export const FRICTION_AVERAGING_METHODS: readonly FrictionAveraging[] = ['average-conveyance', 'arithmetic', 'geometric', 'harmonic'];

/**
 * Mean friction slope over a step from the conveyances at its two ends, where each end alone gives
 * Sf = (Q/K)² (Manning's formula written with conveyance; Chow, Open-Channel Hydraulics, 1959, eq. 6-2 — from memory).
 * - 'arithmetic': (Sf₁ + Sf₂)/2, the mean Chow uses in the direct step (Chow 1959, §10-3, eq. 10-10 — from memory);
 * - 'average-conveyance': Sf = (2Q/(K₁ + K₂))², i.e. the conveyances averaged first (common practice);
 * - 'geometric': √(Sf₁·Sf₂) (common practice);
 * - 'harmonic': 2·Sf₁·Sf₂/(Sf₁ + Sf₂) (common practice).
 * For any two slopes: harmonic ≤ average-conveyance ≤ geometric ≤ arithmetic, all equal when Sf₁ = Sf₂.
 */
export function meanFrictionSlope(
  method: FrictionAveraging,
  discharge: CubicMetresPerSecond,
  conveyance1: CubicMetresPerSecond,
  conveyance2: CubicMetresPerSecond,
): Slope {
  if (!(conveyance1 > 0) || !(conveyance2 > 0)) {
    throw new InvalidInputError('frictionAveraging', 'needs a wetted section with conveyance above 0 at both ends of the step');
  }
  const slope1 = (discharge / conveyance1) ** 2;
  const slope2 = (discharge / conveyance2) ** 2;
  switch (method) {
    case 'average-conveyance':
      return ((2 * discharge) / (conveyance1 + conveyance2)) ** 2;
    case 'arithmetic':
      return (slope1 + slope2) / 2;
    case 'geometric':
      return Math.sqrt(slope1 * slope2);
    case 'harmonic':
      return slope1 + slope2 === 0 ? 0 : (2 * slope1 * slope2) / (slope1 + slope2);
    default:
      throw new InvalidInputError('frictionAveraging', `must be one of ${FRICTION_AVERAGING_METHODS.join(', ')}`);
  }
}
