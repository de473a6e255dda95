import 'server-only';
import type { Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision, Scheme, database } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';
import { mayReadRevision } from '@/lib/schemes/revision-visibility';

/**
 * A revision with its scheme, if this user may see it: designers only their own schemes', planning officers only
 * countersigned revisions; the other roles every revision. Anything else is "not found", never "forbidden",
 * so that ids of other designers' work reveal nothing.
 */
export async function findVisibleRevision(user: SessionUser, revisionId: string, transaction?: Transaction): Promise<{ revision: Revision; scheme: Scheme }> {
  database();
  const revision = await Revision.findByPk(revisionId, { transaction });
  const scheme = revision ? await Scheme.findByPk(revision.schemeId, { transaction }) : null;
  const hidden = !revision || !scheme || (user.role === 'designer' && scheme.designerId !== user.id) || !mayReadRevision(user, revision);
  if (hidden) throw new NotFoundError('There is no such revision among those you can see.');
  return { revision, scheme };
}
