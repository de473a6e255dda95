import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CASE_FIELDS, ENGINE_ALIASES } from '@/lib/case-words/case-field-dictionary';
import { EngineError } from '@/lib/hydraulics/errors';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { parseCase } from '@/lib/validation/parse-case';

// An invented base case of our own, mutated at random.
const base = () => ({
  format: 'sillmark-case',
  version: 1,
  units: 'SI',
  reach: { kind: 'prismatic', section: { shape: 'trapezoidal', bottomWidth: 8, sideSlope: 2 }, manningN: 0.035, bedSlope: 0.0007, length: 4000, bedLevelAtControl: 20, bankHeight: 3 },
  events: [{ name: 'test flood', discharge: 25 }],
  control: { type: 'weir', kind: 'broad-crested', crestLength: 8, sillHeight: 1, approachVelocity: true } as Record<string, unknown>,
  profile: { normalDepthTolerance: 0.01 },
  limits: [{ label: 'a bridge', distanceUpstream: 500, maxLevel: 24, freeboard: 0.3 }],
});

type Raw = ReturnType<typeof base>;

// Issue 14 §8: an engine error names a field the user entered (`reach.manningN`), never one of the engine's own (`depth`).
const topOf = (path: string) => path.split(/[.[]/)[0];
const CASE_TOPS = new Set([...Object.keys(CASE_FIELDS), ...Object.keys(ENGINE_ALIASES)].map(topOf));
const mutations: Record<string, (c: Raw, v: unknown) => void> = {
  bottomWidth: (c, v) => ((c.reach.section as Record<string, unknown>).bottomWidth = v),
  sideSlope: (c, v) => ((c.reach.section as Record<string, unknown>).sideSlope = v),
  manningN: (c, v) => ((c.reach as Record<string, unknown>).manningN = v),
  bedSlope: (c, v) => ((c.reach as Record<string, unknown>).bedSlope = v),
  length: (c, v) => ((c.reach as Record<string, unknown>).length = v),
  discharge: (c, v) => ((c.events[0] as Record<string, unknown>).discharge = v),
  sillHeight: (c, v) => (c.control.sillHeight = v),
  crestLength: (c, v) => (c.control.crestLength = v),
  tailwaterDepth: (c, v) => (c.control.tailwaterDepth = v),
  coefficient: (c, v) => (c.control.coefficient = v),
  kind: (c, v) => (c.control.kind = v),
  depthControl: (c, v) => (c.control = { type: 'depth', depth: v }),
  existingControl: (c, v) => ((c as Record<string, unknown>).existingControl = { type: 'depth', depth: v }),
  limitDistance: (c, v) => ((c.limits[0] as Record<string, unknown>).distanceUpstream = v),
  tolerance: (c, v) => ((c.profile as Record<string, unknown>).normalDepthTolerance = v),
};

const value = fc.oneof(
  fc.double({ min: -5, max: 50, noNaN: true }),
  fc.double({ min: 1e-4, max: 5, noNaN: true }),
  fc.constantFrom(0, -1, 1e-6, 1e6, null, 'two', true, 'sharp-crested', 'ogee', 'rating-table'),
);

function allNumbersFinite(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allNumbersFinite);
  if (v !== null && typeof v === 'object') return Object.values(v).every(allNumbersFinite);
  return true;
}

describe('parse + evaluate on mutated cases', () => {
  it('gives issues with paths, a typed engine error, or a result with no NaN', { timeout: 300_000 }, () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.constantFrom(...Object.keys(mutations)), value), { minLength: 1, maxLength: 3 }), (changes) => {
        const raw = base();
        for (const [key, v] of changes) mutations[key](raw, v);
        const parsed = parseCase(JSON.parse(JSON.stringify(raw)));
        if (!parsed.ok) {
          expect(parsed.issues.length).toBeGreaterThan(0);
          for (const issue of parsed.issues) expect(issue.path.length > 0 && issue.message.length > 0).toBe(true);
          return;
        }
        try {
          expect(allNumbersFinite(evaluateCase(parsed.value))).toBe(true);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          expect(CASE_TOPS.has(topOf((error as EngineError).field)), (error as EngineError).field).toBe(true);
        }
      }),
      { numRuns: 150 },
    );
  });
});
