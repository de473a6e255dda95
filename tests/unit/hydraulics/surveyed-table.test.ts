import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type GroundSegment, sumPieces, wettedPiece } from '@/lib/hydraulics/polygon-clip';
import { SurveyTable } from '@/lib/hydraulics/surveyed-table';

// The tabulated geometry is checked against clipping the ground at each level, piece by piece (polygon-clip.ts):
// two ways of computing the same exact integrals. Grounds are random invented polylines with flat runs and walls.
const elevation = fc.integer({ min: 0, max: 40 }).map((tenths) => 100 + tenths / 10);
const groundPoints = fc.array(fc.tuple(fc.integer({ min: 0, max: 3 }), elevation), { minLength: 3, maxLength: 30 });

function segmentsOf(points: [number, number][]): GroundSegment[][] {
  let station = 0;
  const ground = points.map(([step, z]) => [(station += step), z] as const);
  const segments = ground.slice(1).map((p, i) => ({ x1: ground[i][0], z1: ground[i][1], x2: p[0], z2: p[1] }));
  const third = Math.ceil(segments.length / 3);
  return [segments.slice(0, third), segments.slice(third, 2 * third), segments.slice(2 * third)];
}

/** The table of ground given as separate segments per sub-area: each segment its own pair of points, the links between them in no sub-area. */
function tableOf(subAreas: GroundSegment[][]): SurveyTable {
  const stations: number[] = [];
  const elevations: number[] = [];
  const segmentSubAreas: number[] = [];
  subAreas.forEach((segments, j) => {
    for (const { x1, z1, x2, z2 } of segments) {
      stations.push(x1, x2);
      elevations.push(z1, z2);
      segmentSubAreas.push(-1, j);
    }
  });
  return new SurveyTable({ stations, elevations, segmentSubAreas });
}

function close(actual: number, expected: number, scale: number): boolean {
  return Math.abs(actual - expected) <= 1e-9 * Math.max(1, scale);
}

describe('SurveyTable', () => {
  it('gives the clipped area, perimeter, top width and first moment of every sub-area at any level, flat runs and walls included', () => {
    fc.assert(
      fc.property(groundPoints, fc.double({ min: 99.5, max: 105, noNaN: true }), (points, level) => {
        const subAreas = segmentsOf(points);
        const table = tableOf(subAreas);
        const k = table.interval(level);
        subAreas.forEach((segments, j) => {
          const clipped = sumPieces(segments.map((segment) => wettedPiece(segment, level)));
          const out = { area: -1, wettedPerimeter: -1, topWidth: -1, firstMoment: -1 };
          table.fill(k, j, level, out);
          expect(close(out.area, clipped.area, clipped.area)).toBe(true);
          expect(close(out.wettedPerimeter, clipped.wettedPerimeter, clipped.wettedPerimeter)).toBe(true);
          expect(close(out.topWidth, clipped.topWidth, clipped.topWidth)).toBe(true);
          expect(close(out.firstMoment, clipped.firstMoment, clipped.firstMoment)).toBe(true);
        });
      }),
      { numRuns: 400 },
    );
  });

  it('takes a flat run of ground as dry with the water exactly at its level and wet just above it', () => {
    const table = tableOf([[], [{ x1: 0, z1: 101, x2: 0, z2: 100 }, { x1: 0, z1: 100, x2: 5, z2: 100 }, { x1: 5, z1: 100, x2: 5, z2: 101 }], []]);
    const at = (level: number) => {
      const out = { area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0 };
      table.fill(table.interval(level), 1, level, out);
      return out;
    };
    expect(at(100)).toEqual({ area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0 });
    // A 5 m wide rectangle 0.5 m deep: A = 2.5 m², P = 6 m, T = 5 m, Aȳ = 5 · 0.5²/2 = 0.625 m³ (plain geometry).
    expect(at(100.5).area).toBeCloseTo(2.5, 12);
    expect(at(100.5).wettedPerimeter).toBeCloseTo(6, 12);
    expect(at(100.5).topWidth).toBeCloseTo(5, 12);
    expect(at(100.5).firstMoment).toBeCloseTo(0.625, 12);
  });
});
