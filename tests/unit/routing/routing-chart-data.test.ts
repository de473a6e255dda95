import { describe, expect, it } from 'vitest';
import { routingChartData, sampledSteps } from '@/lib/routing-sheet/routing-chart-data';
import { routingResultFixture, routingStepsFixture } from '../../fixtures/routing/routing-result-fixture';

describe('routing chart data', () => {
  const routing = routingResultFixture();

  it('puts every step on the chart in hours, with the three peaks', () => {
    const data = routingChartData(routing);
    expect(data.inflow).toHaveLength(routing.steps.length);
    expect(data.outflow.at(-1)?.x).toBe(24);
    expect(data.level[0].y).toBe(routing.steps[0].level);
    expect(data.peaks).toEqual({ inflow: { x: 6, y: 42 }, outflow: { x: 8, y: 30 }, level: { x: 8, y: 61.76 } });
  });

  it('samples at most the rows asked for, in time order, keeping the first, the last and each peak', () => {
    const rows = sampledSteps(routing, 25);
    expect(rows.length).toBeLessThanOrEqual(25);
    expect(rows.length).toBeGreaterThan(20);
    const times = rows.map((s) => s.time);
    expect([...times].sort((a, b) => a - b)).toEqual(times);
    expect(times).toContain(0);
    expect(times).toContain(24 * 3600);
    expect(times).toContain(6 * 3600);
    expect(times).toContain(8 * 3600);
  });

  it('keeps a short table whole', () => {
    const short = routingResultFixture({ steps: routingStepsFixture(9) });
    expect(sampledSteps(short, 25)).toEqual(short.steps);
  });
});
