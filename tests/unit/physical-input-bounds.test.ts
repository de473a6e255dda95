import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { parseSurveyCsv } from '@/lib/validation/survey-csv';
import { parseCase } from '@/lib/validation/parse-case';

// Values the fuzz test (evaluate-case-fuzz) found to end in an engine error naming the engine's own variable
// (`depth`): a Manning's n or a discharge of 5e-324. They are now refused where they are typed, with the field named.
const demo = () => JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-broad-crested.json', 'utf8'));

describe('physical bounds on what a case may give', () => {
  it("refuses a Manning's n below 0.005 or above 0.5, and keeps one within", () => {
    for (const manningN of [5e-324, 0.004]) {
      const parsed = parseCase({ ...demo(), reach: { ...demo().reach, manningN } });
      expect(parsed.ok ? [] : parsed.issues).toEqual([{ path: 'reach.manningN', message: "must be at least 0.005 (Manning's n is dimensionless, typically 0.01–0.15)" }]);
    }
    expect(parseCase({ ...demo(), reach: { ...demo().reach, manningN: 0.6 } }).ok).toBe(false);
    expect(parseCase({ ...demo(), reach: { ...demo().reach, manningN: 0.009 } }).ok).toBe(true);
  });

  it('refuses a flood smaller than 0.001 m³/s, says "greater than 0" for a negative one, and evaluates one at the bound', () => {
    const withDischarge = (discharge: number) => ({ ...demo(), events: [{ name: 'trickle', discharge }] });
    const issues = (discharge: number) => {
      const parsed = parseCase(withDischarge(discharge));
      return parsed.ok ? [] : parsed.issues.map((i) => `${i.path}: ${i.message}`);
    };
    expect(issues(5e-324)).toEqual(['events[0].discharge: must be at least 0.001 m³/s (a smaller flow is below what the depth calculations resolve)']);
    expect(issues(-5)).toEqual(['events[0].discharge: must be greater than 0 m³/s']);
    const atBound = parseCase({ ...withDischarge(0.001), reach: { ...demo().reach, section: { shape: 'rectangular', width: 1e6 } } });
    if (!atBound.ok) throw new Error(JSON.stringify(atBound.issues));
    expect(() => evaluateCase(atBound.value)).not.toThrow();
  });

  it("refuses a survey line whose Manning's n is below 0.005, naming the line", () => {
    const csv = ['distance_upstream,station,elevation,manning_n', '0,0,35,0.001', '0,5,31,0.035', '0,10,35,0.035'].join('\n');
    const result = parseSurveyCsv(csv, 'SI');
    expect(JSON.stringify(result)).toContain('manning_n 0.001 must be at least 0.005 and at most 0.5');
  });
});
