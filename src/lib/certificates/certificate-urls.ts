// Public addresses printed on certificates and sent in e-mails.

export function certificateVerificationUrl(baseUrl: string, number: string): string {
  return `${baseUrl}/verify?number=${encodeURIComponent(number)}`;
}

export function signingCertificateUrl(baseUrl: string): string {
  return `${baseUrl}/api/signing-certificate`;
}
