import 'server-only';
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { ROLE_LABELS } from '@/lib/auth/roles';
import { Certificate, type Revision, type Scheme, type User } from '@/lib/db';
import { UnprocessableError } from '@/lib/http/app-errors';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CertificateContent } from '@/lib/pdf/certificate-content';
import { signedCertificateOffThread } from '@/lib/pdf-pool/render-off-thread';
import { utcDateTime } from '@/lib/pdf/certificate-text';
import { decodeDraft } from '@/lib/revisions/draft-inputs';
import { frozenCaseFile, sha256Hex } from '@/lib/revisions/revision-hashes';
import { signingIdentity } from '@/lib/signing/signing-identity';
import { parseCase } from '@/lib/validation/parse-case';
import { listCertificateFiles, removeCertificateFile, writeCertificateFile } from './certificate-files';
import { nextCertificateNumber } from './certificate-number';
import { certificateVerificationUrl, signingCertificateUrl } from './certificate-urls';

export interface IssueCertificateOptions {
  revision: Revision;
  scheme: Scheme;
  designer: User;
  checker: User;
  issuedAt: string;
  baseUrl: string;
  transaction: Transaction;
  /** Called with the stored file's path as soon as it is written, so the caller can remove it if the transaction fails. */
  onFileWritten: (relativePath: string) => void;
}

function content(o: IssueCertificateOptions, number: string): CertificateContent {
  const parsed = parseCase(frozenCaseFile(o.revision.inputsJson));
  if (!parsed.ok || !o.revision.resultsJson) throw new UnprocessableError('The frozen revision has no readable inputs and results to certify.');
  const r = o.revision;
  return {
    number,
    issuedAt: o.issuedAt,
    scheme: { reference: o.scheme.reference, name: o.scheme.name, watercourse: o.scheme.watercourse, site: o.scheme.site },
    revision: { number: r.number, engineVersion: r.engineVersion ?? '', revisionSha256: r.revisionSha256 ?? '', inputsSha256: r.inputsSha256 ?? '', resultsSha256: r.resultsSha256 ?? '' },
    designer: { name: o.designer.name, organisation: o.designer.organisation, role: ROLE_LABELS.designer, act: `Designed the revision and submitted it for check on ${utcDateTime(r.submittedAt ?? o.issuedAt)}.` },
    checker: { name: o.checker.name, organisation: o.checker.organisation, role: ROLE_LABELS.checker, act: `Checked the revision independently and countersigned it on ${utcDateTime(o.issuedAt)}.` },
    datum: decodeDraft(r.inputsJson).wizard?.datum ?? null,
    inputs: parsed.value,
    results: JSON.parse(o.revision.resultsJson) as CaseResult,
    verificationUrl: certificateVerificationUrl(o.baseUrl, number),
    signingCertificateUrl: signingCertificateUrl(o.baseUrl),
  };
}

/**
 * Removes signed PDFs that no certificate row records: a server killed between writing the file and committing leaves
 * one behind, bearing the number the next certificate will reuse. Run under the write lock of the issuing transaction,
 * where no other issue can be half-done, so every unrecorded file is such a leftover.
 */
async function removeUnrecordedFiles(transaction: Transaction): Promise<void> {
  const files = await listCertificateFiles();
  if (files.length === 0) return;
  const recorded = new Set((await Certificate.findAll({ where: { pdfPath: files }, attributes: ['pdfPath'], transaction })).map((c) => c.pdfPath));
  await Promise.all(files.filter((f) => !recorded.has(f)).map(removeCertificateFile));
}

/**
 * Makes, signs and stores the certificate of a countersigned revision, inside the countersigning transaction, and
 * supersedes the scheme's certificate issued before it. Only called for a frozen, countersigned revision.
 */
export async function issueCertificate(o: IssueCertificateOptions): Promise<{ certificate: Certificate; superseded: Certificate[] }> {
  const { revision, scheme, transaction } = o;
  const id = randomUUID();
  await removeUnrecordedFiles(transaction);
  const number = await nextCertificateNumber(o.issuedAt, transaction);
  const { p12, passphrase, subjectName, fingerprint: signerFingerprint } = await signingIdentity();
  const signature = { reason: `Sillmark certificate ${number}: independent check of ${scheme.reference} revision ${revision.number}`, location: `${scheme.watercourse} at ${scheme.site}`, contactInfo: certificateVerificationUrl(o.baseUrl, number) };
  const signed = await signedCertificateOffThread(content(o, number), { p12, passphrase, subjectName }, signature);
  const pdfPath = await writeCertificateFile(id, signed);
  o.onFileWritten(pdfPath);
  const pdfSha256 = sha256Hex(signed);
  const superseded = await Certificate.findAll({ where: { schemeId: scheme.id, status: 'issued' }, transaction });
  const certificate = await Certificate.create({ id, number, schemeId: scheme.id, revisionId: revision.id, status: 'issued', pdfPath, pdfSha256, signerFingerprint, issuedAt: o.issuedAt, supersededById: null, revokedAt: null, revokedBy: null, revocationReason: null }, { transaction });
  for (const previous of superseded) {
    await previous.update({ status: 'superseded', supersededById: id }, { transaction });
    await recordAuditEvent({ actorId: o.checker.id, action: 'certificate.superseded', entityType: 'certificate', entityId: previous.id, schemeId: scheme.id, details: { number: previous.number, supersededBy: number } }, transaction);
  }
  await recordAuditEvent(
    { actorId: o.checker.id, action: 'certificate.issued', entityType: 'certificate', entityId: id, schemeId: scheme.id, details: { number, revisionId: revision.id, revisionNumber: revision.number, revisionSha256: revision.revisionSha256, pdfSha256, signerFingerprint } },
    transaction,
  );
  return { certificate, superseded };
}
