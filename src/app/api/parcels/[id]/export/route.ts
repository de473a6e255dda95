import { z } from 'zod';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { idQuery, queryOrThrow } from '@/lib/http/query-params';
import { exportCasework } from '@/lib/parcels/export-casework';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';

const exportQuery = z.object({
  table: z.enum(['register', 'impact', 'tracking'], { error: 'must be register, impact or tracking (which table to export)' }),
  revision: idQuery('the revision').optional(),
});

/** GET ?table=register|impact|tracking[&revision=<id>]: the scheme's parcels register, impact table or letter tracking as CSV. */
export const GET = authorizedRoute<{ id: string }>(LIAISON_READERS, async (request, user, { id }) => {
  const { table, revision } = queryOrThrow(exportQuery, request);
  const { csv, fileName } = await exportCasework({ user, schemeId: id, table, revisionId: revision });
  return new Response(csv, { headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${fileName}"`, 'cache-control': 'private, no-store' } });
});
