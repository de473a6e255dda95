import { z } from 'zod';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { readJsonBody } from '@/lib/http/read-json-body';
import { changeUserRole } from '@/lib/users/change-user-role';
import { roleSchema } from '@/lib/validation/auth-schemas';

const bodySchema = z.object({ role: roleSchema });

export const PATCH = authorizedRoute<{ id: string }>(['admin'], async (request, admin, { id }) => {
  const { role } = await readJsonBody(request, bodySchema);
  return Response.json(await changeUserRole({ input: { userId: id, role }, admin }));
});
