import { z } from 'zod';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { idQuery, queryOrThrow } from '@/lib/http/query-params';

const query = z.object({ revision: idQuery('the draft revision the survey belongs to').optional() });

/** `?revision=<id>`: the draft an upload belongs to. */
export function revisionIdParam(request: Request): string {
  const { revision } = queryOrThrow(query, request);
  if (!revision) throw new InvalidRequestError([{ path: 'revision', message: 'is required: the draft revision the survey belongs to' }]);
  return revision;
}
