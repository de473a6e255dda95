import 'server-only';
import { plainAddPlaceholder } from '@signpdf/placeholder-plain';
import { P12Signer } from '@signpdf/signer-p12';
import { SignPdf } from '@signpdf/signpdf';
import { signingIdentity } from './signing-identity';

export interface SignPdfOptions {
  /** The unsigned PDF: pdfkit's classic cross-reference table, which the plain placeholder can extend. */
  pdf: Buffer;
  reason: string;
  location: string;
  contactInfo: string;
}

// Room for the DER signature: an RSA 2048 signature, the certificate and the signed attributes fit well inside.
const SIGNATURE_LENGTH = 8192;

/** A detached PKCS#7 signature (adbe.pkcs7.detached) by the portal's identity, covering the whole file but the signature. */
export async function signPdf({ pdf, reason, location, contactInfo }: SignPdfOptions): Promise<{ signed: Buffer; signerFingerprint: string }> {
  const identity = await signingIdentity();
  const prepared = plainAddPlaceholder({ pdfBuffer: pdf, reason, location, contactInfo, name: identity.subjectName, signatureLength: SIGNATURE_LENGTH, appName: 'Sillmark' });
  // The named class, not the default instance: under plain Node ESM (tsx, the CLI) the default import is the whole CommonJS exports object.
  const signed = await new SignPdf().sign(prepared, new P12Signer(identity.p12, { passphrase: identity.passphrase }));
  return { signed, signerFingerprint: identity.fingerprint };
}
