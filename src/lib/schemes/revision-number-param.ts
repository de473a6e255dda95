import { z } from 'zod';
import { numberFromOneQuery, queryOrThrow } from '@/lib/http/query-params';

const query = z.object({ revision: z.union([z.literal('').transform(() => undefined), numberFromOneQuery('the revision number: 1, 2, …')]).optional() });

/** `?revision=N` of a scheme URL: a revision number, or null for the latest. */
export function revisionNumberParam(request: Request): number | null {
  return queryOrThrow(query, request).revision ?? null;
}
