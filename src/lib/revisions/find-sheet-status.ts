import 'server-only';
import { Certificate, type Revision, User } from '@/lib/db';
import type { SheetStatus } from '@/lib/pdf/calculation-sheet-status';

async function checkerName(revision: Revision): Promise<string | null> {
  if (!revision.checkerId) return null;
  return (await User.findByPk(revision.checkerId, { attributes: ['name'] }))?.name ?? null;
}

/** The one state a revision's calculation sheet reports: its own status, and for a countersigned one its certificate's. */
export async function findSheetStatus(revision: Revision): Promise<SheetStatus> {
  switch (revision.status) {
    case 'draft':
      return { kind: 'draft' };
    case 'withdrawn':
      return { kind: 'withdrawn' };
    case 'submitted':
      return { kind: 'submitted', submittedAt: revision.submittedAt, checker: await checkerName(revision) };
    case 'returned':
      return { kind: 'returned', checker: await checkerName(revision) };
  }
  // Countersigned: the certificate decides whether the work is current, superseded or revoked.
  const certificate = await Certificate.findOne({ where: { revisionId: revision.id }, order: [['issuedAt', 'DESC']] });
  if (certificate?.status === 'revoked') return { kind: 'revoked', certificate: certificate.number, revokedAt: certificate.revokedAt, reason: certificate.revocationReason };
  if (certificate?.status === 'superseded') {
    const next = certificate.supersededById ? await Certificate.findByPk(certificate.supersededById, { attributes: ['number'] }) : null;
    return { kind: 'superseded', certificate: certificate.number, supersededBy: next?.number ?? null };
  }
  return { kind: 'countersigned', countersignedAt: revision.countersignedAt, checker: await checkerName(revision), certificate: certificate?.number ?? null };
}
