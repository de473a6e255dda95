import { listCertificates } from '@/lib/certificates/list-certificates';
import { REGISTER_ROLES } from '@/lib/certificates/register-roles';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { queryOrThrow } from '@/lib/http/query-params';
import { certificateRegisterQuerySchema } from '@/lib/validation/certificate-schemas';

// The certificate register as JSON, with the same search, sort and paging as the register page.
export const GET = authorizedRoute(REGISTER_ROLES, async (request) => {
  return Response.json(await listCertificates(queryOrThrow(certificateRegisterQuerySchema, request)));
});
