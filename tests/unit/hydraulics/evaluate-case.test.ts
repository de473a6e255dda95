import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { InvalidInputError, NoPhysicalSolutionError } from '@/lib/hydraulics/errors';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { METRES_PER_FOOT } from '@/lib/hydraulics/units';
import type { CaseInput } from '@/lib/validation/case-schema';
import { parseCase } from '@/lib/validation/parse-case';

// The demo cases are our own invented scenario (the fictional River Wendle at Harrowfield Mill).
const CASES_DIR = join(__dirname, '../../../db/seeds/cases');
const demoFiles = readdirSync(CASES_DIR).filter((f) => f.endsWith('.json'));
const SLOW = { timeout: 120_000 };

function load(file: string): CaseInput {
  const parsed = parseCase(JSON.parse(readFileSync(join(CASES_DIR, file), 'utf8')));
  if (!parsed.ok) throw new Error(`${file}: ${JSON.stringify(parsed.issues)}`);
  return parsed.value;
}

function allNumbersFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allNumbersFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(allNumbersFinite);
  return true;
}

const results = new Map<string, CaseResult>();
function resultOf(file: string): CaseResult {
  if (!results.has(file)) results.set(file, evaluateCase(load(file)));
  return results.get(file) as CaseResult;
}

describe('demo cases', () => {
  it('cover every reach kind and structure type, and one US case', () => {
    const inputs = demoFiles.map(load);
    const kinds = new Set(inputs.map((c) => `${c.reach.kind}+${c.control.type === 'weir' ? c.control.kind : 'depth'}`));
    for (const k of ['prismatic+sharp-crested', 'prismatic+broad-crested', 'prismatic+ogee', 'prismatic+rating-table', 'prismatic+depth', 'surveyed+broad-crested']) {
      expect(kinds.has(k)).toBe(true);
    }
    expect(inputs.some((c) => c.units === 'US')).toBe(true);
  });

  for (const file of demoFiles) {
    it(`${file}: result structure and verdict logic`, SLOW, () => {
      const input = load(file);
      const result = resultOf(file);
      expect(allNumbersFinite(result)).toBe(true);
      expect(result.events).toHaveLength(input.events.length);
      for (const event of result.events) {
        const p = event.profile;
        expect(p[0].distanceUpstream).toBe(0);
        p.forEach((q, j) => j > 0 && expect(q.distanceUpstream).toBeGreaterThanOrEqual(p[j - 1].distanceUpstream));
        expect(p[0].depth).toBeCloseTo(event.control.depth, 9);
        expect(p[0].waterLevel).toBeCloseTo(event.control.level, 9);
        if (event.control.weir && event.control.causesBackwater) expect(event.control.depth).toBeCloseTo(event.control.weir.sillHeight + event.control.head, 9);
        for (const limit of event.limits) {
          // pass when waterLevel + freeboard ≤ maxLevel; margin = maxLevel − freeboard − waterLevel (the case-file rule)
          expect(limit.margin).toBeCloseTo(limit.maxLevel - limit.freeboard - limit.waterLevel, 9);
          expect(limit.pass).toBe(limit.waterLevel + limit.freeboard <= limit.maxLevel);
          if (limit.source === 'beyond-profile') expect(limit.waterLevel).toBe(limit.withoutSchemeLevel);
        }
        expect(event.verdict).toBe(event.limits.every((l) => l.pass) ? 'pass' : 'fail');
        expect(event.limits).toHaveLength(input.limits.length);
      }
      expect(result.verdict).toBe(result.events.some((e) => e.verdict === 'fail') ? 'fail' : 'pass');
      const margins = result.events.map((e) => e.leastMargin ?? Infinity);
      if (result.governingEvent) expect(result.governingEvent.leastMargin).toBe(Math.min(...margins));
    });
  }

  it('the rise at the control is what the structure holds above the level without it', SLOW, () => {
    const event = resultOf('wendle-harrowfield-sharp-crested.json').events[1];
    expect(event.afflux.atControl).toBeCloseTo(event.control.level - event.withoutScheme.controlLevel, 9);
    expect(event.withoutScheme.controlDepth).toBeCloseTo(event.normalDepth, 9);
    expect(event.afflux.atControl).toBeGreaterThan(0);
  });

  it('applies the climate-change allowance to the discharge', SLOW, () => {
    const event = resultOf('wendle-harrowfield-sharp-crested.json').events[2];
    expect(event.discharge).toBeCloseTo(38 * 1.25, 12);
    expect(event.baseDischarge).toBe(38);
  });

  it('sizes the sill: the value passes and the next increment up fails', SLOW, () => {
    const sizing = resultOf('wendle-harrowfield-sharp-crested.json').sizing;
    expect(sizing?.value).not.toBeNull();
    const input = load('wendle-harrowfield-sharp-crested.json');
    const at = (sill: number) => evaluateCase({ ...input, sizing: undefined, sensitivity: undefined, control: { ...input.control, sillHeight: sill } as CaseInput['control'] });
    const value = sizing?.value ?? NaN;
    expect(at(value).verdict).toBe('pass');
    expect(at(value + 0.05).verdict).toBe('fail');
  });

  it('reports sensitivity: more roughness raises the levels at the limits', SLOW, () => {
    const s = resultOf('wendle-harrowfield-ogee.json').sensitivity;
    const up = s?.cases.find((c) => c.label === 'manning-n-up');
    expect(up?.levelChanges?.every((d) => d > 0)).toBe(true);
  });
});

