import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { ReviewComment, User, database } from '@/lib/db';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { queueMail } from '@/lib/mail/queue-mail';
import type { ReturnRevisionInput } from '@/lib/validation/check-schemas';
import { openReview, revisionForCheck } from './revision-for-check';

/** The checker returns the revision to its designer with the review's comments; the designer revises in a new draft. */
export async function returnRevision({ input, checker, baseUrl }: { input: ReturnRevisionInput; checker: SessionUser; baseUrl: string }) {
  const sequelize = database();
  const returned = await sequelize.transaction(async (transaction) => {
    const { revision, scheme } = await revisionForCheck(input.revisionId, checker, transaction);
    const review = await openReview(revision, checker, transaction);
    const comments = await ReviewComment.count({ where: { reviewId: review.id }, transaction });
    const decidedAt = new Date().toISOString();
    await review.update({ decision: 'returned', summary: input.summary, decidedAt }, { transaction });
    await revision.update({ status: 'returned', updatedAt: decidedAt }, { transaction });
    await recordAuditEvent(
      { actorId: checker.id, action: 'revision.returned', entityType: 'revision', entityId: revision.id, schemeId: scheme.id, details: { number: revision.number, reviewId: review.id, comments, summary: input.summary, revisionSha256: revision.revisionSha256 } },
      transaction,
    );
    const author = await User.findByPk(revision.authorId, { transaction });
    const mail = author
      ? await queueMail(
          {
            purpose: 'revision.returned',
            messages: [
              {
                to: author.email,
                subject: `Sillmark: ${scheme.reference} revision ${revision.number} was returned by the checker`,
                text: `Hello ${author.name},\n\n${checker.name} has returned revision ${revision.number} of ${scheme.reference} ${scheme.name} with ${comments} comment(s):\n\n${input.summary}\n\nRead the comments and start a new draft from the revision here:\n${baseUrl}/revisions/${revision.id}\n`,
              },
            ],
          },
          transaction,
        )
      : [];
    return { revision, review, comments, mail };
  });
  const { revision, comments } = returned;
  const notified = await deliverOutboundMail({ ids: returned.mail });
  return { revisionId: revision.id, status: 'returned' as const, reviewId: returned.review.id, comments, notified: notified.delivered };
}
