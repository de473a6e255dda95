import type { CubicMetresPerSecond, Metres, SquareMetres } from './units';

/**
 * Conveyance K = (1/n) A R^(2/3), so that Q = K √S: Manning's formula in SI
 * (Manning, "On the flow of water in open channels and pipes", 1891; Chow, Open-Channel Hydraulics, 1959, eq. 5-6 — from memory).
 * A dry or perimeter-free piece carries nothing.
 */
export function manningConveyance(area: SquareMetres, wettedPerimeter: Metres, manningN: number): CubicMetresPerSecond {
  if (area <= 0 || wettedPerimeter <= 0) return 0;
  return (area * Math.pow(area / wettedPerimeter, 2 / 3)) / manningN;
}
