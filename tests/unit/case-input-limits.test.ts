import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MAX_EVENTS, MAX_LIMITS, MAX_POINTS_PER_SECTION, MAX_SURVEYED_SECTIONS } from '@/lib/validation/input-limits';
import { parseCase } from '@/lib/validation/parse-case';

const demo = (name: string) => JSON.parse(readFileSync(`db/seeds/cases/${name}`, 'utf8')) as Record<string, unknown> & { reach: { sections: { distanceUpstream: number; points: [number, number][] }[] } };

function issuesOf(raw: unknown) {
  const parsed = parseCase(raw);
  return parsed.ok ? [] : parsed.issues;
}

describe('the case file limits', () => {
  it('accepts a case at each limit and refuses one beyond it, naming the field, the limit and the count', () => {
    const prismatic = demo('wendle-harrowfield-broad-crested.json');
    const events = (n: number) => Array.from({ length: n }, (_, i) => ({ name: `Event ${i + 1}`, discharge: 10 + i }));
    expect(issuesOf({ ...prismatic, events: events(MAX_EVENTS) })).toEqual([]);
    expect(issuesOf({ ...prismatic, events: events(MAX_EVENTS + 1) })).toEqual([{ path: 'events', message: `are too many: at most ${MAX_EVENTS} per case (this one has ${MAX_EVENTS + 1}); reduce them to ${MAX_EVENTS} or fewer` }]);
    const limits = Array.from({ length: MAX_LIMITS + 1 }, (_, i) => ({ label: `Place ${i}`, distanceUpstream: i, maxLevel: 40 }));
    expect(issuesOf({ ...prismatic, limits }).map((i) => i.path)).toEqual(['limits']);
  });

  it('refuses too many surveyed cross-sections and too many points in one of them', () => {
    const surveyed = demo('wendle-harrowfield-surveyed-broad-crested.json');
    const first = surveyed.reach.sections[0];
    const sections = Array.from({ length: MAX_SURVEYED_SECTIONS + 1 }, (_, i) => ({ ...first, distanceUpstream: i * 5 }));
    expect(issuesOf({ ...surveyed, reach: { ...surveyed.reach, sections } })).toEqual([
      { path: 'reach.sections', message: `are too many: at most ${MAX_SURVEYED_SECTIONS} per reach (this one has ${MAX_SURVEYED_SECTIONS + 1}); reduce them to ${MAX_SURVEYED_SECTIONS} or fewer` },
    ]);
    const points = Array.from({ length: MAX_POINTS_PER_SECTION + 1 }, (_, i): [number, number] => [i * 0.1, i === 0 || i === MAX_POINTS_PER_SECTION ? 35 : 31]);
    const crowded = [{ ...first, points }, ...surveyed.reach.sections.slice(1)];
    expect(issuesOf({ ...surveyed, reach: { ...surveyed.reach, sections: crowded } }).map((i) => i.path)).toEqual(['reach.sections[0].points']);
  });
});
