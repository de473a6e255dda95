import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Parcel, ParcelRegister, Upload, User, database } from '@/lib/db';
import { parcelInputOf, parcelRecord } from './parcel-record';
import { type ParcelFieldChanges, type RegisterChanges, changedFields, registerChanges } from './register-changes';
import { requireSchemeLiaisonAccess } from './scheme-liaison-access';

export interface RegisterVersion {
  id: string;
  version: number;
  createdAt: string;
  createdBy: string;
  note: string | null;
  source: string;
  parcelCount: number;
  changes: RegisterChanges;
  /** Which fields of each changed parcel differ from the version before. */
  fieldChanges: ParcelFieldChanges[];
  isLatest: boolean;
}

/** Every version of a scheme's register, newest first, with what each changed against the one before. */
export async function listRegisterHistory({ user, schemeId }: { user: SessionUser; schemeId: string }): Promise<RegisterVersion[]> {
  await requireSchemeLiaisonAccess({ user, schemeId });
  database();
  const registers = await ParcelRegister.findAll({ where: { schemeId }, order: [['version', 'ASC']] });
  const parcels = await Parcel.findAll({ where: { registerId: registers.map((r) => r.id) } });
  const uploads = new Map((await Upload.findAll({ where: { id: registers.map((r) => r.uploadId).filter((id): id is string => !!id) } })).map((u) => [u.id, u]));
  const people = new Map((await User.findAll({ where: { id: registers.map((r) => r.createdBy) } })).map((u) => [u.id, u.name]));
  const byRegister = (id: string) => parcels.filter((p) => p.registerId === id).map((p) => parcelInputOf(parcelRecord(p)));
  const versions = registers.map((r, i) => {
    const upload = r.uploadId ? uploads.get(r.uploadId) : undefined;
    const current = byRegister(r.id);
    const previous = i === 0 ? [] : byRegister(registers[i - 1].id);
    return {
      id: r.id,
      version: r.version,
      createdAt: r.createdAt,
      createdBy: people.get(r.createdBy) ?? 'unknown user',
      note: r.note,
      source: upload ? `CSV upload: ${upload.originalName}` : r.restoredFromVersion !== null ? `Restored from version ${r.restoredFromVersion}` : 'Edited in the table',
      parcelCount: current.length,
      changes: registerChanges(previous, current),
      fieldChanges: changedFields(previous, current),
      isLatest: i === registers.length - 1,
    };
  });
  return versions.reverse();
}
