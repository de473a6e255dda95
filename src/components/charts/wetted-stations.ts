import type { XY } from '@/lib/revisions/results-sheet';

export interface StationedGround {
  /** The ground with a station added wherever it crosses the water level. */
  points: XY[];
  /** True for the stations added, which lie on the ground line and are not drawn as survey points. */
  added: boolean[];
}

const EPSILON = 1e-9;

/**
 * The ground with the water's edges added: where a ground segment crosses the level, the crossing station (by linear
 * interpolation along that segment) is inserted, so that a water line drawn on these stations reaches the banks and
 * spans the whole wetted width rather than stopping at the last survey point under water.
 */
export function withWaterEdges(ground: readonly XY[], level: number): StationedGround {
  const points: XY[] = [];
  const added: boolean[] = [];
  ground.forEach((p, i) => {
    const q = ground[i + 1];
    points.push(p);
    added.push(false);
    if (!q) return;
    const crosses = (p.y - level) * (q.y - level) < 0;
    if (!crosses) return;
    const t = (level - p.y) / (q.y - p.y);
    points.push({ x: p.x + t * (q.x - p.x), y: level });
    added.push(true);
  });
  return { points, added };
}

/** Whether the segment between two stations lies under the water (its ends at or below the level). */
export function isWet(a: XY, b: XY, level: number): boolean {
  return a.y <= level + EPSILON && b.y <= level + EPSILON && !(a.y >= level - EPSILON && b.y >= level - EPSILON);
}
