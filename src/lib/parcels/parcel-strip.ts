import 'server-only';
import { pointAtDistance } from '@/lib/hydraulics/profiles/profile-interpolation';
import type { Metres } from '@/lib/hydraulics/units';
import type { RevisionEventProfiles } from './revision-results';

/** The data of the small long-section drawn for one parcel: levels along its frontage and a little either side. */
export interface ParcelStrip {
  event: string;
  from: Metres;
  to: Metres;
  points: { distance: Metres; withScheme: Metres; withoutScheme: Metres; ground: Metres | null; bed: Metres }[];
}

const SAMPLES = 40;

/** Reads the event's two profiles (interpolated, never recomputed) at evenly spaced distances around the parcel. */
export function parcelStrip(event: RevisionEventProfiles, span: { from: Metres; to: Metres }, groundAt: ((d: Metres) => Metres) | null): ParcelStrip | null {
  const without = event.withoutScheme;
  const reachEnd = without.length ? without[without.length - 1].distanceUpstream : 0;
  if (span.from > reachEnd) return null;
  const pad = Math.max(25, 0.25 * (span.to - span.from));
  const start = Math.max(0, span.from - pad);
  const end = Math.min(reachEnd, span.to + pad);
  const points = Array.from({ length: SAMPLES + 1 }, (_, i) => start + ((end - start) * i) / SAMPLES).map((distance) => {
    const wo = pointAtDistance(without, distance)!;
    const w = pointAtDistance(event.withScheme, distance) ?? wo;
    return { distance, withScheme: w.waterLevel, withoutScheme: wo.waterLevel, ground: groundAt ? groundAt(distance) : null, bed: wo.bedLevel };
  });
  return { event: event.name, from: span.from, to: Math.min(span.to, reachEnd), points };
}
