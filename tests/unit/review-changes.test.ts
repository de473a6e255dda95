import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { flattenInputs, partOfPath } from '@/lib/review/input-fields';
import { keyResults } from '@/lib/review/key-results';
import { inputChanges, resultChanges } from '@/lib/review/revision-changes';
import { parseCase } from '@/lib/validation/parse-case';

// The invented River Wendle demo case; the expected differences follow from the edits made below, not from any source.
interface DemoCase {
  title: string;
  control: { crestLength: number };
  events: { name: string; discharge: number }[];
  sizing?: unknown;
}
const text = readFileSync('db/seeds/cases/wendle-harrowfield-broad-crested.json', 'utf8');
const base = JSON.parse(text) as DemoCase;
const copy = () => JSON.parse(text) as DemoCase;

function evaluated(value: unknown) {
  const parsed = parseCase(value);
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => `${i.path} ${i.message}`).join('; '));
  return evaluateCase(parsed.value);
}

describe('flattening a case file into fields by part', () => {
  it('names every leaf by its case-file path and sorts it into the part a checker comments on', () => {
    const fields = flattenInputs(base);
    expect(fields).toContainEqual({ path: 'reach.manningN', part: 'channel', value: 0.035 });
    expect(fields).toContainEqual({ path: 'events[1].discharge', part: 'flows', value: 38 });
    expect(fields).toContainEqual({ path: 'control.crestLength', part: 'structure', value: 10 });
    expect(fields).toContainEqual({ path: 'limits[0].maxLevel', part: 'limits', value: 35.6 });
    expect(fields).toContainEqual({ path: 'title', part: 'scheme', value: base.title });
    expect(partOfPath('sizing.vary')).toBe('results');
  });

  it('keeps a list of number pairs (a surveyed section) as one readable field', () => {
    const fields = flattenInputs({ reach: { sections: [{ points: [[0, 10], [5, 8.5], [10, 10]] }] } });
    expect(fields).toEqual([{ path: 'reach.sections[0].points', part: 'channel', value: '[0, 10] [5, 8.5] [10, 10]' }]);
  });
});

describe('changes between two revisions', () => {
  it('reports each changed, added and removed input field with its old and new value', () => {
    const next = copy();
    next.control.crestLength = 12;
    next.events.push({ name: '0.1% AEP', discharge: 60 });
    delete next.sizing;
    const changes = inputChanges(base, next);
    expect(changes).toContainEqual({ part: 'structure', field: 'control.crestLength', label: 'proposed structure: crest length (m)', before: 10, after: 12, change: 'changed', kind: 'none' });
    expect(changes).toContainEqual(expect.objectContaining({ field: 'events[2].discharge', label: 'flood event “0.1% AEP”: peak discharge (m³/s)', before: null, after: 60, change: 'added' }));
    expect(changes).toContainEqual(expect.objectContaining({ field: 'sizing.vary', label: 'crest sizing: dimension to size (sill height or crest length)', before: 'crestLength', after: null, change: 'removed' }));
    expect(inputChanges(base, copy())).toEqual([]);
  });

  it('reports the key results that a longer crest changes, and none for an identical re-run', () => {
    const before = evaluated(base);
    const next = copy();
    next.control.crestLength = 12;
    const after = evaluated(next);
    expect(resultChanges(before, evaluated(copy()))).toEqual([]);
    const changed = resultChanges(before, after, 1e-6).map((c) => c.field);
    expect(changed).toContain('1% AEP: head over the crest');
    expect(changed).toContain('1% AEP: control depth');
    expect(changed).not.toContain('1% AEP: design discharge');
    const head = resultChanges(before, after).find((c) => c.field === '1% AEP: head over the crest')!;
    // A longer crest passes the same flood with less head over it.
    expect(head.after as number).toBeLessThan(head.before as number);
    expect(head.kind).toBe('length');
  });

  it('keys results by event and limit names, so the same results in another order are no change', () => {
    const results = evaluated(base);
    const reordered = { ...results, events: [...results.events].reverse() };
    expect(resultChanges(results, reordered)).toEqual([]);
    expect(keyResults(results).filter((r) => r.key.endsWith(':pass'))).toHaveLength(4);
  });
});
