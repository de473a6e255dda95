import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Letter, LetterBatch, LetterResponse, Parcel, Revision, database } from '@/lib/db';
import type { LetterStatus } from '@/lib/db/models/letter';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';

export interface TrackedLetter {
  id: string;
  version: number;
  revisionNumber: number;
  preliminary: boolean;
  recipient: string;
  status: LetterStatus;
  failureReason: string | null;
  sentAt: string | null;
  responseDueOn: string | null;
  postedOn: string | null;
  responses: number;
  createdAt: string;
}

/** Per parcel reference (kept across register versions): every letter version, to whom, when, and its responses. */
export async function listLetterTracking({ user, schemeId }: { user: SessionUser; schemeId: string }) {
  await requireSchemeLiaisonAccess({ user, schemeId });
  database();
  const revisions = await Revision.findAll({ where: { schemeId }, attributes: ['id', 'number'] });
  const numbers = new Map(revisions.map((r) => [r.id, r.number]));
  const letters = await Letter.findAll({ where: { revisionId: revisions.map((r) => r.id) }, order: [['createdAt', 'DESC']] });
  const parcels = new Map((await Parcel.findAll({ where: { id: letters.map((l) => l.parcelId) } })).map((p) => [p.id, p]));
  const responses = await LetterResponse.findAll({ where: { letterId: letters.map((l) => l.id) }, attributes: ['letterId'] });
  const byParcel = new Map<string, { reference: string; ownerName: string; letters: TrackedLetter[] }>();
  for (const l of letters) {
    const parcel = parcels.get(l.parcelId);
    const key = (parcel?.reference ?? '?').toLowerCase();
    const entry = byParcel.get(key) ?? { reference: parcel?.reference ?? '?', ownerName: parcel?.ownerName ?? '?', letters: [] };
    entry.letters.push({
      id: l.id,
      version: l.version,
      revisionNumber: numbers.get(l.revisionId) ?? 0,
      preliminary: l.preliminary,
      recipient: l.recipientEmail ?? `${parcel?.ownerName ?? ''} (by post)`,
      status: l.status as LetterStatus,
      failureReason: l.failureReason,
      sentAt: l.sentAt,
      // A deadline only counts once the letter has gone out.
      responseDueOn: ['sent', 'posted', 'acknowledged'].includes(l.status) ? (l.responseDueOn ?? null) : null,
      postedOn: l.postedOn ?? null,
      responses: responses.filter((r) => r.letterId === l.id).length,
      createdAt: l.createdAt,
    });
    byParcel.set(key, entry);
  }
  const batches = await LetterBatch.findAll({ where: { schemeId }, order: [['createdAt', 'DESC']] });
  return {
    parcels: [...byParcel.values()].sort((a, b) => a.reference.localeCompare(b.reference, 'en', { numeric: true })),
    batches: batches.map((b) => ({ id: b.id, revisionNumber: numbers.get(b.revisionId) ?? 0, status: b.status, createdAt: b.createdAt, letters: letters.filter((l) => l.batchId === b.id).length })),
  };
}
