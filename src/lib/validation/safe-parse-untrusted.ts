import { z } from 'zod';

// zod 4.6 runs its length checks (`.min`, `.max`, `.length`) on any value that has a `length`, even after the type
// check failed, and compares that length with a number: a `length` that is a symbol or an object with no prototype
// makes safeParse throw instead of reporting an issue. JSON and form posts never carry such values, but a server
// action receives whatever the caller's runtime can encode, so every server entry point first checks that the input
// is plain data and names the field where it is not.

type PathKey = string | number;

const describe = (value: unknown): string | null => {
  if (typeof value === 'symbol') return 'a symbol';
  if (typeof value === 'function') return 'a function';
  if (typeof value !== 'object' || value === null) return null;
  const prototype: unknown = Object.getPrototypeOf(value);
  if (prototype === Object.prototype || prototype === Array.prototype || value instanceof Date) return null;
  if (typeof Blob !== 'undefined' && value instanceof Blob) return null;
  return prototype === null ? 'an object without a prototype' : 'an object of a kind a form never sends';
};

interface Visit {
  value: unknown;
  key: PathKey | null;
  parent: Visit | null;
}

const pathOf = (visit: Visit): PathKey[] => {
  const path: PathKey[] = [];
  for (let at: Visit | null = visit; at && at.key !== null; at = at.parent) path.unshift(at.key);
  return path;
};

/** The path to the first value in `input` that is not plain data (text, numbers, lists, fields, dates, files), if any. */
export function findNonPlainValue(input: unknown): { path: PathKey[]; kind: string } | null {
  // Iterative, with each path kept as a link to its parent, so that nesting far deeper than the call stack is walked
  // in linear time and memory.
  const stack: Visit[] = [{ value: input, key: null, parent: null }];
  const seen = new Set<object>();
  while (stack.length > 0) {
    const visit = stack.pop()!;
    const { value } = visit;
    const kind = describe(value);
    if (kind) return { path: pathOf(visit), kind };
    if (typeof value !== 'object' || value === null || seen.has(value) || value instanceof Date) continue;
    if (typeof Blob !== 'undefined' && value instanceof Blob) continue;
    seen.add(value);
    if (Array.isArray(value)) value.forEach((item: unknown, index) => stack.push({ value: item, key: index, parent: visit }));
    else for (const key of Object.keys(value)) stack.push({ value: (value as Record<string, unknown>)[key], key, parent: visit });
  }
  return null;
}

/** `schema.safeParse(input)` for input from outside: values that are not plain data are an issue at their field, never a throw. */
export function safeParseUntrusted<S extends z.ZodType>(schema: S, input: unknown): z.ZodSafeParseResult<z.output<S>> {
  const odd = findNonPlainValue(input);
  if (!odd) return schema.safeParse(input);
  const message = `Expected plain data (text, numbers, true or false, lists or fields) but got ${odd.kind}.`;
  const error = new z.ZodError([{ code: 'custom', path: odd.path, message, input: undefined }]) as z.ZodError<z.output<S>>;
  return { success: false, error };
}
