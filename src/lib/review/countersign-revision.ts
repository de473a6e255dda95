import 'server-only';
import { Op } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { confirmPassword } from '@/lib/auth/confirm-password';
import { issueCertificate } from '@/lib/certificates/issue-certificate';
import { removeCertificateFile } from '@/lib/certificates/certificate-files';
import { Revision, User, database } from '@/lib/db';
import { ConflictError, NotFoundError } from '@/lib/http/app-errors';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { queueMail } from '@/lib/mail/queue-mail';
import { signingIdentity } from '@/lib/signing/signing-identity';
import type { CountersignInput } from '@/lib/validation/check-schemas';
import { checkFrozenRevision } from './check-frozen-revision';
import { openReview, revisionForCheck } from './revision-for-check';

/**
 * The checker countersigns: password re-entered, four-eyes rule, frozen hashes intact, and an independent re-run of
 * the frozen inputs that reproduces the stored results. Then, in one transaction: the review's decision, the
 * revision's status, the signed certificate, the supersession of the scheme's earlier certificate, the audit events and the designer's e-mail (sent once it commits).
 */
export async function countersignRevision({ input, checker, baseUrl, now = Date.now() }: { input: CountersignInput; checker: SessionUser; baseUrl: string; now?: number }) {
  const sequelize = database();
  const checkerAccount = await confirmPassword({ user: checker, password: input.password, act: 'Countersigning', now });
  const preview = await sequelize.transaction((transaction) => revisionForCheck(input.revisionId, checker, transaction));
  const check = await checkFrozenRevision(preview.revision);
  if (check.blockers.length) throw new ConflictError(`Countersigning is blocked. ${check.blockers.join(' ')}`);
  await signingIdentity();

  let writtenFile: string | null = null;
  try {
    const issued = await sequelize.transaction(async (transaction) => {
      const { revision, scheme } = await revisionForCheck(input.revisionId, checker, transaction);
      // The re-run above read this revision; the same hashes must still be there when the decision is recorded.
      if (revision.inputsSha256 !== preview.revision.inputsSha256 || revision.resultsSha256 !== preview.revision.resultsSha256) throw new ConflictError('The revision changed while it was being checked; open it again.');
      const later = await Revision.count({ where: { schemeId: scheme.id, status: 'countersigned', number: { [Op.gt]: revision.number } }, transaction });
      if (later > 0) throw new ConflictError(`A later revision of ${scheme.reference} is already certified; this one can no longer be.`);
      const designer = await User.findByPk(revision.authorId, { transaction });
      if (!designer) throw new NotFoundError('The designer of this revision no longer exists.');
      const review = await openReview(revision, checker, transaction);
      const issuedAt = new Date().toISOString();
      await review.update({ decision: 'countersigned', decidedAt: issuedAt, rerunMatches: true, rerunResultsSha256: check.rerun.resultsSha256 }, { transaction });
      await revision.update({ status: 'countersigned', countersignedAt: issuedAt, checkerId: checker.id, updatedAt: issuedAt }, { transaction });
      await recordAuditEvent(
        { actorId: checker.id, action: 'revision.countersigned', entityType: 'revision', entityId: revision.id, schemeId: scheme.id, details: { number: revision.number, reviewId: review.id, revisionSha256: revision.revisionSha256, rerunResultsSha256: check.rerun.resultsSha256, rerunEngineVersion: check.rerun.engineVersion } },
        transaction,
      );
      const { certificate, superseded } = await issueCertificate({ revision, scheme, designer, checker: checkerAccount, issuedAt, baseUrl, transaction, onFileWritten: (file) => (writtenFile = file) });
      const mail = await queueMail(
        {
          purpose: 'revision.countersigned',
          messages: [
            {
              to: designer.email,
              subject: `Sillmark: certificate ${certificate.number} issued for ${scheme.reference} revision ${revision.number}`,
              text: `Hello ${designer.name},\n\n${checker.name} has countersigned revision ${revision.number} of ${scheme.reference} ${scheme.name}. Certificate ${certificate.number} is issued${superseded.length ? ` and supersedes ${superseded.map((c) => c.number).join(', ')}` : ''}.\n\nThe revision and its certificate:\n${baseUrl}/revisions/${revision.id}\n`,
            },
          ],
        },
        transaction,
      );
      return { revision, certificate, superseded, mail };
    });
    const { revision, certificate } = issued;
    const notified = await deliverOutboundMail({ ids: issued.mail });
    return { revisionId: revision.id, status: 'countersigned' as const, certificateId: certificate.id, certificateNumber: certificate.number, superseded: issued.superseded.map((c) => c.number), notified: notified.delivered };
  } catch (error) {
    if (writtenFile) await removeCertificateFile(writtenFile);
    throw error;
  }
}

