import type { CubicMetresPerSecond, Metres, SquareMetres } from './units';

/**
 * Conveyance K = (1/n) A R^(2/3), so that Q = K √S: Manning's formula in SI
 * (Manning, "On the flow of water in open channels and pipes", 1891; Chow, Open-Channel Hydraulics, 1959, eq. 5-6 — from memory).
 * A dry or perimeter-free piece carries nothing.
 */
export function manningConveyance(area: SquareMetres, wettedPerimeter: Metres, manningN: number): CubicMetresPerSecond {
  if (area <= 0 || wettedPerimeter <= 0) return 0;
  // R^(2/3) as (∛R)²: the same value to rounding, no overflow where R² would, and a cube root costs a fraction of a general power.
  const root = Math.cbrt(area / wettedPerimeter);
  return (area * root * root) / manningN;
}
