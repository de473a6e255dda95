import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Certificate, database } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import type { RevokeCertificateInput } from '@/lib/validation/certificate-schemas';

/** An administrator withdraws a certificate for a stated reason; the verification page shows it from then on. */
export async function revokeCertificate({ input, admin }: { input: RevokeCertificateInput; admin: SessionUser }) {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const certificate = await Certificate.findByPk(input.certificateId, { transaction });
    if (!certificate) throw new NotFoundError('There is no such certificate.');
    if (certificate.status === 'revoked') throw new ConflictError(`Certificate ${certificate.number} is revoked already.`);
    const revokedAt = new Date().toISOString();
    const previousStatus = certificate.status;
    await certificate.update({ status: 'revoked', revokedAt, revokedBy: admin.id, revocationReason: input.reason }, { transaction });
    await recordAuditEvent(
      { actorId: admin.id, action: 'certificate.revoked', entityType: 'certificate', entityId: certificate.id, schemeId: certificate.schemeId, details: { number: certificate.number, previousStatus, reason: input.reason, pdfSha256: certificate.pdfSha256 } },
      transaction,
    );
    return { certificateId: certificate.id, number: certificate.number, status: 'revoked' as const };
  });
}
