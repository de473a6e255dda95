import { InvalidRequestError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { type PlanFormat, importParcelPlan } from '@/lib/plan/import-parcel-plan';
import { readUploadBody, uploadedFileName } from '@/lib/uploads/read-upload-body';
import { MAX_PLAN_FILE_BYTES } from '@/lib/validation/input-limits';

function formatOf(request: Request): PlanFormat {
  const type = (request.headers.get('content-type') ?? '').toLowerCase();
  if (type.includes('csv')) return 'csv';
  if (type.includes('json')) return 'geojson';
  throw new InvalidRequestError([{ path: 'file', label: 'Plan file', message: 'must be GeoJSON (.geojson) or a CSV of outline vertices (.csv)' }], 'The plan file must be GeoJSON (.geojson) or a CSV of outline vertices (.csv). Nothing was stored.');
}

function headerText(request: Request, name: string): string {
  const raw = request.headers.get(name) ?? '';
  try {
    return decodeURIComponent(raw);
  } catch {
    return raw;
  }
}

/** POST the plan file as the body (Content-Type GeoJSON or CSV, X-File-Name, X-Coordinate-System): the next plan version. */
export const POST = authorizedRoute<{ id: string }>(LIAISON_MANAGERS, async (request, user, { id }) => {
  const format = formatOf(request);
  const bytes = await readUploadBody(request, MAX_PLAN_FILE_BYTES, 'a plan file');
  const result = await importParcelPlan({ user, schemeId: id, bytes, originalName: uploadedFileName(request, `plan.${format}`), format, coordinateSystem: headerText(request, 'x-coordinate-system') });
  return Response.json(result, { status: 201 });
});
