import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { confirmPassword } from '@/lib/auth/confirm-password';
import type { SessionUser } from '@/lib/auth/current-session';
import { Certificate, Letter, Revision, Scheme, database } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { queueMail } from '@/lib/mail/queue-mail';
import type { RevokeCertificateInput } from '@/lib/validation/certificate-schemas';
import { heldReason } from './held-reason';
import { revocationNotices } from './revocation-notices';

/**
 * An administrator, password re-entered, withdraws a certificate for a stated reason. In one transaction: the
 * certificate is revoked, the revision's queued letters are held and the audit event is written. The e-mails to the
 * designer, the checker and the liaison officers are queued in it too and sent once it commits; the verification page shows the revocation from then on.
 */
export async function revokeCertificate({ input, admin, baseUrl }: { input: RevokeCertificateInput; admin: SessionUser; baseUrl: string }) {
  await confirmPassword({ user: admin, password: input.password, act: 'Revoking a certificate' });
  const sequelize = database();
  const revoked = await sequelize.transaction(async (transaction) => {
    const certificate = await Certificate.findByPk(input.certificateId, { transaction });
    if (!certificate) throw new NotFoundError('There is no such certificate.');
    if (certificate.status === 'revoked') throw new ConflictError(`Certificate ${certificate.number} is revoked already.`);
    const revision = await Revision.findByPk(certificate.revisionId, { transaction });
    const scheme = await Scheme.findByPk(certificate.schemeId, { transaction });
    if (!revision || !scheme) throw new NotFoundError('The revision this certificate was issued for no longer exists.');
    const revokedAt = new Date().toISOString();
    const previousStatus = certificate.status;
    await certificate.update({ status: 'revoked', revokedAt, revokedBy: admin.id, revocationReason: input.reason }, { transaction });
    const [heldLetters] = await Letter.update({ status: 'held', failureReason: heldReason(certificate.number) }, { where: { revisionId: revision.id, status: 'queued' }, transaction });
    await recordAuditEvent(
      { actorId: admin.id, action: 'certificate.revoked', entityType: 'certificate', entityId: certificate.id, schemeId: certificate.schemeId, details: { number: certificate.number, previousStatus, reason: input.reason, pdfSha256: certificate.pdfSha256, revisionNumber: revision.number, heldLetters } },
      transaction,
    );
    const mail = await queueMail({ purpose: 'certificate.revoked', messages: await revocationNotices({ certificate, revision, scheme, admin, heldLetters, baseUrl }, transaction) }, transaction);
    return { certificate, heldLetters, mail };
  });
  const notified = await deliverOutboundMail({ ids: revoked.mail });
  return { certificateId: revoked.certificate.id, number: revoked.certificate.number, status: 'revoked' as const, heldLetters: revoked.heldLetters, notified: notified.delivered };
}
