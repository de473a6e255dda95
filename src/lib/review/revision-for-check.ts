import 'server-only';
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Review, Revision, Scheme, database } from '@/lib/db';
import { ConflictError, ForbiddenError, NotFoundError } from '@/lib/http/app-errors';

export class OwnWorkError extends ForbiddenError {
  constructor() {
    super('You designed this revision, so you cannot check it: another checker must (four-eyes rule).');
  }
}

/**
 * The submitted revision a checker may act on: never their own work, never one assigned to another checker.
 * Shared by commenting, returning and countersigning, inside their transactions.
 */
export async function revisionForCheck(revisionId: string, checker: SessionUser, transaction: Transaction): Promise<{ revision: Revision; scheme: Scheme }> {
  database();
  const revision = await Revision.findByPk(revisionId, { transaction });
  const scheme = revision ? await Scheme.findByPk(revision.schemeId, { transaction }) : null;
  if (!revision || !scheme) throw new NotFoundError('There is no such revision.');
  if (revision.authorId === checker.id || scheme.designerId === checker.id) throw new OwnWorkError();
  if (revision.checkerId && revision.checkerId !== checker.id) throw new ForbiddenError('This revision is assigned to another checker.');
  if (revision.status !== 'submitted') throw new ConflictError(`Revision ${revision.number} is ${revision.status}, not waiting for check.`);
  return { revision, scheme };
}

/** The checker's open (undecided) review of the revision, started on first use; a queued revision is claimed by it. */
export async function openReview(revision: Revision, checker: SessionUser, transaction: Transaction): Promise<Review> {
  const open = await Review.findOne({ where: { revisionId: revision.id, checkerId: checker.id, decision: null }, transaction });
  if (open) return open;
  const claimed = revision.checkerId === null;
  if (claimed) await revision.update({ checkerId: checker.id, updatedAt: new Date().toISOString() }, { transaction });
  const review = await Review.create({ id: randomUUID(), revisionId: revision.id, checkerId: checker.id, decision: null, summary: null, rerunMatches: null, rerunResultsSha256: null, decidedAt: null }, { transaction });
  await recordAuditEvent({ actorId: checker.id, action: 'review.started', entityType: 'review', entityId: review.id, schemeId: revision.schemeId, details: { revisionId: revision.id, number: revision.number, claimedFromQueue: claimed, revisionSha256: revision.revisionSha256 } }, transaction);
  return review;
}
