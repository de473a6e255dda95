import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { readJsonBody } from '@/lib/http/read-json-body';
import { inviteUser } from '@/lib/users/invite-user';
import { listUsers } from '@/lib/users/list-users';
import { inviteUserSchema } from '@/lib/validation/auth-schemas';

export const GET = authorizedRoute(['admin'], async () => Response.json({ users: await listUsers() }));

export const POST = authorizedRoute(['admin'], async (request, admin) => {
  const input = await readJsonBody(request, inviteUserSchema);
  return Response.json(await inviteUser({ input, admin, baseUrl: portalBaseUrl() }), { status: 201 });
});
