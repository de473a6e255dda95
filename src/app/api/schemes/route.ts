import { ANY_ROLE } from '@/lib/auth/authorize';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { readJsonBody } from '@/lib/http/read-json-body';
import { createScheme } from '@/lib/schemes/create-scheme';
import { listSchemes } from '@/lib/schemes/list-schemes';
import { newSchemeSchema } from '@/lib/validation/scheme-schemas';

export const GET = authorizedRoute(ANY_ROLE, async (_request, user) => Response.json({ schemes: await listSchemes(user) }));

export const POST = authorizedRoute(['designer'], async (request, designer) => {
  const input = await readJsonBody(request, newSchemeSchema);
  return Response.json(await createScheme({ input, designer }), { status: 201 });
});
