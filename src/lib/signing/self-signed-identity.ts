import 'server-only';
import { randomBytes } from 'node:crypto';
import forge from 'node-forge';

const VALIDITY_YEARS = 10;
const SUBJECT = [
  { name: 'commonName', value: 'Sillmark certificate signing (local signing service)' },
  { name: 'organizationName', value: 'Sillmark' },
  { name: 'countryName', value: 'GB' },
];

/**
 * A local stand-in for a hosted signing service: an RSA 2048 key and a self-signed X.509 certificate for
 * document signing, packed as PKCS#12 for @signpdf/signer-p12. The passphrase protects the key bag.
 */
export function createSelfSignedIdentity(passphrase: string): { p12: Buffer; certificatePem: string } {
  const keys = forge.pki.rsa.generateKeyPair({ bits: 2048, e: 0x10001 });
  const certificate = forge.pki.createCertificate();
  certificate.publicKey = keys.publicKey;
  // A positive serial: a leading zero nibble keeps the DER integer from reading as negative.
  certificate.serialNumber = `0${randomBytes(15).toString('hex')}`;
  certificate.validity.notBefore = new Date(Date.now() - 60_000);
  certificate.validity.notAfter = new Date(Date.now() + VALIDITY_YEARS * 365 * 86_400_000);
  certificate.setSubject(SUBJECT);
  certificate.setIssuer(SUBJECT);
  certificate.setExtensions([
    { name: 'basicConstraints', cA: false },
    { name: 'keyUsage', critical: true, digitalSignature: true, nonRepudiation: true },
    { name: 'subjectKeyIdentifier' },
  ]);
  certificate.sign(keys.privateKey, forge.md.sha256.create());
  const p12Asn1 = forge.pkcs12.toPkcs12Asn1(keys.privateKey, [certificate], passphrase, { algorithm: 'aes256', friendlyName: 'Sillmark signing' });
  return { p12: Buffer.from(forge.asn1.toDer(p12Asn1).getBytes(), 'binary'), certificatePem: forge.pki.certificateToPem(certificate) };
}
