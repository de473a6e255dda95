import { authorizedRoute } from '@/lib/http/authorized-route';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';

/** GET ?revision=<id>: how each parcel is affected in every event of that revision (default: latest countersigned, else latest draft). */
export const GET = authorizedRoute<{ id: string }>(LIAISON_READERS, async (request, user, { id }) => {
  const revisionId = new URL(request.url).searchParams.get('revision');
  return Response.json(await computeParcelImpact({ user, schemeId: id, revisionId: revisionId && revisionId.length <= 64 ? revisionId : null }));
});
