import { signingIdentity } from '@/lib/signing/signing-identity';

// Public: the portal's signing certificate (PEM), so anyone can check a certificate's signature with their own tools.
export async function GET(): Promise<Response> {
  const identity = await signingIdentity();
  return new Response(identity.certificatePem, {
    headers: { 'content-type': 'application/x-pem-file', 'content-disposition': 'attachment; filename="sillmark-signing-certificate.pem"', 'x-certificate-sha256': identity.fingerprint },
  });
}
