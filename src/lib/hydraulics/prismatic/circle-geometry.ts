import { brentRoot } from '../solvers';
import type { SectionGeometry } from '../section-state';
import type { Metres } from '../units';

/** Central angle θ subtended by the water surface in a circle of diameter D at depth y: θ = 2 arccos(1 − 2y/D). */
export function circleCentralAngle(diameter: Metres, depth: Metres): number {
  const ratio = Math.min(Math.max(depth / diameter, 0), 1);
  return 2 * Math.acos(1 - 2 * ratio);
}

/**
 * Part-full circle: A = D²(θ − sin θ)/8, P = θD/2, T = D sin(θ/2)
 * (Chow, Open-Channel Hydraulics, 1959, Table 2-1 — from memory).
 * First moment about the surface: the segment's centroid lies 4r sin³(θ/2) / (3(θ − sin θ)) from the centre
 * (centroid of a circular segment, standard mensuration — from memory), which gives
 * Aȳ = A(y − D/2) + D³ sin³(θ/2)/12. Depths above the soffit are held at the full bore.
 */
export function circleGeometry(diameter: Metres, depth: Metres): SectionGeometry {
  const y = Math.min(depth, diameter);
  const theta = circleCentralAngle(diameter, y);
  const halfSine = Math.sin(theta / 2);
  const area = (diameter * diameter * (theta - Math.sin(theta))) / 8;
  return {
    depth,
    area,
    wettedPerimeter: (theta * diameter) / 2,
    topWidth: y >= diameter ? 0 : diameter * halfSine,
    firstMoment: Math.max(0, area * (y - diameter / 2) + (diameter ** 3 * halfSine ** 3) / 12),
  };
}

/**
 * Depth ratio y/D at which the conveyance A·R^(2/3) of a circle peaks (about 0.938).
 * Setting d(A^(5/3) P^(−2/3))/dθ = 0 with the Table 2-1 formulas gives 3θ − 5θ cos θ + 2 sin θ = 0 (derived),
 * solved here on θ ∈ (π, 2π).
 */
export const CIRCLE_PEAK_CONVEYANCE_DEPTH_RATIO: number = (() => {
  const theta = brentRoot((t) => 3 * t - 5 * t * Math.cos(t) + 2 * Math.sin(t), Math.PI, 2 * Math.PI - 1e-9, { field: 'circle.peakConveyance' });
  return (1 - Math.cos(theta / 2)) / 2;
})();
