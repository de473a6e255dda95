import 'server-only';
import { requireRole } from '@/lib/auth/authorize';
import type { SessionUser } from '@/lib/auth/current-session';
import type { Role } from '@/lib/auth/roles';
import { toHttpResponse } from './to-http-response';

type RouteContext<P> = { params: Promise<P> };

/** Wraps a route handler: session and role are checked on the server first; domain errors map to their status. */
export function authorizedRoute<P = Record<string, string>>(roles: readonly Role[], handle: (request: Request, user: SessionUser, params: P) => Promise<Response>) {
  return async (request: Request, context: RouteContext<P>): Promise<Response> => {
    try {
      const user = await requireRole(roles);
      return await handle(request, user, await context.params);
    } catch (error) {
      return toHttpResponse(error);
    }
  };
}
