import 'server-only';
import { uploadedCertificateOffThread } from '@/lib/pdf-pool/render-off-thread';
import { signingIdentity } from '@/lib/signing/signing-identity';
import { lookupCertificate, type CertificateLookup } from './lookup-certificate';

export interface PdfVerification {
  signaturePresent: boolean;
  signatureValid: boolean;
  coversWholeDocument: boolean;
  signedByPortal: boolean;
  /** The file is byte for byte the one the portal issued (its SHA-256 is on record). */
  unaltered: boolean;
  /** The certificate is issued: neither superseded nor revoked. */
  current: boolean;
  /** All of the above. */
  authentic: boolean;
  problems: string[];
  certificate: CertificateLookup | null;
  /** The number the file names, when it matches no issued file: what it claims to be. */
  claimedNumber: string | null;
  sha256: string;
}

/**
 * The portal's own check of an uploaded certificate: the PKCS#7 signature over its byte ranges, the signer against
 * the portal's identity, the file's SHA-256 against the one stored at issue, and the certificate's status now. The
 * file is read on the PDF pool, its bytes moved there: the caller must not use `pdf` afterwards.
 */
export async function verifyCertificatePdf({ pdf }: { pdf: Uint8Array }): Promise<PdfVerification> {
  const [reading, identity] = await Promise.all([uploadedCertificateOffThread(pdf), signingIdentity()]);
  const { signature, sha256 } = reading;
  const issued = await lookupCertificate({ pdfSha256: sha256 });
  const claimed = issued ? null : reading.claimedNumber;
  const certificate = issued ?? (claimed ? await lookupCertificate({ number: claimed }) : null);
  const signedByPortal = signature.valid && signature.signerFingerprint === identity.fingerprint;
  const current = certificate?.status === 'issued';
  const problems: string[] = [];
  if (signature.problem) problems.push(signature.problem);
  if (signature.valid && !signature.coversWholeDocument) problems.push('The signature does not cover the whole file: something was added after signing.');
  if (signature.valid && !signedByPortal) problems.push('The file was signed by someone other than the Sillmark signing identity.');
  if (!issued) problems.push(certificate ? `The file is not the one issued as ${certificate.number}: its SHA-256 differs from the one on record.` : 'No certificate issued by this portal has this file’s SHA-256.');
  if (certificate?.status === 'superseded') problems.push(`Certificate ${certificate.number} is superseded${certificate.supersededBy ? ` by ${certificate.supersededBy}` : ''}.`);
  if (certificate?.status === 'revoked') problems.push(`Certificate ${certificate.number} is revoked: ${certificate.revocationReason ?? 'no reason recorded'}.`);
  const authentic = signature.valid && signature.coversWholeDocument && signedByPortal && !!issued && current;
  return { signaturePresent: signature.present, signatureValid: signature.valid, coversWholeDocument: signature.coversWholeDocument, signedByPortal, unaltered: !!issued, current, authentic, problems, certificate, claimedNumber: claimed, sha256 };
}
