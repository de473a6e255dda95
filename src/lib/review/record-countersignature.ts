import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { issueCertificate } from '@/lib/certificates/issue-certificate';
import type { SignedCertificate } from '@/lib/certificates/sign-certificate';
import { database } from '@/lib/db';
import { queueMail } from '@/lib/mail/queue-mail';
import type { FrozenRevisionCheck } from './check-frozen-revision';
import { type CheckedHashes, countersignParties } from './countersign-parties';
import { openReview } from './revision-for-check';

export interface RecordCountersignatureOptions {
  revisionId: string;
  checker: SessionUser;
  checked: CheckedHashes;
  rerun: FrozenRevisionCheck['rerun'];
  signed: SignedCertificate;
  baseUrl: string;
  /** Called with the certificate file's path once it is stored, so the caller can remove it if the commit fails. */
  onFileWritten: (relativePath: string) => void;
}

/**
 * The one short write transaction of countersigning, run once the certificate is made: every rule checked again, then
 * the review's decision, the revision's status, the certificate, the supersession, the audit events and the
 * designer's e-mail, all or nothing. No CPU work happens here: the write lock is held for reads and writes alone.
 */
export function recordCountersignature(o: RecordCountersignatureOptions) {
  const { checker, signed, baseUrl } = o;
  return database().transaction(async (transaction) => {
    const parties = await countersignParties({ revisionId: o.revisionId, checker, checked: o.checked, transaction });
    const { revision, scheme, designer } = parties;
    const issuedAt = signed.draft.issuedAt;
    const review = await openReview(revision, checker, transaction);
    await review.update({ decision: 'countersigned', decidedAt: issuedAt, rerunMatches: true, rerunResultsSha256: o.rerun.resultsSha256 }, { transaction });
    await revision.update({ status: 'countersigned', countersignedAt: issuedAt, checkerId: checker.id, updatedAt: issuedAt }, { transaction });
    await recordAuditEvent(
      { actorId: checker.id, action: 'revision.countersigned', entityType: 'revision', entityId: revision.id, schemeId: scheme.id, details: { number: revision.number, reviewId: review.id, revisionSha256: revision.revisionSha256, rerunResultsSha256: o.rerun.resultsSha256, rerunEngineVersion: o.rerun.engineVersion } },
      transaction,
    );
    const { certificate, superseded } = await issueCertificate({ parties, signed, baseUrl, transaction, onFileWritten: o.onFileWritten });
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
}
