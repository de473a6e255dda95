import { InvalidRequestError } from '@/lib/http/app-errors';

/** `?revision=N` of a scheme URL: a revision number, or null for the latest. */
export function revisionNumberParam(request: Request): number | null {
  const raw = new URL(request.url).searchParams.get('revision');
  if (raw === null || raw === '') return null;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1) throw new InvalidRequestError([{ path: 'revision', message: 'must be a revision number (1, 2, …)' }]);
  return n;
}
