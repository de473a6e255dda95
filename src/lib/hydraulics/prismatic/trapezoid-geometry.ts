import type { SectionGeometry } from '../section-state';
import type { Metres } from '../units';

/** A trapezoid with its bottom width and a side slope on each side (horizontal run per unit rise, z:1). */
export interface TrapezoidDimensions {
  bottomWidth: Metres;
  sideSlopeLeft: number;
  sideSlopeRight: number;
}

/**
 * Geometry of a trapezoid, which also covers the rectangle (z = 0) and the triangle (b = 0):
 * A = b·y + (zL + zR)·y²/2, P = b + y(√(1+zL²) + √(1+zR²)), T = b + (zL + zR)·y
 * (Chow, Open-Channel Hydraulics, 1959, Table 2-1, written for unequal side slopes — from memory).
 * First moment about the surface Aȳ = ∫₀^y (y − η) T(η) dη = b·y²/2 + (zL + zR)·y³/6 (by integration).
 */
export function trapezoidGeometry({ bottomWidth: b, sideSlopeLeft: zL, sideSlopeRight: zR }: TrapezoidDimensions, depth: Metres): SectionGeometry {
  const y = depth;
  const zSum = zL + zR;
  return {
    depth: y,
    area: b * y + (zSum * y * y) / 2,
    wettedPerimeter: b + y * (Math.hypot(1, zL) + Math.hypot(1, zR)),
    topWidth: b + zSum * y,
    firstMoment: (b * y * y) / 2 + (zSum * y * y * y) / 6,
  };
}
