// Unit-bearing aliases: the engine works in SI throughout; conversion happens at the edges.
export type Metres = number;
export type SquareMetres = number;
export type CubicMetres = number;
export type CubicMetresPerSecond = number;
export type MetresPerSecond = number;
/** Slope as a ratio (m/m), positive when the bed falls in the direction of flow. */
export type Slope = number;
export type Dimensionless = number;

/** Standard gravity, m/s² (CGPM 1901; BIPM SI Brochure, 9th ed., 2019). */
export const GRAVITY = 9.80665;

/** International foot, exactly 0.3048 m (International Yard and Pound Agreement, 1959). */
export const METRES_PER_FOOT = 0.3048;
export const CUBIC_METRES_PER_CUBIC_FOOT = METRES_PER_FOOT ** 3;

/**
 * Manning's equation in US customary units carries the factor 1.486 ≈ (1 m / 1 ft)^(1/3) (Chow 1959, eq. 5-7).
 * The engine never uses it: US inputs are converted to SI first, which is exactly equivalent.
 */
export const MANNING_US_FACTOR = (1 / METRES_PER_FOOT) ** (1 / 3);
