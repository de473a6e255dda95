import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { CUBIC_METRES_PER_CUBIC_FOOT, METRES_PER_FOOT } from '@/lib/hydraulics/units';
import type { CaseInput } from '@/lib/validation/case-schema';
import { parseCase } from '@/lib/validation/parse-case';

// The invented Harrowfield Upper Pond demo (db/seeds/cases), and variants of it made here.
const SLOW = { timeout: 120_000 };
const raw = () => JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-reservoir-spillway.json', 'utf8')) as Record<string, unknown> & { events: Record<string, unknown>[]; reservoir: Record<string, unknown>; control: Record<string, unknown> };

function parsed(file: unknown): CaseInput {
  const p = parseCase(file);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.value;
}

describe('a routed case', () => {
  const demo = parsed(raw());
  const result: CaseResult = evaluateCase(demo);

  it('routes every event with a hydrograph and reports the routing in full', SLOW, () => {
    for (const event of result.events) {
      const r = event.routing!;
      expect(r.method).toBe('modified-puls');
      expect(r.refinement.converged).toBe(true);
      expect(r.selfCheck!.peakLevelDifference).toBeLessThan(1e-3);
      expect(Math.abs(r.volumeBalance.residual)).toBeLessThan(1e-9 * r.volumeBalance.inflow);
      expect(r.outflowPeak.discharge).toBeLessThan(r.inflowPeak.discharge);
      expect(r.attenuation).toBeCloseTo(r.inflowPeak.discharge - r.outflowPeak.discharge, 9);
      expect(r.lag).toBeGreaterThan(0);
      expect(r.assumptions.join(' ')).toContain('carries the peak inflow');
    }
  });

  it('starts the backwater from the peak reservoir level with the peak inflow', SLOW, () => {
    for (const event of result.events) {
      expect(event.control.level).toBeCloseTo(event.routing!.peakLevel.level, 9);
      expect(event.discharge).toBeCloseTo(event.routing!.inflowPeak.discharge, 9);
      expect(event.profile[0].waterLevel).toBeCloseTo(event.routing!.peakLevel.level, 9);
    }
  });

  it('checks limits inside the reservoir against the peak level and those beyond it against the profile', SLOW, () => {
    for (const event of result.events) {
      const [inside, upstream] = event.limits;
      expect(inside.source).toBe('reservoir');
      expect(inside.waterLevel).toBe(event.routing!.peakLevel.level);
      expect(upstream.source).toBe('profile');
    }
  });

  it('takes a table hydrograph scaled by the climate allowance, and the NRCS shape peaking at the event discharge', SLOW, () => {
    expect(result.events[0].routing!.inflowPeak.discharge).toBe(30);
    expect(result.events[1].routing!.inflowPeak.discharge).toBeCloseTo(48 * 1.25, 9);
    expect(result.events[1].routing!.hydrograph.shapeSource).toContain('table 16-1');
    expect(result.events[1].routing!.inflowPeak.time).toBe(3 * 3600);
  });

  it('runs the storage and hydrograph-volume sensitivity: more storage lowers the peak, more volume raises it', SLOW, () => {
    const cases = Object.fromEntries(result.sensitivity!.cases.map((c) => [c.label, c]));
    expect(cases['storage-up'].levelChanges![0]).toBeLessThan(0);
    expect(cases['storage-down'].levelChanges![0]).toBeGreaterThan(0);
    expect(cases['volume-up'].levelChanges![0]).toBeGreaterThan(0);
    expect(cases['volume-down'].levelChanges![0]).toBeLessThan(0);
  });

  it('gives a lower peak level than the steady check of the same peak discharge (the storage attenuates the flood)', SLOW, () => {
    const steady = evaluateCase({ ...demo, reservoir: undefined, events: demo.events.map(({ hydrograph: _h, ...e }) => ({ ...e, discharge: e.discharge })) });
    steady.events.forEach((e, i) => expect(result.events[i].control.level).toBeLessThan(e.control.level));
  });

  it('sizes the sill of a routed case so that it passes', SLOW, () => {
    const sized = evaluateCase({ ...demo, sensitivity: undefined, sizing: { vary: 'sillHeight', increment: 0.05 } });
    expect(sized.sizing!.value).not.toBeNull();
    const check = evaluateCase({ ...demo, sensitivity: undefined, control: { ...demo.control, sillHeight: sized.sizing!.value! } as CaseInput['control'] });
    expect(check.verdict).toBe('pass');
    const over = evaluateCase({ ...demo, sensitivity: undefined, control: { ...demo.control, sillHeight: sized.sizing!.value! + 0.05 } as CaseInput['control'] });
    expect(over.verdict).toBe('fail');
  });

  it('gives the same routing in US customary units, converted back', SLOW, () => {
    const L = METRES_PER_FOOT;
    const Q = CUBIC_METRES_PER_CUBIC_FOOT;
    const si = raw();
    const storage = si.reservoir.storage as { rows: { level: number; area: number }[] };
    const us = {
      ...si,
      units: 'US',
      sensitivity: undefined,
      reach: { ...(si.reach as object), section: { shape: 'trapezoidal', bottomWidth: 14 / L, sideSlope: 2 }, length: 4000 / L, bedLevelAtControl: 52 / L, bankHeight: 5.5 / L },
      events: si.events.map((e) => {
        const h = e.hydrograph as { kind: string; points?: { time: number; discharge: number }[] };
        return { ...e, ...(e.discharge !== undefined ? { discharge: (e.discharge as number) / Q } : {}), hydrograph: h.points ? { ...h, points: h.points.map((p) => ({ time: p.time, discharge: p.discharge / Q })) } : h };
      }),
      control: { ...si.control, crestLength: 12 / L, sillHeight: 3 / L },
      reservoir: { storage: { kind: 'level-area', rows: storage.rows.map((r) => ({ level: r.level / L, area: r.area / (L * L) })) }, length: 900 / L },
      limits: (si.limits as { label: string; distanceUpstream: number; maxLevel: number; freeboard: number }[]).map((l) => ({ ...l, distanceUpstream: l.distanceUpstream / L, maxLevel: l.maxLevel / L, freeboard: l.freeboard / L })),
    };
    const usResult = evaluateCase(parsed(us));
    usResult.events.forEach((e, i) => {
      const r = e.routing!;
      const base = result.events[i].routing!;
      expect(r.peakLevel.level * L).toBeCloseTo(base.peakLevel.level, 6);
      expect(r.outflowPeak.discharge * Q).toBeCloseTo(base.outflowPeak.discharge, 6);
      expect(r.volumeBalance.inflow * Q).toBeCloseTo(base.volumeBalance.inflow, 1);
      expect(r.storage.areaAtStart * L * L).toBeCloseTo(base.storage.areaAtStart, 3);
      expect(r.peakLevel.time).toBeCloseTo(base.peakLevel.time, 6);
    });
  });

  it('routes through a rating-table control', SLOW, () => {
    const table: [number, number][] = [[0, 0], [0.25, 3.2], [0.5, 9.1], [1, 25.8], [1.5, 47.4], [2, 73]];
    const routed = evaluateCase({ ...demo, sensitivity: undefined, control: { type: 'weir', kind: 'rating-table', sillHeight: 3, ratingTable: table } });
    for (const e of routed.events) expect(e.routing!.outflowPeak.discharge).toBeLessThan(e.routing!.inflowPeak.discharge);
  });

  it('explains a storage table that the flood overtops, naming it', SLOW, () => {
    const small = parsed({ ...raw(), reservoir: { storage: { kind: 'level-area', rows: [{ level: 54, area: 20_000 }, { level: 55.2, area: 21_000 }] } } });
    expect(() => evaluateCase(small)).toThrow(/reservoir\.storage: runs out: the flood rises above the top of the storage table/);
  });

  it('explains a rating table that does not reach the flood, naming it', SLOW, () => {
    const short = evaluateCase.bind(null, { ...demo, sensitivity: undefined, control: { type: 'weir', kind: 'rating-table', sillHeight: 3, ratingTable: [[0, 0], [0.2, 1], [0.4, 3]] } });
    expect(short).toThrow(/control\.ratingTable/);
  });
});

