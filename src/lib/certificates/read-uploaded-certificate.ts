import 'server-only';
import { sha256Hex } from '@/lib/revisions/revision-hashes';
import { type PdfSignatureCheck, checkPdfSignature } from '@/lib/signing/check-pdf-signature';

/** What an uploaded file says of itself, read without the database: the part of verifying that is CPU work. */
export interface UploadedCertificateReading {
  signature: PdfSignatureCheck;
  sha256: string;
  /** The certificate number the file names, whether or not it is one the portal issued. */
  claimedNumber: string | null;
}

function claimedNumber(pdf: Buffer): string | null {
  return /\((SMC-\d{4}-\d{4,})\)/.exec(pdf.toString('latin1'))?.[1] ?? null;
}

/** Runs on the PDF pool (the file may be 5 MB): the signature, the file's SHA-256 and the number it claims. */
export function readUploadedCertificate(pdf: Buffer): UploadedCertificateReading {
  return { signature: checkPdfSignature(pdf), sha256: sha256Hex(pdf), claimedNumber: claimedNumber(pdf) };
}
