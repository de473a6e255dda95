import 'server-only';
import { Op, type Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { Review, Revision, Scheme, database } from '@/lib/db';
import { ForbiddenError, NotFoundError } from '@/lib/http/app-errors';

export type LiaisonAccess = 'manage' | 'read';

async function isSchemeChecker(userId: string, schemeId: string, transaction?: Transaction): Promise<boolean> {
  const revisions = await Revision.findAll({ where: { schemeId }, attributes: ['id', 'checkerId'], transaction });
  if (revisions.some((r) => r.checkerId === userId)) return true;
  return (await Review.count({ where: { checkerId: userId, revisionId: { [Op.in]: revisions.map((r) => r.id) } }, transaction })) > 0;
}

/** Who may see a scheme's owner details (personal data): the liaison officers, admins, and that scheme's designer and checker. */
export async function schemeLiaisonAccess(user: SessionUser, scheme: Scheme, transaction?: Transaction): Promise<LiaisonAccess | null> {
  if (user.role === 'liaison') return 'manage';
  if (user.role === 'admin') return 'read';
  if (user.role === 'designer' && scheme.designerId === user.id) return 'read';
  if (user.role === 'checker' && (await isSchemeChecker(user.id, scheme.id, transaction))) return 'read';
  return null;
}

/**
 * The scheme, when the user may read its parcels (and change them, when `manage`). A scheme the user may not see is
 * "not found" (404), so its existence is not revealed; seeing but not managing is 403.
 */
export async function requireSchemeLiaisonAccess({ user, schemeId, manage = false, transaction }: { user: SessionUser; schemeId: string; manage?: boolean; transaction?: Transaction }) {
  database();
  const scheme = await Scheme.findByPk(schemeId, { transaction });
  const access = scheme ? await schemeLiaisonAccess(user, scheme, transaction) : null;
  if (!scheme || !access) throw new NotFoundError('No such scheme.');
  if (manage && access !== 'manage') throw new ForbiddenError('Only a landowner liaison officer can change parcels and letters.');
  return { scheme, access };
}
