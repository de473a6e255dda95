import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { ReviewComment, database } from '@/lib/db';
import type { ReviewCommentInput } from '@/lib/validation/check-schemas';
import { openReview, revisionForCheck } from './revision-for-check';

/** A checker's comment on one part of a submitted revision (channel, flows, structure, limits, results…). */
export async function addReviewComment({ input, checker }: { input: ReviewCommentInput; checker: SessionUser }) {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const { revision } = await revisionForCheck(input.revisionId, checker, transaction);
    const review = await openReview(revision, checker, transaction);
    const comment = await ReviewComment.create({ id: randomUUID(), reviewId: review.id, authorId: checker.id, part: input.part, body: input.body }, { transaction });
    await recordAuditEvent(
      { actorId: checker.id, action: 'review.commented', entityType: 'review', entityId: review.id, schemeId: revision.schemeId, details: { revisionId: revision.id, commentId: comment.id, part: input.part, revisionSha256: revision.revisionSha256 } },
      transaction,
    );
    return { commentId: comment.id, reviewId: review.id, part: comment.part };
  });
}
