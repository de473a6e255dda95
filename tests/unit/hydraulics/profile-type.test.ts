import { describe, expect, it } from 'vitest';
import { criticalDepth } from '@/lib/hydraulics/critical-depth';
import { EngineError, NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { normalDepth } from '@/lib/hydraulics/normal-depth';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { directStepProfile } from '@/lib/hydraulics/profiles/direct-step';
import { profileType } from '@/lib/hydraulics/profiles/profile-type';

// The twelve profile zones as laid out in Chow, Open-Channel Hydraulics (1959), §9-3 and Fig. 9-1 (from memory):
// zone 1 above both yn and yc, zone 2 between them, zone 3 below both; H and A beds have no zone 1.
describe('profileType: the classical table', () => {
  const cases: [Parameters<typeof profileType>[0], number, number | null, number, string][] = [
    ['mild', 2.0, 1.5, 1.0, 'M1'],
    ['mild', 1.2, 1.5, 1.0, 'M2'],
    ['mild', 0.8, 1.5, 1.0, 'M3'],
    ['steep', 1.2, 0.6, 1.0, 'S1'],
    ['steep', 0.8, 0.6, 1.0, 'S2'],
    ['steep', 0.5, 0.6, 1.0, 'S3'],
    ['critical', 1.3, 1.0, 1.0, 'C1'],
    ['critical', 0.7, 1.0, 1.0, 'C3'],
    ['horizontal', 1.3, null, 1.0, 'H2'],
    ['horizontal', 0.7, null, 1.0, 'H3'],
    ['adverse', 1.3, null, 1.0, 'A2'],
    ['adverse', 0.7, null, 1.0, 'A3'],
  ];
  it.each(cases)('%s bed, depth %f, yn %s, yc %f → %s', (slopeClass, depth, yn, yc, expected) => {
    expect(profileType(slopeClass, depth, yn, yc)).toBe(expected);
  });

  it('covers all twelve types exactly once', () => {
    expect(new Set(cases.map((c) => c[4])).size).toBe(12);
  });

  it('puts a depth on a zone boundary in the zone above it', () => {
    expect(profileType('mild', 1.5, 1.5, 1.0)).toBe('M1');
    expect(profileType('mild', 1.0, 1.5, 1.0)).toBe('M2');
    expect(profileType('steep', 1.0, 0.6, 1.0)).toBe('S1');
  });

  it('rejects a mild or steep bed without a normal depth, and non-positive depths', () => {
    expect(() => profileType('mild', 1, null, 1)).toThrow(EngineError);
    expect(() => profileType('steep', 0.5, null, 1)).toThrow(EngineError);
    expect(() => profileType('mild', 0, 1.5, 1)).toThrow(EngineError);
    expect(() => profileType('mild', 1, 1.5, Number.NaN)).toThrow(EngineError);
  });
});

describe('profile type from real reaches (invented channel: 6 m rectangle, n = 0.03, 12 m³/s)', () => {
  const section = prismaticSection({ shape: 'rectangular', width: 6 }, 0.03);
  const discharge = 12;
  const yc = criticalDepth(section, discharge);
  const run = (bedSlope: number, controlDepth: number) =>
    directStepProfile({ section, discharge, bedSlope, controlDepth, bedLevelAtControl: 100, reachLength: 2000, depthSteps: 64, skipSelfCheck: true });

  it('reports M1, M2, H2, A2, C1 and S1 for subcritical controls', () => {
    const mild = 0.0005;
    const yn = normalDepth(section, discharge, mild);
    expect(run(mild, yn * 1.6).profileType).toBe('M1');
    expect(run(mild, (yn + yc) / 2).profileType).toBe('M2');
    expect(run(0, yc * 1.5).profileType).toBe('H2');
    expect(run(-0.0005, yc * 1.5).profileType).toBe('A2');
    expect(run(0.05, yc * 2).profileType).toBe('S1');
    // Critical slope: the slope at which normal depth equals critical depth, found from Manning with yn = yc.
    const state = section.stateAtDepth(yc);
    const criticalSlope = (discharge / state.conveyance) ** 2;
    expect(run(criticalSlope, yc * 1.5).profileType).toBe('C1');
  });

  it('throws the typed error for a control below critical depth on a mild reach', () => {
    try {
      run(0.0005, yc * 0.8);
      expect.unreachable('a control below critical depth must throw');
    } catch (error) {
      expect(error).toBeInstanceOf(NoPhysicalSolutionError);
      expect((error as NoPhysicalSolutionError).field).toBe('control');
      expect((error as NoPhysicalSolutionError).code).toBe('control-below-critical');
      expect((error as Error).message).toContain('below the critical depth');
    }
  });

  it('treats a control at normal depth as a profile of no length', () => {
    const mild = 0.0005;
    const yn = normalDepth(section, discharge, mild);
    const profile = run(mild, yn);
    expect(profile.points).toHaveLength(1);
    expect(profile.stoppedBy).toBe('normal-depth');
  });
});
