import { ANY_ROLE } from '@/lib/auth/authorize';
import { downloadCertificate } from '@/lib/certificates/download-certificate';
import { authorizedRoute } from '@/lib/http/authorized-route';

// The signed PDF exactly as issued; each download is an audit event. Designers may download only their own schemes'.
export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (_request, user, { id }) => {
  const { pdf, fileName } = await downloadCertificate({ certificateId: id, user });
  return new Response(new Uint8Array(pdf), {
    headers: { 'content-type': 'application/pdf', 'content-disposition': `attachment; filename="${fileName}"`, 'content-length': String(pdf.length), 'cache-control': 'private, no-store' },
  });
});
