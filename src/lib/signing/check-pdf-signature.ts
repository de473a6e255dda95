import 'server-only';
import { createHash, createVerify } from 'node:crypto';
import forge from 'node-forge';
import { locatePdfSignature } from './pdf-signature';
import { certificateFingerprint } from './certificate-fingerprint';

export interface PdfSignatureCheck {
  present: boolean;
  /** The signed attributes verify with the signer's public key, and their message digest is that of the signed bytes. */
  valid: boolean;
  coversWholeDocument: boolean;
  signerFingerprint: string | null;
  signerName: string | null;
  problem: string | null;
}

interface SignerCapture {
  authenticatedAttributes?: forge.asn1.Asn1[];
  signature?: string;
  digestAlgorithm?: string;
}

const DIGESTS: Record<string, string> = { [forge.pki.oids.sha256]: 'sha256', [forge.pki.oids.sha384]: 'sha384', [forge.pki.oids.sha512]: 'sha512' };

function messageDigestOf(attributes: forge.asn1.Asn1[]): string | null {
  for (const attribute of attributes) {
    const [type, values] = attribute.value as forge.asn1.Asn1[];
    if (forge.asn1.derToOid(type.value as string) !== forge.pki.oids.messageDigest) continue;
    const first = (values.value as forge.asn1.Asn1[])[0];
    return typeof first?.value === 'string' ? first.value : null;
  }
  return null;
}

function commonName(certificate: forge.pki.Certificate): string | null {
  const field = certificate.subject.getField('CN');
  return typeof field?.value === 'string' ? field.value : null;
}

const failed = (present: boolean, coversWholeDocument: boolean, problem: string): PdfSignatureCheck => ({ present, valid: false, coversWholeDocument, signerFingerprint: null, signerName: null, problem });

/**
 * Checks a detached PKCS#7 PDF signature without trusting the file: the digest of the byte ranges must equal the
 * signed message digest, and the signed attributes (re-encoded as the DER SET they were signed as, RFC 5652 §5.4)
 * must verify with the public key of a certificate carried in the signature. CPU work: the portal runs it on the PDF pool.
 */
export function checkPdfSignature(pdf: Buffer): PdfSignatureCheck {
  const location = locatePdfSignature(pdf);
  if (!location) return failed(false, false, 'The file carries no PDF signature.');
  let message: forge.pkcs7.PkcsSignedData & { rawCapture?: SignerCapture };
  try {
    message = forge.pkcs7.messageFromAsn1(forge.asn1.fromDer(forge.util.createBuffer(location.signature.toString('binary')))) as typeof message;
  } catch {
    return failed(true, location.coversWholeDocument, 'The signature is not a readable PKCS#7 structure.');
  }
  const { authenticatedAttributes, signature, digestAlgorithm } = message.rawCapture ?? {};
  const digest = digestAlgorithm ? DIGESTS[forge.asn1.derToOid(digestAlgorithm)] : undefined;
  if (!authenticatedAttributes || !signature || !digest) return failed(true, location.coversWholeDocument, 'The signature lacks signed attributes or uses an unknown digest.');

  const expected = messageDigestOf(authenticatedAttributes);
  const actual = createHash(digest).update(location.signedBytes).digest('binary');
  if (expected !== actual) return failed(true, location.coversWholeDocument, 'The document’s bytes do not match the digest that was signed: the file has been altered.');

  const signedSet = forge.asn1.create(forge.asn1.Class.UNIVERSAL, forge.asn1.Type.SET, true, authenticatedAttributes);
  const signedAttributes = Buffer.from(forge.asn1.toDer(signedSet).getBytes(), 'binary');
  const signer = message.certificates.find((certificate) => {
    const verifier = createVerify(digest);
    verifier.update(signedAttributes);
    return verifier.verify(forge.pki.publicKeyToPem(certificate.publicKey), Buffer.from(signature, 'binary'));
  });
  if (!signer) return failed(true, location.coversWholeDocument, 'The signature does not verify with the certificate it carries.');
  return { present: true, valid: true, coversWholeDocument: location.coversWholeDocument, signerFingerprint: certificateFingerprint(signer), signerName: commonName(signer), problem: null };
}
