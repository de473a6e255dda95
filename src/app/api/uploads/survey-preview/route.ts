import { authorizedRoute } from '@/lib/http/authorized-route';
import { previewSurvey } from '@/lib/revisions/attach-survey';
import { revisionIdParam } from '@/lib/uploads/revision-id-param';
import { readUploadBody } from '@/lib/uploads/read-upload-body';
import { UPLOAD_LIMIT_BYTES } from '@/lib/uploads/upload-limits';

/** POST ?revision=<id> with the CSV as the body: the parsed cross-sections, or every bad line; stores nothing. */
export const POST = authorizedRoute(['designer'], async (request, user) => {
  const revisionId = revisionIdParam(request);
  const bytes = await readUploadBody(request, UPLOAD_LIMIT_BYTES['survey-csv'], 'a survey CSV');
  return Response.json(await previewSurvey({ revisionId, bytes, user }));
});
