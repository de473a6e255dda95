import { geoIdentity, geoPath } from 'd3-geo';
import type { MultiPolygon, Position } from 'geojson';
import type { PlanGeometry } from '@/lib/validation/plan-schemas';
import { type Centreline, centrelineBetween, pointAtChainage } from './linear-referencing';
import type { PlanCategory } from './plan-style';
import { polygonArea } from './planar-geometry';
import type { Stretch } from './river-stretches';

// The plan laid out on a page: projected coordinates (metres) to page units by d3-geo's planar identity projection,
// northing up (reflectY), one scale both ways, fitted to the drawing. The same layout is drawn as SVG in the browser
// and with pdfkit's vector drawing in a letter: both take the path commands d3-geo writes.

export interface PlanDrawingInput {
  geometry: PlanGeometry;
  categories: ReadonlyMap<string, PlanCategory>;
  inundated: readonly Stretch[];
  extent: Stretch | null;
  width: number;
  height: number;
  /** Crop the plan round this parcel (for its letter); the whole plan when absent. */
  focus?: string;
  /** The category of a parcel missing from `categories`. */
  otherwise?: PlanCategory;
}

export interface DrawnParcel {
  reference: string;
  category: PlanCategory;
  path: string;
  labelAt: [number, number];
}

export interface PlanDrawing {
  width: number;
  height: number;
  parcels: DrawnParcel[];
  river: string;
  inundated: string[];
  extent: string | null;
  structure: [number, number] | null;
  scaleBar: { metres: number; length: number };
}

/** Margins of the fitted plan: room on the right for the north arrow, below for the scale bar. */
const MARGIN = { left: 20, top: 20, right: 48, bottom: 36 };
const positions = (points: readonly (readonly [number, number])[]): Position[] => points.map(([x, y]) => [x, y]);
const toMultiPolygon = (polygons: PlanGeometry['outlines'][number]['polygons']): MultiPolygon => ({ type: 'MultiPolygon', coordinates: polygons as unknown as Position[][][] });

/** The longest 1, 2 or 5 × 10ⁿ metres that fits in `maxLength` page units at `unitsPerMetre`. */
export function niceScaleBar(unitsPerMetre: number, maxLength: number): { metres: number; length: number } {
  const most = maxLength / unitsPerMetre;
  const power = 10 ** Math.floor(Math.log10(most));
  const metres = [5, 2, 1].map((m) => m * power).find((m) => m <= most) ?? power;
  return { metres, length: metres * unitsPerMetre };
}

export function planProjection(input: Pick<PlanDrawingInput, 'geometry' | 'width' | 'height' | 'focus'>) {
  const focus = input.focus ? input.geometry.outlines.find((o) => o.reference.toLowerCase() === input.focus!.toLowerCase()) : undefined;
  const points: Position[] = focus ? focus.polygons.flat(2) : [...input.geometry.centreline.points, ...input.geometry.outlines.flatMap((o) => o.polygons.flat(2))];
  const projection = geoIdentity().reflectY(true);
  if (focus) {
    // Room round the parcel to see its neighbours and the river: the fit is to its box grown by half each way, at least 150 m.
    const xs = points.map((p) => p[0]);
    const ys = points.map((p) => p[1]);
    const grow = Math.max(150, 0.5 * Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)));
    points.push([Math.min(...xs) - grow, Math.min(...ys) - grow], [Math.max(...xs) + grow, Math.max(...ys) + grow]);
  }
  projection.fitExtent([[MARGIN.left, MARGIN.top], [input.width - MARGIN.right, input.height - MARGIN.bottom]], { type: 'MultiPoint', coordinates: points });
  return projection;
}

/** Everything the plan draws, in page units. */
export function layOutPlan(input: PlanDrawingInput): PlanDrawing {
  const projection = planProjection(input);
  const path = geoPath(projection).digits(1);
  const line: Centreline = input.geometry.centreline;
  const along = (from: number, to: number) => path({ type: 'LineString', coordinates: positions(centrelineBetween(line, from, to)) }) ?? '';
  const structure = pointAtChainage(line, 0);
  return {
    width: input.width,
    height: input.height,
    parcels: input.geometry.outlines.flatMap((o) => {
      const shape = toMultiPolygon(o.polygons);
      const [[x0, y0], [x1, y1]] = path.bounds(shape);
      if (input.focus && (x1 < 0 || y1 < 0 || x0 > input.width || y0 > input.height)) return [];
      // The label goes in the largest piece: a centroid over pieces wound opposite ways can fall far outside them all.
      const largest = o.polygons.reduce((best, p) => (polygonArea(p) > polygonArea(best) ? p : best), o.polygons[0]);
      const labelAt = path.centroid(toMultiPolygon([largest]));
      return [{ reference: o.reference, category: input.categories.get(o.reference.toLowerCase()) ?? input.otherwise ?? 'not-computed', path: path(shape) ?? '', labelAt }];
    }),
    river: path({ type: 'LineString', coordinates: positions(line.points) }) ?? '',
    inundated: input.inundated.map((s) => along(s.from, s.to)).filter((d) => d !== ''),
    extent: input.extent ? along(input.extent.from, input.extent.to) || null : null,
    structure: structure ? (projection(structure as [number, number]) as [number, number]) : null,
    scaleBar: niceScaleBar(projection.scale(), input.width / 4),
  };
}
