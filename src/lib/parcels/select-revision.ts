import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { Certificate, Revision, database } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';

/**
 * The revision the liaison work reads: the one asked for (it must belong to the scheme), else the latest countersigned
 * whose certificate still stands, else the latest draft-like one. Null when the scheme has no revision at all.
 * A revoked certificate no longer certifies anything, so its revision is never the default.
 */
export async function selectRevision({ schemeId, revisionId, transaction }: { schemeId: string; revisionId?: string | null; transaction?: Transaction }): Promise<Revision | null> {
  database();
  if (revisionId) {
    const revision = await Revision.findOne({ where: { id: revisionId, schemeId }, transaction });
    if (!revision) throw new NotFoundError('No such revision of this scheme.');
    return revision;
  }
  const revoked = (await Certificate.findAll({ where: { schemeId, status: 'revoked' }, attributes: ['revisionId'], transaction })).map((c) => c.revisionId);
  const certified = await Revision.findOne({ where: { schemeId, status: 'countersigned', id: { [Op.notIn]: revoked } }, order: [['number', 'DESC']], transaction });
  if (certified) return certified;
  return Revision.findOne({ where: { schemeId, status: { [Op.ne]: 'withdrawn' } }, order: [['number', 'DESC']], transaction });
}

/** The scheme's revisions, newest first; `revoked` when the revision's certificate was revoked. */
export async function listSchemeRevisions(schemeId: string) {
  database();
  const revisions = await Revision.findAll({ where: { schemeId }, order: [['number', 'DESC']], attributes: ['id', 'number', 'status'] });
  const revoked = new Set((await Certificate.findAll({ where: { schemeId, status: 'revoked' }, attributes: ['revisionId'] })).map((c) => c.revisionId));
  return revisions.map((r) => ({ id: r.id, number: r.number, status: r.status, revoked: revoked.has(r.id) }));
}

/** Letters from a revision that is not countersigned are watermarked PRELIMINARY. */
export function isPreliminary(revision: Pick<Revision, 'status'>): boolean {
  return revision.status !== 'countersigned';
}
