import { authorizedRoute } from '@/lib/http/authorized-route';
import { importSchemeCase } from '@/lib/schemes/import-scheme-case';
import { readUploadBody, uploadedFileName } from '@/lib/uploads/read-upload-body';
import { UPLOAD_LIMIT_BYTES } from '@/lib/uploads/upload-limits';

/** POST the case file's bytes as the body (X-File-Name: its name); a new scheme and draft are made from it. */
export const POST = authorizedRoute(['designer'], async (request, designer) => {
  const bytes = await readUploadBody(request, UPLOAD_LIMIT_BYTES['case-json'], 'a case file');
  return Response.json(await importSchemeCase({ bytes, originalName: uploadedFileName(request, 'case.json'), designer }), { status: 201 });
});
