import { ANY_ROLE } from '@/lib/auth/authorize';
import { verifyCertificatePdf } from '@/lib/certificates/verify-certificate-pdf';
import { AppError, InvalidRequestError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { MAX_CERTIFICATE_PDF_BYTES, certificatePdfFileSchema } from '@/lib/validation/certificate-schemas';

const tooLarge = () => new AppError(`The file is larger than ${MAX_CERTIFICATE_PDF_BYTES / 1024 / 1024} MB; a Sillmark certificate is far smaller.`, 413);

// Signed-in users upload a certificate PDF (multipart field "file"); it is checked in memory and never stored.
export const POST = authorizedRoute(ANY_ROLE, async (request) => {
  if (Number(request.headers.get('content-length') ?? '0') > MAX_CERTIFICATE_PDF_BYTES + 64 * 1024) throw tooLarge();
  const form = await request.formData().catch(() => {
    throw new InvalidRequestError([{ path: 'file', message: 'Send the certificate as a multipart form with the PDF in the field "file".' }]);
  });
  const parsed = certificatePdfFileSchema.safeParse(form.get('file'));
  if (!parsed.success) throw new InvalidRequestError([{ path: 'file', message: parsed.error.issues[0]?.message ?? 'Choose the certificate PDF file to verify.' }]);
  return Response.json(await verifyCertificatePdf({ pdf: new Uint8Array(await parsed.data.arrayBuffer()) }));
});
