import { authorizedRoute } from '@/lib/http/authorized-route';
import { readJsonBody } from '@/lib/http/read-json-body';
import { previewHead } from '@/lib/revisions/preview-head';
import { headPreviewRequestSchema } from '@/lib/validation/scheme-schemas';

/** POST { revisionId, control, existingControl? }: head over the crest and control depth per event, computed by the engine. */
export const POST = authorizedRoute(['designer'], async (request, user) => {
  const body = await readJsonBody(request, headPreviewRequestSchema);
  return Response.json(await previewHead({ request: body, user }));
});
