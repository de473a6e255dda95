import 'server-only';
import { engineIssueInWords } from '@/lib/case-words/case-issue-words';
import { EngineError } from '@/lib/hydraulics/errors';
import { AppError, InvalidRequestError, ThrottledError, UnprocessableError } from './app-errors';

/** The one place domain and engine errors become JSON responses; anything unexpected is a logged 500 with no detail. */
export function toHttpResponse(error: unknown): Response {
  if (error instanceof InvalidRequestError || error instanceof UnprocessableError) {
    return Response.json({ error: error.message, issues: error.issues }, { status: error.status });
  }
  if (error instanceof ThrottledError && error.retryAfterSeconds !== undefined) {
    return Response.json({ error: error.message }, { status: error.status, headers: { 'Retry-After': String(error.retryAfterSeconds) } });
  }
  if (error instanceof AppError) return Response.json({ error: error.message }, { status: error.status });
  if (error instanceof EngineError) {
    const status = error.code === 'invalid-input' ? 400 : 422;
    const issue = engineIssueInWords(error);
    return Response.json({ error: issue.message, code: error.code, issues: [issue] }, { status });
  }
  console.error('Unexpected error in a route handler', error);
  return Response.json({ error: 'Something went wrong on the server. The problem has been logged.' }, { status: 500 });
}
