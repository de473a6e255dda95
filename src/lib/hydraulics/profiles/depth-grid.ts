// The depths at which the direct step computes its points.
import type { Metres } from '../units';

/** Depth of step k (k = 0 is the control); reaches `towards` at k = steps and may be continued beyond it. */
export type DepthSequence = (k: number) => Metres;

/**
 * Depths spaced geometrically in their distance from normal depth: |y − yn| shrinks by a constant ratio per step.
 * Why: near normal depth the integrand dx/dy = (1 − Fr²)/(S₀ − Sf) grows like 1/(y − yn), because S₀ − Sf is
 * nearly proportional to y − yn there. Equal ratios of |y − yn| make the integrand change by the same factor in
 * every step, so every step carries about the same relative error and the same share of the distance — the
 * steps crowd into the depths where the distance per unit of depth changes fastest.
 */
export function geometricDepths(from: Metres, towards: Metres, normalDepth: Metres, steps: number): DepthSequence {
  const side = from > normalDepth ? 1 : -1;
  const first = Math.abs(from - normalDepth);
  const ratio = Math.pow(Math.abs(towards - normalDepth) / first, 1 / steps);
  return (k) => (k === 0 ? from : k === steps ? towards : normalDepth + side * first * Math.pow(ratio, k));
}

/**
 * Depths in geometric progression, for horizontal and adverse beds, which have no normal depth. Why: there the
 * integrand dx/dy = (1 − Fr²)/(Sf − S₀) is, away from critical depth, close to a power of the depth (Sf ∝ y^(−10/3)
 * in a wide channel with Manning's n), so equal ratios of depth give every step the same relative change of it.
 */
export function proportionalDepths(from: Metres, towards: Metres, steps: number): DepthSequence {
  const ratio = Math.pow(towards / from, 1 / steps);
  return (k) => (k === 0 ? from : k === steps ? towards : from * Math.pow(ratio, k));
}
