import 'server-only';
import type { Transaction } from 'sequelize';
import { Certificate, Revision, database } from '@/lib/db';

/** A revoked certificate, as the pages, letters and e-mails made from its revision must show it. */
export interface Revocation {
  certificateNumber: string;
  revisionId: string;
  revisionNumber: number;
  revokedAt: string;
  reason: string;
}

function toRevocation(certificate: Certificate, revisionNumber: number): Revocation {
  return { certificateNumber: certificate.number, revisionId: certificate.revisionId, revisionNumber, revokedAt: certificate.revokedAt ?? '', reason: certificate.revocationReason ?? '' };
}

/** The revocation of the revision's certificate, or null while the revision has no revoked certificate. */
export async function revisionRevocation(revision: Pick<Revision, 'id' | 'number'>, transaction?: Transaction): Promise<Revocation | null> {
  database();
  const certificate = await Certificate.findOne({ where: { revisionId: revision.id, status: 'revoked' }, transaction });
  return certificate ? toRevocation(certificate, revision.number) : null;
}

/** Every revoked certificate of the scheme, newest revision first. */
export async function schemeRevocations(schemeId: string): Promise<Revocation[]> {
  database();
  const certificates = await Certificate.findAll({ where: { schemeId, status: 'revoked' } });
  if (certificates.length === 0) return [];
  const numbers = new Map((await Revision.findAll({ where: { id: certificates.map((c) => c.revisionId) }, attributes: ['id', 'number'] })).map((r) => [r.id, r.number]));
  return certificates.map((c) => toRevocation(c, numbers.get(c.revisionId) ?? 0)).sort((a, b) => b.revisionNumber - a.revisionNumber);
}

/** The certificate a letter from this revision cites so a landowner can check it: the revision's one not revoked. */
export async function citableCertificate(revisionId: string, transaction?: Transaction): Promise<Certificate | null> {
  database();
  return Certificate.findOne({ where: { revisionId, status: ['issued', 'superseded'] }, transaction });
}
