import 'server-only';
import { Op } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { Review, Revision, Scheme, User, database } from '@/lib/db';

/** Revisions waiting for this checker: assigned to them or in the open queue, never their own; and their recent decisions. */
export async function listCheckQueue(checker: SessionUser) {
  database();
  const waiting = await Revision.findAll({
    where: { status: 'submitted', authorId: { [Op.ne]: checker.id }, [Op.or]: [{ checkerId: checker.id }, { checkerId: null }] },
    order: [['submittedAt', 'ASC']],
  });
  const decided = await Review.findAll({ where: { checkerId: checker.id, decision: { [Op.ne]: null } }, order: [['decidedAt', 'DESC']], limit: 10 });
  const decidedRevisions = await Revision.findAll({ where: { id: decided.map((r) => r.revisionId) } });
  const all = [...waiting, ...decidedRevisions];
  const schemes = new Map((await Scheme.findAll({ where: { id: all.map((r) => r.schemeId) } })).map((s) => [s.id, s]));
  const authors = new Map((await User.findAll({ where: { id: all.map((r) => r.authorId) }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]));
  const describe = (r: Revision) => {
    const s = schemes.get(r.schemeId);
    return { id: r.id, number: r.number, status: r.status, submittedAt: r.submittedAt, author: authors.get(r.authorId) ?? 'unknown', scheme: { reference: s?.reference ?? '', name: s?.name ?? '', watercourse: s?.watercourse ?? '', site: s?.site ?? '' } };
  };
  return {
    waiting: waiting.filter((r) => schemes.get(r.schemeId)?.designerId !== checker.id).map((r) => ({ ...describe(r), assignedToMe: r.checkerId === checker.id })),
    decided: decided.flatMap((review) => {
      const revision = decidedRevisions.find((r) => r.id === review.revisionId);
      return revision ? [{ ...describe(revision), decision: review.decision, decidedAt: review.decidedAt }] : [];
    }),
  };
}
export type CheckQueue = Awaited<ReturnType<typeof listCheckQueue>>;
