import { listCertificates } from '@/lib/certificates/list-certificates';
import { REGISTER_ROLES } from '@/lib/certificates/register-roles';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { fieldIssuesFromZod } from '@/lib/http/zod-issues';
import { certificateRegisterQuerySchema } from '@/lib/validation/certificate-schemas';

// The certificate register as JSON, with the same search, sort and paging as the register page.
export const GET = authorizedRoute(REGISTER_ROLES, async (request) => {
  const parsed = certificateRegisterQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!parsed.success) throw new InvalidRequestError(fieldIssuesFromZod(parsed.error));
  return Response.json(await listCertificates(parsed.data));
});
