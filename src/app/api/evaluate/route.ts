import { z } from 'zod';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { evaluateCaseJsonOffThread } from '@/lib/engine-pool/engine-pool';
import { caseIssuesInWords } from '@/lib/case-words/case-issue-words';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { readJsonBody } from '@/lib/http/read-json-body';
import { fieldIssuesFromZod } from '@/lib/http/zod-issues';
import { evaluateDraft } from '@/lib/revisions/evaluate-draft';
import { parseCase } from '@/lib/validation/parse-case';
import { evaluateRequestSchema } from '@/lib/validation/scheme-schemas';

const EVALUATED_OPENING = Buffer.from('{"status":"evaluated","result":');
const EVALUATED_CLOSING = Buffer.from('}');
const objectBody = z.record(z.string(), z.unknown(), { error: 'The request body must be a JSON object: a case file, or { "revisionId": … }.' });

/**
 * POST a case file (`"format": "sillmark-case"`): the engine's result, as `npm run evaluate` prints it.
 * POST { revisionId }: the result for a stored draft, or the steps still to complete (422) with field paths.
 */
export const POST = authorizedRoute(ANY_ROLE, async (request, user) => {
  const body = await readJsonBody(request, objectBody);
  if ('format' in body) {
    const parsed = parseCase(body);
    if (!parsed.ok) throw new InvalidRequestError(caseIssuesInWords(parsed.issues, body));
    // The worker's JSON bytes are sent as they are: decoding, parsing or re-serialising them would put the work back
    // on this thread (a string body is also scanned and encoded again on the way out).
    const resultJson = await evaluateCaseJsonOffThread(parsed.value, request.signal);
    return new Response(Buffer.concat([EVALUATED_OPENING, resultJson, EVALUATED_CLOSING]), { headers: { 'content-type': 'application/json' } });
  }
  const draftRequest = evaluateRequestSchema.safeParse(body);
  if (!draftRequest.success) throw new InvalidRequestError(fieldIssuesFromZod(draftRequest.error));
  const { revisionId } = draftRequest.data;
  const evaluation = await evaluateDraft({ revisionId, user });
  if (evaluation.status === 'evaluated') return Response.json({ status: 'evaluated', input: evaluation.input, result: evaluation.result });
  const error = evaluation.status === 'incomplete' ? 'The draft is not complete yet.' : evaluation.error;
  return Response.json({ status: evaluation.status, error, issues: evaluation.issues }, { status: 422 });
});
