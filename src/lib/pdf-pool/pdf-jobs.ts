// What the request side hands the PDF worker: plain data only (a structured clone), read from the database beforehand.
import type { MessagePort } from 'node:worker_threads';
import type { LetterDocument } from '@/lib/letters/render-letter-pdf';
import type { CalculationSheetOptions } from '@/lib/pdf/calculation-sheet';
import type { CertificateContent } from '@/lib/pdf/certificate-content';
import type { SignatureDetails, SigningKey } from '@/lib/signing/sign-pdf';

export type PdfJob =
  /** The certificate rendered and signed in one job: the unsigned file never crosses back to the request thread. */
  | { kind: 'certificate'; content: CertificateContent; key: SigningKey; signature: SignatureDetails }
  | { kind: 'calculation-sheet'; sheet: CalculationSheetOptions }
  | { kind: 'letter'; letter: LetterDocument }
  | { kind: 'letters-to-post'; letters: LetterDocument[]; printedAt: string }
  /** A new self-signed signing identity: an RSA key pair and a PKCS#12 bag, CPU work as signing is. */
  | { kind: 'signing-identity'; passphrase: string };

export type PdfJobKind = PdfJob['kind'];

export interface CreatedIdentity {
  p12: Uint8Array;
  certificatePem: string;
}

/** Each job's answer: a PDF's bytes (transferred, not copied), or the created identity. */
export type PdfJobResult<K extends PdfJobKind> = K extends 'signing-identity' ? CreatedIdentity : ArrayBuffer;

export interface PdfTask {
  job: PdfJob;
  /** Told when the work starts, so that the time limit counts the run and not the wait in the queue. */
  started: MessagePort;
}

/** The job's name in a practitioner's words, for the messages that say it could not be made. */
export const PDF_JOB_WORDS: Record<PdfJobKind, string> = {
  certificate: 'the certificate',
  'calculation-sheet': 'the calculation sheet',
  letter: 'the letter',
  'letters-to-post': 'the letters to post',
  'signing-identity': 'the signing identity',
};
