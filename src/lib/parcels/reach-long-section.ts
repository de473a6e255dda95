import 'server-only';
import { pointAtDistance } from '@/lib/hydraulics/profiles/profile-interpolation';
import type { Metres } from '@/lib/hydraulics/units';
import type { RevisionResults } from './revision-results';

export interface ReachLongSection {
  event: string;
  points: { distance: Metres; withScheme: Metres; withoutScheme: Metres; bank: Metres | null }[];
}

/** Each event's levels along the whole reach, read from its two stored profiles at their own points (nothing recomputed). */
export function reachLongSections(results: RevisionResults): ReachLongSection[] {
  return results.events.map((e) => {
    const distances = [...new Set([...e.withScheme, ...e.withoutScheme].map((p) => p.distanceUpstream))].sort((a, b) => a - b);
    return {
      event: e.name,
      points: distances.flatMap((distance) => {
        const without = pointAtDistance(e.withoutScheme, distance);
        if (!without) return [];
        const withScheme = pointAtDistance(e.withScheme, distance) ?? without;
        return [{ distance, withScheme: withScheme.waterLevel, withoutScheme: without.waterLevel, bank: results.bankLevelAt ? results.bankLevelAt(distance) : null }];
      }),
    };
  });
}
