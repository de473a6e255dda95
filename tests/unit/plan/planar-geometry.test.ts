import { geoIdentity, geoPath } from 'd3-geo';
import { describe, expect, it } from 'vitest';
import { centrelineBetween, chainageEnd, chainageRange, locateOnCentreline, pointAtChainage } from '@/lib/plan/linear-referencing';
import { type PlanPoint, polygonArea, signedRingArea } from '@/lib/plan/planar-geometry';

// Expected values are analytic (plane geometry worked by hand) or come from d3-geo's own planar area, an
// implementation outside this project.

const E0 = 412_000;
const N0 = 286_000;
const at = (x: number, y: number): PlanPoint => [E0 + x, N0 + y];

describe('polygon area by the shoelace formula', () => {
  it('gives a 100 m by 40 m rectangle 4000 m², positive anticlockwise and negative clockwise (analytic)', () => {
    const ring = [at(0, 0), at(100, 0), at(100, 40), at(0, 40)];
    expect(signedRingArea(ring)).toBeCloseTo(4000, 6);
    expect(signedRingArea([...ring].reverse())).toBeCloseTo(-4000, 6);
    expect(polygonArea([[...ring].reverse()])).toBeCloseTo(4000, 6);
  });

  it('gives a right triangle with legs 30 m and 80 m half their product, 1200 m², with or without the closing vertex (analytic)', () => {
    expect(polygonArea([[at(0, 0), at(30, 0), at(0, 80)]])).toBeCloseTo(1200, 6);
    expect(polygonArea([[at(0, 0), at(30, 0), at(0, 80), at(0, 0)]])).toBeCloseTo(1200, 6);
  });

  it('takes the holes out: a 50 m square with a 10 m square hole is 2400 m² (analytic)', () => {
    const hole = [at(20, 20), at(20, 30), at(30, 30), at(30, 20)];
    expect(polygonArea([[at(0, 0), at(50, 0), at(50, 50), at(0, 50)], hole])).toBeCloseTo(2400, 6);
  });

  it('keeps its precision at national-grid coordinates: a 1 m square near 412 km E, 286 km N is 1 m² (analytic)', () => {
    expect(polygonArea([[at(0.25, 0.25), at(1.25, 0.25), at(1.25, 1.25), at(0.25, 1.25)]])).toBeCloseTo(1, 9);
  });

  it('agrees with d3-geo’s planar area (geoPath with geoIdentity) for an irregular concave outline', () => {
    const ring = [at(0, 0), at(120, -15), at(160, 60), at(90, 35), at(70, 110), at(-20, 80)];
    const d3Area = geoPath(geoIdentity()).area({ type: 'Polygon', coordinates: [[...ring, ring[0]].map((p) => [p[0] - E0, p[1] - N0])] });
    expect(polygonArea([ring])).toBeCloseTo(Math.abs(d3Area), 6);
    // By hand: ½ (0 + 9600 + 200 + 7450 + 7800 + 0) = 12,525 m².
    expect(polygonArea([ring])).toBeCloseTo(12_525, 6);
  });
});

describe('chainage along the centreline by linear referencing', () => {
  // An L: 300 m east, then 400 m north; starts 50 m downstream of the structure (chainage -50).
  const line = { chainageStartM: -50, points: [at(0, 0), at(300, 0), at(300, 400)] };

  it('measures the whole line as its length, 700 m, ending at chainage 650 m (analytic)', () => {
    expect(chainageEnd(line)).toBeCloseTo(650, 9);
  });

  it('finds the foot of the perpendicular on the nearest segment, its offset and side (analytic)', () => {
    expect(locateOnCentreline(line, at(120, 25))).toEqual({ chainage: 70, offset: 25, side: 1 });
    expect(locateOnCentreline(line, at(330, 100))).toEqual({ chainage: 350, offset: 30, side: -1 });
  });

  it('takes the corner for a point beyond it: 3-4-5 triangle from the bend gives 50 m offset (analytic)', () => {
    const located = locateOnCentreline(line, at(330, -40));
    expect(located.chainage).toBeCloseTo(250, 9);
    expect(located.offset).toBeCloseTo(50, 9);
  });

  it('gives the point at a chainage and nothing beyond the ends (analytic)', () => {
    expect(pointAtChainage(line, 0)).toEqual(at(50, 0));
    expect(pointAtChainage(line, 450)).toEqual(at(300, 200));
    expect(pointAtChainage(line, 651)).toBeNull();
    expect(pointAtChainage(line, -51)).toBeNull();
  });

  it('cuts the stretch between two chainages, keeping the bend inside it, clipped to the line (analytic)', () => {
    expect(centrelineBetween(line, 200, 300)).toEqual([at(250, 0), at(300, 0), at(300, 50)]);
    expect(centrelineBetween(line, 600, 9000)).toEqual([at(300, 350), at(300, 400)]);
    expect(centrelineBetween(line, 700, 800)).toEqual([]);
  });

  it('gives a parcel beside the river the chainages its outline spans (analytic)', () => {
    expect(chainageRange(line, [at(100, 10), at(200, 10), at(200, 60), at(100, 60)])).toEqual({ from: 50, to: 150 });
  });
});

describe('the searched chainage range of an outline', () => {
  it('agrees with the nearest point over every segment, for each demo outline (brute force, no pruning)', async () => {
    const { readFileSync } = await import('node:fs');
    const { parsePlanGeoJson } = await import('@/lib/plan/outlines-geojson');
    const parsed = parsePlanGeoJson(readFileSync('db/seeds/parcels/harrowfield-plan.geojson', 'utf8'));
    if (!parsed.ok) throw new Error('the demo plan does not parse');
    const line = parsed.plan.centreline;
    for (const outline of parsed.plan.outlines) {
      const vertices = outline.polygons.flat(2);
      const chainages = vertices.map((v) => locateOnCentreline(line, v).chainage);
      expect(chainageRange(line, vertices), outline.reference).toEqual({ from: Math.min(...chainages), to: Math.max(...chainages) });
    }
  });
});
