import 'server-only';
import { Review, ReviewComment, User, database } from '@/lib/db';

/** The reviews of a revision, each with its checker, decision and comments, oldest first. */
export async function listReviewComments(revisionId: string, options: { includeOpen: boolean }) {
  database();
  const reviews = (await Review.findAll({ where: { revisionId }, order: [['createdAt', 'ASC']] })).filter((r) => options.includeOpen || r.decision !== null);
  const comments = await ReviewComment.findAll({ where: { reviewId: reviews.map((r) => r.id) }, order: [['createdAt', 'ASC']] });
  const people = new Map((await User.findAll({ where: { id: [...reviews.map((r) => r.checkerId), ...comments.map((c) => c.authorId)] }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]));
  return reviews.map((r) => ({
    id: r.id,
    checker: people.get(r.checkerId) ?? 'unknown',
    checkerId: r.checkerId,
    decision: r.decision,
    summary: r.summary,
    decidedAt: r.decidedAt,
    rerunMatches: r.rerunMatches,
    comments: comments.filter((c) => c.reviewId === r.id).map((c) => ({ id: c.id, part: c.part, body: c.body, author: people.get(c.authorId) ?? 'unknown', createdAt: c.createdAt })),
  }));
}
export type RevisionReview = Awaited<ReturnType<typeof listReviewComments>>[number];
