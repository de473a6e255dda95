import 'server-only';
import type { WhereOptions } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { Certificate, Revision, Scheme, database } from '@/lib/db';
import { readableRevisionWhere } from './revision-visibility';

/** Schemes the user may see: designers their own, planning officers certified ones only, the other roles all. */
export async function listSchemes(user: SessionUser) {
  database();
  let where: WhereOptions<Scheme> = {};
  if (user.role === 'designer') where = { designerId: user.id };
  if (user.role === 'planning') where = { id: (await Certificate.findAll({ attributes: ['schemeId'] })).map((c) => c.schemeId) };
  const schemes = await Scheme.findAll({ where, order: [['reference', 'ASC']] });
  const revisions = await Revision.findAll({ where: { schemeId: schemes.map((s) => s.id), ...readableRevisionWhere(user) }, attributes: ['schemeId', 'number', 'status'] });
  return schemes.map((s) => {
    const latest = revisions.filter((r) => r.schemeId === s.id).sort((a, b) => b.number - a.number)[0];
    return { id: s.id, reference: s.reference, name: s.name, watercourse: s.watercourse, site: s.site, latestRevision: latest ? { number: latest.number, status: latest.status } : null };
  });
}
export type ListedScheme = Awaited<ReturnType<typeof listSchemes>>[number];
