import 'server-only';
import type { UploadedCertificateReading } from '@/lib/certificates/read-uploaded-certificate';
import type { LetterDocument } from '@/lib/letters/render-letter-pdf';
import type { CalculationSheetOptions } from '@/lib/pdf/calculation-sheet';
import type { CertificateContent } from '@/lib/pdf/certificate-content';
import type { SignatureDetails, SigningKey } from '@/lib/signing/sign-pdf';
import { ownArrayBuffer } from '@/lib/worker-pool/own-array-buffer';
import type { CreatedIdentity } from './pdf-jobs';
import { runPdfJob } from './pdf-pool';

// The portal's only way to make a PDF, or to check an uploaded one: each renderer of src/lib/pdf and src/lib/letters,
// and the signature check, run on the PDF pool. The bytes are those the renderer makes on any thread: the same input
// gives the same file.

/** The certificate, rendered and signed by `key` (a detached PKCS#7 signature over the whole file). */
export async function signedCertificateOffThread(content: CertificateContent, key: SigningKey, signature: SignatureDetails): Promise<Buffer> {
  return Buffer.from(await runPdfJob({ kind: 'certificate', content, key, signature }));
}

export async function calculationSheetOffThread(sheet: CalculationSheetOptions): Promise<Buffer> {
  return Buffer.from(await runPdfJob({ kind: 'calculation-sheet', sheet }));
}

export async function letterPdfOffThread(letter: LetterDocument): Promise<Buffer> {
  return Buffer.from(await runPdfJob({ kind: 'letter', letter }));
}

/** Several letters in one PDF to print, each from a new page; at most one register's worth (2000 parcels). */
export async function lettersToPostOffThread(letters: LetterDocument[], printedAt: string): Promise<Buffer> {
  return Buffer.from(await runPdfJob({ kind: 'letters-to-post', letters, printedAt }));
}

export function signingIdentityOffThread(passphrase: string): Promise<CreatedIdentity> {
  return runPdfJob({ kind: 'signing-identity', passphrase });
}

/**
 * An uploaded certificate's signature, SHA-256 and claimed number, read on the PDF pool. The bytes are moved there when
 * `pdf` is the only view of its buffer: the caller must not use them afterwards.
 */
export function uploadedCertificateOffThread(pdf: Uint8Array): Promise<UploadedCertificateReading> {
  const bytes = ownArrayBuffer(pdf);
  return runPdfJob({ kind: 'uploaded-certificate', pdf: bytes }, [bytes]);
}
