import { ANY_ROLE } from '@/lib/auth/authorize';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { loadScheme } from '@/lib/schemes/load-scheme';

export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (_request, user, { id }) => Response.json(await loadScheme({ schemeId: id, user })));
