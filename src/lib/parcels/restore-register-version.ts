import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Parcel, ParcelRegister, database } from '@/lib/db';
import { ConflictError, NotFoundError, UnprocessableError } from '@/lib/http/app-errors';
import type { RestoreRegisterInput } from '@/lib/validation/register-schemas';
import { parcelColumns, parcelInputOf, parcelRecord } from './parcel-record';
import { registerChanges } from './register-changes';
import { requireSchemeLiaisonAccess } from './scheme-liaison-access';

/**
 * Restores an earlier register version by saving its parcels as the next version: nothing is deleted or rewritten,
 * so the history keeps every step. Refused with 409 when someone saved a newer version since the page was loaded.
 */
export async function restoreRegisterVersion({ user, input }: { user: SessionUser; input: RestoreRegisterInput }) {
  return database().transaction(async (transaction) => {
    await requireSchemeLiaisonAccess({ user, schemeId: input.schemeId, manage: true, transaction });
    const latest = await ParcelRegister.findOne({ where: { schemeId: input.schemeId }, order: [['version', 'DESC']], transaction });
    const earlier = await ParcelRegister.findOne({ where: { schemeId: input.schemeId, version: input.version }, transaction });
    if (!latest || !earlier) throw new NotFoundError(`The register has no version ${input.version}.`);
    if (latest.id !== input.baseRegisterId) throw new ConflictError(`The register was changed meanwhile (now version ${latest.version}). Reload the history and choose again.`);
    if (earlier.id === latest.id) throw new UnprocessableError(`Version ${input.version} is the current register already; nothing was saved.`);
    const parcelsOf = async (registerId: string) => (await Parcel.findAll({ where: { registerId }, transaction })).map((p) => parcelInputOf(parcelRecord(p)));
    const [restored, current] = await Promise.all([parcelsOf(earlier.id), parcelsOf(latest.id)]);
    const changes = registerChanges(current, restored);
    if (!changes.added.length && !changes.removed.length && !changes.changed.length) throw new UnprocessableError(`Version ${input.version} holds the same parcels as the current register; nothing was saved.`);

    const version = latest.version + 1;
    const register = await ParcelRegister.create({ id: randomUUID(), schemeId: input.schemeId, version, uploadId: null, restoredFromVersion: earlier.version, createdBy: user.id, note: input.note || `Restored from version ${earlier.version}` }, { transaction });
    await Parcel.bulkCreate(restored.map((p) => ({ id: randomUUID(), registerId: register.id, schemeId: input.schemeId, ...parcelColumns(p) })), { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'parcels.register-restored', entityType: 'parcel_register', entityId: register.id, schemeId: input.schemeId, details: { version, restoredVersion: earlier.version, ...changes } }, transaction);
    return { registerId: register.id, version, restoredVersion: earlier.version, ...changes };
  });
}
