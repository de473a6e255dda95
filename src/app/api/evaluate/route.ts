import { ANY_ROLE } from '@/lib/auth/authorize';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { readJsonBody } from '@/lib/http/read-json-body';
import { evaluateDraft } from '@/lib/revisions/evaluate-draft';
import { evaluateRequestSchema } from '@/lib/validation/scheme-schemas';

/** POST { revisionId }: the engine's result for the revision, or the steps still to complete (422) with field paths. */
export const POST = authorizedRoute(ANY_ROLE, async (request, user) => {
  const { revisionId } = await readJsonBody(request, evaluateRequestSchema);
  const evaluation = await evaluateDraft({ revisionId, user });
  if (evaluation.status === 'evaluated') return Response.json({ status: 'evaluated', input: evaluation.input, result: evaluation.result });
  const error = evaluation.status === 'incomplete' ? 'The draft is not complete yet.' : evaluation.error;
  return Response.json({ status: evaluation.status, error, issues: evaluation.issues }, { status: 422 });
});
