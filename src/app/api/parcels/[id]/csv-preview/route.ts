import { authorizedRoute } from '@/lib/http/authorized-route';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { previewParcelsCsv } from '@/lib/parcels/preview-parcels-csv';
import { readUploadBody } from '@/lib/uploads/read-upload-body';
import { UPLOAD_LIMIT_BYTES } from '@/lib/uploads/upload-limits';

/** POST the parcels CSV as the body: its rows with every line-numbered problem; stores nothing. */
export const POST = authorizedRoute<{ id: string }>(LIAISON_MANAGERS, async (request, user, { id }) => {
  const bytes = await readUploadBody(request, UPLOAD_LIMIT_BYTES['parcels-csv'], 'a parcels CSV');
  return Response.json(await previewParcelsCsv({ user, schemeId: id, bytes }));
});