describe('US customary units', () => {
  const toSI = (us: CaseInput): CaseInput => {
    // Our own conversion, written out field by field (1 ft = 0.3048 m exactly; 1 ft³/s = 0.3048³ m³/s).
    const ft = METRES_PER_FOOT;
    const reach = us.reach;
    if (reach.kind !== 'prismatic' || reach.section.shape !== 'trapezoidal' || us.control.type !== 'weir') throw new Error('test expects the demo US case');
    return {
      ...us,
      units: 'SI',
      reach: { ...reach, section: { ...reach.section, bottomWidth: reach.section.bottomWidth * ft }, length: reach.length * ft, bedLevelAtControl: reach.bedLevelAtControl * ft, bankHeight: (reach.bankHeight ?? NaN) * ft },
      events: us.events.map((e) => ({ ...e, discharge: e.discharge * ft ** 3 })),
      control: {
        ...us.control,
        crestLength: (us.control.crestLength ?? NaN) * ft,
        sillHeight: us.control.sillHeight * ft,
        crestBreadth: (us.control.crestBreadth ?? NaN) * ft,
        ...(us.control.kind === 'ogee' && us.control.coefficient !== undefined ? { coefficient: us.control.coefficient * Math.sqrt(ft) } : {}),
      },
      impactThreshold: (us.impactThreshold ?? NaN) * ft,
      limits: us.limits.map((l) => ({ ...l, distanceUpstream: l.distanceUpstream * ft, maxLevel: l.maxLevel * ft, freeboard: l.freeboard * ft })),
    };
  };

  function expectSameResults(us: CaseResult, si: CaseResult): void {
    const ft = METRES_PER_FOOT;
    expect(us.units).toBe('US');
    expect(us.verdict).toBe(si.verdict);
    us.events.forEach((e, i) => {
      const s = si.events[i];
      expect(e.discharge * ft ** 3).toBeCloseTo(s.discharge, 8);
      expect(e.normalDepth * ft).toBeCloseTo(s.normalDepth, 8);
      expect(e.criticalDepth * ft).toBeCloseTo(s.criticalDepth, 8);
      expect(e.control.level * ft).toBeCloseTo(s.control.level, 8);
      expect(e.control.head * ft).toBeCloseTo(s.control.head, 8);
      expect((e.control.weir?.coefficient ?? 0) * (e.control.weir?.kind === 'ogee' ? Math.sqrt(ft) : 1)).toBeCloseTo(s.control.weir?.coefficient ?? 0, 8);
      expect(e.extent.distanceUpstream * ft).toBeCloseTo(s.extent.distanceUpstream, 5);
      expect(e.profile).toHaveLength(s.profile.length);
      e.profile.forEach((p, j) => {
        expect(p.waterLevel * ft).toBeCloseTo(s.profile[j].waterLevel, 7);
        expect(p.velocity * ft).toBeCloseTo(s.profile[j].velocity, 8);
        expect(p.froude).toBeCloseTo(s.profile[j].froude, 8);
      });
      e.limits.forEach((l, j) => expect(l.margin * ft).toBeCloseTo(s.limits[j].margin, 7));
    });
  }

  it('a US case gives the SI case converted (broad-crested demo)', SLOW, () => {
    const us = load('wendle-harrowfield-us-customary.json');
    expectSameResults(evaluateCase(us), evaluateCase(toSI(us)));
  });

  it('converts a user ogee coefficient C (ft^0.5/s ↔ m^0.5/s)', SLOW, () => {
    const base = load('wendle-harrowfield-us-customary.json');
    const us = { ...base, events: [base.events[1]], control: { ...base.control, kind: 'ogee', coefficient: 3.9, abutmentCoefficient: 0 } } as CaseInput;
    const si = toSI(us);
    expect(si.control.type === 'weir' && si.control.coefficient).toBeCloseTo(3.9 * Math.sqrt(0.3048), 12);
    expectSameResults(evaluateCase(us), evaluateCase(si));
  });
});

