import { describe, expect, it } from 'vitest';
import { inundation, inundationComparison } from '@/lib/hydraulics/impact/inundation';
import { at } from './test-helpers';


// Invented: banks at a constant 10.0 m; water levels chosen so the crossings fall at hand-computable places.
const flatBank = () => 10;

describe('inundation', () => {
  it('finds one stretch from the control with the crossing interpolated', () => {
    // 10.6 at 0 m, 10.2 at 100 m, 9.8 at 200 m: over the bank until 100 + 100·0.2/0.4 = 150 m.
    const result = inundation([at(0, 10.6), at(100, 10.2), at(200, 9.8)], flatBank);
    expect(result.stretches).toHaveLength(1);
    expect(result.stretches[0].from).toBe(0);
    expect(result.stretches[0].to).toBeCloseTo(150, 9);
    expect(result.stretches[0].maxDepth).toBeCloseTo(0.6, 12);
    expect(result.totalLength).toBeCloseTo(150, 9);
    expect(result.extentUpstream).toBeCloseTo(150, 9);
  });

  it('finds two separate stretches, each crossing interpolated, with a bank level varying along the reach', () => {
    // Bank rises 1 mm/m from 10 m; water at 10.1, 10.05, 10.3, 10.5: depth over bank 0.1, −0.05, 0.1, 0.2 at 0/100/200/300 m.
    const bank = (x: number) => 10 + 0.001 * x;
    const profile = [at(0, 10.1), at(100, 10.05), at(200, 10.3), at(300, 10.5)];
    const result = inundation(profile, bank);
    expect(result.stretches).toHaveLength(2);
    expect(result.stretches[0].to).toBeCloseTo(100 * (0.1 / 0.15), 9); // 66.67 m
    expect(result.stretches[1].from).toBeCloseTo(100 + 100 * (0.05 / 0.15), 9); // 133.33 m
    expect(result.stretches[1].to).toBe(300);
    expect(result.maxDepth).toBeCloseTo(0.2, 12);
    expect(result.totalLength).toBeCloseTo(66.6667 + (300 - 133.3333), 3);
    expect(result.extentUpstream).toBe(300);
  });

  it('reports nothing when the water stays in the banks', () => {
    expect(inundation([at(0, 9.9), at(100, 9.5)], flatBank)).toEqual({ stretches: [], totalLength: 0, maxDepth: 0, extentUpstream: 0 });
  });

  it('compares with- and without-scheme inundation', () => {
    const comparison = inundationComparison([at(0, 10.6), at(100, 10.2), at(200, 9.8)], [at(0, 10.2), at(100, 9.8), at(200, 9.6)], flatBank);
    expect(comparison.withoutScheme.totalLength).toBeCloseTo(50, 9); // 10.2 → 9.8 crosses at 50 m
    expect(comparison.addedLength).toBeCloseTo(100, 9);
  });
});
