import { InvalidRequestError } from '@/lib/http/app-errors';

/** `?revision=<id>`: the draft an upload belongs to. */
export function revisionIdParam(request: Request): string {
  const id = new URL(request.url).searchParams.get('revision');
  if (!id || id.length > 64) throw new InvalidRequestError([{ path: 'revision', message: 'is required: the draft revision the survey belongs to' }]);
  return id;
}
