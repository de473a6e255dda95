import { describe, expect, it } from 'vitest';
import { routeReservoir } from '@/lib/hydraulics/routing/route-reservoir';
import { linearReservoir, triangularResponse } from './routing-support';

// Invented reservoir: 250 000 m² of surface, storage constant K = 2 h, crest at 84.0 m above the datum.
const AREA = 250_000;
const K = 7200;
const CREST = 84;
const model = linearReservoir(AREA, K, CREST);

const route = (times: number[], discharges: number[]) =>
  routeReservoir({ model, hydrograph: { times, discharges }, hydrographKind: 'table', shapeSource: null, startLevel: CREST, reservoirLength: null, hydrographField: 'events[0].hydrograph', skipSelfCheck: false }).result;

describe('a linear reservoir (storage = K × outflow) against its analytic solutions', () => {
  it('follows O = I₀(1 − e^(−t/K)) for a step inflow (solution of dS/dt = I₀ − S/K, S(0) = 0)', () => {
    const inflow = 40;
    const r = route([0, 10 * 3600, 20 * 3600], [inflow, inflow, inflow]);
    for (const step of r.steps) {
      const analytic = inflow * -Math.expm1(-step.time / K);
      expect(Math.abs(step.outflow - analytic)).toBeLessThan(2e-3 * inflow);
    }
    // The level is 1 mm-converged: at the end it stands at h₀ + K·O/A.
    const end = r.steps[r.steps.length - 1];
    expect(Math.abs(r.peakLevel.level - (CREST + (K * inflow * -Math.expm1(-end.time / K)) / AREA))).toBeLessThan(1e-3);
    expect(Math.abs(r.volumeBalance.residual)).toBeLessThan(1e-9 * r.volumeBalance.inflow);
  });

  it('matches the superposed ramp responses for a triangular inflow, peak outflow where it meets the falling limb', () => {
    const peak = 120;
    const [tp, tb, end] = [3 * 3600, 9 * 3600, 30 * 3600];
    const r = route([0, tp, tb, end], [0, peak, 0, 0]);
    let best = { time: 0, discharge: 0 };
    for (let t = 0; t <= end; t += 1) {
      const o = triangularResponse(t, K, peak, tp, tb);
      if (o > best.discharge) best = { time: t, discharge: o };
    }
    expect(Math.abs(r.outflowPeak.discharge - best.discharge)).toBeLessThan(1e-3 * best.discharge);
    expect(Math.abs(r.outflowPeak.time - best.time)).toBeLessThan(r.refinement.timeStep);
    expect(Math.abs(r.peakLevel.level - (CREST + (K * best.discharge) / AREA))).toBeLessThan(1e-3);
    expect(r.attenuation).toBeCloseTo(peak - r.outflowPeak.discharge, 9);
    expect(r.lag).toBeCloseTo(r.outflowPeak.time - tp, 9);
    // At the peak the outflow equals the inflow on the falling limb: I(t*) = peak(tb − t*)/(tb − tp).
    expect(Math.abs(best.discharge - (peak * (tb - best.time)) / (tb - tp))).toBeLessThan(0.01);
    expect(Math.abs(r.volumeBalance.residual)).toBeLessThan(1e-9 * r.volumeBalance.inflow);
    expect(r.refinement.converged).toBe(true);
    expect(r.refinement.peakLevelChangeOnHalving).toBeLessThan(1e-3);
  });

  it('is self-checked by odex, whose own peak level matches the analytic one', () => {
    const [peak, tp, tb] = [120, 3 * 3600, 9 * 3600];
    const r = route([0, tp, tb, 30 * 3600], [0, peak, 0, 0]);
    // The analytic peak: golden-section search on the superposed ramp responses.
    let [a, b] = [tp, tb];
    for (let i = 0; i < 200; i++) {
      const [c, d] = [b - 0.618 * (b - a), a + 0.618 * (b - a)];
      if (triangularResponse(c, K, peak, tp, tb) > triangularResponse(d, K, peak, tp, tb)) b = d;
      else a = c;
    }
    const analyticPeakLevel = CREST + (K * triangularResponse((a + b) / 2, K, peak, tp, tb)) / AREA;
    expect(r.selfCheck).not.toBeNull();
    expect(Math.abs(r.selfCheck!.peakLevel - analyticPeakLevel)).toBeLessThan(1e-6);
    expect(r.selfCheck!.peakLevelDifference).toBeLessThan(1e-3);
  });
});
