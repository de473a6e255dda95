import { z } from 'zod';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { numberFromOneQuery, queryOrThrow } from '@/lib/http/query-params';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';
import { loadParcelRegister } from '@/lib/parcels/load-parcel-register';

const versionQuery = z.object({ version: numberFromOneQuery('the register version').optional() });

/** GET: the scheme's parcels register with owner details (personal data), latest version or ?version=N. */
export const GET = authorizedRoute<{ id: string }>(LIAISON_READERS, async (request, user, { id }) => {
  const { version } = queryOrThrow(versionQuery, request);
  return Response.json(await loadParcelRegister({ user, schemeId: id, version }));
});
