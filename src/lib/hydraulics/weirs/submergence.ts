import { NoPhysicalSolutionError } from '../errors';
import type { Metres } from '../units';
import type { SubmergenceState } from './weir-types';

/** Exponent n of the free-flow rating Q ∝ H^n; 1.5 for a rectangular weir (Villemonte 1947). */
export const RECTANGULAR_WEIR_EXPONENT = 1.5;

/**
 * Beyond this tailwater-to-headwater ratio the weir no longer controls: the level difference across
 * it is under 5 % of the head, within the scatter of Villemonte's (1947) data, and a small error in the
 * tailwater moves the upstream level by as much as the weir does. The reach's upstream level is then
 * set by the channel downstream, which this calculation does not model.
 */
export const DROWNED_RATIO = 0.95;

/**
 * Villemonte's submerged-flow reduction Qs/Q = (1 − (H₂/H₁)^n)^0.385
 * (Villemonte, "Submerged-weir discharge studies", Engineering News-Record, 1947).
 */
export function villemonteFactor(ratio: number, exponent: number = RECTANGULAR_WEIR_EXPONENT): number {
  if (ratio <= 0) return 1;
  if (ratio >= 1) return 0;
  return (1 - ratio ** exponent) ** 0.385;
}

/** Tailwater head over the crest, m, from the tailwater depth above the bed and the sill height. */
export function tailwaterHead(tailwaterLevel: Metres, sillHeight: Metres): Metres {
  return Math.max(0, tailwaterLevel - sillHeight);
}

export function submergenceState(head: Metres, tailwater: Metres): SubmergenceState {
  const ratio = head > 0 ? tailwater / head : tailwater > 0 ? 1 : 0;
  return { tailwaterHead: tailwater, ratio, factor: villemonteFactor(ratio) };
}

export function assertNotDrowned(state: SubmergenceState, field: string): void {
  if (state.ratio < DROWNED_RATIO) return;
  throw new NoPhysicalSolutionError(
    `${field}.tailwaterLevel`,
    'weir-drowned',
    `the weir is drowned out: the tailwater stands at ${(state.ratio * 100).toFixed(1)} % of the upstream head over the crest ` +
      `(limit ${DROWNED_RATIO * 100} %), so the weir no longer controls the upstream level. ` +
      'Treat the tailwater level as the control depth, or raise the crest.',
  );
}
