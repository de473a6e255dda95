import 'server-only';
import { ParcelPlan, database } from '@/lib/db';
import { UnprocessableError } from '@/lib/http/app-errors';
import { type PlanGeometry, planGeometrySchema } from '@/lib/validation/plan-schemas';

export interface StoredPlan {
  version: number;
  coordinateSystem: string;
  sourceFormat: 'geojson' | 'csv';
  originalName: string;
  createdAt: string;
  geometry: PlanGeometry;
}

/** The latest plan of a scheme's parcels, or null when none was uploaded. The caller has checked access. */
export async function loadParcelPlan(schemeId: string): Promise<StoredPlan | null> {
  database();
  const row = await ParcelPlan.findOne({ where: { schemeId }, order: [['version', 'DESC']] });
  if (!row) return null;
  const geometry = planGeometrySchema.safeParse(JSON.parse(row.geometryJson));
  if (!geometry.success) throw new UnprocessableError(`Plan version ${row.version} is stored in a shape the portal cannot read.`);
  return { version: row.version, coordinateSystem: row.coordinateSystem, sourceFormat: row.sourceFormat, originalName: row.originalName, createdAt: row.createdAt, geometry: geometry.data };
}
