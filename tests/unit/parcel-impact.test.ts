import { describe, expect, it } from 'vitest';
import { NEGLIGIBLE_AFFLUX, parcelImpact, worstCategory } from '@/lib/hydraulics/impact/parcel-impact';
import type { ProfilePoint } from '@/lib/hydraulics/profiles/profile-point';

// Invented straight-line profiles, so every expected value is simple arithmetic on a straight line.
const point = (distanceUpstream: number, waterLevel: number): ProfilePoint => ({ distanceUpstream, waterLevel, depth: waterLevel - 30, bedLevel: 30, velocity: 1, froude: 0.3, frictionSlope: 0.001, energyLevel: waterLevel });
// Without the scheme: 31.0 m at the control rising 1 m per km. With it: 0.5 m higher at the control, the rise fading to 0 at 1000 m.
const without = [point(0, 31), point(1000, 32), point(2000, 33)];
const withScheme = [point(0, 31.5), point(500, 31.75), point(1000, 32)];
const opts = { impactThreshold: 0.01, bankLevelAt: null };

describe('the impact on one parcel', () => {
  it('interpolates the afflux at both ends and finds its greatest value over the parcel', () => {
    const impact = parcelImpact({ from: 200, to: 700, groundLevel: null }, withScheme, without, opts);
    // At 200 m: with 31.6, without 31.2 → 0.4 m. At 700 m: with 31.85, without 31.7 → 0.15 m.
    expect(impact.affluxAtFrom).toBeCloseTo(0.4, 12);
    expect(impact.affluxAtTo).toBeCloseTo(0.15, 12);
    expect(impact.maxAfflux).toBeCloseTo(0.4, 12);
    expect(impact.maxAffluxAt).toBe(200);
    expect(impact.category).toBe('affected');
    expect(impact.withScheme).toBeNull();
    expect(impact.floodingJudgedBy).toBeNull();
  });

  it('takes the without-scheme level beyond the with-scheme profile, so a parcel upstream of it is not affected', () => {
    const impact = parcelImpact({ from: 1200, to: 1800, groundLevel: 40 }, withScheme, without, opts);
    expect(impact.maxAfflux).toBe(0);
    expect(impact.category).toBe('not-affected');
    expect(impact.withScheme).toEqual({ inundatedLength: 0, maxDepth: 0, maxWaterLevel: 32.8 });
  });

  it('says "below the threshold" for a rise under the threshold, and "affected" once the scheme floods dry ground', () => {
    const nearlyFlat = [point(0, 31.005), point(1000, 32.005)];
    expect(parcelImpact({ from: 0, to: 100, groundLevel: 35 }, nearlyFlat, without, opts).category).toBe('below-threshold');
    // Ground at 31.1 m over 0–100 m: without, water 31.0–31.1 (dry); with, 31.005–31.105 (wet over the last 5 m).
    const wet = parcelImpact({ from: 0, to: 100, groundLevel: 31.1 }, nearlyFlat, without, { ...opts, impactThreshold: 0.01 });
    expect(wet.withScheme?.inundatedLength).toBeCloseTo(5, 9);
    expect(wet.category).toBe('affected');
    expect(parcelImpact({ from: 0, to: 100, groundLevel: 35 }, [point(0, 31 + NEGLIGIBLE_AFFLUX / 2), point(1000, 32)], without, opts).category).toBe('not-affected');
  });

  it('measures flooding against the bank level when the parcel gives no ground level', () => {
    const bank = (d: number) => 31.4 + d / 1000;
    const impact = parcelImpact({ from: 0, to: 600, groundLevel: null }, withScheme, without, { ...opts, bankLevelAt: bank });
    expect(impact.floodingJudgedBy).toBe('bank-level');
    // With the scheme the water is 0.1 m over the bank at the control, falling to 0 where 31.5 + d/2000 = 31.4 + d/1000, i.e. at 200 m.
    expect(impact.withScheme?.inundatedLength).toBeCloseTo(200, 9);
    expect(impact.withScheme?.maxDepth).toBeCloseTo(0.1, 12);
    expect(impact.withoutScheme?.inundatedLength).toBe(0);
  });

  it('assesses only the part inside the computed reach, and nothing beyond it', () => {
    expect(parcelImpact({ from: 1500, to: 2600, groundLevel: null }, withScheme, without, opts).assessed).toEqual({ from: 1500, to: 2000 });
    const beyond = parcelImpact({ from: 2100, to: 2600, groundLevel: null }, withScheme, without, opts);
    expect(beyond.category).toBe('outside-reach');
    expect(beyond.assessed).toBeNull();
  });

  it('ranks a parcel by its worst event', () => {
    expect(worstCategory(['not-affected', 'below-threshold'])).toBe('below-threshold');
    expect(worstCategory(['outside-reach', 'affected', 'not-affected'])).toBe('affected');
    expect(worstCategory(['outside-reach'])).toBe('outside-reach');
  });
});
