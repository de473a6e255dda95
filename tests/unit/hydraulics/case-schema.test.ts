import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { caseToSI } from '@/lib/hydraulics/case-units';
import { caseSchema } from '@/lib/validation/case-schema';
import { fieldPath, parseCase, parseCaseText } from '@/lib/validation/parse-case';

const demo = (name: string) => JSON.parse(readFileSync(join(__dirname, '../../../db/seeds/cases', name), 'utf8'));

describe('parseCase', () => {
  it('accepts the demo cases and fills the defaults', () => {
    const parsed = parseCase(demo('wendle-harrowfield-depth-control.json'));
    expect(parsed.ok).toBe(true);
    if (parsed.ok) {
      expect(parsed.value.units).toBe('SI');
      expect(parsed.value.limits[1].freeboard).toBe(0);
    }
  });

  it('names the field path of a bad value, with its unit', () => {
    const raw = demo('wendle-harrowfield-broad-crested.json');
    raw.reach.section.bottomWidth = -9;
    raw.events[1].discharge = 0;
    const parsed = parseCase(raw);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) {
      expect(parsed.issues).toContainEqual({ path: 'reach.section.bottomWidth', message: 'must be greater than 0 m' });
      expect(parsed.issues).toContainEqual({ path: 'events[1].discharge', message: 'must be greater than 0 m³/s' });
    }
  });

  it('quotes US units in the messages of a US case', () => {
    const raw = demo('wendle-harrowfield-us-customary.json');
    raw.control.sillHeight = -1;
    const parsed = parseCase(raw);
    expect(!parsed.ok && parsed.issues[0]).toEqual({ path: 'control.sillHeight', message: 'must be 0 ft or more' });
  });

  it('says a missing field is required', () => {
    const raw = demo('wendle-harrowfield-ogee.json');
    delete raw.reach.length;
    const parsed = parseCase(raw);
    expect(!parsed.ok && parsed.issues).toContainEqual({ path: 'reach.length', message: 'is required' });
  });

  it('rejects another format or version with one clear message', () => {
    const other = parseCase({ format: 'someone-elses-file', version: 1 });
    expect(!other.ok && other.issues).toEqual([{ path: 'format', message: expect.stringContaining('not a Sillmark case file') }]);
    const newer = parseCase({ ...demo('wendle-harrowfield-ogee.json'), version: 2 });
    expect(!newer.ok && newer.issues).toEqual([{ path: 'version', message: expect.stringContaining('2 is not supported') }]);
  });

  it('explains bad JSON', () => {
    const parsed = parseCaseText('{ "format": "sillmark-case", ');
    expect(!parsed.ok && parsed.issues[0].path).toBe('case');
    expect(!parsed.ok && parsed.issues[0].message).toMatch(/^is not valid JSON/);
  });

  it('ignores unknown keys', () => {
    const parsed = parseCase({ ...demo('wendle-harrowfield-ogee.json'), remarks: 'checked by hand' });
    expect(parsed.ok).toBe(true);
  });

  it('checks the rating table and surveyed sections row by row', () => {
    const table = demo('wendle-harrowfield-rating-table.json');
    table.control.ratingTable[3] = [0.4, 9.0];
    const t = parseCase(table);
    expect(!t.ok && t.issues.map((i) => i.path)).toContain('control.ratingTable[3]');
    const survey = demo('wendle-harrowfield-surveyed-broad-crested.json');
    survey.reach.sections[2].distanceUpstream = 100;
    const s = parseCase(survey);
    expect(!s.ok && s.issues.map((i) => i.path)).toContain('reach.sections[2].distanceUpstream');
  });

  it('writes paths with brackets for list items', () => {
    expect(fieldPath(['reach', 'sections', 2, 'points', 0])).toBe('reach.sections[2].points[0]');
    expect(fieldPath([])).toBe('case');
  });
});

describe('caseToSI', () => {
  it('converts lengths by 0.3048 and discharges by 0.3048³ (exact definitions of the international foot)', () => {
    const us = caseSchema.parse(demo('wendle-harrowfield-us-customary.json'));
    const si = caseToSI(us);
    expect(si.units).toBe('SI');
    expect(si.reach.kind === 'prismatic' && si.reach.length).toBeCloseTo(20000 * 0.3048, 9);
    expect(si.reach.kind === 'prismatic' && si.reach.section.shape === 'trapezoidal' && si.reach.section.bottomWidth).toBeCloseTo(10.0584, 12);
    expect(si.events[1].discharge).toBeCloseTo(1340 * 0.028316846592, 9);
    expect(si.limits[0].maxLevel).toBeCloseTo(116.5 * 0.3048, 12);
    // slopes, Manning's n and the dimensionless Cd are the same numbers in both systems
    expect(si.reach.kind === 'prismatic' && si.reach.bedSlope).toBe(0.0006);
    expect(si.reach.kind === 'prismatic' && si.reach.manningN).toBe(0.035);
  });

  it('leaves an SI case as it is', () => {
    const si = caseSchema.parse(demo('wendle-harrowfield-ogee.json'));
    expect(caseToSI(si)).toBe(si);
  });
});
