import { authorizedRoute } from '@/lib/http/authorized-route';
import { isPrefetch } from '@/lib/http/is-prefetch';
import { printLettersToPost } from '@/lib/letters/print-letters-to-post';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';

// GET: the batch's letters to post as one PDF to print (address placed for a DL window envelope). Each print is an
// audit event, so a prefetch gets no file and logs nothing.
export const GET = authorizedRoute<{ id: string }>(LIAISON_MANAGERS, async (request, user, { id }) => {
  if (isPrefetch(request)) return new Response(null, { status: 204, headers: { 'cache-control': 'private, no-store', vary: 'Next-Router-Prefetch, Purpose, Sec-Purpose' } });
  const { pdf, fileName } = await printLettersToPost({ user, batchId: id });
  return new Response(new Uint8Array(pdf), { headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${fileName}"`, 'content-length': String(pdf.length), 'cache-control': 'private, no-store' } });
});
