import { describe, expect, it } from 'vitest';
import { isWet, withWaterEdges } from '@/components/charts/wetted-stations';
import { axisTitleLines } from '@/components/charts/register-charts';

describe('the cross-section water line reaches both banks', () => {
  // A trapezoid 10 wide at the bed with 2:1 sides, 3 deep, bed at 0: at water level 2 the surface is 10 + 2·2·2 = 18
  // wide (analytic: top width b + 2zy), from station 1 to 19.
  const ground = [{ x: -1, y: 3 }, { x: 5, y: 0 }, { x: 15, y: 0 }, { x: 21, y: 3 }];

  it('adds the stations where the ground meets the water, so the wetted width is the analytic top width', () => {
    const { points, added } = withWaterEdges(ground, 2);
    expect(points.filter((_, i) => added[i])).toEqual([{ x: 1, y: 2 }, { x: 19, y: 2 }]);
    const wet = points.slice(1).map((p, i) => (isWet(points[i], p, 2) ? p.x - points[i].x : 0)).reduce((a, b) => a + b, 0);
    expect(wet).toBeCloseTo(18, 12);
  });

  it('adds nothing when the water is over the banks or below the bed', () => {
    expect(withWaterEdges(ground, 4).added.every((a) => !a)).toBe(true);
    expect(withWaterEdges(ground, -1).added.every((a) => !a)).toBe(true);
  });

  it('sets a long level axis title on two lines, broken after “above”', () => {
    expect(axisTitleLines('Level (m above Wendle Valley local datum)')).toEqual(['Level (m above', 'Wendle Valley local datum)']);
    expect(axisTitleLines('Height above the bed (m)')).toBe('Height above the bed (m)');
  });
});
