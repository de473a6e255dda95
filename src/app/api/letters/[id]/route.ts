import { NotFoundError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { readLetterPdf } from '@/lib/letters/letter-files';
import { requireLetterAccess } from '@/lib/letters/load-letter';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';

/** GET: the letter's PDF, as it was made (and e-mailed). */
export const GET = authorizedRoute<{ id: string }>(LIAISON_READERS, async (_request, user, { id }) => {
  const { letter, scheme } = await requireLetterAccess({ user, letterId: id });
  if (!letter.pdfPath) throw new NotFoundError('This letter has no PDF.');
  const pdf = await readLetterPdf(letter.pdfPath);
  const name = `${scheme.reference}-letter-v${letter.version}-${letter.id.slice(0, 8)}.pdf`.replace(/[^A-Za-z0-9._-]/g, '-');
  return new Response(new Uint8Array(pdf), { headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${name}"`, 'cache-control': 'private, no-store' } });
});
