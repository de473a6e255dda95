import { ANY_ROLE } from '@/lib/auth/authorize';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { listSchemes } from '@/lib/schemes/list-schemes';

export const GET = authorizedRoute(ANY_ROLE, async (_request, user) => Response.json({ schemes: await listSchemes(user) }));
