import { MAX_PLAN_VERTICES } from '@/lib/validation/input-limits';
import type { PlanGeometry } from '@/lib/validation/plan-schemas';
import type { PlanIssue } from './plan-issues';
import { boundsOf, polygonArea, signedRingArea } from './planar-geometry';

// Checks common to both file formats, on the plan as read: what a zod shape cannot see.

type Place = (source: number) => string;

function closedRing(ring: [number, number][]): [number, number][] {
  const [first, last] = [ring[0], ring[ring.length - 1]];
  return first[0] === last[0] && first[1] === last[1] ? ring.slice(0, -1) : ring;
}

/** The plan with every ring stored without its repeated closing vertex. */
export function withOpenRings(plan: PlanGeometry): PlanGeometry {
  return { ...plan, outlines: plan.outlines.map((o) => ({ ...o, polygons: o.polygons.map((p) => p.map(closedRing)) })) };
}

/** Rings with no area, repeated references, a centreline of no length, and coordinates that look like degrees. */
export function planGeometryIssues(plan: PlanGeometry, place: Place): PlanIssue[] {
  const issues: PlanIssue[] = [];
  const seen = new Map<string, number>();
  for (const outline of plan.outlines) {
    const key = outline.reference.toLowerCase();
    const first = seen.get(key);
    if (first !== undefined) issues.push({ place: place(outline.source), field: 'parcel reference', message: `repeats the parcel ${outline.reference} of ${place(first)}: give each parcel one outline (a MultiPolygon for several pieces)` });
    else seen.set(key, outline.source);
    const flat = outline.polygons.flatMap((polygon, p) =>
      polygon.flatMap((ring, r) => (ring.length < 3 || signedRingArea(ring) === 0 ? [{ place: place(outline.source), field: `${outline.polygons.length > 1 ? `polygon ${p + 1}, ` : ''}ring ${r + 1}`, message: 'encloses no area: it needs at least 3 vertices not all on one line' }] : [])),
    );
    issues.push(...flat);
    if (flat.length === 0 && outline.polygons.reduce((a, p) => a + polygonArea(p), 0) <= 0) issues.push({ place: place(outline.source), field: 'coordinates', message: 'its holes are as large as its outline: it encloses no area' });
  }
  const vertices = plan.outlines.reduce((n, o) => n + o.polygons.reduce((m, p) => m + p.reduce((k, r) => k + r.length, 0), 0), 0);
  if (vertices > MAX_PLAN_VERTICES) issues.push({ place: 'the file', field: 'coordinates', message: `holds ${vertices} outline vertices in all; a plan holds at most ${MAX_PLAN_VERTICES}: simplify the outlines` });
  const points = plan.centreline.points;
  if (points.every((p) => p[0] === points[0][0] && p[1] === points[0][1])) issues.push({ place: 'the centreline', field: 'coordinates', message: 'has no length: its vertices are all at one point' });
  const all = [...points, ...plan.outlines.flatMap((o) => o.polygons.flat(2))];
  const b = boundsOf(all);
  if (b && b.minX >= -180 && b.maxX <= 180 && b.minY >= -90 && b.maxY <= 90 && b.maxX - b.minX < 2 && b.maxY - b.minY < 2) {
    issues.push({ place: 'the file', field: 'coordinates', message: 'look like longitude and latitude in degrees: the plan needs easting and northing in metres of a projected coordinate system (for example a national grid)' });
  }
  return issues;
}

/** Outlines whose parcel is not in the register, each at its feature or line. */
export function unknownParcelIssues(plan: PlanGeometry, references: readonly string[], place: Place, registerVersion: number): PlanIssue[] {
  const known = new Set(references.map((r) => r.toLowerCase()));
  return plan.outlines.filter((o) => !known.has(o.reference.toLowerCase())).map((o) => ({ place: place(o.source), field: 'parcel reference', message: `${o.reference} is not a parcel of the register (version ${registerVersion}): correct the reference or add the parcel to the register first` }));
}
