import type { ZodError } from 'zod';
import type { FieldIssue } from './app-errors';

/** zod issues as dotted field paths, e.g. "reach.section.bottomWidth" or "events[0].discharge". */
export function fieldIssuesFromZod(error: ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({ path: dottedPath(issue.path), message: issue.message }));
}

export function dottedPath(path: ReadonlyArray<PropertyKey>): string {
  return path.reduce<string>((acc, key) => (typeof key === 'number' ? `${acc}[${key}]` : acc ? `${acc}.${String(key)}` : String(key)), '');
}
