import { type PlanPoint, cumulativeLengths, distanceBetween } from './planar-geometry';

// Chainage along the river centreline by linear referencing: the centreline is a route whose measure (chainage)
// grows with the length walked from its first vertex, which is at a stated chainage (ISO 19148:2021, Geographic
// information — Linear referencing; the "length along the route" method, common practice).

export interface Centreline {
  /** Vertices from the downstream end upstream, in projected metres. */
  points: readonly PlanPoint[];
  /** Chainage of the first vertex, metres upstream of the structure (0 when the line starts at the structure). */
  chainageStartM: number;
}

export interface LocatedPoint {
  /** Chainage of the nearest point on the centreline. */
  chainage: number;
  /** Distance from the point to the centreline, metres. */
  offset: number;
  /** +1 when the point lies left of the line's direction (walking upstream), −1 right, 0 on it. */
  side: -1 | 0 | 1;
}

/** The nearest point of the centreline to `p`: each segment's foot of the perpendicular, clamped to the segment. */
export function locateOnCentreline(line: Centreline, p: PlanPoint): LocatedPoint {
  const lengths = cumulativeLengths(line.points);
  let best: LocatedPoint = { chainage: line.chainageStartM, offset: distanceBetween(line.points[0], p), side: 0 };
  for (let i = 1; i < line.points.length; i++) {
    const [ax, ay] = line.points[i - 1];
    const [bx, by] = line.points[i];
    const dx = bx - ax;
    const dy = by - ay;
    const squared = dx * dx + dy * dy;
    const t = squared === 0 ? 0 : Math.min(1, Math.max(0, ((p[0] - ax) * dx + (p[1] - ay) * dy) / squared));
    const foot: PlanPoint = [ax + t * dx, ay + t * dy];
    const offset = distanceBetween(foot, p);
    if (offset < best.offset) {
      const cross = dx * (p[1] - ay) - dy * (p[0] - ax);
      best = { chainage: line.chainageStartM + lengths[i - 1] + t * Math.sqrt(squared), offset, side: cross > 0 ? 1 : cross < 0 ? -1 : 0 };
    }
  }
  return best;
}

/** Chainage of the centreline's last vertex. */
export function chainageEnd(line: Centreline): number {
  const lengths = cumulativeLengths(line.points);
  return line.chainageStartM + lengths[lengths.length - 1];
}

/** The point at a chainage, interpolated along its segment; null outside the centreline. */
export function pointAtChainage(line: Centreline, chainage: number): PlanPoint | null {
  const lengths = cumulativeLengths(line.points);
  const along = chainage - line.chainageStartM;
  if (along < 0 || along > lengths[lengths.length - 1]) return null;
  const i = Math.max(1, lengths.findIndex((l) => l >= along));
  const [ax, ay] = line.points[i - 1];
  const [bx, by] = line.points[i];
  const span = lengths[i] - lengths[i - 1];
  const t = span === 0 ? 0 : (along - lengths[i - 1]) / span;
  return [ax + t * (bx - ax), ay + t * (by - ay)];
}

/** The part of the centreline between two chainages (clipped to its ends), as a polyline; empty when they miss it. */
export function centrelineBetween(line: Centreline, from: number, to: number): PlanPoint[] {
  const start = Math.max(from, line.chainageStartM);
  const end = Math.min(to, chainageEnd(line));
  if (!(end > start)) return [];
  const lengths = cumulativeLengths(line.points);
  const inner = line.points.filter((_, i) => line.chainageStartM + lengths[i] > start && line.chainageStartM + lengths[i] < end);
  return [pointAtChainage(line, start)!, ...inner, pointAtChainage(line, end)!];
}

/** The chainages a parcel's outline spans along the river: the least and greatest chainage of its vertices. */
export function chainageRange(line: Centreline, vertices: Iterable<PlanPoint>): { from: number; to: number } | null {
  let range: { from: number; to: number } | null = null;
  for (const v of vertices) {
    const { chainage } = locateOnCentreline(line, v);
    range = range ? { from: Math.min(range.from, chainage), to: Math.max(range.to, chainage) } : { from: chainage, to: chainage };
  }
  return range;
}
