import { authorizedRoute } from '@/lib/http/authorized-route';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';
import { loadParcelRegister } from '@/lib/parcels/load-parcel-register';

/** GET: the scheme's parcels register with owner details (personal data), latest version or ?version=N. */
export const GET = authorizedRoute<{ id: string }>(LIAISON_READERS, async (request, user, { id }) => {
  const raw = new URL(request.url).searchParams.get('version');
  const version = raw && /^\d{1,6}$/.test(raw) ? Number(raw) : undefined;
  return Response.json(await loadParcelRegister({ user, schemeId: id, version }));
});
