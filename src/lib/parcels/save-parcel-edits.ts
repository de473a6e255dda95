import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Parcel, ParcelRegister, database } from '@/lib/db';
import { ConflictError, NotFoundError, UnprocessableError } from '@/lib/http/app-errors';
import type { SaveParcelsInput } from '@/lib/validation/parcel-schemas';
import { parcelColumns, parcelInputOf, parcelRecord } from './parcel-record';
import { registerChanges } from './register-changes';
import { requireSchemeLiaisonAccess } from './scheme-liaison-access';

/**
 * Saves the edited table as the scheme's next register version; earlier versions stay untouched for the history.
 * Refused with 409 when someone saved a newer version since the editor loaded its base.
 */
export async function saveParcelEdits({ user, input }: { user: SessionUser; input: SaveParcelsInput }) {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    await requireSchemeLiaisonAccess({ user, schemeId: input.schemeId, manage: true, transaction });
    const latest = await ParcelRegister.findOne({ where: { schemeId: input.schemeId }, order: [['version', 'DESC']], transaction });
    if (!latest) throw new NotFoundError('This scheme has no parcels register yet; upload a CSV first.');
    if (latest.id !== input.baseRegisterId) throw new ConflictError(`The register was changed meanwhile (now version ${latest.version}). Reload the page and make your edits again.`);
    const before = (await Parcel.findAll({ where: { registerId: latest.id }, transaction })).map((p) => parcelInputOf(parcelRecord(p)));
    const changes = registerChanges(before, input.parcels);
    if (!changes.added.length && !changes.removed.length && !changes.changed.length) throw new UnprocessableError('Nothing was changed, so no new version was saved.');

    const version = latest.version + 1;
    const register = await ParcelRegister.create({ id: randomUUID(), schemeId: input.schemeId, version, uploadId: null, createdBy: user.id, note: input.note || 'Edited in the table' }, { transaction });
    await Parcel.bulkCreate(input.parcels.map((p) => ({ id: randomUUID(), registerId: register.id, schemeId: input.schemeId, ...parcelColumns(p) })), { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'parcels.register-edited', entityType: 'parcel_register', entityId: register.id, schemeId: input.schemeId, details: { version, ...changes } }, transaction);
    return { registerId: register.id, version, ...changes };
  });
}
