import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { confirmPassword } from '@/lib/auth/confirm-password';
import { CertificateDraftChangedError, draftCertificate } from '@/lib/certificates/certificate-draft';
import { removeCertificateFile } from '@/lib/certificates/certificate-files';
import { signCertificate } from '@/lib/certificates/sign-certificate';
import { readSnapshot } from '@/lib/db/read-snapshot';
import { ConflictError } from '@/lib/http/app-errors';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import type { CountersignInput } from '@/lib/validation/check-schemas';
import { checkFrozenRevision } from './check-frozen-revision';
import { countersignParties } from './countersign-parties';
import { recordCountersignature } from './record-countersignature';

/**
 * How many times a certificate may be made for one countersignature: made again only when another certificate took
 * its number while it was being made. Each making is one PDF job, so this caps the PDF work one request can cause.
 */
export const MAX_CERTIFICATE_MAKINGS = 3;

/**
 * The checker countersigns: password re-entered, four-eyes rule, frozen hashes intact, and an independent re-run of
 * the frozen inputs that reproduces the stored results. The certificate is then drawn from a read of the records and
 * made on the PDF pool, holding no lock; one short transaction checks every rule again and records the review's
 * decision, the revision's status, the certificate, the supersession, the audit events and the designer's e-mail
 * (sent once it commits). If anything changed meanwhile, nothing is recorded and the made file is discarded.
 */
export async function countersignRevision({ input, checker, baseUrl, now = Date.now() }: { input: CountersignInput; checker: SessionUser; baseUrl: string; now?: number }) {
  await confirmPassword({ user: checker, password: input.password, act: 'Countersigning', now });
  const { revision: checked } = await readSnapshot((transaction) => countersignParties({ revisionId: input.revisionId, checker, transaction }));
  const check = await checkFrozenRevision(checked);
  if (check.blockers.length) throw new ConflictError(`Countersigning is blocked. ${check.blockers.join(' ')}`);

  for (let making = 1; ; making++) {
    const issuedAt = new Date().toISOString();
    const draft = await readSnapshot(async (transaction) => draftCertificate(await countersignParties({ revisionId: input.revisionId, checker, checked, transaction }), { issuedAt, baseUrl, transaction }));
    const signed = await signCertificate(draft);
    let writtenFile: string | null = null;
    const issued = await recordCountersignature({ revisionId: input.revisionId, checker, checked, rerun: check.rerun, signed, baseUrl, onFileWritten: (file) => (writtenFile = file) }).catch(async (error: unknown) => {
      if (writtenFile) await removeCertificateFile(writtenFile);
      if (error instanceof CertificateDraftChangedError && making < MAX_CERTIFICATE_MAKINGS) return null;
      throw error;
    });
    if (!issued) continue;
    const notified = await deliverOutboundMail({ ids: issued.mail });
    return { revisionId: issued.revision.id, status: 'countersigned' as const, certificateId: issued.certificate.id, certificateNumber: issued.certificate.number, superseded: issued.superseded.map((c) => c.number), notified: notified.delivered };
  }
}
