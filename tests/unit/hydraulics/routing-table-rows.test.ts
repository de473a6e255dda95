import { describe, expect, it } from 'vitest';
import type { RoutingStep } from '@/lib/hydraulics/routing/routing-result';
import { routingTableRows } from '@/lib/hydraulics/routing/routing-table-rows';

const steps = (n: number): RoutingStep[] => Array.from({ length: n }, (_, i) => ({ time: i * 60, inflow: i, outflow: i / 2, level: 100 + i / 1000, storage: i * 10 }));

describe('the routing table kept in a result', () => {
  it('keeps a short table whole', () => {
    expect(routingTableRows(steps(500), [120], 1000)).toHaveLength(500);
  });

  it('thins a long table to the limit, keeping the first and last rows and the peaks', () => {
    const all = steps(20_001);
    const peaks = [all[12_345].time, all[7].time];
    const kept = routingTableRows(all, peaks, 1000);
    expect(kept.length).toBeLessThanOrEqual(1000);
    expect(kept.length).toBeGreaterThan(900);
    expect(kept[0]).toEqual(all[0]);
    expect(kept[kept.length - 1]).toEqual(all[20_000]);
    for (const time of peaks) expect(kept.some((row) => row.time === time)).toBe(true);
    expect(kept.every((row, i) => i === 0 || row.time > kept[i - 1].time)).toBe(true);
  });
});
