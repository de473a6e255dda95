import { authorizedRoute } from '@/lib/http/authorized-route';
import { reminderPdf } from '@/lib/letters/reminder-pdf';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';

/** GET: a reminder letter as a PDF to print and post (address placed for a DL window envelope). */
export const GET = authorizedRoute<{ id: string }>(LIAISON_MANAGERS, async (_request, user, { id }) => {
  const { pdf, fileName } = await reminderPdf({ user, reminderId: id });
  return new Response(new Uint8Array(pdf), { headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${fileName}"`, 'cache-control': 'private, no-store' } });
});
