import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseSurveyCsv } from '@/lib/validation/survey-csv';

const HEADER = 'distance_upstream,station,elevation,bank,manning_n';
const ok = (d: number, n = '0.035') => [`${d},0,12,,${n}`, `${d},5,10,,`, `${d},10,12,,`];
const issues = (text: string, units: 'SI' | 'US' = 'SI') => {
  const r = parseSurveyCsv(text, units);
  if (r.ok) throw new Error('expected the survey to be refused');
  return r.issues;
};

describe('survey CSV parsing', () => {
  it('reads the demo survey into sections with banks and one n per sub-area', () => {
    const r = parseSurveyCsv(readFileSync('db/seeds/surveys/wendle-harrowfield-survey.csv', 'utf8'), 'SI');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.sections).toHaveLength(6);
    expect(r.sections[0]).toMatchObject({ distanceUpstream: 0, bankStations: [27, 44], manningN: { left: 0.06, channel: 0.035, right: 0.05 }, lines: [4, 14] });
  });

  it('accepts units in the header, blank n carried down, and no banks with one n', () => {
    const r = parseSurveyCsv(['Distance upstream (ft),Station (ft),Elevation (ft),Manning n', '0,0,12,0.03', '0,5,10,', '0,10,12,', '100,0,12.1,0.03', '100,5,10.1,', '100,10,12.1,'].join('\n'), 'US');
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.sections.map((s) => s.manningN)).toEqual([0.03, 0.03]);
  });

  it('names the line and the reason for each problem, with units', () => {
    expect(issues([HEADER, ...ok(0), '120,0,12,,0.035', '120,5,10,,', '120,x,12,,'].join('\n'), 'US')).toEqual([{ line: 7, message: 'station "x" is not a number (distance across the section from its left end, ft)' }]);
    expect(issues([HEADER, ...ok(0), '100,0,12,,0.035', '100,5,10,left,', '100,10,12,,'].join('\n'))).toEqual([{ line: 6, message: 'the section at 100 m (lines 5–7) marks a left bank but no right bank: mark both, or neither' }]);
    expect(issues([HEADER, ...ok(10), ...ok(100)].join('\n'))[0].message).toMatch(/^the first section is at 10 m; it must be at distance_upstream 0 m/);
    expect(issues([HEADER, ...ok(0), '100,0,12,,0.035', '100,5,10,,0.04', '100,10,12,,'].join('\n'))[0]).toEqual({ line: 6, message: expect.stringMatching(/^manning_n changes from 0.035 to 0.04 within the section at 100 m/) });
    expect(issues([HEADER, ...ok(0), '100,0,12,,', '100,5,10,,', '100,10,12,,'].join('\n'))[0].message).toMatch(/manning_n is empty on the first point of the section at 100 m/);
    expect(issues([HEADER, ...ok(0), '100,5,12,,0.035', '100,0,10,,', '100,10,12,,'].join('\n'))[0]).toEqual({ line: 6, message: expect.stringMatching(/^station 0 m is less than 5 m on line 5/) });
    expect(issues([HEADER, '0,0,12,,0.03,extra'].join('\n'))[0]).toEqual({ line: 2, message: 'has 6 values; the header names 5 columns' });
  });

  it('refuses a file that is not text, or is empty', () => {
    expect(issues('a\u0000b')[0].message).toMatch(/is not a text file/);
    expect(issues('')[0].message).toMatch(/is empty/);
    expect(issues(HEADER)[0].message).toMatch(/has a header but no ground points/);
  });

  it('lists at most 200 problems, and says how many more there are', () => {
    const rows = Array.from({ length: 300 }, (_, i) => `0,${i},high,,0.03`);
    const found = issues([HEADER, ...rows].join('\n'));
    expect(found).toHaveLength(201);
    expect(found[200]).toEqual({ line: 0, message: 'and 100 more problems not listed; correct these first' });
  });
});
