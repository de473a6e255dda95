import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Certificate, Letter, Parcel, ParcelRegister, Revision, Scheme, database } from '@/lib/db';
import { schemeLiaisonAccess } from './scheme-liaison-access';

/** The schemes whose landowners the user may see, with where their register and letters stand. */
export async function listLiaisonSchemes(user: SessionUser) {
  database();
  const all = await Scheme.findAll({ where: user.role === 'designer' ? { designerId: user.id } : {}, order: [['reference', 'ASC']] });
  const schemes = [];
  for (const s of all) if (await schemeLiaisonAccess(user, s)) schemes.push(s);
  const ids = schemes.map((s) => s.id);
  const [registers, revisions, parcels] = await Promise.all([
    ParcelRegister.findAll({ where: { schemeId: ids }, attributes: ['id', 'schemeId', 'version'] }),
    Revision.findAll({ where: { schemeId: ids }, attributes: ['id', 'schemeId', 'number', 'status'] }),
    Parcel.findAll({ where: { schemeId: ids }, attributes: ['registerId'] }),
  ]);
  const [letters, revokedCertificates] = await Promise.all([
    Letter.findAll({ where: { revisionId: revisions.map((r) => r.id) }, attributes: ['revisionId', 'status'] }),
    Certificate.findAll({ where: { schemeId: ids, status: 'revoked' }, attributes: ['revisionId'] }),
  ]);
  const revoked = new Set(revokedCertificates.map((c) => c.revisionId));
  return schemes.map((s) => {
    const latest = registers.filter((r) => r.schemeId === s.id).sort((a, b) => b.version - a.version)[0];
    const mine = revisions.filter((r) => r.schemeId === s.id);
    const certified = mine.filter((r) => r.status === 'countersigned' && !revoked.has(r.id)).sort((a, b) => b.number - a.number)[0];
    const theirLetters = letters.filter((l) => mine.some((r) => r.id === l.revisionId));
    return {
      id: s.id,
      reference: s.reference,
      name: s.name,
      watercourse: s.watercourse,
      site: s.site,
      register: latest ? { version: latest.version, parcels: parcels.filter((p) => p.registerId === latest.id).length } : null,
      certifiedRevision: certified ? certified.number : null,
      revisions: mine.length,
      letters: { total: theirLetters.length, waiting: theirLetters.filter((l) => l.status === 'queued' || l.status === 'failed').length },
    };
  });
}
export type LiaisonScheme = Awaited<ReturnType<typeof listLiaisonSchemes>>[number];
