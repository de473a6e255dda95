// What the request side hands the PDF worker: plain data only (a structured clone), read from the database beforehand.
import type { UploadedCertificateReading } from '@/lib/certificates/read-uploaded-certificate';
import type { LetterDocument } from '@/lib/letters/render-letter-pdf';
import type { CalculationSheetOptions } from '@/lib/pdf/calculation-sheet';
import type { CertificateContent } from '@/lib/pdf/certificate-content';
import type { SignatureDetails, SigningKey } from '@/lib/signing/sign-pdf';
import type { StartSignal } from '@/lib/worker-pool/start-signal';

export type PdfJob =
  /** The certificate rendered and signed in one job: the unsigned file never crosses back to the request thread. */
  | { kind: 'certificate'; content: CertificateContent; key: SigningKey; signature: SignatureDetails }
  | { kind: 'calculation-sheet'; sheet: CalculationSheetOptions }
  | { kind: 'letter'; letter: LetterDocument }
  | { kind: 'letters-to-post'; letters: LetterDocument[]; printedAt: string }
  /** A new self-signed signing identity: an RSA key pair and a PKCS#12 bag, CPU work as signing is. */
  | { kind: 'signing-identity'; passphrase: string }
  /** An uploaded certificate's signature checked and its SHA-256 taken; its bytes are moved to the worker, not copied. */
  | { kind: 'uploaded-certificate'; pdf: ArrayBuffer };

export type PdfJobKind = PdfJob['kind'];

export interface CreatedIdentity {
  p12: Uint8Array;
  certificatePem: string;
}

/** Each job's answer: a PDF's bytes (transferred, not copied), the created identity, or what an upload says of itself. */
export type PdfJobResult<K extends PdfJobKind> = K extends 'signing-identity' ? CreatedIdentity : K extends 'uploaded-certificate' ? UploadedCertificateReading : ArrayBuffer;

export interface PdfTask extends StartSignal {
  job: PdfJob;
}

/** What each job does, in a practitioner's words, for the messages that say it could not be done. */
export const PDF_JOB_ACTS: Record<PdfJobKind, string> = {
  certificate: 'Making the certificate',
  'calculation-sheet': 'Making the calculation sheet',
  letter: 'Making the letter',
  'letters-to-post': 'Making the letters to post',
  'signing-identity': 'Making the signing identity',
  'uploaded-certificate': 'Checking the certificate’s signature',
};
