import type { z } from 'zod';
import { excerpt } from '@/lib/case-words/excerpt';
import { type PlanGeometry, centrelineFeatureSchema, featureCollectionSchema, outlineFeatureSchema } from '@/lib/validation/plan-schemas';
import { planGeometryIssues, withOpenRings } from './check-plan-geometry';
import { type PlanIssue, geoJsonFieldWords } from './plan-issues';

// A plan as GeoJSON (RFC 7946 shapes, coordinates in the stated projected system rather than degrees): a
// FeatureCollection of Polygon or MultiPolygon features, each with properties.parcel_reference, and one LineString
// with properties.centreline = true (and chainage_start_m, default 0) drawn from the structure upstream.

export type ParsedPlan = { ok: true; plan: PlanGeometry } | { ok: false; issues: PlanIssue[] };

const featureAt = (n: number) => `feature ${n}`;

function zodIssues(place: string, error: z.ZodError, geometryType: string | null): PlanIssue[] {
  return error.issues.slice(0, 5).map((i) => ({ place, field: geoJsonFieldWords(i.path, geometryType), message: i.message }));
}

function isCentreline(feature: unknown): boolean {
  const properties = (feature as { properties?: { centreline?: unknown } } | null)?.properties;
  return typeof properties === 'object' && properties !== null && properties.centreline === true;
}

function geometryTypeOf(feature: unknown): string | null {
  const type = (feature as { geometry?: { type?: unknown } } | null)?.geometry?.type;
  return typeof type === 'string' ? type : null;
}

function parseJson(text: string): { value: unknown } | { issue: PlanIssue } {
  try {
    return { value: JSON.parse(text) };
  } catch (error) {
    return { issue: { place: 'the file', field: null, message: `is not valid JSON (${excerpt((error as Error).message, 80)})` } };
  }
}

/** Reads and checks the GeoJSON text; every problem names its feature (counted from 1) and field. */
export function parsePlanGeoJson(text: string): ParsedPlan {
  const json = parseJson(text);
  if ('issue' in json) return { ok: false, issues: [json.issue] };
  const collection = featureCollectionSchema.safeParse(json.value);
  if (!collection.success) return { ok: false, issues: collection.error.issues.map((i) => ({ place: 'the file', field: geoJsonFieldWords(i.path, null), message: i.message })) };

  const issues: PlanIssue[] = [];
  const outlines: PlanGeometry['outlines'] = [];
  const centrelines: { feature: number; value: z.infer<typeof centrelineFeatureSchema> }[] = [];
  collection.data.features.forEach((feature, i) => {
    const n = i + 1;
    const schema = isCentreline(feature) ? centrelineFeatureSchema : outlineFeatureSchema;
    const parsed = schema.safeParse(feature);
    if (!parsed.success) return issues.push(...zodIssues(featureAt(n), parsed.error, geometryTypeOf(feature)));
    if ('centreline' in parsed.data.properties) centrelines.push({ feature: n, value: parsed.data as z.infer<typeof centrelineFeatureSchema> });
    else {
      const outline = parsed.data as z.infer<typeof outlineFeatureSchema>;
      outlines.push({ reference: outline.properties.parcel_reference, source: n, polygons: outline.geometry });
    }
  });
  if (centrelines.length === 0 && !collection.data.features.some(isCentreline)) issues.push({ place: 'the file', field: 'centreline', message: 'is missing: add one LineString feature with "centreline": true in its properties, drawn from the structure upstream' });
  if (centrelines.length > 1) issues.push({ place: featureAt(centrelines[1].feature), field: 'centreline', message: `is a second centreline (the first is ${featureAt(centrelines[0].feature)}): give one` });
  if (issues.length) return { ok: false, issues };

  const line = centrelines[0].value;
  const plan = withOpenRings({ outlines, centreline: { chainageStartM: line.properties.chainage_start_m ?? 0, points: line.geometry.coordinates } });
  const geometry = planGeometryIssues(plan, featureAt);
  return geometry.length ? { ok: false, issues: geometry } : { ok: true, plan };
}
