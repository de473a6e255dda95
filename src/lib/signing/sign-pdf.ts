import 'server-only';
import { plainAddPlaceholder } from '@signpdf/placeholder-plain';
import { P12Signer } from '@signpdf/signer-p12';
import { SignPdf } from '@signpdf/signpdf';

/** What signing needs of the portal's identity; plain data, so that it can be handed to a worker thread. */
export interface SigningKey {
  p12: Uint8Array;
  passphrase: string;
  subjectName: string;
}

/** What the signature says about itself, shown by PDF readers beside it. */
export interface SignatureDetails {
  reason: string;
  location: string;
  contactInfo: string;
}

// Room for the DER signature: an RSA 2048 signature, the certificate and the signed attributes fit well inside.
const SIGNATURE_LENGTH = 8192;

/**
 * A detached PKCS#7 signature (adbe.pkcs7.detached) by `key`, covering the whole file but the signature. `pdf` must
 * be pdfkit's classic cross-reference table, which the plain placeholder can extend. CPU work: run it on the PDF pool.
 */
export async function signPdf(pdf: Buffer, key: SigningKey, { reason, location, contactInfo }: SignatureDetails): Promise<Buffer> {
  const prepared = plainAddPlaceholder({ pdfBuffer: pdf, reason, location, contactInfo, name: key.subjectName, signatureLength: SIGNATURE_LENGTH, appName: 'Sillmark' });
  // A key that crossed a thread boundary arrives as a plain Uint8Array; the signer wants a Buffer (this one shares its bytes).
  const p12 = Buffer.from(key.p12.buffer, key.p12.byteOffset, key.p12.byteLength);
  // The named class, not the default instance: under plain Node ESM (tsx, the CLI) the default import is the whole CommonJS exports object.
  return new SignPdf().sign(prepared, new P12Signer(p12, { passphrase: key.passphrase }));
}
