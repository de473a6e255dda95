// Where along the river the plan marks water: the stretches where the level with the scheme stands above the bank,
// and how far upstream the scheme raises the water by the impact threshold or more. Read from an event's levels at
// the profile's own points, straight between them (as the long-section chart draws them); nothing is recomputed.

export interface LevelsAlongRiver {
  distance: number;
  withScheme: number;
  withoutScheme: number;
  bank: number | null;
}

export interface Stretch {
  from: number;
  to: number;
}

/** Where `excess` (positive when wet) changes sign between two points, by straight-line interpolation. */
function crossing(d0: number, e0: number, d1: number, e1: number): number {
  return d0 + ((d1 - d0) * e0) / (e0 - e1);
}

/** Stretches where `excess` is positive, joining neighbours; the ends fall where the straight lines cross zero. */
export function positiveStretches(points: readonly { distance: number; excess: number }[]): Stretch[] {
  const stretches: Stretch[] = [];
  let start: number | null = null;
  points.forEach((p, i) => {
    const previous = points[i - 1];
    if (p.excess > 0 && start === null) start = previous && previous.excess <= 0 ? crossing(previous.distance, previous.excess, p.distance, p.excess) : p.distance;
    if (p.excess <= 0 && start !== null) {
      stretches.push({ from: start, to: crossing(previous.distance, previous.excess, p.distance, p.excess) });
      start = null;
    }
  });
  if (start !== null) stretches.push({ from: start, to: points[points.length - 1].distance });
  return stretches.filter((s) => s.to > s.from);
}

/** With the scheme, where the water stands above the top of the bank; none when the case gives no bank level. */
export function inundatedStretches(levels: readonly LevelsAlongRiver[]): Stretch[] {
  if (levels.some((l) => l.bank === null)) return [];
  return positiveStretches(levels.map((l) => ({ distance: l.distance, excess: l.withScheme - (l.bank as number) })));
}

/** From the structure to the farthest point where the scheme raises the water by the threshold or more; null when nowhere. */
export function impactExtent(levels: readonly LevelsAlongRiver[], thresholdM: number): Stretch | null {
  const raised = positiveStretches(levels.map((l) => ({ distance: l.distance, excess: l.withScheme - l.withoutScheme - thresholdM })));
  if (!raised.length) return null;
  return { from: Math.min(0, raised[0].from), to: raised[raised.length - 1].to };
}
