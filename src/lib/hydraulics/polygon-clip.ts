// Exact clipping of a ground polyline against a horizontal water surface.
import type { CubicMetres, Metres, SquareMetres } from './units';

export interface GroundSegment {
  x1: Metres;
  z1: Metres;
  x2: Metres;
  z2: Metres;
}

export interface WettedPiece {
  area: SquareMetres;
  wettedPerimeter: Metres;
  topWidth: Metres;
  /** First moment of the wetted area about the water surface, m³. */
  firstMoment: CubicMetres;
}

export const DRY: WettedPiece = { area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0 };

/**
 * The water above one straight piece of ground when the surface stands at `level`.
 * Between two points the depth d(x) is linear, so over a wetted run of width w with end depths d₁, d₂:
 * A = w(d₁ + d₂)/2 and Aȳ = ∫ d²/2 dx = w(d₁² + d₁d₂ + d₂²)/6 (exact integrals of a linear function).
 * Ground exactly at the surface is dry; a vertical wall adds wetted perimeter but no area or width.
 */
export function wettedPiece(segment: GroundSegment, level: Metres): WettedPiece {
  const { x1, z1, x2, z2 } = segment;
  const d1 = level - z1;
  const d2 = level - z2;
  if (d1 <= 0 && d2 <= 0) return DRY;
  if (x1 === x2) {
    const wetLength = Math.min(level, Math.max(z1, z2)) - Math.min(z1, z2);
    return { ...DRY, wettedPerimeter: Math.max(0, wetLength) };
  }
  const length = Math.hypot(x2 - x1, z2 - z1);
  const wetFraction = d1 >= 0 && d2 >= 0 ? 1 : Math.max(d1, d2) / Math.abs(d1 - d2);
  const deepEnd = Math.max(d1, d2);
  const shallowEnd = Math.max(0, Math.min(d1, d2));
  const width = wetFraction * (x2 - x1);
  return {
    area: (width * (deepEnd + shallowEnd)) / 2,
    wettedPerimeter: wetFraction * length,
    topWidth: width,
    firstMoment: (width * (deepEnd * deepEnd + deepEnd * shallowEnd + shallowEnd * shallowEnd)) / 6,
  };
}

export function sumPieces(pieces: readonly WettedPiece[]): WettedPiece {
  return pieces.reduce(
    (sum, piece) => ({
      area: sum.area + piece.area,
      wettedPerimeter: sum.wettedPerimeter + piece.wettedPerimeter,
      topWidth: sum.topWidth + piece.topWidth,
      firstMoment: sum.firstMoment + piece.firstMoment,
    }),
    DRY,
  );
}
