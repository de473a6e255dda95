import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CaseInput } from '@/lib/validation/case-schema';

export interface CertificatePerson {
  name: string;
  organisation: string | null;
  role: string;
  /** What the person did, with its date: "Submitted for check 2026-03-14 09:30 UTC". */
  act: string;
}

/** Everything the certificate shows, gathered by the use case that issues it; the renderer reads nothing else. */
export interface CertificateContent {
  number: string;
  issuedAt: string;
  scheme: { reference: string; name: string; watercourse: string; site: string };
  revision: { number: number; engineVersion: string; revisionSha256: string; inputsSha256: string; resultsSha256: string };
  designer: CertificatePerson;
  checker: CertificatePerson;
  /** The datum every level is measured from, as the scheme names it; null when the scheme does not name one. */
  datum: string | null;
  inputs: CaseInput;
  results: CaseResult;
  verificationUrl: string;
  signingCertificateUrl: string;
}
