import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Certificate, Scheme, database } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import { sha256Hex } from '@/lib/revisions/revision-hashes';
import { readCertificateFile } from './certificate-files';

/** The signed PDF as issued, checked against its stored hash, and the download written to the audit trail. */
export async function downloadCertificate({ certificateId, user }: { certificateId: string; user: SessionUser }) {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const certificate = await Certificate.findByPk(certificateId, { transaction });
    const scheme = certificate ? await Scheme.findByPk(certificate.schemeId, { transaction }) : null;
    if (!certificate || !scheme || (user.role === 'designer' && scheme.designerId !== user.id)) throw new NotFoundError('There is no such certificate among those you can see.');
    const pdf = await readCertificateFile(certificate.pdfPath).catch(() => {
      throw new ConflictError(`The stored file of certificate ${certificate.number} is missing; ask an administrator.`);
    });
    if (sha256Hex(pdf) !== certificate.pdfSha256) throw new ConflictError(`The stored file of certificate ${certificate.number} does not match the one issued; ask an administrator.`);
    await recordAuditEvent({ actorId: user.id, action: 'certificate.downloaded', entityType: 'certificate', entityId: certificate.id, schemeId: scheme.id, details: { number: certificate.number, status: certificate.status, pdfSha256: certificate.pdfSha256 } }, transaction);
    return { pdf, fileName: `${certificate.number}.pdf`, number: certificate.number };
  });
}
