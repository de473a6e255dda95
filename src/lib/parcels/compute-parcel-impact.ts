import 'server-only';
import type { Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { type ParcelCategory, type ParcelEventImpact, parcelImpact, worstCategory } from '@/lib/hydraulics/impact/parcel-impact';
import { Parcel, ParcelRegister, type Revision, database } from '@/lib/db';
import { type ParcelRecord, parcelRecord } from './parcel-record';
import { type ParcelStrip, parcelStrip } from './parcel-strip';
import { type ReachLongSection, reachLongSections } from './reach-long-section';
import { type RevisionResults, revisionResults } from './revision-results';
import { requireSchemeLiaisonAccess } from './scheme-liaison-access';
import { isPreliminary, selectRevision } from './select-revision';

export interface ParcelImpactRow {
  parcel: ParcelRecord;
  events: (ParcelEventImpact & { event: string })[];
  category: ParcelCategory;
  /** The event the strip draws: the one that puts most new frontage under water, else the one with the greatest afflux. */
  governingEvent: number;
  strip: ParcelStrip | null;
}

export interface ParcelImpactTable {
  revision: { id: string; number: number; status: string; preliminary: boolean; engineVersion: string; resultsStored: boolean } | null;
  register: { id: string; version: number } | null;
  impactThresholdM: number;
  events: { name: string; dischargeM3s: number }[];
  rows: ParcelImpactRow[];
  longSections: ReachLongSection[];
}

/** Newly flooded frontage first (a landowner sees water on their land), then the rise in level. */
function severity(e: ParcelEventImpact): number {
  const added = e.withScheme && e.withoutScheme ? e.withScheme.inundatedLength - e.withoutScheme.inundatedLength : 0;
  return Math.max(0, added) * 1000 + e.maxAfflux;
}

/** Every parcel against every event of the revision, from its with- and without-scheme profiles (pure engine function per parcel). */
export function parcelImpactRows(results: RevisionResults, parcels: readonly ParcelRecord[]): ParcelImpactRow[] {
  return parcels.map((parcel) => {
    const span = { from: parcel.distanceFromM, to: parcel.distanceToM, groundLevel: parcel.groundLevelM };
    const events = results.events.map((e) => ({ event: e.name, ...parcelImpact(span, e.withScheme, e.withoutScheme, { impactThreshold: results.impactThreshold, bankLevelAt: results.bankLevelAt }) }));
    const governingEvent = events.reduce((best, e, i) => (severity(e) > severity(events[best]) ? i : best), 0);
    const groundAt = parcel.groundLevelM !== null ? () => parcel.groundLevelM as number : results.bankLevelAt;
    return { parcel, events, category: worstCategory(events.map((e) => e.category)), governingEvent, strip: parcelStrip(results.events[governingEvent], span, groundAt) };
  });
}

/** Loads the register and revision and computes the impact table; `revision` is given when the caller has chosen it already. */
export async function impactForRevision({ schemeId, revision, transaction }: { schemeId: string; revision: Revision; transaction?: Transaction }) {
  database();
  const register = await ParcelRegister.findOne({ where: { schemeId }, order: [['version', 'DESC']], transaction });
  const parcels = register ? (await Parcel.findAll({ where: { registerId: register.id }, order: [['distanceFromM', 'ASC'], ['reference', 'ASC']], transaction })).map(parcelRecord) : [];
  const results = await revisionResults(revision);
  return { register, results, rows: parcelImpactRows(results, parcels) };
}

/** The impact table a liaison page shows: for the chosen revision (default: latest countersigned, else latest draft). */
export async function computeParcelImpact({ user, schemeId, revisionId }: { user: SessionUser; schemeId: string; revisionId?: string | null }): Promise<ParcelImpactTable> {
  await requireSchemeLiaisonAccess({ user, schemeId });
  const revision = await selectRevision({ schemeId, revisionId });
  if (!revision) return { revision: null, register: null, impactThresholdM: 0, events: [], rows: [], longSections: [] };
  const { register, results, rows } = await impactForRevision({ schemeId, revision });
  return {
    revision: { id: revision.id, number: revision.number, status: revision.status, preliminary: isPreliminary(revision), engineVersion: results.engineVersion, resultsStored: results.stored },
    register: register ? { id: register.id, version: register.version } : null,
    impactThresholdM: results.impactThreshold,
    events: results.events.map((e) => ({ name: e.name, dischargeM3s: e.discharge })),
    rows,
    longSections: reachLongSections(results),
  };
}
