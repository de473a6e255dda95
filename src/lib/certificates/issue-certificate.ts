import 'server-only';
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { Certificate } from '@/lib/db';
import { sha256Hex } from '@/lib/revisions/revision-hashes';
import { listCertificateFiles, removeCertificateFile, writeCertificateFile } from './certificate-files';
import { type CertificateParties, CertificateDraftChangedError, draftCertificate, sameDraft } from './certificate-draft';
import type { SignedCertificate } from './sign-certificate';

export interface IssueCertificateOptions {
  parties: CertificateParties;
  /** Made beforehand, outside the transaction (signCertificate). */
  signed: SignedCertificate;
  baseUrl: string;
  transaction: Transaction;
  /** Called with the stored file's path as soon as it is written, so the caller can remove it if the transaction fails. */
  onFileWritten: (relativePath: string) => void;
}

/**
 * Removes signed PDFs that no certificate row records: a server killed between storing the file and committing leaves
 * one behind. Files take their final name only under the write lock of the issuing transaction, where no other issue
 * can be half-done, so every unrecorded `.pdf` is such a leftover (a file still being written is a `.tmp`).
 */
async function removeUnrecordedFiles(transaction: Transaction): Promise<void> {
  const files = await listCertificateFiles();
  if (files.length === 0) return;
  const recorded = new Set((await Certificate.findAll({ where: { pdfPath: files }, attributes: ['pdfPath'], transaction })).map((c) => c.pdfPath));
  await Promise.all(files.filter((f) => !recorded.has(f)).map(removeCertificateFile));
}

/**
 * Stores the signed certificate of a countersigned revision inside the countersigning transaction, and supersedes the
 * scheme's certificate issued before it. The file must say what the records say now, under the number that is next
 * now: otherwise CertificateDraftChangedError, and nothing is written.
 */
export async function issueCertificate(o: IssueCertificateOptions): Promise<{ certificate: Certificate; superseded: Certificate[] }> {
  const { parties, signed, transaction } = o;
  const { revision, scheme, checker } = parties;
  const { number, issuedAt } = signed.draft;
  if (!sameDraft(await draftCertificate(parties, { issuedAt, baseUrl: o.baseUrl, transaction }), signed.draft)) throw new CertificateDraftChangedError();
  const id = randomUUID();
  await removeUnrecordedFiles(transaction);
  const pdfPath = await writeCertificateFile(id, signed.pdf);
  o.onFileWritten(pdfPath);
  const pdfSha256 = sha256Hex(signed.pdf);
  const { signerFingerprint } = signed;
  const superseded = await Certificate.findAll({ where: { schemeId: scheme.id, status: 'issued' }, transaction });
  const certificate = await Certificate.create({ id, number, schemeId: scheme.id, revisionId: revision.id, status: 'issued', pdfPath, pdfSha256, signerFingerprint, issuedAt, supersededById: null, revokedAt: null, revokedBy: null, revocationReason: null }, { transaction });
  for (const previous of superseded) {
    await previous.update({ status: 'superseded', supersededById: id }, { transaction });
    await recordAuditEvent({ actorId: checker.id, action: 'certificate.superseded', entityType: 'certificate', entityId: previous.id, schemeId: scheme.id, details: { number: previous.number, supersededBy: number } }, transaction);
  }
  await recordAuditEvent(
    { actorId: checker.id, action: 'certificate.issued', entityType: 'certificate', entityId: id, schemeId: scheme.id, details: { number, revisionId: revision.id, revisionNumber: revision.number, revisionSha256: revision.revisionSha256, pdfSha256, signerFingerprint } },
    transaction,
  );
  return { certificate, superseded };
}
