import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Parcel, ParcelRegister, database } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';
import { type ParcelRecord, parcelRecord } from './parcel-record';
import { requireSchemeLiaisonAccess } from './scheme-liaison-access';

/** A scheme's parcels register, the latest version unless one is asked for, checked against who may see owner details. */
export async function loadParcelRegister({ user, schemeId, version }: { user: SessionUser; schemeId: string; version?: number }) {
  const { scheme, access } = await requireSchemeLiaisonAccess({ user, schemeId });
  database();
  const latest = await ParcelRegister.findOne({ where: { schemeId }, order: [['version', 'DESC']] });
  const register = version === undefined ? latest : await ParcelRegister.findOne({ where: { schemeId, version } });
  if (version !== undefined && !register) throw new NotFoundError(`The register has no version ${version}.`);
  const parcels: ParcelRecord[] = register
    ? (await Parcel.findAll({ where: { registerId: register.id }, order: [['distanceFromM', 'ASC'], ['reference', 'ASC']] })).map(parcelRecord)
    : [];
  return {
    scheme: { id: scheme.id, reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site },
    access,
    register: register ? { id: register.id, version: register.version, note: register.note, createdAt: register.createdAt, isLatest: register.id === latest?.id } : null,
    parcels,
  };
}
export type LoadedParcelRegister = Awaited<ReturnType<typeof loadParcelRegister>>;
