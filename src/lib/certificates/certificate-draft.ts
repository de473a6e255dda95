import 'server-only';
import { isDeepStrictEqual } from 'node:util';
import type { Transaction } from 'sequelize';
import { ROLE_LABELS } from '@/lib/auth/roles';
import type { Revision, Scheme, User } from '@/lib/db';
import { ConflictError, UnprocessableError } from '@/lib/http/app-errors';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CertificateContent } from '@/lib/pdf/certificate-content';
import { utcDateTime } from '@/lib/pdf/certificate-text';
import { decodeDraft } from '@/lib/revisions/draft-inputs';
import { frozenCaseFile } from '@/lib/revisions/revision-hashes';
import type { SignatureDetails } from '@/lib/signing/sign-pdf';
import { parseCase } from '@/lib/validation/parse-case';
import { nextCertificateNumber } from './certificate-number';
import { certificateVerificationUrl, signingCertificateUrl } from './certificate-urls';

/** The records a certificate is made from, as read in one transaction. */
export interface CertificateParties {
  revision: Revision;
  scheme: Scheme;
  designer: User;
  checker: User;
}

/** Everything the signed file says: drawn from the records before it is made, and compared with them when it is stored. */
export interface CertificateDraft {
  number: string;
  issuedAt: string;
  content: CertificateContent;
  signature: SignatureDetails;
}

function content(p: CertificateParties, number: string, issuedAt: string, baseUrl: string): CertificateContent {
  const r = p.revision;
  const parsed = parseCase(frozenCaseFile(r.inputsJson));
  if (!parsed.ok || !r.resultsJson) throw new UnprocessableError('The frozen revision has no readable inputs and results to certify.');
  return {
    number,
    issuedAt,
    scheme: { reference: p.scheme.reference, name: p.scheme.name, watercourse: p.scheme.watercourse, site: p.scheme.site },
    revision: { number: r.number, engineVersion: r.engineVersion ?? '', revisionSha256: r.revisionSha256 ?? '', inputsSha256: r.inputsSha256 ?? '', resultsSha256: r.resultsSha256 ?? '' },
    designer: { name: p.designer.name, organisation: p.designer.organisation, role: ROLE_LABELS.designer, act: `Designed the revision and submitted it for check on ${utcDateTime(r.submittedAt ?? issuedAt)}.` },
    checker: { name: p.checker.name, organisation: p.checker.organisation, role: ROLE_LABELS.checker, act: `Checked the revision independently and countersigned it on ${utcDateTime(issuedAt)}.` },
    datum: decodeDraft(r.inputsJson).wizard?.datum ?? null,
    inputs: parsed.value,
    results: JSON.parse(r.resultsJson) as CaseResult,
    verificationUrl: certificateVerificationUrl(baseUrl, number),
    signingCertificateUrl: signingCertificateUrl(baseUrl),
  };
}

/**
 * The certificate as the records stand in `transaction`, under the next free number of the year. Drawn before the
 * file is made, outside the write lock; drawn again inside the recording transaction, where it must come out the same.
 */
export async function draftCertificate(parties: CertificateParties, { issuedAt, baseUrl, transaction }: { issuedAt: string; baseUrl: string; transaction: Transaction }): Promise<CertificateDraft> {
  const number = await nextCertificateNumber(issuedAt, transaction);
  const { scheme, revision } = parties;
  return {
    number,
    issuedAt,
    content: content(parties, number, issuedAt, baseUrl),
    signature: { reason: `Sillmark certificate ${number}: independent check of ${scheme.reference} revision ${revision.number}`, location: `${scheme.watercourse} at ${scheme.site}`, contactInfo: certificateVerificationUrl(baseUrl, number) },
  };
}

export const sameDraft = (a: CertificateDraft, b: CertificateDraft) => isDeepStrictEqual(a, b);

/** The records changed between drawing the certificate and storing it (another certificate took its number, say). */
export class CertificateDraftChangedError extends ConflictError {
  constructor() {
    super('Other certificates were issued, or the scheme’s details changed, while this certificate was being made, so nothing was recorded: countersign again.');
  }
}
