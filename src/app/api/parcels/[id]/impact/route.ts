import { z } from 'zod';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { idQuery, queryOrThrow } from '@/lib/http/query-params';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';

const revisionQuery = z.object({ revision: idQuery('the revision').optional() });

/** GET ?revision=<id>: how each parcel is affected in every event of that revision (default: latest countersigned, else latest draft). */
export const GET = authorizedRoute<{ id: string }>(LIAISON_READERS, async (request, user, { id }) => {
  const { revision } = queryOrThrow(revisionQuery, request);
  return Response.json(await computeParcelImpact({ user, schemeId: id, revisionId: revision ?? null }));
});
