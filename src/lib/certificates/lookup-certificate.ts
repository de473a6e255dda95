import 'server-only';
import { Certificate, Revision, Scheme, database } from '@/lib/db';
import type { CertificateStatus } from '@/lib/db/models/certificate';

/** What anyone may learn from a certificate number: the certificate, its scheme and revision, and its status now. */
export async function lookupCertificate(where: { number: string } | { pdfSha256: string }) {
  database();
  const certificate = await Certificate.findOne({ where });
  if (!certificate) return null;
  const [scheme, revision, successor] = await Promise.all([
    Scheme.findByPk(certificate.schemeId),
    Revision.findByPk(certificate.revisionId),
    certificate.supersededById ? Certificate.findByPk(certificate.supersededById) : null,
  ]);
  return {
    id: certificate.id,
    number: certificate.number,
    status: certificate.status as CertificateStatus,
    issuedAt: certificate.issuedAt,
    pdfSha256: certificate.pdfSha256,
    signerFingerprint: certificate.signerFingerprint,
    scheme: scheme ? { reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site } : null,
    revision: revision ? { number: revision.number, revisionSha256: revision.revisionSha256, countersignedAt: revision.countersignedAt } : null,
    supersededBy: successor ? successor.number : null,
    revokedAt: certificate.revokedAt,
    revocationReason: certificate.revocationReason,
  };
}
export type CertificateLookup = NonNullable<Awaited<ReturnType<typeof lookupCertificate>>>;
