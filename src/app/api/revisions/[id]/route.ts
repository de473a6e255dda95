import { ANY_ROLE } from '@/lib/auth/authorize';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { readJsonBody } from '@/lib/http/read-json-body';
import { loadDraft } from '@/lib/revisions/load-draft';
import { saveDraft } from '@/lib/revisions/save-draft';
import { saveStepRequestSchema } from '@/lib/validation/scheme-schemas';

export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (_request, user, { id }) => Response.json(await loadDraft({ revisionId: id, user })));

/** PUT { step, values }: one wizard step, checked with that step's schema; 409 when the revision is no longer a draft. */
export const PUT = authorizedRoute<{ id: string }>(['designer'], async (request, user, { id }) => {
  const body = await readJsonBody(request, saveStepRequestSchema);
  return Response.json(await saveDraft({ revisionId: id, request: body, user }));
});
