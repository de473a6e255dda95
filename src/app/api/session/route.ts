import { ANY_ROLE } from '@/lib/auth/authorize';
import { authorizedRoute } from '@/lib/http/authorized-route';

export const GET = authorizedRoute(ANY_ROLE, async (_request, user) => Response.json({ user: { id: user.id, email: user.email, name: user.name, role: user.role } }));
