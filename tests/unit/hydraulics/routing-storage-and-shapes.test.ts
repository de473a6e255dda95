import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { hydrographVolume } from '@/lib/hydraulics/routing/inflow-hydrograph';
import { NRCS_ORDINATES, unitShapeHydrograph } from '@/lib/hydraulics/routing/nrcs-unit-hydrograph';
import { refinedPulsMarch } from '@/lib/hydraulics/routing/routing-refinement';
import { storageCurve } from '@/lib/hydraulics/routing/storage-curve';
import { linearReservoir } from './routing-support';

describe('storage curve from a level–area table', () => {
  // Invented basin whose area grows linearly with level, A = 10 000 + 4 000 (h − 80) m²: V = 10 000 d + 2 000 d² exactly.
  const rows = [80, 81, 82.5, 84].map((level) => ({ level, area: 10_000 + 4_000 * (level - 80) }));
  const curve = storageCurve({ kind: 'level-area', rows });

  it('integrates a linearly varying area exactly (trapezoidal rule, exact for linear integrands)', () => {
    for (const d of [0, 0.3, 1, 2.2, 4]) expect(curve.volumeAt(80 + d)).toBeCloseTo(10_000 * d + 2_000 * d * d, 6);
  });

  it('inverts volume to level', () => {
    for (const level of [80, 80.01, 81.7, 83.99, 84]) expect(curve.levelAt(curve.volumeAt(level))).toBeCloseTo(level, 10);
  });

  it('refuses a level above its top, naming the table', () => {
    expect(() => curve.volumeAt(84.5)).toThrow(InvalidInputError);
    expect(() => curve.volumeAt(84.5)).toThrow(/reservoir\.storage\.rows.*extend the table/);
  });

  it('refuses rows whose levels do not rise, naming the row', () => {
    expect(() => storageCurve({ kind: 'level-area', rows: [{ level: 1, area: 5 }, { level: 1, area: 6 }] })).toThrow(/rows\[1\]\.level/);
  });
});

describe('storage curve from a level–volume table', () => {
  const curve = storageCurve({ kind: 'level-volume', rows: [{ level: 10, volume: 500 }, { level: 11, volume: 2500 }, { level: 13, volume: 10_500 }] });
  it('reads volumes linearly between rows, measured from the lowest row, and areas as their slope', () => {
    expect(curve.volumeAt(10.5)).toBeCloseTo(1000, 9);
    expect(curve.areaAt(12)).toBeCloseTo(4000, 9);
    expect(curve.levelAt(curve.volumeAt(12.25))).toBeCloseTo(12.25, 12);
  });
});

describe('the NRCS dimensionless unit hydrograph (NEH Part 630, ch. 16, table 16-1)', () => {
  it('holds the volume implied by the peak rate factor 484: the area under q/qp against t/Tp is about 1.333', () => {
    // qp = 484·A·Q/Tp (cfs, mi², in, h) with 1 in over 1 mi² = 2 323 200 ft³ gives ∫(q/qp)d(t/Tp) = 2 323 200/(484·3600) = 1.3333
    // (NEH Part 630, ch. 16, eq. 16-1, the peak rate factor — from memory). The tabulated ordinates, read linearly, hold it to 1 %.
    const area = NRCS_ORDINATES.slice(1).reduce((sum, [t, q], i) => sum + ((q + NRCS_ORDINATES[i][1]) / 2) * (t - NRCS_ORDINATES[i][0]), 0);
    expect(Math.abs(area - 2_323_200 / (484 * 3600))).toBeLessThan(0.01 * 1.3333);
  });

  it('scales to the peak and time to peak, lasting five times to peak', () => {
    const h = unitShapeHydrograph('nrcs-dimensionless', 50, 7200, 'events[0].hydrograph');
    expect(Math.max(...h.discharges)).toBe(50);
    expect(h.times[h.discharges.indexOf(50)]).toBe(7200);
    expect(h.times[h.times.length - 1]).toBe(36_000);
    expect(hydrographVolume(h) / (50 * 7200)).toBeCloseTo(1.33, 1);
  });
});

describe('the routing step cap', () => {
  it('refuses a hydrograph that needs more steps than allowed, saying what to reduce', () => {
    const model = linearReservoir(1000, 600, 0);
    const spiky = { times: [0, 1, 2, 1_000_000], discharges: [0, 100, 0, 0] };
    expect(() => refinedPulsMarch(model, spiky, 0, 'events[2].hydrograph')).toThrow(/events\[2\]\.hydrograph: would need more than 20000 routing time steps.*shorten it/);
  });
});
