import { ANY_ROLE } from '@/lib/auth/authorize';
import { downloadCertificate } from '@/lib/certificates/download-certificate';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { isPrefetch } from '@/lib/http/is-prefetch';

// The signed PDF exactly as issued; each download is an audit event. Designers may download only their own schemes'.
// A prefetch gets no file and logs nothing: only a download a person asked for is recorded.
export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (request, user, { id }) => {
  if (isPrefetch(request)) return new Response(null, { status: 204, headers: { 'cache-control': 'private, no-store', vary: 'Next-Router-Prefetch, Purpose, Sec-Purpose' } });
  const { pdf, fileName } = await downloadCertificate({ certificateId: id, user });
  return new Response(new Uint8Array(pdf), {
    headers: { 'content-type': 'application/pdf', 'content-disposition': `attachment; filename="${fileName}"`, 'content-length': String(pdf.length), 'cache-control': 'private, no-store' },
  });
});
