import { z } from 'zod';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { queryOrThrow } from '@/lib/http/query-params';
import { previewRoutingCsv } from '@/lib/revisions/preview-routing-csv';
import { revisionIdParam } from '@/lib/uploads/revision-id-param';
import { readUploadBody } from '@/lib/uploads/read-upload-body';
import { ROUTING_CSV_LIMIT_BYTES } from '@/lib/uploads/upload-limits';

const tableQuery = z.object({ table: z.enum(['hydrograph', 'storage'], { error: 'must be hydrograph or storage (which table the file fills)' }) });

/** POST ?revision=<id>&table=hydrograph|storage with the CSV as the body: its rows for the reservoir step, or every bad line; stores nothing. */
export const POST = authorizedRoute(['designer'], async (request, user) => {
  const revisionId = revisionIdParam(request);
  const { table } = queryOrThrow(tableQuery, request);
  const bytes = await readUploadBody(request, ROUTING_CSV_LIMIT_BYTES, table === 'hydrograph' ? 'a hydrograph CSV' : 'a storage CSV');
  return Response.json(await previewRoutingCsv({ revisionId, table, bytes, user }));
});
