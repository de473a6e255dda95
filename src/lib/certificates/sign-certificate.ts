import 'server-only';
import { signedCertificateOffThread } from '@/lib/pdf-pool/render-off-thread';
import { signingIdentity } from '@/lib/signing/signing-identity';
import type { CertificateDraft } from './certificate-draft';

export interface SignedCertificate {
  draft: CertificateDraft;
  pdf: Buffer;
  signerFingerprint: string;
}

/** The draft rendered and signed by the portal's identity on the PDF pool: CPU work, done outside any transaction. */
export async function signCertificate(draft: CertificateDraft): Promise<SignedCertificate> {
  const { p12, passphrase, subjectName, fingerprint } = await signingIdentity();
  const pdf = await signedCertificateOffThread(draft.content, { p12, passphrase, subjectName }, draft.signature);
  return { draft, pdf, signerFingerprint: fingerprint };
}
