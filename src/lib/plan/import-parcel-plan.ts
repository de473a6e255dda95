import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Parcel, ParcelPlan, ParcelRegister, database } from '@/lib/db';
import { InvalidRequestError, UnprocessableError } from '@/lib/http/app-errors';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import { textOfUpload } from '@/lib/uploads/sniff-upload';
import { coordinateSystemSchema } from '@/lib/validation/plan-schemas';
import { unknownParcelIssues } from './check-plan-geometry';
import { parsePlanCsv } from './outlines-csv';
import { parsePlanGeoJson } from './outlines-geojson';
import { planRefusal } from './plan-refusal';
import { withStoredPlanFile } from './store-plan-file';

export type PlanFormat = 'geojson' | 'csv';

function checkedCoordinateSystem(value: string): string {
  const parsed = coordinateSystemSchema.safeParse(value);
  if (parsed.success) return parsed.data;
  throw new InvalidRequestError([{ path: 'coordinateSystem', label: 'Coordinate system', message: parsed.error.issues[0].message }], `Coordinate system: ${parsed.error.issues[0].message}. Nothing was stored.`);
}

/**
 * Stores a checked plan file (parcel outlines and the river centreline) as the scheme's next plan version: the file
 * in the plans folder, its row with the checked geometry, and the audit event, in one transaction. Every outline must
 * belong to a parcel of the current register; a file with any problem stores nothing.
 */
export async function importParcelPlan({ user, schemeId, bytes, originalName, format, coordinateSystem }: { user: SessionUser; schemeId: string; bytes: Buffer; originalName: string; format: PlanFormat; coordinateSystem: string }) {
  await requireSchemeLiaisonAccess({ user, schemeId, manage: true });
  const text = textOfUpload(bytes, format === 'csv' ? 'a CSV of outline vertices' : 'a GeoJSON plan file');
  const parsed = format === 'csv' ? parsePlanCsv(text) : parsePlanGeoJson(text);
  if (!parsed.ok) throw planRefusal(parsed.issues);
  const system = checkedCoordinateSystem(coordinateSystem);
  const place = (n: number) => `${format === 'csv' ? 'line' : 'feature'} ${n}`;
  return withStoredPlanFile(bytes, format, ({ storedName, sha256 }) =>
    database().transaction(async (transaction) => {
      await requireSchemeLiaisonAccess({ user, schemeId, manage: true, transaction });
      const register = await ParcelRegister.findOne({ where: { schemeId }, order: [['version', 'DESC']], transaction });
      if (!register) throw new UnprocessableError('Upload the parcels register first: the outlines are matched to its parcels by reference. Nothing was stored.');
      const references = (await Parcel.findAll({ where: { registerId: register.id }, attributes: ['reference'], transaction })).map((p) => p.reference);
      const unknown = unknownParcelIssues(parsed.plan, references, place, register.version);
      if (unknown.length) throw planRefusal(unknown);
      const version = ((await ParcelPlan.max<number, ParcelPlan>('version', { where: { schemeId }, transaction })) ?? 0) + 1;
      const plan = await ParcelPlan.create({ id: randomUUID(), schemeId, version, coordinateSystem: system, geometryJson: JSON.stringify(parsed.plan), sourceFormat: format, originalName, storedName, sha256, createdBy: user.id }, { transaction });
      const outlines = parsed.plan.outlines.length;
      await recordAuditEvent({ actorId: user.id, action: 'parcels.plan-imported', entityType: 'parcel_plan', entityId: plan.id, schemeId, details: { version, outlines, file: originalName, sha256, registerVersion: register.version } }, transaction);
      return { planId: plan.id, version, outlines, withoutOutline: references.filter((r) => !parsed.plan.outlines.some((o) => o.reference.toLowerCase() === r.toLowerCase())) };
    }),
  );
}
