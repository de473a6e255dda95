import { describe, expect, it } from 'vitest';
import { parsePlanCsv } from '@/lib/plan/outlines-csv';
import { parsePlanGeoJson } from '@/lib/plan/outlines-geojson';
import { formatPlanIssue } from '@/lib/plan/plan-issues';
import { MAX_OUTLINE_VERTICES } from '@/lib/validation/input-limits';

const square = (x: number, y: number, size = 50) => [[x, y], [x + size, y], [x + size, y + size], [x, y + size], [x, y]];
const outline = (reference: string, ring: number[][]) => ({ type: 'Feature', properties: { parcel_reference: reference }, geometry: { type: 'Polygon', coordinates: [ring] } });
const centreline = (coordinates: number[][], extra: Record<string, unknown> = {}) => ({ type: 'Feature', properties: { centreline: true, ...extra }, geometry: { type: 'LineString', coordinates } });
const collection = (...features: unknown[]) => JSON.stringify({ type: 'FeatureCollection', features });
const LINE = [[412_000, 286_000], [412_500, 286_000]];

describe('the plan as GeoJSON', () => {
  it('reads outlines and the centreline, drops the closing vertex, defaults the chainage to 0 and keeps feature numbers', () => {
    const parsed = parsePlanGeoJson(collection(outline('HM-01', square(412_000, 286_010)), centreline(LINE), outline('HM-02', square(412_100, 286_010))));
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.plan.outlines.map((o) => [o.reference, o.source, o.polygons[0][0].length])).toEqual([['HM-01', 1, 4], ['HM-02', 3, 4]]);
    expect(parsed.plan.centreline).toEqual({ chainageStartM: 0, points: LINE });
  });

  it('names the feature and the field, in words, of each problem', () => {
    const bad = outline('HM-01', square(412_000, 286_010));
    (bad.geometry.coordinates[0][2] as unknown[])[1] = 'north';
    const parsed = parsePlanGeoJson(collection(bad, { type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [square(0, 0)] } }, centreline(LINE, { chainage_start_m: 20 })));
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.issues.map(formatPlanIssue)).toEqual([
      'Feature 1, coordinates, ring 1, vertex 3, northing: must be a number of metres (the northing)',
      'Feature 2, parcel reference: is required (the parcel reference, e.g. HM-07)',
      'Feature 3, chainage of the first vertex: must be 0 m or less: the centreline starts at or downstream of the structure (chainage 0 m)',
    ]);
  });

  it('refuses a point or line where a parcel outline belongs, a missing centreline, and JSON that does not parse', () => {
    const point = { type: 'Feature', properties: { parcel_reference: 'HM-03' }, geometry: { type: 'Point', coordinates: [1, 2] } };
    const parsed = parsePlanGeoJson(collection(point));
    expect(!parsed.ok && parsed.issues.map(formatPlanIssue)).toEqual([
      'Feature 1, geometry type: must be a Polygon or MultiPolygon (a parcel outline)',
      'The file, centreline: is missing: add one LineString feature with "centreline": true in its properties, drawn from the structure upstream',
    ]);
    const broken = parsePlanGeoJson('{"type": "FeatureCollection", ');
    expect(!broken.ok && broken.issues[0].place).toBe('the file');
    expect(!broken.ok && broken.issues[0].message).toMatch(/^is not valid JSON/);
  });

  it('refuses an outline over the vertex cap, a repeated parcel, a ring with no area, and coordinates in degrees', () => {
    const many = Array.from({ length: MAX_OUTLINE_VERTICES + 1 }, (_, i) => [412_000 + Math.cos(i) * 40, 286_050 + Math.sin(i) * 40]);
    const capped = parsePlanGeoJson(collection(outline('HM-01', many), centreline(LINE)));
    expect(!capped.ok && capped.issues.map(formatPlanIssue)).toEqual([`Feature 1, geometry: must have at most ${MAX_OUTLINE_VERTICES} vertices in one parcel outline`]);
    const twice = parsePlanGeoJson(collection(outline('HM-01', square(412_000, 286_010)), outline('hm-01', [[412_000, 286_000], [412_010, 286_000], [412_020, 286_000]]), centreline(LINE)));
    expect(!twice.ok && twice.issues.map(formatPlanIssue)).toEqual([
      'Feature 2, parcel reference: repeats the parcel hm-01 of feature 1: give each parcel one outline (a MultiPolygon for several pieces)',
      'Feature 2, ring 1: encloses no area: it needs at least 3 vertices not all on one line',
    ]);
    const degrees = parsePlanGeoJson(collection(outline('HM-01', square(-1.5, 52.4, 0.001)), centreline([[-1.5, 52.4], [-1.49, 52.41]])));
    expect(!degrees.ok && degrees.issues[0].message).toMatch(/^look like longitude and latitude in degrees/);
  });
});

describe('the plan as a CSV of vertices', () => {
  const HEADER = 'feature,easting_m,northing_m,part,chainage_start_m';

  it('reads outlines (pieces by part), the centreline and its starting chainage, keeping the first line of each', () => {
    const text = [HEADER, 'centreline,412000,286000,,-25', 'centreline,412500,286000,,', 'HM-01,412000,286010,,', 'HM-01,412050,286010,,', 'HM-01,412050,286060,,', 'HM-01,412100,286010,2,', 'HM-01,412150,286010,2,', 'HM-01,412150,286060,2,'].join('\n');
    const parsed = parsePlanCsv(text);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.plan.centreline).toEqual({ chainageStartM: -25, points: LINE });
    expect(parsed.plan.outlines).toEqual([{ reference: 'HM-01', source: 4, polygons: [[[[412000, 286010], [412050, 286010], [412050, 286060]]], [[[412100, 286010], [412150, 286010], [412150, 286060]]]] }]);
  });

  it('names the line and column of each problem', () => {
    const text = [HEADER, 'centreline,412000,286000,,', 'centreline,412500,286000,,', 'HM-01,412000,x,,', 'HM-01,412050,286010,,-5', ',412050,286060,,', 'HM-02,412100,286010,,', 'HM-01,412100,286010,,'].join('\n');
    const parsed = parsePlanCsv(text);
    expect(!parsed.ok && parsed.issues.map(formatPlanIssue)).toEqual([
      'Line 4, northing_m: must be a number of metres (the northing)',
      'Line 5, chainage_start_m: belongs on the first line of the centreline only',
      'Line 6, feature: is required (the parcel reference, e.g. HM-07)',
      'Line 8, feature: the vertices of HM-01 must be on consecutive lines (it began on line 5)',
    ]);
  });

  it('names unknown and missing columns on line 1 and a file without a centreline', () => {
    const header = parsePlanCsv('feature,east,northing_m\nHM-01,1,2\n');
    expect(!header.ok && header.issues.map(formatPlanIssue)).toEqual(['Line 1: column 2 "east" is not a plan column; the columns are feature, easting_m, northing_m, part, chainage_start_m', 'Line 1: the header has no easting_m column (required)']);
    const noLine = parsePlanCsv(['feature,easting_m,northing_m', 'HM-01,412000,286010', 'HM-01,412050,286010', 'HM-01,412050,286060'].join('\n'));
    expect(!noLine.ok && noLine.issues.map((i) => i.place)).toEqual(['the file']);
  });
});