describe('explained failures and special cases', () => {
  const base = (): CaseInput => load('wendle-harrowfield-sharp-crested.json');
  const simple = (c: CaseInput): CaseInput => ({ ...c, sizing: undefined, sensitivity: undefined, events: [c.events[1]] });

  it('a horizontal reach needs an existing control, and then reports no normal depth', SLOW, () => {
    const flat = simple({ ...base(), reach: { ...base().reach, bedSlope: 0 } as CaseInput['reach'] });
    expect(() => evaluateCase(flat)).toThrow(InvalidInputError);
    expect(() => evaluateCase(flat)).toThrow(/^existingControl/);
    const withExisting = evaluateCase({ ...flat, existingControl: { type: 'depth', depth: 2.0 } });
    const event = withExisting.events[0];
    expect(event.slopeClass).toBe('horizontal');
    expect(event.normalDepthExists).toBe(false);
    expect(event.normalDepth).toBe(0);
    expect(event.profileType).toBe('H2');
  });

  it('a depth control below critical depth is an explained error on the control', SLOW, () => {
    const c = simple({ ...base(), control: { type: 'depth', depth: 0.5 } });
    try {
      evaluateCase(c);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(NoPhysicalSolutionError);
      expect((error as NoPhysicalSolutionError).code).toBe('control-below-critical');
      expect((error as NoPhysicalSolutionError).field).toBe('control.depth');
    }
  });

  it('a given depth below the level without the scheme is a boundary condition: an M2 drawdown, negative afflux with its extent', SLOW, () => {
    const c = simple({ ...base(), control: { type: 'depth', depth: 1.5 } });
    const event = evaluateCase(c).events[0];
    expect(event.control.causesBackwater).toBe(false);
    expect(event.profileType).toBe('M2');
    expect(event.afflux.max).toBeCloseTo(0, 9);
    expect(event.afflux.min).toBeLessThan(-0.1);
    expect(event.afflux.atControl).toBeCloseTo(event.afflux.min, 9);
    expect(event.extent.sense).toBe('drawdown');
    expect(event.extent.distanceUpstream).toBeGreaterThan(0);
  });

  it('a weir deep in its tailwater still heads the water up: computed past the data, with a warning', SLOW, () => {
    const b = base();
    // Tailwater 5.0 m over a 0.9 m sill: the 1 % AEP flow passes with H₂/H₁ above 0.95.
    const c = simple({ ...b, control: { ...b.control, tailwaterDepth: 5.0 } as CaseInput['control'] });
    const event = evaluateCase(c).events[0];
    expect(event.control.head).toBeGreaterThan(5.0 - 0.9);
    expect(event.afflux.atControl).toBeGreaterThan(0);
    expect(event.warnings.join(' ')).toMatch(/past the data of the relation/);
  });

  it('a version 1 file with the old tailwaterLevel key is read as the depth, with a deprecation warning', SLOW, () => {
    const b = base();
    const old = evaluateCase(simple({ ...b, control: { ...b.control, tailwaterLevel: 3.0 } as CaseInput['control'] }));
    const renamed = evaluateCase(simple({ ...b, control: { ...b.control, tailwaterDepth: 3.0 } as CaseInput['control'] }));
    expect(old.events[0].control.head).toBeCloseTo(renamed.events[0].control.head, 12);
    expect(old.warnings.join(' ')).toMatch(/tailwaterLevel.*tailwaterDepth/);
  });

  it('a limit beyond the reach is an input error on that limit', SLOW, () => {
    const b = base();
    const c = simple({ ...b, limits: [...b.limits, { label: 'Far away', distanceUpstream: 9000, maxLevel: 40, freeboard: 0 }] });
    expect(() => evaluateCase(c)).toThrow(/^limits\[3\]\.distanceUpstream/);
  });

  it('a discharge beyond the rating table names control.ratingTable', SLOW, () => {
    const c = load('wendle-harrowfield-rating-table.json');
    expect(() => evaluateCase({ ...c, events: [{ name: 'huge', discharge: 90 }] })).toThrow(/^control\.ratingTable/);
  });
});
