import 'server-only';
import { unstable_rethrow } from 'next/navigation';
import type { z } from 'zod';
import { requireRole } from '@/lib/auth/authorize';
import type { SessionUser } from '@/lib/auth/current-session';
import type { Role } from '@/lib/auth/roles';
import { engineIssueInWords } from '@/lib/case-words/case-issue-words';
import { EngineError } from '@/lib/hydraulics/errors';
import { AppError, InvalidRequestError, UnprocessableError } from '@/lib/http/app-errors';
import { fieldIssuesFromZod } from '@/lib/http/zod-issues';
import { safeParseUntrusted } from '@/lib/validation/safe-parse-untrusted';
import type { ActionResult } from './action-result';

interface ActionOptions<S extends z.ZodType> {
  /** Roles allowed to call the action; checked on the server before the input is even parsed. */
  roles: readonly Role[];
  schema: S;
}

/** Wraps a server action so it cannot forget the session, the role or the shared schema. */
export function authorizedAction<S extends z.ZodType, T>(options: ActionOptions<S>, run: (input: z.infer<S>, user: SessionUser) => Promise<T>) {
  return async (raw: unknown): Promise<ActionResult<T>> => {
    try {
      const user = await requireRole(options.roles);
      return { ok: true, data: await run(parseInput(options.schema, raw), user) };
    } catch (error) {
      return actionFailure(error);
    }
  };
}

/** For the few actions anyone may call (signing in, accepting an invitation). */
export function publicAction<S extends z.ZodType, T>(schema: S, run: (input: z.infer<S>) => Promise<T>) {
  return async (raw: unknown): Promise<ActionResult<T>> => {
    try {
      return { ok: true, data: await run(parseInput(schema, raw)) };
    } catch (error) {
      return actionFailure(error);
    }
  };
}

function parseInput<S extends z.ZodType>(schema: S, raw: unknown): z.infer<S> {
  const parsed = safeParseUntrusted(schema, raw);
  if (!parsed.success) throw new InvalidRequestError(fieldIssuesFromZod(parsed.error));
  return parsed.data;
}

function actionFailure(error: unknown): ActionResult<never> {
  unstable_rethrow(error);
  if (error instanceof InvalidRequestError || error instanceof UnprocessableError) return { ok: false, status: error.status, error: error.message, issues: error.issues };
  if (error instanceof AppError) return { ok: false, status: error.status, error: error.message, issues: [] };
  if (error instanceof EngineError) {
    const issue = engineIssueInWords(error);
    return { ok: false, status: error.code === 'invalid-input' ? 400 : 422, error: issue.message, issues: [issue] };
  }
  console.error('Unexpected error in a server action', error);
  return { ok: false, status: 500, error: 'Something went wrong on the server. The problem has been logged.', issues: [] };
}
