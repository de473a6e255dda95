import { authorizedRoute } from '@/lib/http/authorized-route';
import { attachSurvey } from '@/lib/revisions/attach-survey';
import { revisionIdParam } from '@/lib/uploads/revision-id-param';
import { readUploadBody, uploadedFileName } from '@/lib/uploads/read-upload-body';
import { UPLOAD_LIMIT_BYTES } from '@/lib/uploads/upload-limits';

/** POST ?revision=<id> with the CSV as the body (X-File-Name: its name): stores it and makes it the draft's reach. */
export const POST = authorizedRoute(['designer'], async (request, user) => {
  const revisionId = revisionIdParam(request);
  const bytes = await readUploadBody(request, UPLOAD_LIMIT_BYTES['survey-csv'], 'a survey CSV');
  return Response.json(await attachSurvey({ revisionId, bytes, originalName: uploadedFileName(request, 'survey.csv'), user }), { status: 201 });
});
