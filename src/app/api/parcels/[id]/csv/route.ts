import { authorizedRoute } from '@/lib/http/authorized-route';
import { importParcelRegister } from '@/lib/parcels/import-parcel-register';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { readUploadBody, uploadedFileName } from '@/lib/uploads/read-upload-body';
import { UPLOAD_LIMIT_BYTES } from '@/lib/uploads/upload-limits';

/** POST the parcels CSV as the body (X-File-Name: its name): stores it as the scheme's next register version. */
export const POST = authorizedRoute<{ id: string }>(LIAISON_MANAGERS, async (request, user, { id }) => {
  const bytes = await readUploadBody(request, UPLOAD_LIMIT_BYTES['parcels-csv'], 'a parcels CSV');
  return Response.json(await importParcelRegister({ user, schemeId: id, bytes, originalName: uploadedFileName(request, 'parcels.csv') }), { status: 201 });
});
