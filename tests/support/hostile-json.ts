import fc from 'fast-check';

// Hostile input as JSON *text*, so that it can hold what JSON.stringify never writes: numbers beyond the double
// range (1e400 parses to Infinity), own "__proto__" keys, and nesting deeper than any recursive code survives.

export const DEEP = 100_000;

export const nestedArrays = (depth: number): string => `${'['.repeat(depth)}${']'.repeat(depth)}`;
export const nestedObjects = (depth: number): string => `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`;

const POLLUTERS = ['{"__proto__":{"polluted":true}}', '{"constructor":{"prototype":{"polluted":true}}}', '{"__proto__":[],"toString":1,"valueOf":"x","hasOwnProperty":null}'];
const DEEP_TEXTS = [nestedArrays(DEEP), nestedObjects(5_000), nestedArrays(2_000)];

/** Texts that are never a number, a string or a boolean a form sends: strings of numbers, huge values, containers. */
const NOT_A_NUMBER = ['1e400', '-1e400', '"NaN"', '"Infinity"', '"-1e400"', '"12"', '"0x1F"', '""', 'true', '[]', '{}', '[1]', '{"valueOf":1}', ...POLLUTERS, ...DEEP_TEXTS];
const NOT_A_STRING = ['1e400', '-0', '12', 'true', 'false', '[]', '{}', '["text"]', '{"toString":"x"}', ...POLLUTERS, ...DEEP_TEXTS];
const NOT_A_BOOLEAN = ['"true"', '"false"', '1', '0', '[]', '{}', '"on"', ...POLLUTERS];
const NOT_AN_OBJECT = ['"{}"', '[]', '[{}]', '1', 'true', '"[object Object]"', '1e400', ...DEEP_TEXTS.slice(0, 1)];
const NOT_AN_ARRAY = ['{}', '"[]"', '1', 'true', '{"0":{},"length":1}', ...POLLUTERS, nestedObjects(5_000)];

export type JsonValue = null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };
export type JsonPath = (string | number)[];

/** Whole bodies of garbage: invalid JSON, bare values, random JSON, deep nesting, prototype keys. */
export const garbageJsonText = (options: { objects: boolean } = { objects: true }): fc.Arbitrary<string> =>
  fc
    .oneof(
      fc.string({ maxLength: 40 }),
      fc.constantFrom('', ' ', '{', '[1,', '{"a":}', 'NaN', 'undefined', '"\\ud800"', '\u0000', '\ufeff{}', '1e400', '-1e400', 'null', 'true', '"x"', '[]', ...DEEP_TEXTS.slice(0, 1)),
      fc.json({ maxDepth: 3 }),
      fc.constantFrom(...POLLUTERS, nestedObjects(5_000)),
    )
    // A body decoder drops a byte-order mark, so "\ufeff{}" is an object too.
    .filter((text) => options.objects || !/^[\s\ufeff]*\{/.test(text));

function replacementsFor(value: JsonValue): string[] {
  if (typeof value === 'number') return NOT_A_NUMBER;
  if (typeof value === 'string') return NOT_A_STRING;
  if (typeof value === 'boolean') return NOT_A_BOOLEAN;
  if (Array.isArray(value)) return NOT_AN_ARRAY;
  return NOT_AN_OBJECT;
}

/** Every path to a value inside `value` (not the root itself). */
export function jsonPaths(value: JsonValue, prefix: JsonPath = []): { path: JsonPath; value: JsonValue }[] {
  if (value === null || typeof value !== 'object') return [];
  const entries: [string | number, JsonValue][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : Object.entries(value);
  return entries.flatMap(([key, child]) => [{ path: [...prefix, key], value: child }, ...jsonPaths(child, [...prefix, key])]);
}

const MARK = '\u0000hostile\u0000';

function withMark(value: JsonValue, path: JsonPath): JsonValue {
  if (path.length === 0) return MARK;
  const [key, ...rest] = path;
  if (Array.isArray(value)) return value.map((v, i) => (i === key ? withMark(v, rest) : v));
  const record = value as Record<string, JsonValue>;
  return { ...record, [key]: withMark(record[key], rest) };
}

/** A valid body with one field (leaf or branch) replaced by a value of another type: always invalid, and which field is known. */
export const mutatedJsonText = (valid: JsonValue): fc.Arbitrary<{ path: JsonPath; text: string }> => {
  const paths = jsonPaths(valid).filter((p) => p.value !== null);
  return fc
    .constantFrom(...paths)
    .chain(({ path, value }) => fc.constantFrom(...replacementsFor(value)).map((replacement) => ({ path, text: JSON.stringify(withMark(valid, path)).replace(JSON.stringify(MARK), replacement) })));
};

/** `['values', 'events', 0, 'discharge']` → `values.events[0].discharge`, as the API writes field paths. */
export function dotted(path: JsonPath): string {
  return path.reduce<string>((acc, key) => (typeof key === 'number' ? `${acc}[${key}]` : acc ? `${acc}.${key}` : key), '');
}

/** True when one path lies on the way to the other: an issue about `events[0]` names a change at `events[0].discharge`. */
export function relatedPaths(a: string, b: string): boolean {
  // An issue about the whole body ("") names no field, so it is related to nothing but the whole body.
  const under = (outer: string, inner: string) => inner === outer || (outer !== '' && (inner.startsWith(`${outer}.`) || inner.startsWith(`${outer}[`)));
  return under(a, b) || under(b, a);
}
