import { z } from 'zod';
import { MAX_CENTRELINE_VERTICES, MAX_OUTLINE_VERTICES, MAX_PLAN_OUTLINES } from './input-limits';
import { singleLineText } from './plain-text';

// The plan of the parcels: outlines and the river centreline in a projected coordinate system (metres). One schema
// for a GeoJSON feature (checked feature by feature so every problem carries its feature number), one for the
// coordinate system the upload form asks for, and one for the plan as stored.

export { MAX_CENTRELINE_VERTICES, MAX_OUTLINE_VERTICES, MAX_PLAN_OUTLINES };
/** Coordinates beyond ±100,000 km are typing errors in any projected system on earth. */
const MAX_COORDINATE = 1e8;

export const coordinateSystemSchema = singleLineText('the coordinate system')
  .min(1, 'is required (the projected coordinate system of the file, e.g. British National Grid, EPSG:27700)')
  .max(120, 'must be at most 120 characters');

const coordinate = (axis: 'easting' | 'northing') =>
  z
    .number({ error: (i) => (i.input === undefined ? `is missing (the ${axis}, m)` : `must be a number of metres (the ${axis})`) })
    .refine(Number.isFinite, { error: `must be a finite number of metres (the ${axis})` })
    .refine((v) => Math.abs(v) <= MAX_COORDINATE, { error: `must be within ±${MAX_COORDINATE} m (the ${axis})` });

/** [easting, northing], a third value (height) allowed and ignored. */
export const positionSchema = z.tuple([coordinate('easting'), coordinate('northing')], z.number()).transform(([x, y]) => [x, y] as [number, number]);
const ringSchema = z.array(positionSchema, { error: 'must be a list of [easting, northing] vertices' }).min(3, 'must have at least 3 vertices');
const polygonSchema = z.array(ringSchema, { error: 'must be a list of rings (the outline, then any holes)' }).min(1, 'must have an outer ring');

const vertexCount = (polygons: [number, number][][][]) => polygons.reduce((n, p) => n + p.reduce((m, r) => m + r.length, 0), 0);

const outlineGeometry = z
  .discriminatedUnion('type', [
    z.object({ type: z.literal('Polygon'), coordinates: polygonSchema }).transform((g) => [g.coordinates]),
    z.object({ type: z.literal('MultiPolygon'), coordinates: z.array(polygonSchema, { error: 'must be a list of polygons' }).min(1, 'must have at least one polygon') }).transform((g) => g.coordinates),
  ], { error: 'must be a Polygon or MultiPolygon (a parcel outline)' })
  .refine((polygons) => vertexCount(polygons) <= MAX_OUTLINE_VERTICES, { error: `must have at most ${MAX_OUTLINE_VERTICES} vertices in one parcel outline` });

const REFERENCE_MISSING = 'is required (the parcel reference, e.g. HM-07)';
export const parcelReferenceSchema = singleLineText('the parcel reference', { missing: REFERENCE_MISSING }).trim().min(1, REFERENCE_MISSING).max(40, 'must be at most 40 characters');

export const outlineFeatureSchema = z.object({
  type: z.literal('Feature', { error: 'must be "Feature"' }),
  properties: z.object({ parcel_reference: parcelReferenceSchema }, { error: 'must be an object with the parcel_reference' }),
  geometry: outlineGeometry,
});

export const chainageStartSchema = z
  .number({ error: 'must be a number of metres (the chainage of the first vertex)' })
  .refine(Number.isFinite, { error: 'must be a finite number of metres (the chainage of the first vertex)' })
  .max(0, { error: 'must be 0 m or less: the centreline starts at or downstream of the structure (chainage 0 m)' })
  .min(-10_000, { error: 'must be at least -10000 m (the chainage of the first vertex)' });

export const centrelineFeatureSchema = z.object({
  type: z.literal('Feature', { error: 'must be "Feature"' }),
  properties: z.object({ centreline: z.literal(true), chainage_start_m: chainageStartSchema.optional() }),
  geometry: z.object({
    type: z.literal('LineString', { error: 'must be a LineString (the river centreline)' }),
    coordinates: z.array(positionSchema, { error: 'must be a list of [easting, northing] vertices' }).min(2, 'must have at least 2 vertices').max(MAX_CENTRELINE_VERTICES, `must have at most ${MAX_CENTRELINE_VERTICES} vertices`),
  }),
});

export const featureCollectionSchema = z.object({
  type: z.literal('FeatureCollection', { error: 'must be "FeatureCollection"' }),
  features: z.array(z.unknown(), { error: 'must be a list of features' }).min(1, 'must hold the parcel outlines and the centreline').max(MAX_PLAN_OUTLINES + 1, `must hold at most ${MAX_PLAN_OUTLINES} outlines and the centreline`),
});

const storedPoint = z.tuple([z.number(), z.number()]);
/** The plan as stored: each outline with the feature (GeoJSON) or first line (CSV) it came from, for messages. */
export const planGeometrySchema = z.object({
  outlines: z.array(z.object({ reference: z.string(), source: z.number().int(), polygons: z.array(z.array(z.array(storedPoint))) })),
  centreline: z.object({ chainageStartM: z.number(), points: z.array(storedPoint).min(2) }),
});
export type PlanGeometry = z.infer<typeof planGeometrySchema>;
export type PlanOutline = PlanGeometry['outlines'][number];
