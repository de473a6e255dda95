// Plane geometry on projected coordinates (easting, northing in metres): no map projection, no curvature of the
// earth. Over the few kilometres of a reach the scale error of a national grid is well under one part in a thousand.

/** [easting, northing] in metres of the stated projected coordinate system. */
export type PlanPoint = readonly [number, number];
/** A closed ring of vertices; the closing vertex may be repeated or left out. */
export type PlanRing = readonly PlanPoint[];
/** An outer ring followed by its holes. */
export type PlanPolygon = readonly PlanRing[];

/**
 * Signed area of a ring, positive when its vertices run anticlockwise: the shoelace (Gauss's area) formula,
 * A = ½ Σ (xᵢ·yᵢ₊₁ − xᵢ₊₁·yᵢ) (common practice; O'Rourke, Computational Geometry in C, 2nd ed., 1998, §1.3).
 * Coordinates are taken relative to the first vertex so that large grid values do not lose precision.
 */
export function signedRingArea(ring: PlanRing): number {
  if (ring.length < 3) return 0;
  const [x0, y0] = ring[0];
  let twice = 0;
  for (let i = 0; i < ring.length; i++) {
    const [xa, ya] = ring[i];
    const [xb, yb] = ring[(i + 1) % ring.length];
    twice += (xa - x0) * (yb - y0) - (xb - x0) * (ya - y0);
  }
  return twice / 2;
}

/** Area of a polygon in square metres: its outer ring less its holes, whichever way each ring runs. */
export function polygonArea(polygon: PlanPolygon): number {
  const [outer, ...holes] = polygon;
  if (!outer) return 0;
  return Math.abs(signedRingArea(outer)) - holes.reduce((sum, hole) => sum + Math.abs(signedRingArea(hole)), 0);
}

export function distanceBetween(a: PlanPoint, b: PlanPoint): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/** Length along the line from its first vertex to each vertex, in metres. */
export function cumulativeLengths(line: readonly PlanPoint[]): number[] {
  const lengths = [0];
  for (let i = 1; i < line.length; i++) lengths.push(lengths[i - 1] + distanceBetween(line[i - 1], line[i]));
  return lengths;
}

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function boundsOf(points: Iterable<PlanPoint>): Bounds | null {
  let b: Bounds | null = null;
  for (const [x, y] of points) {
    b = b ? { minX: Math.min(b.minX, x), minY: Math.min(b.minY, y), maxX: Math.max(b.maxX, x), maxY: Math.max(b.maxY, y) } : { minX: x, minY: y, maxX: x, maxY: y };
  }
  return b;
}
