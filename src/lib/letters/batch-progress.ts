import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Letter, LetterBatch, Parcel, Revision, database } from '@/lib/db';
import type { LetterStatus } from '@/lib/db/models/letter';
import { NotFoundError } from '@/lib/http/app-errors';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import { emptyLetterCounts } from './letter-statuses';

export interface BatchProgress {
  batchId: string;
  schemeId: string;
  revisionNumber: number;
  preliminary: boolean;
  status: 'open' | 'sending' | 'complete' | 'withdrawn';
  createdAt: string;
  total: number;
  counts: Record<LetterStatus, number>;
  letters: { id: string; parcelReference: string; ownerName: string; recipientEmail: string | null; version: number; status: LetterStatus; failureReason: string | null; sentAt: string | null; postedOn: string | null; responseDueOn: string | null }[];
}

export async function loadBatch(batchId: string) {
  database();
  const batch = await LetterBatch.findByPk(batchId);
  if (!batch) throw new NotFoundError('No such batch of letters.');
  return batch;
}

/** Where a batch stands: how many letters are queued, sent, failed or acknowledged, and each letter's state. */
export async function batchProgress({ user, batchId }: { user: SessionUser; batchId: string }): Promise<BatchProgress> {
  const batch = await loadBatch(batchId);
  await requireSchemeLiaisonAccess({ user, schemeId: batch.schemeId });
  const letters = await Letter.findAll({ where: { batchId }, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
  const parcels = new Map((await Parcel.findAll({ where: { id: letters.map((l) => l.parcelId) } })).map((p) => [p.id, p]));
  const revision = await Revision.findByPk(batch.revisionId, { attributes: ['number'] });
  const counts = emptyLetterCounts();
  for (const l of letters) counts[l.status as LetterStatus] += 1;
  return {
    batchId,
    schemeId: batch.schemeId,
    revisionNumber: revision?.number ?? 0,
    preliminary: letters.some((l) => l.preliminary),
    status: batch.status,
    createdAt: batch.createdAt,
    total: letters.length,
    counts,
    letters: letters.map((l) => ({ id: l.id, parcelReference: parcels.get(l.parcelId)?.reference ?? '?', ownerName: parcels.get(l.parcelId)?.ownerName ?? '?', recipientEmail: l.recipientEmail, version: l.version, status: l.status as LetterStatus, failureReason: l.failureReason, sentAt: l.sentAt, postedOn: l.postedOn ?? null, responseDueOn: l.responseDueOn ?? null })),
  };
}