describe('plausibility of a reservoir', () => {
  it('warns of a reservoir longer than the reach and of a flood starting above the crest, naming the field', SLOW, () => {
    const input = parsed({ ...raw(), sensitivity: undefined, events: [raw().events[0]], reservoir: { ...raw().reservoir, length: 5000, startLevel: 55.4 } });
    const result = evaluateCase(input);
    expect(result.warnings.some((w) => w.startsWith('reservoir.length: the reservoir (5000 m) runs beyond'))).toBe(true);
    expect(result.warnings.some((w) => w.startsWith('reservoir.startLevel: the flood starts with the reservoir above the crest'))).toBe(true);
    // Starting above the crest, the outflow at the start is the spillway's flow at that level, more than the inflow.
    const r = result.events[0].routing!;
    expect(r.steps[0].outflow).toBeGreaterThan(r.steps[0].inflow);
    expect(Math.abs(r.volumeBalance.residual)).toBeLessThan(1e-9 * r.volumeBalance.inflow);
    expect(result.events[0].limits.every((l) => l.source === 'reservoir')).toBe(true);
  });
});

describe('the three ways of giving the storage', () => {
  it('route alike when they describe the same pool', SLOW, () => {
    const base = raw();
    const areaRows = (base.reservoir.storage as { rows: { level: number; area: number }[] }).rows;
    // The same storage as a level–volume table: the trapezoidal rule at the rows, as the engine integrates the areas.
    let volume = 0;
    const volumeRows = areaRows.map((r, i) => {
      if (i > 0) volume += ((r.area + areaRows[i - 1].area) / 2) * (r.level - areaRows[i - 1].level);
      return { level: r.level, volume };
    });
    const run = (storage: unknown) => evaluateCase(parsed({ ...base, sensitivity: undefined, reservoir: { ...base.reservoir, storage } })).events.map((e) => e.routing!.peakLevel.level);
    const byArea = run(base.reservoir.storage);
    const byVolume = run({ kind: 'level-volume', rows: volumeRows });
    // Between rows the volume is read linearly rather than integrated from a linear area: the two tables differ by at
    // most ΔA·Δh/8 in volume (a chord against a parabola), about 45 000 m² × 1 m / 8 / 240 000 m² ≈ 23 mm of level between
    // the 55 m and 56 m rows, and less in the peak, since they agree at the rows. (Which peaks higher depends on the flood:
    // the chord holds more low down and less near the top of each interval.)
    byArea.forEach((level, i) => expect(Math.abs(byVolume[i] - level)).toBeLessThan(0.023));
    // A constant area equal to the table's area at the crest holds less above it (the table widens), so it peaks higher.
    const byConstant = run({ kind: 'constant-area', area: 240_000 });
    byArea.forEach((level, i) => expect(byConstant[i]).toBeGreaterThan(level));
  });
});
