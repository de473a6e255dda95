import forge from 'node-forge';

/** SHA-256 of an X.509 certificate's DER encoding, lowercase hex: how the portal names a signer. */
export function certificateFingerprint(certificate: forge.pki.Certificate): string {
  const der = forge.asn1.toDer(forge.pki.certificateToAsn1(certificate)).getBytes();
  return forge.md.sha256.create().update(der).digest().toHex();
}
