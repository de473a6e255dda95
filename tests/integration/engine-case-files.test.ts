// The engine through its case-file command, checked against references worked out here, outside the engine.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { villemonteFactor } from '@/lib/hydraulics/weirs/submergence';
import { bisect, odexAlongDistance, referenceNormalDepth, type TrapezoidCase } from '../unit/hydraulics/profile-reference-solutions';

const G = 9.80665;
const FIXTURES = join(__dirname, '../fixtures/cases');
const SLOW = { timeout: 180_000 };

function evaluateFile(file: string): CaseResult {
  const cli = spawnSync('npm', ['run', '--silent', 'evaluate', '--', file], { encoding: 'utf8' });
  if (cli.status !== 0) throw new Error(`evaluate exited ${cli.status}: ${cli.stderr}`);
  return JSON.parse(cli.stdout) as CaseResult;
}

type EditableCase = { control: { sillHeight: number }; sizing?: unknown };

function evaluateVariant(fixture: string, change: (c: EditableCase) => void): CaseResult {
  const raw = JSON.parse(readFileSync(join(FIXTURES, fixture), 'utf8')) as EditableCase;
  change(raw);
  const file = join(mkdtempSync(join(tmpdir(), 'case-')), fixture);
  writeFileSync(file, JSON.stringify(raw));
  return evaluateFile(file);
}

// The fixtures' channel: 8 m rectangle, n = 0.03, S₀ = 0.001, Q = 20 m³/s (invented).
const channel: TrapezoidCase = { bottomWidth: 8, sideSlope: 0, manningN: 0.03, discharge: 20, bedSlope: 0.001, alpha: 1 };

describe('a low weir in a deep flow heads the water up (Villemonte 1947)', () => {
  it('the head solves Cd·(2/3)√(2g)·b·h^1.5·(1 − (h₂/h₁)^1.5)^0.385 = Q against the normal depth downstream, within 0.5 %', SLOW, () => {
    const result = evaluateFile(join(FIXTURES, 'drowned-sharp-crested.json'));
    const event = result.events[0];
    // Reference: normal depth by bisection on Manning's equation, then the submerged head by bisection on Villemonte's relation.
    const yn = referenceNormalDepth(channel);
    const sill = 0.4;
    const h2 = yn - sill;
    const free = (h: number) => 0.62 * (2 / 3) * Math.sqrt(2 * G) * 8 * h ** 1.5;
    const head = bisect((h) => free(h) * villemonteFactor(h2 / h) - 20, h2 + 1e-9, 10);
    expect(Math.abs(event.control.head - head) / head).toBeLessThan(0.005);
    expect(event.afflux.atControl).toBeGreaterThan(0.1);
    expect(event.afflux.atControl).toBeCloseTo(sill + head - yn, 3);
    expect(event.extent.endsBy).toBe('threshold');
    expect(event.control.weir?.submergence?.relation).toContain('Villemonte');
  });
});

describe('a given depth below normal depth is a boundary condition: the M2 drawdown', () => {
  it('depths agree with odex integrating the GVF equation from the same depth within 5 mm, and the drawdown is negative afflux', SLOW, () => {
    const result = evaluateFile(join(FIXTURES, 'drawdown-depth-control.json'));
    const event = result.events[0];
    expect(event.profileType).toBe('M2');
    const points = event.profile.filter((p) => p.distanceUpstream > 0);
    const reference = odexAlongDistance(channel, 1.2, points.map((p) => p.distanceUpstream));
    points.forEach((p, i) => expect(Math.abs(p.depth - reference.depths[i])).toBeLessThan(0.005));
    const yn = referenceNormalDepth(channel);
    expect(event.afflux.atControl).toBeCloseTo(1.2 - yn, 4);
    expect(event.afflux.min).toBeLessThan(0);
    expect(event.extent.sense).toBe('drawdown');
    // Where the drawdown is back within the 10 mm threshold: the depth reaches yn − 0.01 m (odex, the same reference).
    const back = odexAlongDistance(channel, 1.2, [8000], yn - 0.01).distanceToTarget;
    expect(back).not.toBeNull();
    expect(Math.abs(event.extent.distanceUpstream - (back as number)) / (back as number)).toBeLessThan(0.01);
  });
});

describe('the crest search finds the crest whenever one exists', () => {
  it('the default search, from the physics, sizes the trial case and names what governs it', SLOW, () => {
    const result = evaluateFile(join(FIXTURES, 'crest-search-trial.json'));
    const sizing = result.sizing;
    expect(sizing?.value).not.toBeNull();
    expect(sizing?.searchedRange).toMatch(/from 0\.01 m .* to 3\.00 m \(the bank at the structure/);
    expect(sizing?.governing?.limit).toMatch(/meadow/);
    expect(sizing?.governing?.margin).toBeGreaterThanOrEqual(0);
    const value = sizing?.value as number;
    const atValue = evaluateVariant('crest-search-trial.json', (c) => ((c.control.sillHeight = value), delete c.sizing));
    const above = evaluateVariant('crest-search-trial.json', (c) => ((c.control.sillHeight = Number((value + 0.01).toFixed(2))), delete c.sizing));
    expect(atValue.verdict).toBe('pass');
    expect(above.verdict).toBe('fail');
  });

  it('a crest far too low is a result, not a failure: it passes at the level the channel holds', SLOW, () => {
    const low = evaluateVariant('crest-search-trial.json', (c) => ((c.control.sillHeight = 0.05), delete c.sizing));
    for (const event of low.events) expect(event.afflux.atControl).toBeGreaterThanOrEqual(0);
    expect(low.verdict).toBe('pass');
  });
});
