import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Parcel, ParcelRegister } from '@/lib/db';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { withStoredUpload } from '@/lib/uploads/store-upload';
import { textOfUpload } from '@/lib/uploads/sniff-upload';
import { parcelColumns } from './parcel-record';
import { type CsvIssue, formatCsvIssue, parseParcelsCsv } from './parcels-csv';
import { requireSchemeLiaisonAccess } from './scheme-liaison-access';

/** A refused CSV: every issue at its line, for the upload page to list. */
export function csvRefusal(issues: CsvIssue[]): InvalidRequestError {
  const count = issues.length;
  return new InvalidRequestError(
    issues.map((i) => ({ path: `line ${i.line}${i.column ? `, ${i.column}` : ''}`, message: formatCsvIssue(i) })),
    `The parcels CSV has ${count} problem${count === 1 ? '' : 's'}; nothing was stored.`,
  );
}

/**
 * Stores a checked parcels CSV as the scheme's next register version: the file (under the data directory, by a name
 * of ours), its upload record, the register, every parcel and the audit event, in one transaction. A CSV with any
 * problem stores nothing.
 */
export async function importParcelRegister({ user, schemeId, bytes, originalName }: { user: SessionUser; schemeId: string; bytes: Buffer; originalName: string }) {
  await requireSchemeLiaisonAccess({ user, schemeId, manage: true });
  const parsed = parseParcelsCsv(textOfUpload(bytes, 'a parcels CSV file'));
  if (!parsed.ok) throw csvRefusal(parsed.issues);
  return withStoredUpload(bytes, { kind: 'parcels-csv', originalName, mediaType: 'text/csv', schemeId, uploadedBy: user.id }, async (transaction, record) => {
    await requireSchemeLiaisonAccess({ user, schemeId, manage: true, transaction });
    const upload = await record();
    const version = ((await ParcelRegister.max<number, ParcelRegister>('version', { where: { schemeId }, transaction })) ?? 0) + 1;
    const register = await ParcelRegister.create({ id: randomUUID(), schemeId, version, uploadId: upload.id, createdBy: user.id, note: `Imported from ${originalName}` }, { transaction });
    const parcels = parsed.rows.map((row) => ({ id: randomUUID(), registerId: register.id, schemeId, ...parcelColumns(row.parcel!) }));
    await Parcel.bulkCreate(parcels, { transaction });
    await recordAuditEvent(
      { actorId: user.id, action: 'parcels.register-imported', entityType: 'parcel_register', entityId: register.id, schemeId, details: { version, parcels: parcels.length, uploadId: upload.id, sha256: upload.sha256, file: originalName } },
      transaction,
    );
    return { registerId: register.id, version, parcels: parcels.length };
  });
}
