import { ANY_ROLE } from '@/lib/auth/authorize';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { calculationSheetOffThread } from '@/lib/pdf-pool/render-off-thread';
import { calculationSheetSource } from '@/lib/revisions/calculation-sheet-source';
import { revisionNumberParam } from '@/lib/schemes/revision-number-param';

/** GET ?revision=N: the revision's printable calculation sheet; its status line and mark say where the revision stands. */
export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (request, user, { id }) => {
  const source = await calculationSheetSource({ schemeId: id, number: revisionNumberParam(request), user });
  const pdf = await calculationSheetOffThread(source);
  const name = `${source.scheme.reference}-rev${source.revision.number}-calculation-sheet.pdf`;
  return new Response(new Uint8Array(pdf), { headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${name}"` } });
});
