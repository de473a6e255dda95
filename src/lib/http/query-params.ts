import { z } from 'zod';
import { InvalidRequestError, type FieldIssue } from './app-errors';
import { fieldIssuesFromZod } from './zod-issues';

// A query parameter that cannot be read is refused rather than ignored: silently showing the latest revision, or
// every certificate, when the reader asked for something else would answer a question they did not ask.

/** A record id in a URL: what the portal's ids are made of (letters, digits, hyphens), at most 64 characters. */
export const idQuery = (what: string) =>
  z
    .string()
    .max(64, { error: `is too long to be an id (${what})` })
    .regex(/^[A-Za-z0-9-]+$/, { error: `is not an id (${what})` });

/** A count from 1 (a revision or register version number), as digits. */
export const numberFromOneQuery = (what: string) =>
  z
    .string()
    .regex(/^[1-9]\d{0,5}$/, { error: `must be a whole number from 1 (${what})` })
    .transform(Number);

/** A position from 0 (an event in the case's list), as digits. */
export const indexQuery = (what: string) =>
  z
    .string()
    .regex(/^(0|[1-9]\d{0,3})$/, { error: `must be a whole number from 0 (${what})` })
    .transform(Number);

type QueryInput = URLSearchParams | Record<string, string | string[] | undefined>;

function entriesOf(input: QueryInput): [string, string[]][] {
  if (input instanceof URLSearchParams) return [...new Set(input.keys())].map((key) => [key, input.getAll(key)]);
  return Object.entries(input).flatMap(([key, value]) => (value === undefined ? [] : [[key, [value].flat()] as [string, string[]]]));
}

/** The query parsed by `schema`, or the issues naming each parameter that is repeated or cannot be read. */
export function readQuery<S extends z.ZodObject>(schema: S, input: QueryInput): { ok: true; data: z.output<S> } | { ok: false; issues: FieldIssue[] } {
  const entries = entriesOf(input).filter(([key]) => key in schema.shape);
  const repeated = entries.filter(([, values]) => values.length > 1).map(([key]) => ({ path: key, message: 'is given more than once' }));
  if (repeated.length > 0) return { ok: false, issues: repeated };
  const parsed = schema.safeParse(Object.fromEntries(entries.map(([key, values]) => [key, values[0]])));
  return parsed.success ? { ok: true, data: parsed.data } : { ok: false, issues: fieldIssuesFromZod(parsed.error) };
}

/** For route handlers: the parsed query, or a 400 naming the parameters at fault. */
export function queryOrThrow<S extends z.ZodObject>(schema: S, request: Request): z.output<S> {
  const read = readQuery(schema, new URL(request.url).searchParams);
  if (!read.ok) throw new InvalidRequestError(read.issues, 'The address has parameters that cannot be read.');
  return read.data;
}
