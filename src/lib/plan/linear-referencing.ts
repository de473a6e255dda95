import { type PlanPoint, boundsOf, cumulativeLengths, distanceBetween } from './planar-geometry';

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

/** The nearest point to `p` on the given segments (segment i runs from vertex i−1 to vertex i): the foot of the perpendicular, clamped to the segment. */
function nearestOnSegments(line: Centreline, lengths: readonly number[], p: PlanPoint, segments: Iterable<number>): LocatedPoint {
  let best: LocatedPoint = { chainage: line.chainageStartM, offset: Infinity, side: 0 };
  for (const i of segments) {
    const [ax, ay] = line.points[i - 1];
    const [bx, by] = line.points[i];
    const dx = bx - ax;
    const dy = by - ay;
    const squared = dx * dx + dy * dy;
    const t = squared === 0 ? 0 : Math.min(1, Math.max(0, ((p[0] - ax) * dx + (p[1] - ay) * dy) / squared));
    const offset = distanceBetween([ax + t * dx, ay + t * dy], p);
    if (offset < best.offset) {
      const cross = dx * (p[1] - ay) - dy * (p[0] - ax);
      best = { chainage: line.chainageStartM + lengths[i - 1] + t * Math.sqrt(squared), offset, side: cross > 0 ? 1 : cross < 0 ? -1 : 0 };
    }
  }
  return best;
}

const allSegments = (line: Centreline) => Array.from({ length: line.points.length - 1 }, (_, i) => i + 1);

/** The nearest point of the centreline to `p`. */
export function locateOnCentreline(line: Centreline, p: PlanPoint): LocatedPoint {
  return nearestOnSegments(line, cumulativeLengths(line.points), p, allSegments(line));
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

/**
 * The chainages a parcel's outline spans along the river: the least and greatest chainage of its vertices. Only the
 * segments that can hold a vertex's nearest point are searched: none is farther from a vertex than the first
 * vertex's nearest point is from it, so a segment whose box lies beyond that reach of the outline's box is skipped.
 */
export function chainageRange(line: Centreline, vertices: Iterable<PlanPoint>): { from: number; to: number } | null {
  const list = [...vertices];
  const box = boundsOf(list);
  if (!box) return null;
  const lengths = cumulativeLengths(line.points);
  const first = nearestOnSegments(line, lengths, list[0], allSegments(line));
  const reach = first.offset + Math.hypot(box.maxX - box.minX, box.maxY - box.minY);
  const near = allSegments(line).filter((i) => {
    const [ax, ay] = line.points[i - 1];
    const [bx, by] = line.points[i];
    return Math.max(ax, bx) >= box.minX - reach && Math.min(ax, bx) <= box.maxX + reach && Math.max(ay, by) >= box.minY - reach && Math.min(ay, by) <= box.maxY + reach;
  });
  let range = { from: first.chainage, to: first.chainage };
  for (const v of list.slice(1)) {
    const { chainage } = nearestOnSegments(line, lengths, v, near);
    range = { from: Math.min(range.from, chainage), to: Math.max(range.to, chainage) };
  }
  return range;
}
