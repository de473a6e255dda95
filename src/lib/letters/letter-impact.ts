import type { ParcelCategory, ParcelEventImpact } from '@/lib/hydraulics/impact/parcel-impact';
import type { ParcelStrip } from '@/lib/parcels/parcel-strip';

/**
 * What a letter says, frozen when the letter is made (stored as letters.impact_json): every number is the engine's,
 * so a letter can be reprinted identically and checked against the revision it came from.
 */
export interface LetterImpact {
  parcel: { reference: string; distanceFromM: number; distanceToM: number; bankSide: string; groundLevelM: number | null; landUse: string | null };
  category: ParcelCategory;
  impactThresholdM: number;
  methods: string[];
  engineVersion: string;
  revision: { id: string; number: number; status: string };
  /** The certificate of a certified revision, for the landowner to check; absent in letters made before letters cited it. */
  certificate?: { number: string; verificationUrl: string } | null;
  events: (ParcelEventImpact & { event: string; dischargeM3s: number })[];
  governingEvent: number;
  strip: ParcelStrip | null;
}
