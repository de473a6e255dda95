import { readdirSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { parseParcelsCsv } from '@/lib/parcels/parcels-csv';
import { parseCase, parseCaseText } from '@/lib/validation/parse-case';
import { safeParseUntrusted } from '@/lib/validation/safe-parse-untrusted';
import { parseSurveyCsv } from '@/lib/validation/survey-csv';
import { DEEP, nestedArrays, nestedObjects } from '../support/hostile-json';

// Every zod schema in src/lib/validation, fed random and hostile values through safeParseUntrusted (as every server
// entry point parses): it never throws, and every issue has a path and a message; given an object, every issue names a
// field (a non-empty path).

const FOLDER = path.resolve('src/lib/validation');
const UNITS = ['SI', 'US'] as const;

async function collectSchemas(): Promise<{ name: string; schema: z.ZodType }[]> {
  const found: { name: string; schema: z.ZodType }[] = [];
  for (const file of readdirSync(FOLDER).filter((f) => f.endsWith('.ts')).sort()) {
    const module = (await import(path.join(FOLDER, file))) as Record<string, unknown>;
    for (const [name, value] of Object.entries(module)) {
      if (value instanceof z.ZodType) found.push({ name: `${file} ${name}`, schema: value });
      else if (typeof value === 'function' && /Schema$/.test(name)) {
        for (const units of UNITS) {
          const made: unknown = (value as (u: string) => unknown)(units);
          if (!(made instanceof z.ZodType)) throw new Error(`${file} ${name}(${units}) is named a schema but is not one`);
          found.push({ name: `${file} ${name}(${units})`, schema: made });
        }
      }
    }
  }
  return found;
}

const SCHEMAS = await collectSchemas();

/** The field names the schemas know, so that random objects often hit a real field with a wrong value. */
function fieldNames(schema: z.ZodType, names = new Set<string>(), seen = new Set<unknown>()): Set<string> {
  if (seen.has(schema)) return names;
  seen.add(schema);
  const def = (schema as unknown as { _zod: { def: Record<string, unknown> } })._zod.def;
  const shape = def.shape as Record<string, z.ZodType> | undefined;
  for (const [key, child] of Object.entries(shape ?? {})) {
    names.add(key);
    fieldNames(child, names, seen);
  }
  for (const key of ['innerType', 'element', 'in', 'out', 'schema', 'valueType']) if (def[key] instanceof z.ZodType) fieldNames(def[key] as z.ZodType, names, seen);
  for (const option of (def.options as z.ZodType[] | undefined) ?? []) fieldNames(option, names, seen);
  return names;
}
const FIELDS = [...new Set(SCHEMAS.flatMap(({ schema }) => [...fieldNames(schema)]))];

const DEEP_VALUES = [nestedArrays(1_000), nestedObjects(1_000)].map((text) => JSON.parse(text) as unknown);
const hostile: fc.Arbitrary<unknown> = fc.oneof(
  fc.anything({ maxDepth: 3, withBigInt: true, withDate: true, withMap: true, withSet: true, withTypedArray: true, withSparseArray: true, withNullPrototype: true, withBoxedValues: true, withObjectString: true }),
  fc.constantFrom<unknown>(Number.NaN, Infinity, -Infinity, -0, 1e308, 5e-324, 2n ** 80n, 'NaN', '1e400', '', ' ', '\u0000', 'x'.repeat(10_000), Symbol('s'), () => 1, new Date(Number.NaN)),
  fc.constantFrom(...DEEP_VALUES),
);
// fast-check defines "__proto__" as an own key, as JSON.parse does, rather than setting the prototype.
const hostileObject = fc.dictionary(fc.constantFrom(...FIELDS, '__proto__', 'constructor', 'prototype', 'toString'), hostile, { maxKeys: 8 });

const acceptsOnlyObjects = (schema: z.ZodType) => schema.safeParse(7).error?.issues.some((i) => i.code === 'invalid_type' && i.expected === 'object') ?? false;

describe('every zod schema in src/lib/validation', () => {
  it('has been found (the form schemas, the case file, the wizard steps for SI and US)', () => {
    expect(SCHEMAS.length).toBeGreaterThan(25);
    expect(FIELDS).toEqual(expect.arrayContaining(['revisionId', 'discharge', 'manningN', 'ownerName', 'email', 'events']));
  });

  for (const { name, schema } of SCHEMAS) {
    it(`${name}: parsing never throws; every issue has a path and a message`, () => {
      const objectsOnly = acceptsOnlyObjects(schema);
      fc.assert(
        fc.property(fc.oneof(hostile, hostileObject), (input) => {
          const result = safeParseUntrusted(schema, input);
          if (result.success) return;
          const plainObject = typeof input === 'object' && input !== null && !Array.isArray(input) && Object.getPrototypeOf(input) === Object.prototype;
          for (const issue of result.error.issues) {
            expect(Array.isArray(issue.path), `${name}: path`).toBe(true);
            expect(typeof issue.message === 'string' && issue.message.length > 0, `${name}: message`).toBe(true);
            if (objectsOnly && plainObject) expect(issue.path.length, `${name}: an issue about an object names a field: ${JSON.stringify(issue).slice(0, 200)}`).toBeGreaterThan(0);
          }
        }),
        { numRuns: 60 },
      );
    });
  }
});

describe('the parsers around the schemas', () => {
  it('parseCase never throws and always names the field, even for a nested or endless header', () => {
    const headers = [nestedArrays(DEEP), nestedObjects(2_000), '"x"', '1e400', '{"__proto__":{"format":"sillmark-case"}}'].map((t) => JSON.parse(t) as unknown);
    fc.assert(
      fc.property(fc.oneof(hostile, hostileObject, fc.constantFrom(...headers).map((h) => ({ format: h })), fc.constantFrom(...headers).map((h) => ({ format: 'sillmark-case', version: h }))), (input) => {
        const parsed = parseCase(input);
        if (parsed.ok) return;
        for (const issue of parsed.issues) expect(issue.path.length > 0 && issue.message.length > 0 && issue.message.length < 500).toBe(true);
      }),
      { numRuns: 200 },
    );
  });

  it('parseCaseText, parseSurveyCsv and parseParcelsCsv never throw on random text', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ maxLength: 400 }), fc.constantFrom(nestedArrays(DEEP), 'a,b\n"unclosed', '\ufeff', '\r\r\n\n', '=cmd|"/c calc"!A1,1,2\n'), fc.json()), (text) => {
        expect(parseCaseText(text).ok).toBe(false);
        for (const units of UNITS) parseSurveyCsv(text, units);
        parseParcelsCsv(text);
      }),
      { numRuns: 150 },
    );
  });
});
