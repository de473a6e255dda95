import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { affluxAlong } from '@/lib/hydraulics/impact/afflux';
import { extentOfImpact } from '@/lib/hydraulics/impact/extent-of-impact';
import { normalDepth } from '@/lib/hydraulics/normal-depth';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { directStepProfile } from '@/lib/hydraulics/profiles/direct-step';
import { withoutSchemePrismatic } from '@/lib/hydraulics/profiles/without-scheme';
import { at } from './test-helpers';


describe('affluxAlong (invented hand-made profiles)', () => {
  it('interpolates the without-scheme level linearly at the with-scheme distances', () => {
    const withScheme = [at(0, 12), at(50, 11.8), at(125, 11.5)];
    const without = [at(0, 11), at(100, 11.2), at(200, 11.4)];
    const afflux = affluxAlong(withScheme, without);
    expect(afflux.map((a) => a.distanceUpstream)).toEqual([0, 50, 125]);
    expect(afflux[0].afflux).toBeCloseTo(1, 12); // 12 − 11
    expect(afflux[1].afflux).toBeCloseTo(0.7, 12); // 11.8 − (11 + 0.5·0.2)
    expect(afflux[2].afflux).toBeCloseTo(0.25, 12); // 11.5 − (11.2 + 0.25·0.2)
  });

  it('refuses a without-scheme profile that stops short', () => {
    expect(() => affluxAlong([at(0, 12), at(300, 11)], [at(0, 11), at(200, 11.4)])).toThrow(InvalidInputError);
  });
});

describe('extentOfImpact', () => {
  const afflux = [0.5, 0.2, 0.05, 0.005].map((a, i) => ({ distanceUpstream: 100 * i, afflux: a }));

  it('interpolates where the afflux falls through the threshold', () => {
    // Between 200 m (0.05) and 300 m (0.005): 200 + 100·(0.05 − 0.01)/(0.05 − 0.005) = 288.89 m.
    const extent = extentOfImpact(afflux, 0.01);
    expect(extent.endsBy).toBe('threshold');
    expect(extent.distanceUpstream).toBeCloseTo(200 + (100 * 0.04) / 0.045, 9);
  });

  it('takes the furthest point when the afflux rises again upstream', () => {
    const bumpy = [0.3, 0.004, 0.02, 0.0].map((a, i) => ({ distanceUpstream: 10 * i, afflux: a }));
    expect(extentOfImpact(bumpy, 0.01).distanceUpstream).toBeCloseTo(20 + 10 * (0.01 / 0.02), 9);
  });

  it('a drawdown has its own extent, where the negative afflux is back within the threshold', () => {
    const down = afflux.map((a) => ({ ...a, afflux: -a.afflux }));
    const raised = extentOfImpact(afflux, 0.01);
    const drawn = extentOfImpact(down, 0.01);
    expect(drawn.sense).toBe('drawdown');
    expect(drawn.distanceUpstream).toBeCloseTo(raised.distanceUpstream, 12);
  });

  it('says when there is no impact at all', () => {
    expect(extentOfImpact(afflux, 0.6)).toEqual({ distanceUpstream: 0, endsBy: 'no-impact', sense: 'raise' });
  });

  it('ends at the reach end or the jump when the afflux is still above the threshold there', () => {
    const high = afflux.map((a) => ({ ...a, afflux: a.afflux + 1 }));
    const beyond = extentOfImpact(high, 0.01, 'reach-end');
    expect(beyond).toMatchObject({ distanceUpstream: 300, endsBy: 'beyond-reach', sense: 'raise' });
    expect(beyond.affluxAtReachEnd).toBeCloseTo(high[high.length - 1].afflux, 12);
    expect(beyond.warning).toMatch(/beyond the reach; lengthen the reach/);
    expect(extentOfImpact(high, 0.01, 'hydraulic-jump')).toEqual({ distanceUpstream: 300, endsBy: 'hydraulic-jump', sense: 'raise' });
    const stopped = extentOfImpact(high, 0.01, 'normal-depth');
    expect(stopped.endsBy).toBe('threshold');
    expect(stopped.warning).toContain('at least this far');
  });
});

describe('afflux of a real M1 profile over normal flow (invented channel: 10 m rectangle, n = 0.03, 25 m³/s, S₀ = 0.0005)', () => {
  const section = prismaticSection({ shape: 'rectangular', width: 10 }, 0.03);
  const discharge = 25;
  const bedSlope = 0.0005;
  const yn = normalDepth(section, discharge, bedSlope);
  const withScheme = directStepProfile({ section, discharge, bedSlope, controlDepth: yn + 1.5, bedLevelAtControl: 30, reachLength: 20000, normalDepthTolerance: 0.002 });
  const without = withoutSchemePrismatic({ section, discharge, bedSlope, bedLevelAtControl: 30, reachLength: 20000, distances: withScheme.points.map((p) => p.distanceUpstream) });
  const afflux = affluxAlong(withScheme.points, without.points);

  it('is the rise of the control above normal depth at the weir, and falls steadily upstream', () => {
    expect(afflux[0].afflux).toBeCloseTo(1.5, 9);
    for (let i = 1; i < afflux.length; i++) expect(afflux[i].afflux).toBeLessThan(afflux[i - 1].afflux);
    expect(afflux[afflux.length - 1].afflux).toBeCloseTo(0.002 * yn, 6);
  });

  it('has an extent of impact short of the profile, and longer for a smaller threshold', () => {
    const extent = extentOfImpact(afflux, 0.01, withScheme.stoppedBy);
    expect(extent.endsBy).toBe('threshold');
    expect(extent.distanceUpstream).toBeLessThan(withScheme.points[withScheme.points.length - 1].distanceUpstream);
    expect(extentOfImpact(afflux, 0.05, withScheme.stoppedBy).distanceUpstream).toBeLessThan(extent.distanceUpstream);
  });
});
